import type {
  AgeGroup,
  AnalysisInput,
  AnalysisOutput,
  Breath,
  Etco2DisplayUnit,
  Etco2Point,
  Interval,
  Thresholds,
} from '@upstroke/contracts';
import { thresholdsForAgeGroup } from './age-rules.js';
import { detectBreaths } from './breaths/breath-detector.js';
import { etco2Measures, stepSegments } from './etco2/segments.js';
import { etco2Series } from './etco2/series.js';
import { mergeClose } from './events/intervals.js';
import { eventMeasures } from './events/measures.js';
import { normalizeEvents, type TimedEvent } from './events/normalize.js';
import { buildTimeline } from './events/timeline.js';
import { allFindings } from './findings/index.js';
import { breathIntervals } from './findings/ventilation-findings.js';
import { resolveThresholds } from './profile.js';
import { median } from './time.js';
import { mmHgFactor } from './units.js';
import { monitoringOf, runSpan, waveformRuns } from './waveform/runs.js';

/** What the analysis needs once samples have become breaths (shared by batch and live). */
export interface CoreInput {
  thresholds: Thresholds;
  events: readonly TimedEvent[];
  /** EtCO2 values and breaths, each sorted by time. */
  points: readonly Etco2Point[];
  breaths: readonly Breath[];
  waveformCoverage: readonly Interval[];
  endSec: number;
  live?: boolean;
  /** Default adult; child and infant records use the profile's paediatric rules. */
  ageGroup?: AgeGroup;
  /** The unit finding messages write EtCO2 in (default mmHg). */
  displayUnit?: Etco2DisplayUnit;
  /**
   * Live refresh: only findings still running at or after this time are wanted, so rules
   * read recent EtCO2 values, breaths and pauses only (a look-back long enough for every
   * rule), and the record-wide medians are not computed (returned as null).
   */
  activeFrom?: number;
}

/** Look-back of a live refresh: the rise baseline and sustain, the longest hold, and a margin. */
export function lookbackSec(t: Thresholds): number {
  return (
    t.riseBaselineSec + t.riseSustainSec + Math.max(t.lowEtco2MinSec, t.waveformAbsentSec) + 120
  );
}

