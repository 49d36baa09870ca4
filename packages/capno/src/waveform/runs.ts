import type { AnalysisInput, Interval, Waveform } from '@upstroke/contracts';
import { mergeClose, totalLength } from '../events/intervals.js';
import { secondsFrom } from '../time.js';

/**
 * Stretches without samples up to this long are not data gaps: frames arriving late or a
 * reconnect within a second lose no breath worth reporting (common practice).
 */
export const GAP_MIN_SEC = 1;

/** The runs of an input's capnogram, in time order, empty runs left out. */
export function waveformRuns(w: AnalysisInput['waveform']): Waveform[] {
  const runs = w === undefined ? [] : Array.isArray(w) ? w : [w];
  return runs
    .filter((r) => r.values.length > 0)
    .map((r, i) => ({ r, i, t: Date.parse(r.startAt) }))
    .sort((a, b) => a.t - b.t || a.i - b.i)
    .map((x) => x.r);
}

/** Where a run has samples, in seconds from the arrest. */
export function runSpan(arrestAt: string, w: Waveform): Interval {
  const startSec = secondsFrom(arrestAt, w.startAt);
  return { startSec, endSec: startSec + w.values.length / w.sampleRateHz };
}

export interface Monitoring {
  dataGaps: Interval[];
  monitoredSec: number | null;
  monitoringCoverage: number | null;
}

/**
 * Monitoring from the times covered by samples (sorted by start): from the first sample to
 * the end of the record, the stretches without samples longer than `GAP_MIN_SEC` are data
 * gaps, and coverage is the share of that time with samples. No capnogram: all null/empty.
 */
export function monitoringOf(coverage: readonly Interval[], endSec: number): Monitoring {
  if (coverage.length === 0) return { dataGaps: [], monitoredSec: null, monitoringCoverage: null };
  const covered = mergeClose(coverage)
    .map((x) => ({ startSec: x.startSec, endSec: Math.min(x.endSec, endSec) }))
    .filter((x) => x.endSec > x.startSec);
  const from = coverage[0].startSec;
  const dataGaps: Interval[] = [];
  let reached = from;
  for (const x of [...covered, { startSec: endSec, endSec }]) {
    if (x.startSec - reached > GAP_MIN_SEC)
      dataGaps.push({ startSec: reached, endSec: x.startSec });
    reached = Math.max(reached, x.endSec);
  }
  const monitoredSec = Math.max(0, endSec - from);
  return {
    dataGaps,
    monitoredSec,
    monitoringCoverage: monitoredSec > 0 ? Math.min(1, totalLength(covered) / monitoredSec) : null,
  };
}
