import { Injectable } from '@nestjs/common';
import { buildSummaryRow } from '@upstroke/capno';
import type { RecordSummaryRow } from '@upstroke/contracts';
import type { Knex } from 'knex';
import { notFound } from '../../common/errors';
import { ClinicalRecordsService } from '../resuscitations/clinical-records.service';
import { SummariesRepository } from './summaries.repository';

/**
 * Writes the per-record audit row. Called when a record is signed and when it is amended,
 * inside the caller's transaction when given, so that the row and the signature commit
 * together. The record is read by the debrief's loader and the row derived by capno from
 * the same analysis as the debrief.
 */
@Injectable()
export class SummariesService {
  constructor(
    private readonly data: ClinicalRecordsService,
    private readonly repo: SummariesRepository,
  ) {}

  async write(resuscitationId: string, trx?: Knex.Transaction): Promise<RecordSummaryRow> {
    const record = await this.data.loadStored(resuscitationId, trx);
    if (!record) throw notFound('Resuscitation');
    const row = buildSummaryRow(record);
    await this.repo.upsert(row, trx);
    return row;
  }
}