/** In a time-sorted list, the index of the first item with `tSec` ≥ `t` (`after`: > `t`). */
function firstAt(xs: readonly { tSec: number }[], t: number, after = false): number {
  let lo = 0;
  let hi = xs.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (xs[mid].tSec < t || (after && xs[mid].tSec === t)) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** The items of a time-sorted list from `from` on. */
function tailFrom<T extends { tSec: number }>(xs: readonly T[], from: number): readonly T[] {
  return from === -Infinity ? xs : xs.slice(firstAt(xs, from));
}

/**
 * The items of a time-sorted list up to `end` (inclusive); the list itself when nothing is
 * later, as in every live refresh (no copy of the whole record each second).
 */
function headTo<T extends { tSec: number }>(xs: readonly T[], end: number): readonly T[] {
  if (xs.length === 0 || xs[xs.length - 1].tSec <= end) return xs;
  return xs.slice(0, firstAt(xs, end, true));
}

/**
 * Typical ventilation rate (breaths/min): the median of 60 ÷ the interval between
 * consecutive breaths, leaving out intervals long enough to count as an absent waveform and
 * intervals across a data gap (no signal there, so breaths may have been missed).
 */
export function ventilationRate(
  breaths: readonly Breath[],
  maxGapSec: number,
  dataGaps: readonly Interval[] = [],
): number | null {
  const intervals = breathIntervals(breaths, maxGapSec, dataGaps);
  const rates = new Float64Array(breaths.length);
  let n = 0;
  for (const dt of intervals) if (dt > 0) rates[n++] = 60 / dt;
  return median(rates.subarray(0, n));
}

/** Measures and findings from events, the EtCO2 series and breaths. */
export function analyzeCore(core: CoreInput): AnalysisOutput {
  const c = { ...core, thresholds: thresholdsForAgeGroup(core.thresholds, core.ageGroup) };
  const end = c.endSec;
  const from = c.activeFrom ?? -Infinity;
  const tl = buildTimeline(c.events, end);
  const measures = eventMeasures(c.events, tl, from);
  const monitoring = monitoringOf(c.waveformCoverage, end);
  // Values after the end of the record (e.g. monitor still running) are not part of it.
  const points = headTo(c.points, end);
  const breaths = headTo(c.breaths, end);
  const full = from === -Infinity;
  const segments = full ? stepSegments(points, end, monitoring.dataGaps) : [];
  const cut = from - lookbackSec(c.thresholds);
  const recentBreaths = tailFrom(breaths, cut);
  // In a live refresh, waveform absence is judged from the first breath kept onwards.
  const watchFrom = full || !recentBreaths.length ? cut : recentBreaths[0].tSec;
  const findings = allFindings({
    t: c.thresholds,
    events: c.events,
    tl,
    pauses: measures.pauses,
    points: tailFrom(points, cut),
    allPoints: points,
    segments: full ? segments : stepSegments(tailFrom(points, cut), end, monitoring.dataGaps),
    dataGaps: monitoring.dataGaps,
    breaths: recentBreaths,
    waveformCoverage: mergeClose(c.waveformCoverage)
      .filter((w) => w.endSec > watchFrom)
      .map((w) => ({ startSec: Math.max(w.startSec, watchFrom), endSec: w.endSec })),
    live: c.live ?? false,
    from,
    ageGroup: c.ageGroup ?? 'adult',
    unit: c.displayUnit ?? 'mmHg',
  }).map((f) => ({ ...f, startSec: Math.min(f.startSec, end), endSec: Math.min(f.endSec, end) }));
  return {
    measures: {
      ...measures,
      ...monitoring,
      ventilationRatePerMin: full
        ? ventilationRate(breaths, c.thresholds.waveformAbsentSec, monitoring.dataGaps)
        : null,
      etco2: full
        ? etco2Measures(points, segments, tl.compressions, c.thresholds.targetEtco2MmHg)
        : { medianMmHg: null, fractionAtOrAbove10: null, fractionAtOrAbove20: null },
    },
    findings,
    // A copy: the caller owns its output (the input may be a live detector's own list).
    breaths: breaths.slice(),
  };
}

/** End of the record: the `end` event, else the last time anything was recorded (≥ 0). */
export function recordEnd(
  events: readonly TimedEvent[],
  points: readonly Etco2Point[],
  coverage: readonly Interval[],
): number {
  const end = events.find((e) => e.kind === 'end');
  if (end) return Math.max(0, end.tSec);
  let t = 0;
  for (const e of events) t = Math.max(t, e.tSec);
  for (const p of points) t = Math.max(t, p.tSec);
  for (const w of coverage) t = Math.max(t, w.endSec);
  return t;
}

/**
 * The whole computation (PRODUCT.md "The computation") for an input already validated by
 * `analysisInputSchema`. Pure and deterministic; times are seconds from `arrestAt`.
 */
export function analyze(input: AnalysisInput): AnalysisOutput {
  const events = normalizeEvents(input.arrestAt, input.events);
  let breaths: Breath[] = [];
  const coverage: Interval[] = [];
  // Each run is read on its own: a breath is never pieced together across a gap.
  for (const w of waveformRuns(input.waveform)) {
    const span = runSpan(input.arrestAt, w);
    const scale = mmHgFactor(w.unit, w.barometricMmHg);
    const found = detectBreaths(w.values, w.sampleRateHz, span.startSec, {}, scale);
    for (const b of found) breaths.push(b);
    coverage.push(span);
  }
  // Runs given out of order or overlapping (a hand-made file): breaths in time order.
  if (breaths.some((b, i) => i > 0 && b.tSec < breaths[i - 1].tSec))
    breaths = [...breaths].sort((a, b) => a.tSec - b.tSec);
  const points = etco2Series(input.arrestAt, input.etco2, breaths);
  return analyzeCore({
    thresholds: resolveThresholds(input.profile),
    events,
    points,
    breaths,
    waveformCoverage: coverage,
    endSec: recordEnd(events, points, coverage),
    ageGroup: input.ageGroup,
    displayUnit: input.displayUnit,
  });
}
