import type {
  AnalysisInput,
  AnalysisOutput,
  Breath,
  Etco2Point,
  Interval,
  Thresholds,
} from '@upstroke/contracts';
import { detectBreaths } from './breaths/breath-detector.js';
import { etco2Measures, stepSegments } from './etco2/segments.js';
import { etco2Series } from './etco2/series.js';
import { eventMeasures } from './events/measures.js';
import { normalizeEvents, type TimedEvent } from './events/normalize.js';
import { buildTimeline } from './events/timeline.js';
import { allFindings } from './findings/index.js';
import { resolveThresholds } from './profile.js';
import { median, secondsFrom } from './time.js';
import { mmHgFactor } from './units.js';

/** What the analysis needs once samples have become breaths (shared by batch and live). */
export interface CoreInput {
  thresholds: Thresholds;
  events: readonly TimedEvent[];
  points: readonly Etco2Point[];
  breaths: readonly Breath[];
  waveformCoverage: readonly Interval[];
  endSec: number;
  live?: boolean;
}

/**
 * Typical ventilation rate (breaths/min): the median of 60 ÷ the interval between
 * consecutive breaths, leaving out intervals long enough to count as an absent waveform.
 */
export function ventilationRate(breaths: readonly Breath[], maxGapSec: number): number | null {
  const rates: number[] = [];
  for (let i = 1; i < breaths.length; i++) {
    const dt = breaths[i].tSec - breaths[i - 1].tSec;
    if (dt > 0 && dt < maxGapSec) rates.push(60 / dt);
  }
  return median(rates);
}

/** Measures and findings from events, the EtCO2 series and breaths. */
export function analyzeCore(c: CoreInput): AnalysisOutput {
  const end = c.endSec;
  const tl = buildTimeline(c.events, end);
  const measures = eventMeasures(c.events, tl);
  // Values after the end of the record (e.g. monitor still running) are not part of it.
  const points = c.points.filter((p) => p.tSec <= end);
  const breaths = c.breaths.filter((b) => b.tSec <= end);
  const segments = stepSegments(points, end);
  const findings = allFindings({
    t: c.thresholds,
    events: c.events,
    tl,
    pauses: measures.pauses,
    points,
    segments,
    breaths,
    waveformCoverage: c.waveformCoverage,
    live: c.live ?? false,
  }).map((f) => ({ ...f, startSec: Math.min(f.startSec, end), endSec: Math.min(f.endSec, end) }));
  return {
    measures: {
      ...measures,
      ventilationRatePerMin: ventilationRate(breaths, c.thresholds.waveformAbsentSec),
      etco2: etco2Measures(points, segments, tl.compressions),
    },
    findings,
    breaths,
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
  const w = input.waveform;
  if (w && w.values.length > 0) {
    const t0 = secondsFrom(input.arrestAt, w.startAt);
    breaths = detectBreaths(w.values, w.sampleRateHz, t0, {}, mmHgFactor(w.unit, w.barometricMmHg));
    coverage.push({ startSec: t0, endSec: t0 + w.values.length / w.sampleRateHz });
  }
  const points = etco2Series(input.arrestAt, input.etco2, breaths);
  return analyzeCore({
    thresholds: resolveThresholds(input.profile),
    events,
    points,
    breaths,
    waveformCoverage: coverage,
    endSec: recordEnd(events, points, coverage),
  });
}
