import { runRules } from './run-rules.js';
import { type ChartOptions, type ControlChart, resolveBaseline } from './types.js';

/**
 * 3/d2 with d2 = 1.128, the bias constant for ranges of 2 consecutive values: a standard SPC
 * table constant (Montgomery, Introduction to Statistical Quality Control, table of control
 * chart constants — from memory). 3 / 1.128 = 2.6596, conventionally rounded to 2.66.
 */
export const XMR_LIMIT_FACTOR = 2.66;

/**
 * Individuals (XmR) chart for a continuous measure, one value per period (null = gap).
 * Centre x̄ = mean of the baseline values; moving ranges |xᵢ − xᵢ₋₁| between consecutive
 * values (across a gap, the neighbouring values); limits x̄ ± 2.66·MR̄, MR̄ the mean moving
 * range within the baseline. With fewer than 2 baseline values there are no limits.
 */
export function xmrChart(values: (number | null)[], options: ChartOptions = {}): ControlChart {
  values.forEach((v, i) => {
    if (v !== null && !Number.isFinite(v)) throw new RangeError(`point ${i}: ${v} is not a number`);
  });
  const baseline = resolveBaseline(values.length, options.baseline);
  const base = values.slice(baseline.start, baseline.end).filter((v): v is number => v !== null);
  const centre = base.length > 0 ? base.reduce((s, v) => s + v, 0) / base.length : null;
  const ranges = movingRanges(base);
  const mrBar = ranges.length > 0 ? ranges.reduce((s, r) => s + r, 0) / ranges.length : null;
  const hasLimits = centre !== null && mrBar !== null;
  const lower = hasLimits ? centre - XMR_LIMIT_FACTOR * mrBar : null;
  const upper = hasLimits ? centre + XMR_LIMIT_FACTOR * mrBar : null;
  const points = values.map((value, index) =>
    value === null ? { index, value, lower: null, upper: null } : { index, value, lower, upper },
  );
  return {
    kind: 'xmr',
    centre,
    baseline,
    points,
    signals: runRules(points, centre, options.periodName),
  };
}

/** Moving ranges of a series, skipping gaps: |xᵢ − xᵢ₋₁| for consecutive values. */
export function movingRanges(values: (number | null)[]): number[] {
  const present = values.filter((v): v is number => v !== null);
  return present.slice(1).map((v, i) => Math.abs(v - present[i]!));
}
