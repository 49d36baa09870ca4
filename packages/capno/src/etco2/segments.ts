import type { Etco2Point, Interval } from '@upstroke/contracts';
import { median } from '../time.js';

/**
 * A value is taken to stand from its time until the next value, for at most this long:
 * entered values come about once a minute, breaths every few seconds (common practice).
 */
export const MAX_HOLD_SEC = 60;

export interface Etco2Segment extends Interval {
  mmHg: number;
}

/** Values read off a capnogram: they stand for nothing once its signal stops (a data gap). */
const fromSignal = new Set<Etco2Point['source']>(['waveform', 'stream']);

/**
 * The series as a step function: each value holds until the next one (≤ MAX_HOLD_SEC); a
 * value read off the capnogram holds no further than the start of a data gap (`gaps`,
 * sorted): no data is not a value.
 */
export function stepSegments(
  points: readonly Etco2Point[],
  endSec: number,
  gaps: readonly Interval[] = [],
): Etco2Segment[] {
  const out: Etco2Segment[] = [];
  let g = 0;
  for (let i = 0; i < points.length; i++) {
    const s = points[i].tSec;
    while (g < gaps.length && gaps[g].endSec <= s) g++;
    const next = i + 1 < points.length ? points[i + 1].tSec : endSec;
    const cut = fromSignal.has(points[i].source) && g < gaps.length ? gaps[g].startSec : Infinity;
    const e = Math.min(next, s + MAX_HOLD_SEC, Math.max(endSec, s), Math.max(cut, s));
    if (e > s) out.push({ startSec: s, endSec: e, mmHg: points[i].mmHg });
  }
  return out;
}

/** Length of the part of `seg` that lies inside `xs` (disjoint, sorted), from index `j`. */
function overlapFrom(xs: readonly Interval[], seg: Interval, j: number): number {
  let s = 0;
  for (let k = j; k < xs.length && xs[k].startSec < seg.endSec; k++) {
    s += Math.max(0, Math.min(xs[k].endSec, seg.endSec) - Math.max(xs[k].startSec, seg.startSec));
  }
  return s;
}

/**
 * EtCO2 process measures over CPR time (the compression intervals):
 * - `medianMmHg`: median of the values recorded during compressions;
 * - `fractionAtOrAbove10/20`: share of the CPR time covered by a value (see MAX_HOLD_SEC)
 *   during which EtCO2 was ≥ 10 and ≥ 20 mmHg. Null when no value falls in CPR time;
 * - `fractionAtOrAboveTarget`: the same share at or above the profile's target (`targetMmHg`,
 *   default 20 mmHg, Meaney 2013), so a site's own target drives its measure.
 */
export function etco2Measures(
  points: readonly Etco2Point[],
  segments: readonly Etco2Segment[],
  cpr: readonly Interval[],
  targetMmHg = 20,
) {
  const during: number[] = [];
  let j = 0;
  for (const p of points) {
    while (j < cpr.length && cpr[j].endSec <= p.tSec) j++;
    if (j < cpr.length && p.tSec >= cpr[j].startSec) during.push(p.mmHg);
  }
  let covered = 0;
  let at10 = 0;
  let at20 = 0;
  let atTarget = 0;
  j = 0;
  for (const seg of segments) {
    while (j < cpr.length && cpr[j].endSec <= seg.startSec) j++;
    const len = overlapFrom(cpr, seg, j);
    covered += len;
    if (seg.mmHg >= 10) at10 += len;
    if (seg.mmHg >= 20) at20 += len;
    if (seg.mmHg >= targetMmHg) atTarget += len;
  }
  return {
    medianMmHg: median(during),
    fractionAtOrAbove10: covered > 0 ? at10 / covered : null,
    fractionAtOrAbove20: covered > 0 ? at20 / covered : null,
    targetMmHg,
    fractionAtOrAboveTarget: covered > 0 ? atTarget / covered : null,
  };
}
