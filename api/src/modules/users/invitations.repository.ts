import { randomUUID } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';

export type InvitationPurpose = 'invite' | 'reset';

/** One-time set-password links, stored as hashes of their tokens. */
@Injectable()
export class InvitationsRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async insert(
    row: {
      userId: string;
      tokenHash: string;
      purpose: InvitationPurpose;
      expiresAt: Date;
      createdBy: string | null;
    },
    trx?: Db,
  ): Promise<void> {
    await (trx ?? this.db)('userInvitations').insert({ id: randomUUID(), ...row });
  }

  /** Earlier links stop working once a new one is sent. */
  async revokeOpen(userId: string, trx?: Db): Promise<void> {
    await (trx ?? this.db)('userInvitations')
      .where({ userId })
      .whereNull('usedAt')
      .update({ usedAt: new Date() });
  }

  /** Marks the link used, atomically, and returns whose it was; nothing if spent or expired. */
  async consume(
    tokenHash: string,
    trx?: Db,
  ): Promise<{ userId: string; purpose: InvitationPurpose } | undefined> {
    const rows = await (trx ?? this.db)('userInvitations')
      .where({ tokenHash })
      .whereNull('usedAt')
      .where('expiresAt', '>', new Date())
      .update({ usedAt: new Date() })
      .returning<{ userId: string; purpose: InvitationPurpose }[]>(['userId', 'purpose']);
    return rows[0];
  }
}
