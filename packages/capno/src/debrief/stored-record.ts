import type { AgeGroup, Co2Unit, RecordSummaryRow, Rhythm, Waveform } from '@upstroke/contracts';

/** One stored event: what the record holds, before validation and corrections. */
export interface StoredEvent {
  id: string;
  at: string;
  kind: string;
  data: unknown;
  recordedBy?: string | null;
  /** Added after signing, through the amendment `amendmentId`. */
  amendment?: boolean;
  amendmentId?: string | null;
}

export interface StoredEtco2 {
  /** Its id, so that a correction can take it back (Live's Undo of a typed value). */
  id?: string;
  at: string;
  value: number;
  unit: Co2Unit;
  source: string;
}

export interface StoredWaveformChunk {
  startAt: string;
  sampleRateHz: number;
  unit: Co2Unit;
  /** Where the chunk came from (`stream`, `import`); absent means one source. */
  source?: string;
  values: ArrayLike<number>;
}

/** The protocol profile version in force for the record, as stored (checked on use). */
export interface StoredProfile {
  id?: string | null;
  version: number;
  name?: string;
  thresholds: unknown;
}

/** A record as stored: the resuscitation row, its clinical data and its protocol profile. */
export interface StoredRecord {
  id: string;
  siteId: string;
  unitId: string | null;
  arrestAt: string;
  ageGroup?: AgeGroup | null;
  weightKg?: number | null;
  witnessed?: boolean | null;
  monitored?: boolean | null;
  firstRhythm?: Rhythm | null;
  outcome?: RecordSummaryRow['outcome'];
  events: readonly StoredEvent[];
  etco2: readonly StoredEtco2[];
  waveform?: readonly StoredWaveformChunk[];
  profile?: StoredProfile | null;
}

/**
 * The chunks of the one source the capnogram is read from: the source with most samples (a
 * monitor import and a live stream of the same minutes would overlap), at its first chunk's
 * rate and unit, in time order.
 */
function chunksInUse(chunks: readonly StoredWaveformChunk[]): StoredWaveformChunk[] {
  const bySource = new Map<string, number>();
  for (const c of chunks)
    bySource.set(c.source ?? '', (bySource.get(c.source ?? '') ?? 0) + c.values.length);
  const source = [...bySource.entries()].sort((a, b) => b[1] - a[1])[0]?.[0];
  if (source === undefined) return [];
  const ofSource = chunks.filter((c) => (c.source ?? '') === source);
  const first = ofSource.reduce((a, c) => (Date.parse(c.startAt) < Date.parse(a.startAt) ? c : a));
  return ofSource
    .filter((c) => c.sampleRateHz === first.sampleRateHz && c.unit === first.unit)
    .sort((a, b) => Date.parse(a.startAt) - Date.parse(b.startAt));
}

/** The source of the capnogram the analysis reads (`stream` when none is named). */
export function waveformSource(chunks: readonly StoredWaveformChunk[]): string {
  return chunksInUse(chunks)[0]?.source ?? 'stream';
}

/**
 * Joins stored waveform chunks into the capnogram the analysis reads — the single rule for
 * every output, so all see the same signal: chunks that follow on within half a sample form
 * one run; a later chunk starts a new run, leaving a gap (no signal reached the server: no
 * data, never zero CO2, and never samples allocated for it); a sample that overlaps one
 * already placed is dropped.
 */
export function joinWaveform(chunks: readonly StoredWaveformChunk[]): Waveform[] {
  const runs: { w: Waveform; values: number[]; t0: number }[] = [];
  for (const c of chunksInUse(chunks)) {
    const period = 1000 / c.sampleRateHz;
    const start = Date.parse(c.startAt);
    const last = runs[runs.length - 1];
    const endMs = last ? last.t0 + last.values.length * period : -Infinity;
    if (!last || start > endMs + period / 2) {
      const values: number[] = [];
      runs.push({
        w: { startAt: c.startAt, sampleRateHz: c.sampleRateHz, unit: c.unit, values },
        values,
        t0: start,
      });
    }
    const run = runs[runs.length - 1];
    const offset = Math.round((start - run.t0) / period);
    for (let i = Math.max(0, run.values.length - offset); i < c.values.length; i++)
      run.values.push(c.values[i]);
  }
  return runs.map((r) => r.w).filter((w) => w.values.length > 0);
}
