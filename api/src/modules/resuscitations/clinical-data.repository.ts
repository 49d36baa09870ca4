import { Inject, Injectable } from '@nestjs/common';
import type { StoredProfile, StoredRecord } from '@upstroke/capno';
import type { Co2Unit, Etco2Source, EventKind } from '@upstroke/contracts';
import type { Knex } from 'knex';
import { KNEX, type Db } from '../../db/knex';
import {
  type RecordRow,
  type StoredChunkRow,
  type StoredEtco2Row,
  type StoredEventRow,
  toStoredRecord,
} from './stored-rows';

export interface EventRow {
  id: string;
  resuscitationId: string;
  at: Date;
  kind: EventKind;
  data: Record<string, unknown>;
  recordedBy: string | null;
  deviceId: string | null;
  amendment: boolean;
  amendmentId: string | null;
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

/** Reads of events, EtCO2 values and waveform chunks (writes: `EntriesRepository`). */
@Injectable()
export class ClinicalDataRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

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

  /**
   * A record as stored, with everything every output is composed from: its events (with
   * their amendment), EtCO2 values, capnogram chunks (decoded) and the protocol profile
   * version in force. The one loader for the debrief, the exports and the committee's row.
   */
  async loadStored(id: string, trx?: Db): Promise<StoredRecord | undefined> {
    const q = trx ?? this.db;
    const record = await q('resuscitations')
      .where({ id })
      .first<RecordRow | undefined>(
        'id',
        'siteId',
        'unitId',
        'arrestAt',
        'ageGroup',
        'weightKg',
        'witnessed',
        'monitored',
        'firstRhythm',
        'outcome',
        'profileId',
      );
    if (!record) return undefined;
    const where = { resuscitationId: id };
    // A transaction is one connection: its reads go one after another (pg refuses a query
    // on a client that is still busy); without one, the pool serves them side by side.
    const [events, etco2, chunks, profile] = await readAll(Boolean(trx), [
      () =>
        q('resuscitationEvents')
          .where(where)
          .orderBy([{ column: 'at' }, { column: 'receivedAt' }])
          .select<StoredEventRow[]>(
            'id',
            'at',
            'kind',
            'data',
            'recordedBy',
            'amendment',
            'amendmentId',
          ),
      () =>
        q('etco2Samples')
          .where(where)
          .orderBy('at')
          .select<StoredEtco2Row[]>('id', 'at', 'value', 'unit', 'source'),
      () =>
        q('waveformChunks')
          .where(where)
          .orderBy('startAt')
          .select<StoredChunkRow[]>(
            'startAt',
            'sampleRateHz',
            'unit',
            'source',
            'sampleCount',
            'samples',
          ),
      () => this.profileInForce(q, record.profileId, record.siteId),
    ] as const);
    return toStoredRecord(record, { events, etco2, chunks, profile });
  }

  /**
   * The profile version the record was recorded under; a record without one (or whose
   * version is gone) reads its site's latest. Its values are checked by capno on use.
   */
  private async profileInForce(
    q: Db,
    profileId: string | null,
    siteId: string,
  ): Promise<StoredProfile | null> {
    const cols = ['id', 'version', 'name', 'thresholds'];
    const own = profileId
      ? await q('protocolProfiles').where({ id: profileId }).first<StoredProfile | undefined>(cols)
      : undefined;
    if (own) return own;
    const latest = await q('protocolProfiles')
      .where({ siteId })
      .orderBy('version', 'desc')
      .first<StoredProfile | undefined>(cols);
    return latest ?? null;
  }
}

type Results<T extends readonly (() => PromiseLike<unknown>)[]> = {
  -readonly [K in keyof T]: Awaited<ReturnType<T[K]>>;
};

/** Runs the reads one by one on a single connection, side by side otherwise. */
async function readAll<T extends readonly (() => PromiseLike<unknown>)[]>(
  oneConnection: boolean,
  reads: T,
): Promise<Results<T>> {
  if (!oneConnection) return (await Promise.all(reads.map((read) => read()))) as Results<T>;
  const out: unknown[] = [];
  for (const read of reads) out.push(await read());
  return out as Results<T>;
}
