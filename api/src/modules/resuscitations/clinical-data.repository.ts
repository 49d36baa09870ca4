import { Inject, Injectable } from '@nestjs/common';
import type { Co2Unit, Etco2Source, EventKind } from '@upstroke/contracts';
import type { Knex } from 'knex';
import { KNEX, type Db } from '../../db/knex';

export interface EventRow {
  id: string;
  resuscitationId: string;
  at: Date;
  kind: EventKind;
  data: Record<string, unknown>;
  recordedBy: string | null;
  deviceId: string | null;
  amendment: boolean;
  receivedAt: Date;
}

export interface Etco2Row {
  id: string;
  resuscitationId: string;
  at: Date;
  value: number;
  unit: Co2Unit;
  valueMmhg: number;
  source: Etco2Source;
  deviceId: string | null;
}

export interface WaveformChunkRow {
  id: string;
  resuscitationId: string;
  startAt: Date;
  sampleRateHz: number;
  unit: Co2Unit;
  seq: number | null;
  sampleCount: number;
  samples: Buffer;
  source: string;
}

/** Events, EtCO2 values and waveform chunks: append-only, idempotent on their ids. */
@Injectable()
export class ClinicalDataRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /** Inserts rows whose id is new; returns how many were added (the rest were replays). */
  async insertNew(
    table: 'resuscitationEvents' | 'etco2Samples' | 'waveformChunks',
    rows: object[],
    trx?: Db,
  ): Promise<number> {
    if (rows.length === 0) return 0;
    const added = await (trx ?? this.db)(table)
      .insert(rows)
      .onConflict('id')
      .ignore()
      .returning('id');
    return added.length;
  }

  /** Ids among `ids` already stored under another record (a client bug or a forged id). */
  async idsOwnedElsewhere(
    table: 'resuscitationEvents' | 'etco2Samples' | 'waveformChunks',
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

  async events(resuscitationId: string): Promise<EventRow[]> {
    return this.db<EventRow>('resuscitationEvents')
      .where({ resuscitationId })
      .orderBy([{ column: 'at' }, { column: 'receivedAt' }]);
  }

  async etco2(resuscitationId: string): Promise<Etco2Row[]> {
    return this.db<Etco2Row>('etco2Samples')
      .where({ resuscitationId })
      .orderBy('at')
      .select('id', 'resuscitationId', 'at', 'value', 'unit', 'valueMmhg', 'source', 'deviceId');
  }

  /**
   * Events and EtCO2 values received after `since` (all without it), with the database's
   * time at the start of the read: the caller's next `since`.
   */
  async entriesSince(resuscitationId: string, since?: Date) {
    const now = await this.db.raw<{ rows: { now: Date }[] }>('select now() as now');
    const after = <Q extends Knex.QueryBuilder>(q: Q) =>
      since ? q.where('receivedAt', '>', since) : q;
    const [events, etco2] = await Promise.all([
      after(this.db('resuscitationEvents').where({ resuscitationId }))
        .orderBy('at')
        .select<Pick<EventRow, 'id' | 'at' | 'kind' | 'data' | 'deviceId'>[]>(
          'id',
          'at',
          'kind',
          'data',
          'deviceId',
        ),
      after(this.db('etco2Samples').where({ resuscitationId }))
        .orderBy('at')
        .select<Pick<Etco2Row, 'id' | 'at' | 'value' | 'unit' | 'source' | 'deviceId'>[]>(
          'id',
          'at',
          'value',
          'unit',
          'source',
          'deviceId',
        ),
    ]);
    return { serverTime: now.rows[0].now, events, etco2 };
  }

  async waveformChunks(resuscitationId: string): Promise<WaveformChunkRow[]> {
    return this.db<WaveformChunkRow>('waveformChunks')
      .where({ resuscitationId })
      .orderBy('startAt');
  }
}
