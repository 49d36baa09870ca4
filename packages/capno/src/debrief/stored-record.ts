import type { AgeGroup, Co2Unit, RecordSummaryRow, Rhythm, Waveform } from '@upstroke/contracts';
import type { Interval } from '@upstroke/contracts';

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
 * Joins stored waveform chunks into the one capnogram the analysis reads — the single rule
 * for every output, so all see the same signal. A gap between chunks is filled with zero CO2
 * (no signal reached the server: the analysis may report an absent waveform there), and a
 * sample that overlaps one already placed is dropped.
 */
export function joinWaveform(chunks: readonly StoredWaveformChunk[]): Waveform | undefined {
  const use = chunksInUse(chunks);
  if (use.length === 0) return undefined;
  const first = use[0];
  const rate = first.sampleRateHz;
  const t0 = Date.parse(first.startAt);
  const values: number[] = [];
  for (const c of use) {
    const offset = Math.round(((Date.parse(c.startAt) - t0) / 1000) * rate);
    while (values.length < offset) values.push(0);
    for (let i = values.length - offset; i < c.values.length; i++) values.push(c.values[i]);
  }
  return { startAt: first.startAt, sampleRateHz: rate, unit: first.unit, values };
}

/**
 * Stretches between the chunks in use where no signal was stored (seconds from the arrest),
 * longer than one second: data gaps of the capnogram.
 */
export function waveformGaps(arrestAt: string, chunks: readonly StoredWaveformChunk[]): Interval[] {
  const t0 = Date.parse(arrestAt);
  const gaps: Interval[] = [];
  let reached: number | null = null;
  for (const c of chunksInUse(chunks)) {
    const start = (Date.parse(c.startAt) - t0) / 1000;
    if (reached !== null && start - reached > 1) gaps.push({ startSec: reached, endSec: start });
    const end = start + c.values.length / c.sampleRateHz;
    reached = reached === null ? end : Math.max(reached, end);
  }
  return gaps;
}
