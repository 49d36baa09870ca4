import { describe, expect, it } from 'vitest';
import { runOfEight, runRules } from './run-rules.js';
import type { ControlPoint } from './types.js';

// Rules: Nelson 1984, J Qual Technol 16:237; Western Electric Handbook 1956 (from memory).
const points = (values: (number | null)[], limits = 10): ControlPoint[] =>
  values.map((value, index) => ({
    index,
    value,
    lower: value === null ? null : -limits,
    upper: value === null ? null : limits,
  }));

describe('run rules', () => {
  it('8 points on one side flags rule 2 exactly at the 8th point', () => {
    const signals = runRules(points([-1, 1, 1, 1, 1, 1, 1, 1, 1, -1]), 0, 'months');
    expect(signals).toHaveLength(1);
    expect(signals[0]!.rule).toBe('run-of-8');
    expect(signals[0]!.at).toBe(8);
    expect(signals[0]!.indices).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    expect(signals[0]!.explanation).toBe(
      '8 months in a row above the centre line: a sustained shift, not chance alone.',
    );
  });

  it('7 points on one side do not', () => {
    expect(runRules(points([-1, 1, 1, 1, 1, 1, 1, 1, -1]), 0)).toEqual([]);
  });

  it('a longer run below is one signal listing every point of it', () => {
    const [s, ...rest] = runOfEight(points(Array<number>(10).fill(-2)), 0);
    expect(rest).toEqual([]);
    expect(s!.at).toBe(7);
    expect(s!.indices).toHaveLength(10);
    expect(s!.explanation).toMatch(/^10 points in a row below/);
  });

  it('a point on the centre line breaks a run; a gap neither counts nor breaks', () => {
    expect(runOfEight(points([1, 1, 1, 1, 0, 1, 1, 1, 1]), 0)).toEqual([]);
    const withGap = runOfEight(points([1, 1, 1, 1, null, 1, 1, 1, 1]), 0);
    expect(withGap.map((s) => [s.at, s.indices.length])).toEqual([[8, 8]]);
  });

  it('a point beyond the limits flags rule 1; one on the limit does not', () => {
    const signals = runRules(points([0, 10, -11, 2, 12]), 0);
    expect(signals.map((s) => [s.rule, s.at])).toEqual([
      ['beyond-limits', 2],
      ['beyond-limits', 4],
    ]);
    expect(signals[0]!.explanation).toMatch(/below the lower control limit/);
  });

  it('no centre line: no signals', () => {
    expect(runRules(points([50, 50, 50, 50, 50, 50, 50, 50]), null)).toEqual([]);
  });
});
