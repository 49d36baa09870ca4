import { Inject, Injectable } from '@nestjs/common';
import type { Co2Unit, Etco2Sample, ResusEvent, WaveformChunk } from '@upstroke/contracts';
import { KNEX, type Db } from '../../db/knex';

export type EntryTable = 'resuscitationEvents' | 'etco2Samples' | 'waveformChunks';

/** Who stored entries: the record, the sender and its device (when an entry names none). */
export interface EntryMeta {
  resuscitationId: string;
  recordedBy: string;
  deviceId?: string | null;
  clockOffsetMs?: number | null;
  /** Set on events added by an amendment of a signed record. */
  amendmentId?: string;
}

/** A validated EtCO2 value with its value in mmHg (the analysis reads that column). */
export type Etco2Entry = Etco2Sample & { valueMmhg: number };

/**
 * Appends tablet entries (events, EtCO2 values, capnogram chunks), idempotent on their ids;
 * owns their encoding (event data as jsonb, samples as float32 bytea).
 */
@Injectable()
export class EntriesRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /** Inserts events whose id is new; returns how many were added (the rest were replays). */
  insertEvents(events: readonly ResusEvent[], meta: EntryMeta, trx?: Db): Promise<number> {
    return this.insertNew(
      'resuscitationEvents',
      events.map((e) => ({
        id: e.id,
        resuscitationId: meta.resuscitationId,
        at: e.at,
        kind: e.kind,
        data: JSON.stringify(e.data),
        recordedBy: meta.recordedBy,
        deviceId: e.deviceId ?? meta.deviceId ?? null,
        clockOffsetMs: meta.clockOffsetMs ?? null,
        amendment: meta.amendmentId !== undefined,
        amendmentId: meta.amendmentId ?? null,
      })),
      trx,
    );
  }

  insertEtco2(values: readonly Etco2Entry[], meta: EntryMeta, trx?: Db): Promise<number> {
    return this.insertNew(
      'etco2Samples',
      values.map((v) => ({
        id: v.id,
        resuscitationId: meta.resuscitationId,
        at: v.at,
        value: v.value,
        unit: v.unit,
        valueMmhg: v.valueMmhg,
        source: v.source,
        recordedBy: meta.recordedBy,
        deviceId: v.deviceId ?? meta.deviceId ?? null,
      })),
      trx,
    );
  }

  /** Streamed capnogram chunks, their samples stored as float32 (what the loader decodes). */
  insertWaveform(chunks: readonly WaveformChunk[], meta: EntryMeta, trx?: Db): Promise<number> {
    return this.insertNew(
      'waveformChunks',
      chunks.map((w) => ({
        id: w.id,
        resuscitationId: meta.resuscitationId,
        startAt: w.startAt,
        sampleRateHz: w.sampleRateHz,
        unit: w.unit satisfies Co2Unit,
        seq: w.seq ?? null,
        sampleCount: w.values.length,
        samples: Buffer.from(new Float32Array(w.values).buffer),
        source: 'stream',
      })),
      trx,
    );
  }

  /** Ids among `ids` already stored under another record (a client bug or a forged id). */
  async idsOwnedElsewhere(
    table: EntryTable,
    ids: string[],
    resuscitationId: string,
  ): Promise<Set<string>> {
    if (ids.length === 0) return new Set();
    const rows = await this.db(table)
      .whereIn('id', ids)
      .whereNot({ resuscitationId })
      .select<{ id: string }[]>('id');
    return new Set(rows.map((r) => r.id));
  }

  private async insertNew(table: EntryTable, rows: object[], trx?: Db): Promise<number> {
    if (rows.length === 0) return 0;
    const added = await (trx ?? this.db)(table)
      .insert(rows)
      .onConflict('id')
      .ignore()
      .returning('id');
    return added.length;
  }
}
