import { describe, expect, it } from 'vitest';
import { funnelLimits, funnelPlot, Z_95, Z_998 } from './funnel.js';

// Funnel plot limits: Spiegelhalter 2005, Stat Med 24:1185 (summary).
describe('funnel plot', () => {
  it('z for two-sided 95 % and 99.8 % equal the normal quantiles', () => {
    // Computed independently with SciPy:
    // /usr/bin/python3 -c "from scipy.stats import norm; print(repr(norm.ppf(0.975)), repr(norm.ppf(0.999)))"
    // → 1.959963984540054 3.090232306167813
    expect(Z_95).toBeCloseTo(1.959963984540054, 6);
    expect(Z_998).toBeCloseTo(3.090232306167813, 6);
  });

  it('limits by the normal approximation, clamped to [0, 1]', () => {
    // /usr/bin/python3 -c "p0=0.3;print([(n,max(0,p0-z*(p0*(1-p0)/n)**.5),min(1,p0+z*(p0*(1-p0)/n)**.5)) for n in (12,200) for z in (1.959964,3.090232)])"
    const small = funnelLimits(0.3, 12);
    expect(small.lower95).toBeCloseTo(0.04072113386803006, 12);
    expect(small.upper95).toBeCloseTo(0.5592788661319699, 12);
    expect(small.lower998).toBe(0);
    expect(small.upper998).toBeCloseTo(0.7087992682746875, 12);
    // p0 = 0.9, n = 12: 0.9 + 3.090232·√(0.09/12) = 1.1676… → clamped to 1
    expect(funnelLimits(0.9, 12).upper998).toBe(1);
    const large = funnelLimits(0.3, 200);
    expect(large.lower95).toBeCloseTo(0.2364899076889287, 12);
    expect(large.upper95).toBeCloseTo(0.3635100923110713, 12);
    expect(large.lower998).toBeCloseTo(0.1998650385503884, 12);
    expect(large.upper998).toBeCloseTo(0.4001349614496116, 12);
  });

  it('classifies each unit against its own n', () => {
    const plot = funnelPlot(0.3, [
      { x: 6, n: 12 }, // 0.5 within (0.041, 0.559)
      { x: 75, n: 200 }, // 0.375: beyond 95 % (upper 0.3635), within 99.8 % (0.4001)
      { x: 35, n: 200 }, // 0.175: beyond 99.8 % (lower 0.1999)
      { x: 0, n: 0 },
    ]);
    expect(plot.map((p) => [p.zone, p.side])).toEqual([
      ['within', null],
      ['beyond-95', 'above'],
      ['beyond-99.8', 'below'],
      ['no-data', null],
    ]);
    expect(plot[1]!.p).toBeCloseTo(0.375, 12);
    expect(plot[3]!.limits).toBeNull();
  });

  it('rejects a target outside [0, 1] and impossible counts, naming the unit', () => {
    expect(() => funnelLimits(1.2, 10)).toThrow(/target p0/);
    expect(() => funnelLimits(0.3, 0)).toThrow(/n = 0/);
    expect(() =>
      funnelPlot(0.3, [
        { x: 1, n: 1 },
        { x: 3, n: 2 },
      ]),
    ).toThrow(/unit 1/);
  });
});
