import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX, type Db } from '../../db/knex';
import { type AdminScope, onlyManagedRecipients, scopeOutbox } from '../../db/admin-scope.sql';

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
export class MailSinkRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /** Messages a scoped admin may read: only those to users they manage. */
  private sink(scope: AdminScope): Knex.QueryBuilder {
    const q = this.db('mailSinkMessages');
    if (!scope.organisationWide) q.whereRaw(onlyManagedRecipients('rcpt_to'), [scope.siteIds]);
    return q;
  }

  async listSink(
    scope: AdminScope,
    limit: number,
    offset: number,
  ): Promise<{ items: SinkRow[]; total: number }> {
    const [{ count }] = await this.sink(scope).count<{ count: number }[]>({ count: '*' });
    const items = await this.sink(scope)
      .orderBy('id', 'desc')
      .limit(limit)
      .offset(offset)
      .select<SinkRow[]>(listColumns);
    return { items, total: Number(count) };
  }

  async findSink(scope: AdminScope, id: number): Promise<(SinkRow & { raw: string }) | undefined> {
    return this.sink(scope)
      .where({ id })
      .first<SinkRow & { raw: string }>([...listColumns, 'raw']);
  }

  /** Message counts by status in `mail_outbox`, or null when this database has no queue. */
  async outboxCounts(scope: AdminScope): Promise<Record<string, number> | null> {
    const has = await this.db.raw<{ rows: unknown[] }>(
      `select 1 from information_schema.columns
        where table_schema = 'public' and table_name = 'mail_outbox' and column_name = 'status'`,
    );
    if (has.rows.length === 0) return null;
    const rows = await scopeOutbox(this.db, this.db('mailOutbox'), scope)
      .groupBy('status')
      .select<{ status: string; count: number }[]>('status', this.db.raw('count(*)::int as count'));
    return Object.fromEntries(rows.map((r) => [r.status, Number(r.count)]));
  }
}
