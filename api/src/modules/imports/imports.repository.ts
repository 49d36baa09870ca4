import { randomUUID } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import type { Co2Unit } from '@upstroke/contracts';
import type { AssembledChunk } from '../../common/monitor-file/waveform-assembler';
import { KNEX, type Db } from '../../db/knex';

/** Which record and file imported samples belong to, and who imported it. */
export interface ImportMeta {
  resuscitationId: string;
  importId: string;
  recordedBy: string;
}

/** One per-breath EtCO2 value of a file, at its aligned time. */
export interface ImportedEtco2 {
  at: Date;
  mmHg: number;
}

export interface ImportRow {
  id: string;
  resuscitationId: string;
  fileName: string;
  sha256: string;
  rows: number;
  startedAt: Date;
  endedAt: Date;
  unit: Co2Unit;
  sampleRateHz: number;
  offsetSec: number;
  offsetMethod: 'auto' | 'manual';
  offsetChosenBy: string | null;
  residualSec: number | null;
  markers: number;
  matchedMarkers: number;
  breaths: number;
  createdAt: Date;
  createdBy: string | null;
}

/** Imported monitor files and their samples; no rules here. */
@Injectable()
export class ImportsRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /** Runs `work` in one transaction: the file's rows, samples and audit entry, or nothing. */
  transaction<T>(work: (trx: Db) => Promise<T>): Promise<T> {
    return this.db.transaction((trx) => work(trx));
  }

  async listByResuscitation(resuscitationId: string): Promise<ImportRow[]> {
    return this.db<ImportRow>('imports').where({ resuscitationId }).orderBy('createdAt');
  }

  async findById(resuscitationId: string, id: string, trx?: Db): Promise<ImportRow | undefined> {
    return (trx ?? this.db)<ImportRow>('imports').where({ resuscitationId, id }).first();
  }

  async findBySha(resuscitationId: string, sha256: string): Promise<ImportRow | undefined> {
    return this.db<ImportRow>('imports').where({ resuscitationId, sha256 }).first();
  }

  async insert(row: Omit<ImportRow, 'createdAt'>, trx: Db): Promise<ImportRow> {
    const [stored] = await trx<ImportRow>('imports').insert(row).returning('*');
    return stored as ImportRow;
  }

  async updateOffset(
    id: string,
    patch: Pick<ImportRow, 'offsetSec' | 'offsetMethod' | 'offsetChosenBy' | 'residualSec'>,
    trx: Db,
  ): Promise<void> {
    await trx('imports').where({ id }).update(patch);
  }

  /** Capnogram chunks on the file's clock, samples stored as float32 (mmHg). */
  async insertChunks(chunks: readonly AssembledChunk[], meta: ImportMeta, trx: Db): Promise<void> {
    if (chunks.length === 0) return;
    await trx('waveformChunks').insert(
      chunks.map((c) => ({
        id: randomUUID(),
        resuscitationId: meta.resuscitationId,
        startAt: new Date(c.startMs),
        sampleRateHz: c.sampleRateHz,
        unit: 'mmHg',
        sampleCount: c.values.length,
        samples: Buffer.from(c.values.buffer, c.values.byteOffset, c.values.byteLength),
        source: 'import',
        importId: meta.importId,
      })),
    );
  }

  async insertEtco2(values: readonly ImportedEtco2[], meta: ImportMeta, trx: Db): Promise<void> {
    const rows = values.map((v) => ({
      id: randomUUID(),
      resuscitationId: meta.resuscitationId,
      at: v.at,
      value: Math.round(v.mmHg * 100) / 100,
      unit: 'mmHg',
      valueMmhg: v.mmHg,
      source: 'import',
      importId: meta.importId,
      recordedBy: meta.recordedBy,
    }));
    for (let i = 0; i < rows.length; i += 2000)
      await trx('etco2Samples').insert(rows.slice(i, i + 2000));
  }

  /** Moves an import's stored samples by `deltaSec` (later when positive). */
  async shiftSamples(importId: string, deltaSec: number, trx: Db): Promise<void> {
    const by = trx.raw(`? * interval '1 second'`, [deltaSec]);
    await trx('waveformChunks')
      .where({ importId })
      .update({ startAt: trx.raw('start_at + ?', [by]) });
    await trx('etco2Samples')
      .where({ importId })
      .update({ at: trx.raw('at + ?', [by]) });
  }
}
