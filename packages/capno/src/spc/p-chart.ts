import { runRules } from './run-rules.js';
import { type ChartOptions, type ControlChart, resolveBaseline } from './types.js';

/** One period of a proportion measure: `x` of `n` cases met it. */
export interface ProportionCount {
  x: number;
  n: number;
}

/** Sigma multiple of Shewhart control limits (common practice; Benneyan 2003, summary). */
export const SIGMA_LIMIT = 3;

/**
 * p-chart (Benneyan, Lloyd & Plsek 2003, Qual Saf Health Care 12:458 — summary):
 * centre p̄ = Σx / Σn over the baseline; each point's limits p̄ ± 3·√(p̄(1 − p̄)/nᵢ) from its
 * own n, clamped to [0, 1]. A period with n = 0 is a gap: no value, no limits, never a signal.
 */
export function pChart(counts: ProportionCount[], options: ChartOptions = {}): ControlChart {
  counts.forEach(checkCount);
  const baseline = resolveBaseline(counts.length, options.baseline);
  const base = counts.slice(baseline.start, baseline.end);
  const sumN = base.reduce((s, c) => s + c.n, 0);
  const centre = sumN > 0 ? base.reduce((s, c) => s + c.x, 0) / sumN : null;
  const points = counts.map(({ x, n }, index) => {
    if (n === 0) return { index, value: null, lower: null, upper: null };
    if (centre === null) return { index, value: x / n, lower: null, upper: null };
    const halfWidth = SIGMA_LIMIT * Math.sqrt((centre * (1 - centre)) / n);
    const lower = Math.max(0, centre - halfWidth);
    return { index, value: x / n, lower, upper: Math.min(1, centre + halfWidth) };
  });
  return {
    kind: 'p',
    centre,
    baseline,
    points,
    signals: runRules(points, centre, options.periodName),
  };
}

function checkCount({ x, n }: ProportionCount, i: number) {
  if (!Number.isInteger(n) || n < 0 || !Number.isInteger(x) || x < 0 || x > n) {
    throw new RangeError(`point ${i}: x = ${x} of n = ${n} must be whole numbers, 0 ≤ x ≤ n`);
  }
}
