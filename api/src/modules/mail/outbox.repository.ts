import { randomUUID } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';
import { type AdminScope, scopeOutbox } from '../../db/admin-scope.sql';

export interface OutboxRow {
  id: string;
  to: string[];
  subject: string;
  body: string;
  attachmentName: string | null;
  attachmentType: string | null;
  attachment: Buffer | null;
  status: 'queued' | 'sent' | 'failed';
  attempts: number;
  lastError: string | null;
  nextAttemptAt: Date;
  sentAt: Date | null;
  createdAt: Date;
  createdBy: string | null;
  resuscitationId: string | null;
}

export interface OutboxInsert {
  to: string[];
  subject: string;
  body: string;
  attachmentName?: string | null;
  attachmentType?: string | null;
  attachment?: Buffer | null;
  resuscitationId?: string | null;
  createdBy?: string | null;
  /** Until then the retry worker leaves the row alone: the first attempt is being made. */
  nextAttemptAt: Date;
}

const listColumns = [
  'id',
  'to',
  'subject',
  'status',
  'attempts',
  'lastError',
  'nextAttemptAt',
  'sentAt',
  'createdAt',
  'createdBy',
  'resuscitationId',
  'attachmentName',
];

/**
 * `mail_outbox`, the one queue: every message is written before it is sent, so none is
 * lost; the retry worker claims due rows, the admins list them. No rules here.
 */
@Injectable()
export class OutboxRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async insert(row: OutboxInsert, trx?: Db): Promise<string> {
    const id = randomUUID();
    await (trx ?? this.db)('mailOutbox').insert({ id, ...row, status: 'queued' });
    return id;
  }

  /** The queue as `scope` may see it (see `scopeOutbox`). */
  async list(scope: AdminScope, limit: number, offset: number) {
    const scoped = () => scopeOutbox(this.db, this.db('mailOutbox'), scope);
    const [{ count }] = await scoped().count<{ count: number }[]>({ count: '*' });
    const items = await scoped()
      .orderBy('createdAt', 'desc')
      .limit(limit)
      .offset(offset)
      .select<Omit<OutboxRow, 'body' | 'attachment' | 'attachmentType'>[]>(listColumns);
    return { items, total: Number(count) };
  }

  async findById(id: string): Promise<OutboxRow | undefined> {
    return this.db('mailOutbox').where({ id }).first<OutboxRow>();
  }

  /**
   * Claims due queued rows by pushing their next attempt out first (one worker per row
   * even with several API processes: `for update skip locked`).
   */
  async claimDue(now: Date, limit: number, leaseMs: number): Promise<OutboxRow[]> {
    return this.db.transaction(async (trx) => {
      const rows = await trx('mailOutbox')
        .where({ status: 'queued' })
        .where('nextAttemptAt', '<=', now)
        .orderBy('nextAttemptAt')
        .limit(limit)
        .forUpdate()
        .skipLocked()
        .select<OutboxRow[]>('*');
      if (rows.length > 0)
        await trx('mailOutbox')
          .whereIn(
            'id',
            rows.map((r) => r.id),
          )
          .update({ nextAttemptAt: new Date(now.getTime() + leaseMs) });
      return rows;
    });
  }

  async markSent(id: string, trx?: Db): Promise<void> {
    await (trx ?? this.db)('mailOutbox')
      .where({ id })
      .update({
        status: 'sent',
        sentAt: new Date(),
        lastError: null,
        attempts: this.db.raw('attempts + 1'),
      });
  }

  async markFailed(id: string, error: string, next: Date | null): Promise<void> {
    await this.db('mailOutbox')
      .where({ id })
      .update({
        lastError: error.slice(0, 500),
        attempts: this.db.raw('attempts + 1'),
        ...(next ? { nextAttemptAt: next } : { status: 'failed' }),
      });
  }
}
