import { createHash, randomBytes } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import type { SetPassword } from '@upstroke/contracts';
import bcrypt from 'bcryptjs';
import { badRequest } from '../../common/errors';
import { APP_CONFIG, type AppConfig } from '../../config';
import type { Db } from '../../db/knex';
import { AuditService } from '../audit/audit.service';
import { MailService } from '../mail/mail.service';
import { type InvitationPurpose, InvitationsRepository } from './invitations.repository';
import { type UserRow, UsersRepository } from './users.repository';

/** How long a link works: long enough for a weekend off, short enough to limit exposure. */
export const linkLifetimeHours: Record<InvitationPurpose, number> = { invite: 72, reset: 24 };

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

const invalidLink = () =>
  badRequest(
    'This link is no longer valid (used, replaced or expired); ask an admin for a new one',
    [{ path: 'token', message: 'This link is no longer valid' }],
  );

function mailFor(
  user: Pick<UserRow, 'name' | 'email' | 'role'>,
  purpose: InvitationPurpose,
  link: string,
) {
  const hours = linkLifetimeHours[purpose];
  const intro =
    purpose === 'invite'
      ? `An administrator has created an Upstroke account for you (${user.email}, role: ${user.role}).`
      : 'An administrator has reset your Upstroke password. Your old password no longer works.';
  return {
    to: user.email,
    subject: purpose === 'invite' ? 'Your Upstroke account' : 'Set a new Upstroke password',
    text: [
      `Hello ${user.name},`,
      '',
      intro,
      `Set your password with this link within ${hours} hours. The link works once:`,
      '',
      link,
      '',
      'If you did not expect this message, you can ignore it.',
    ].join('\n'),
  };
}

/** One-time set-password links: issued with an e-mail, consumed once, then dead. */
@Injectable()
export class InvitationsService {
  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly invitations: InvitationsRepository,
    private readonly users: UsersRepository,
    private readonly mail: MailService,
    private readonly audit: AuditService,
  ) {}

  /**
   * Replaces any open link with a new one and e-mails it. Called inside the caller's
   * transaction: if the mail cannot be sent, the whole change is rolled back.
   */
  async issue(
    user: Pick<UserRow, 'id' | 'name' | 'email' | 'role'>,
    purpose: InvitationPurpose,
    createdBy: string | null,
    trx: Db,
  ): Promise<void> {
    const token = randomBytes(32).toString('base64url');
    await this.invitations.revokeOpen(user.id, trx);
    await this.invitations.insert(
      {
        userId: user.id,
        tokenHash: hashToken(token),
        purpose,
        expiresAt: new Date(Date.now() + linkLifetimeHours[purpose] * 3600_000),
        createdBy,
      },
      trx,
    );
    const link = `${this.config.publicUrl.replace(/\/$/, '')}/set-password?token=${token}`;
    await this.mail.send({ ...mailFor(user, purpose, link), createdBy }, trx);
  }

  /** Sets the password from a link; tokens issued before stop working. */
  async setPassword(body: SetPassword, deviceId?: string): Promise<{ email: string }> {
    const passwordHash = await bcrypt.hash(body.password, 10);
    return this.users.inTransaction(async (trx) => {
      const link = await this.invitations.consume(hashToken(body.token), trx);
      const user = link && (await this.users.findWithSites(link.userId, trx));
      if (!link || !user || !user.active) throw invalidLink();
      await this.users.update(user.id, { passwordHash }, true, trx);
      await this.audit.insert(
        {
          userId: user.id,
          action: 'user.set-password',
          entity: 'user',
          entityId: user.id,
          deviceId,
          details: { via: link.purpose },
        },
        trx,
      );
      return { email: user.email };
    });
  }
}
