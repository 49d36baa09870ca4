import { describe, expect, it } from 'vitest';
import { movingRanges, XMR_LIMIT_FACTOR, xmrChart } from './xmr-chart.js';

const series = [12, 15, 11, 14, 13, 16, 12, 30];

describe('XmR (individuals) chart', () => {
  it('2.66 = 3/d2 with d2 = 1.128 for ranges of 2 (SPC constant table, from memory)', () => {
    expect(XMR_LIMIT_FACTOR).toBeCloseTo(3 / 1.128, 2);
  });

  it('centre, mean moving range and limits over all points', () => {
    // Computed independently in Python (re-run to check):
    // /usr/bin/python3 -c "x=[12,15,11,14,13,16,12,30];m=sum(x)/8;mr=[abs(a-b) for a,b in zip(x[1:],x[:-1])];r=sum(mr)/len(mr);print(repr(m),repr(r),repr(m-2.66*r),repr(m+2.66*r))"
    // → 15.375 5.142857142857143 1.6949999999999985 29.055
    const chart = xmrChart(series);
    expect(chart.centre).toBeCloseTo(15.375, 12);
    expect(chart.points[0]!.lower).toBeCloseTo(1.695, 12);
    expect(chart.points[0]!.upper).toBeCloseTo(29.055, 12);
    // 30 > 29.055: beyond the upper limit (rule 1)
    expect(chart.signals.map((s) => [s.rule, s.at])).toEqual([['beyond-limits', 7]]);
  });

  it('a baseline period fixes centre and limits', () => {
    // /usr/bin/python3 -c "x=[12,15,11,14,13,16,12];m=sum(x)/7;mr=[abs(a-b) for a,b in zip(x[1:],x[:-1])];r=sum(mr)/len(mr);print(repr(m),repr(r),repr(m-2.66*r),repr(m+2.66*r))"
    // → 13.285714285714286 3.0 5.305714285714286 21.26571428571429
    const chart = xmrChart(series, { baseline: { start: 0, end: 7 } });
    expect(chart.centre).toBeCloseTo(13.285714285714286, 12);
    expect(chart.points[7]!.lower).toBeCloseTo(5.305714285714286, 12);
    expect(chart.points[7]!.upper).toBeCloseTo(21.26571428571429, 12);
  });

  it('gaps have no limits; moving ranges join the values either side of a gap', () => {
    expect(movingRanges([12, null, 15, 11])).toEqual([3, 4]);
    const chart = xmrChart([12, null, 15, 11]);
    // centre (12+15+11)/3, MR̄ = 3.5 → upper = 38/3 + 2.66 × 3.5
    expect(chart.points[1]).toEqual({ index: 1, value: null, lower: null, upper: null });
    expect(chart.points[0]!.upper).toBeCloseTo(38 / 3 + 2.66 * 3.5, 12);
  });

  it('fewer than 2 baseline values: a centre but no limits', () => {
    const chart = xmrChart([10, 50], { baseline: { start: 0, end: 1 } });
    expect(chart.centre).toBe(10);
    expect(chart.points[1]!.upper).toBeNull();
    expect(chart.signals).toEqual([]);
  });

  it('rejects a value that is not a number, naming the point', () => {
    expect(() => xmrChart([1, Number.NaN])).toThrow(/point 1/);
  });

  it('a constant series gives no signal, even where the mean rounds off the values', () => {
    // Twelve 0.1s: their mean in floating point is 0.09999999999999999, so every value sat a
    // hair "above" a centre and limits that coincide (no moving range); equal values are no change.
    for (const v of [0.1, 0.7, 123.4]) {
      const chart = xmrChart(Array.from({ length: 12 }, () => v));
      expect(chart.signals).toEqual([]);
    }
    // A real change after a constant baseline still signals.
    const shifted = xmrChart([...Array.from({ length: 8 }, () => 0.1), 0.5], {
      baseline: { start: 0, end: 8 },
    });
    expect(shifted.signals.map((s) => s.rule)).toContain('beyond-limits');
  });
});
