import { endianness } from 'node:os';
import type { StoredProfile, StoredRecord } from '@upstroke/capno';
import type { AgeGroup, Co2Unit, Resuscitation, Rhythm } from '@upstroke/contracts';

/** The columns of `resuscitations` a stored record needs. */
export interface RecordRow {
  id: string;
  siteId: string;
  unitId: string | null;
  arrestAt: Date;
  ageGroup: AgeGroup | null;
  weightKg: number | null;
  witnessed: boolean | null;
  monitored: boolean | null;
  firstRhythm: Rhythm | null;
  outcome: Resuscitation['outcome'];
  profileId: string | null;
}

export interface StoredEventRow {
  id: string;
  at: Date;
  kind: string;
  data: unknown;
  recordedBy: string | null;
  amendment: boolean;
  amendmentId: string | null;
}

export interface StoredEtco2Row {
  id: string;
  at: Date;
  value: number;
  unit: Co2Unit;
  source: string;
}

export interface StoredChunkRow {
  startAt: Date;
  sampleRateHz: number;
  unit: Co2Unit;
  source: string;
  sampleCount: number;
  samples: Buffer;
}

const littleEndian = endianness() === 'LE';

/**
 * Little-endian float32, as the sync and the imports store raw capnogram chunks. On a
 * little-endian host (every one we run on) the bytes are the array: one copy, no loop.
 */
export function decodeSamples(buf: Buffer, count: number): Float32Array {
  const n = Math.min(count, Math.floor(buf.length / 4));
  if (littleEndian) return new Float32Array(Uint8Array.prototype.slice.call(buf, 0, n * 4).buffer);
  const out = new Float32Array(n);
  for (let i = 0; i < n; i++) out[i] = buf.readFloatLE(i * 4);
  return out;
}

/** Rows as read from PostgreSQL → the `StoredRecord` capno composes every output from. */
export function toStoredRecord(
  record: RecordRow,
  rows: {
    events: StoredEventRow[];
    etco2: StoredEtco2Row[];
    chunks: StoredChunkRow[];
    profile: StoredProfile | null;
  },
): StoredRecord {
  const { profileId: _profileId, arrestAt, ...rest } = record;
  return {
    ...rest,
    arrestAt: arrestAt.toISOString(),
    events: rows.events.map((e) => ({ ...e, at: e.at.toISOString() })),
    etco2: rows.etco2.map((v) => ({ ...v, at: v.at.toISOString() })),
    waveform: rows.chunks.map((c) => ({
      startAt: c.startAt.toISOString(),
      sampleRateHz: c.sampleRateHz,
      unit: c.unit,
      source: c.source,
      values: decodeSamples(c.samples, c.sampleCount),
    })),
    profile: rows.profile,
  };
}
