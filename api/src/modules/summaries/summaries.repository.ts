import { Inject, Injectable } from '@nestjs/common';
import type { RecordSummaryRow } from '@upstroke/contracts';
import type { Knex } from 'knex';
import { KNEX, type Db } from '../../db/knex';

/** Writes the committee's summary row (`record_summaries`); the record is read elsewhere. */
@Injectable()
export class SummariesRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async upsert(row: RecordSummaryRow, trx?: Knex.Transaction): Promise<void> {
    const values = {
      ...row,
      findingCounts: JSON.stringify(row.findingCounts),
      computedAt: new Date(),
    };
    await (trx ?? this.db)('recordSummaries').insert(values).onConflict('resuscitationId').merge();
  }
}
