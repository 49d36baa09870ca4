import { Inject, Injectable } from '@nestjs/common';
import type { ProfileInput, RecordSummaryRow } from '@upstroke/contracts';
import type { StoredRecord, StoredWaveformChunk } from '@upstroke/capno';
import type { Knex } from 'knex';
import { KNEX, type Db } from '../../db/knex';

type Conn = Db | Knex.Transaction;

interface RecordRow extends Omit<
  StoredRecord,
  'arrestAt' | 'events' | 'etco2' | 'waveform' | 'profile'
> {
  arrestAt: Date;
  profileId: string | null;
}

/** Little-endian float32, as the sync stores raw capnogram chunks. */
function decodeSamples(buf: Buffer, count: number): Float32Array {
  const out = new Float32Array(count);
  for (let i = 0; i < count && i * 4 + 4 <= buf.length; i++) out[i] = buf.readFloatLE(i * 4);
  return out;
}

/** Reads a record with everything its summary needs, and writes the summary row. */
@Injectable()
export class SummariesRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async loadRecord(id: string, trx?: Knex.Transaction): Promise<StoredRecord | undefined> {
    const q: Conn = trx ?? this.db;
    const record = await q<RecordRow>('resuscitations')
      .where({ id })
      .first(
        'id',
        'siteId',
        'unitId',
        'arrestAt',
        'ageGroup',
        'witnessed',
        'monitored',
        'firstRhythm',
        'outcome',
        'profileId',
      );
    if (!record) return undefined;
    const [events, etco2, chunks, profile] = await Promise.all([
      q('resuscitationEvents')
        .where({ resuscitationId: id })
        .orderBy([{ column: 'at' }, { column: 'receivedAt' }])
        .select<{ id: string; at: Date; kind: string; data: unknown }[]>(
          'id',
          'at',
          'kind',
          'data',
        ),
      q('etco2Samples')
        .where({ resuscitationId: id })
        .orderBy('at')
        .select<StoredRecord['etco2'][number][]>('at', 'value', 'unit', 'source'),
      q('waveformChunks').where({ resuscitationId: id }).orderBy('startAt').select<
        (Omit<StoredWaveformChunk, 'values' | 'startAt'> & {
          startAt: Date;
          sampleCount: number;
          samples: Buffer;
        })[]
      >('startAt', 'sampleRateHz', 'unit', 'source', 'sampleCount', 'samples'),
      this.profileFor(q, record.profileId, record.siteId),
    ]);
    const { profileId: _, ...rest } = record;
    return {
      ...rest,
      arrestAt: record.arrestAt.toISOString(),
      events: events.map((e) => ({ ...e, at: e.at.toISOString() })),
      etco2: etco2.map((s) => ({ ...s, at: new Date(s.at).toISOString() })),
      waveform: chunks.map((c) => ({
        startAt: c.startAt.toISOString(),
        sampleRateHz: c.sampleRateHz,
        unit: c.unit,
        source: c.source,
        values: decodeSamples(c.samples, c.sampleCount),
      })),
      profile,
    };
  }

  /** The record's own profile version; a record without one reads its site's latest. */
  private async profileFor(q: Conn, profileId: string | null, siteId: string) {
    const base = q('protocolProfiles').select<{ version: number; thresholds: ProfileInput }[]>(
      'version',
      'thresholds',
    );
    const rows = profileId
      ? await base.where({ id: profileId })
      : await base.where({ siteId }).orderBy('version', 'desc').limit(1);
    return rows[0] ?? null;
  }

  async upsert(row: RecordSummaryRow, trx?: Knex.Transaction): Promise<void> {
    const values = {
      ...row,
      findingCounts: JSON.stringify(row.findingCounts),
      computedAt: new Date(),
    };
    await (trx ?? this.db)('recordSummaries').insert(values).onConflict('resuscitationId').merge();
  }
}
