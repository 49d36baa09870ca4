import { describe, expect, it } from 'vitest';
import { pChart } from './p-chart.js';

// Worked series; n = 0 in the 4th period is a gap.
const series = [
  { x: 20, n: 50 },
  { x: 25, n: 60 },
  { x: 18, n: 40 },
  { x: 0, n: 0 },
  { x: 30, n: 70 },
  { x: 22, n: 45 },
];

describe('p-chart (Benneyan, Lloyd & Plsek 2003, Qual Saf Health Care 12:458 — summary)', () => {
  it('centre Σx/Σn and per-point 3-sigma limits from each n', () => {
    // Expected values computed independently in Python (re-run to check):
    // /usr/bin/python3 -c "x=[20,25,18,0,30,22];n=[50,60,40,0,70,45];b=[(a,k) for a,k in zip(x,n) if k];p=sum(a for a,k in b)/sum(k for a,k in b);print(repr(p),[(repr(p-3*(p*(1-p)/k)**.5),repr(p+3*(p*(1-p)/k)**.5)) for a,k in b])"
    const chart = pChart(series);
    expect(chart.centre).toBeCloseTo(0.4339622641509434, 12);
    const expected: [number, number][] = [
      [0.22368857787539576, 0.6442359504264911],
      [0.24200952877947357, 0.6259149995224133],
      [0.19886913595514882, 0.6690553923467379],
      [0.256248563537715, 0.6116759647641719],
      [0.2123143372741372, 0.6556101910277496],
    ];
    const charted = chart.points.filter((p) => p.value !== null);
    expect(charted.map((p) => p.index)).toEqual([0, 1, 2, 4, 5]);
    charted.forEach((p, i) => {
      expect(p.lower).toBeCloseTo(expected[i]![0], 12);
      expect(p.upper).toBeCloseTo(expected[i]![1], 12);
    });
    expect(chart.points[4]!.value).toBeCloseTo(30 / 70, 12);
  });

  it('a period with n = 0 is a gap: no value, no limits, never a signal', () => {
    const chart = pChart(series);
    expect(chart.points[3]).toEqual({ index: 3, value: null, lower: null, upper: null });
    expect(chart.signals.flatMap((s) => s.indices)).not.toContain(3);
  });

  it('a baseline period fixes the centre line', () => {
    // /usr/bin/python3 -c "x=[20,25,18];n=[50,60,40];p=sum(x)/sum(n);print(repr(p),repr(p+3*(p*(1-p)/70)**.5))"
    const chart = pChart(series, { baseline: { start: 0, end: 3 } });
    expect(chart.centre).toBeCloseTo(0.42, 12);
    expect(chart.points[4]!.upper).toBeCloseTo(0.5969745744450314, 12);
    expect(chart.baseline).toEqual({ start: 0, end: 3 });
  });

  it('clamps limits to [0, 1] for small n', () => {
    // /usr/bin/python3 -c "p=3/10;print(p-3*(p*(1-p)/10)**.5, p+3*(p*(1-p)/10)**.5)"  → -0.1347…, 0.7347…
    const chart = pChart([
      { x: 3, n: 10 },
      { x: 3, n: 10 },
    ]);
    expect(chart.points[0]!.lower).toBe(0);
    expect(chart.points[0]!.upper).toBeCloseTo(0.7347413023856831, 12);
    // p̄ = 0.9, n = 10: 0.9 + 3·√(0.09/10) = 1.1846… → clamped to 1
    const high = pChart([{ x: 9, n: 10 }]);
    expect(high.points[0]!.upper).toBe(1);
    expect(high.points[0]!.lower).toBeCloseTo(0.9 - 3 * Math.sqrt(0.09 / 10), 12);
  });

  it('flags a point beyond its limit (rule 1)', () => {
    const counts = Array.from({ length: 12 }, (_, i) => ({ x: i % 2 === 0 ? 10 : 11, n: 50 }));
    counts.push({ x: 40, n: 50 });
    const chart = pChart(counts, { baseline: { start: 0, end: 12 }, periodName: 'months' });
    const rule1 = chart.signals.filter((s) => s.rule === 'beyond-limits');
    expect(rule1.map((s) => s.at)).toEqual([12]);
    expect(rule1[0]!.explanation).toMatch(/month is above the upper control limit/);
  });

  it('no baseline data: no centre, no limits, no signals', () => {
    const chart = pChart(
      [
        { x: 0, n: 0 },
        { x: 4, n: 5 },
      ],
      { baseline: { start: 0, end: 1 } },
    );
    expect(chart.centre).toBeNull();
    expect(chart.points[1]).toEqual({ index: 1, value: 0.8, lower: null, upper: null });
    expect(chart.signals).toEqual([]);
  });

  it('rejects impossible counts and baselines, naming the point', () => {
    expect(() => pChart([{ x: 5, n: 4 }])).toThrow(/point 0: x = 5 of n = 4/);
    expect(() => pChart([{ x: 1, n: -1 }])).toThrow(RangeError);
    expect(() => pChart([{ x: 1, n: 2 }], { baseline: { start: 0, end: 3 } })).toThrow(/baseline/);
  });
});
