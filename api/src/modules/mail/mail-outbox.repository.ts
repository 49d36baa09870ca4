import { randomUUID } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';

export interface OutboxInsert {
  to: string[];
  subject: string;
  body: string;
  attachmentName?: string | null;
  attachmentType?: string | null;
  attachment?: Buffer | null;
  resuscitationId?: string | null;
  createdBy?: string | null;
  /** Until then a retry worker leaves the row alone: the first attempt is being made. */
  nextAttemptAt: Date;
}

/** Rows of `mail_outbox`: every message is written before it is sent, so none is lost. */
@Injectable()
export class MailOutboxRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async insert(row: OutboxInsert, trx?: Db): Promise<string> {
    const id = randomUUID();
    await (trx ?? this.db)('mailOutbox').insert({ id, ...row, status: 'queued' });
    return id;
  }

  async markSent(id: string, trx?: Db): Promise<void> {
    await (trx ?? this.db)('mailOutbox')
      .where({ id })
      .update({ status: 'sent', sentAt: new Date(), attempts: this.db.raw('attempts + 1') });
  }

  async markAttemptFailed(id: string, error: string, retryAt: Date): Promise<void> {
    await this.db('mailOutbox')
      .where({ id })
      .update({
        lastError: error.slice(0, 500),
        nextAttemptAt: retryAt,
        attempts: this.db.raw('attempts + 1'),
      });
  }
}
