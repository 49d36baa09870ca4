/** Statistical process control for quality measures: shared shapes of the charts. */

/** Points `start` (inclusive) to `end` (exclusive) that fix the centre line and limits. */
export interface Baseline {
  start: number;
  end: number;
}

/** One charted point. `value` is null for a gap (a period with no data): no limits there. */
export interface ControlPoint {
  index: number;
  value: number | null;
  lower: number | null;
  upper: number | null;
}

export type RuleId = 'beyond-limits' | 'run-of-8';

/** A run-rule signal: the rule, the point it fires at, the points behind it, plain words. */
export interface Signal {
  rule: RuleId;
  at: number;
  indices: number[];
  explanation: string;
}

export interface ControlChart {
  kind: 'p' | 'xmr';
  /** Null when the baseline holds no data: nothing can be charted against it. */
  centre: number | null;
  baseline: Baseline;
  points: ControlPoint[];
  signals: Signal[];
}

export interface ChartOptions {
  /** Defaults to every point. */
  baseline?: Baseline;
  /** Plural name of one period in explanations, e.g. 'months'. Defaults to 'points'. */
  periodName?: string;
}

/** Resolves and checks a baseline against a series of `length` points. */
export function resolveBaseline(length: number, baseline?: Baseline): Baseline {
  const b = baseline ?? { start: 0, end: length };
  const ok =
    Number.isInteger(b.start) && Number.isInteger(b.end) && b.start >= 0 && b.end <= length;
  if (!ok || b.start >= b.end) {
    throw new RangeError(
      `baseline: start ${b.start} and end ${b.end} must be whole point indices with ` +
        `0 ≤ start < end ≤ ${length}`,
    );
  }
  return b;
}
