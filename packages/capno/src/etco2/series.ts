import type {
  AnalysisEtco2,
  Breath,
  Etco2Point,
  Etco2Source,
  Etco2TrendPoint,
  Waveform,
} from '@upstroke/contracts';
import { median, secondsFrom } from '../time.js';
import { toMmHg } from '../units.js';

/** Default trend window: one median per 30 s (common practice for a debrief timeline). */
export const TREND_WINDOW_SEC = 30;

/** Sources whose values are read off a capnogram by the monitor link or a monitor file. */
const derivedSources = new Set<Etco2Source>(['stream', 'import', 'waveform']);

/**
 * The stored values to analyse beside a waveform: when the capnogram itself is analysed,
 * the per-breath values that were read off it (monitor link, monitor file) inside the time
 * it covers would count every breath twice, so they are left out; typed values, and values
 * outside the spans of its runs (its breaths are not there), stay. Without a waveform all stay.
 */
export function valuesBesideWaveform(
  values: readonly AnalysisEtco2[],
  waveform: Waveform | readonly Waveform[] | undefined,
): AnalysisEtco2[] {
  const spans = (waveform === undefined ? [] : Array.isArray(waveform) ? waveform : [waveform])
    .filter((w: Waveform) => w.values.length > 0)
    .map((w: Waveform) => {
      const from = Date.parse(w.startAt);
      return { from, to: from + (w.values.length / w.sampleRateHz) * 1000 };
    });
  if (spans.length === 0) return [...values];
  return values.filter((v) => {
    if (!derivedSources.has(v.source)) return true;
    const t = Date.parse(v.at);
    return !spans.some((x) => t >= x.from && t <= x.to);
  });
}

/**
 * The merged EtCO2 series in mmHg, sorted by time: entered and imported values keep their
 * `source`; per-breath values from a waveform come in as source `waveform`.
 */
export function etco2Series(
  arrestAt: string,
  values: readonly AnalysisEtco2[] = [],
  breaths: readonly Breath[] = [],
): Etco2Point[] {
  const pts: Etco2Point[] = values.map((v) => ({
    tSec: secondsFrom(arrestAt, v.at),
    mmHg: toMmHg(v.value, v.unit, v.barometricMmHg),
    source: v.source,
  }));
  for (const b of breaths) pts.push({ tSec: b.tSec, mmHg: b.etco2MmHg, source: 'waveform' });
  return sortByTime(pts);
}

/** Stable sort by time (already-sorted input costs one pass). */
export function sortByTime(pts: Etco2Point[]): Etco2Point[] {
  for (let i = 1; i < pts.length; i++) {
    if (pts[i].tSec < pts[i - 1].tSec) {
      return pts
        .map((p, k) => ({ p, k }))
        .sort((a, b) => a.p.tSec - b.p.tSec || a.k - b.k)
        .map((x) => x.p);
    }
  }
  return pts;
}

/**
 * The trend: windows of `windowSec` from time zero; each window with at least one value
 * gives the median of its values and the sources that contributed.
 */
export function etco2Trend(
  points: readonly Etco2Point[],
  windowSec: number = TREND_WINDOW_SEC,
): Etco2TrendPoint[] {
  const out: Etco2TrendPoint[] = [];
  let i = 0;
  while (i < points.length) {
    const k = Math.floor(points[i].tSec / windowSec);
    const vals: number[] = [];
    const sources = new Set<Etco2Source>();
    while (i < points.length && Math.floor(points[i].tSec / windowSec) === k) {
      vals.push(points[i].mmHg);
      sources.add(points[i].source);
      i++;
    }
    out.push({
      startSec: k * windowSec,
      endSec: (k + 1) * windowSec,
      medianMmHg: median(vals) as number,
      count: vals.length,
      sources: [...sources].sort(),
    });
  }
  return out;
}
