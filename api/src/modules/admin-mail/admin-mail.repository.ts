import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';

export interface SinkRow {
  id: number;
  receivedAt: Date;
  mailFrom: string | null;
  rcptTo: string[];
  subject: string | null;
  sizeBytes: number;
}

const listColumns = ['id', 'receivedAt', 'mailFrom', 'rcptTo', 'subject', 'sizeBytes'];

/** Reads the local sink's messages and, where it exists, the delivery queue's state. */
@Injectable()
export class AdminMailRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async listSink(limit: number, offset: number): Promise<{ items: SinkRow[]; total: number }> {
    const [{ count }] = await this.db('mailSinkMessages').count<{ count: number }[]>({
      count: '*',
    });
    const items = await this.db('mailSinkMessages')
      .orderBy('id', 'desc')
      .limit(limit)
      .offset(offset)
      .select<SinkRow[]>(listColumns);
    return { items, total: Number(count) };
  }

  async findSink(id: number): Promise<(SinkRow & { raw: string }) | undefined> {
    return this.db('mailSinkMessages')
      .where({ id })
      .first<SinkRow & { raw: string }>([...listColumns, 'raw']);
  }

  /** Message counts by status in `mail_outbox`, or null when this database has no queue. */
  async outboxCounts(): Promise<Record<string, number> | null> {
    const has = await this.db.raw<{ rows: unknown[] }>(
      `select 1 from information_schema.columns
        where table_schema = 'public' and table_name = 'mail_outbox' and column_name = 'status'`,
    );
    if (has.rows.length === 0) return null;
    const rows = await this.db('mailOutbox')
      .groupBy('status')
      .select<{ status: string; count: number }[]>('status', this.db.raw('count(*)::int as count'));
    return Object.fromEntries(rows.map((r) => [r.status, Number(r.count)]));
  }
}
