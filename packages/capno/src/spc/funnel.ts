/**
 * Funnel plot for a proportion against volume (Spiegelhalter 2005, Stat Med 24:1185 —
 * summary): target p₀, limits p₀ ± z·√(p₀(1 − p₀)/n) by the normal approximation, clamped
 * to [0, 1]. z are the standard normal quantiles for two-sided 95 % and 99.8 %
 * (norm.ppf(0.975) and norm.ppf(0.999), checked with SciPy in funnel.spec.ts).
 */
export const Z_95 = 1.959964;
export const Z_998 = 3.090232;

export interface FunnelLimits {
  n: number;
  lower95: number;
  upper95: number;
  lower998: number;
  upper998: number;
}

export type FunnelZone = 'within' | 'beyond-95' | 'beyond-99.8' | 'no-data';

export interface FunnelUnit {
  x: number;
  n: number;
}

export interface FunnelPoint extends FunnelUnit {
  /** x / n; null when n = 0. */
  p: number | null;
  limits: FunnelLimits | null;
  zone: FunnelZone;
  /** Which side of the target an outlying unit lies; null when within or without data. */
  side: 'above' | 'below' | null;
}

export function funnelLimits(p0: number, n: number): FunnelLimits {
  checkTarget(p0);
  if (!(n > 0) || !Number.isFinite(n)) throw new RangeError(`n = ${n} must be a positive number`);
  const se = Math.sqrt((p0 * (1 - p0)) / n);
  const clamp = (v: number) => Math.min(1, Math.max(0, v));
  return {
    n,
    lower95: clamp(p0 - Z_95 * se),
    upper95: clamp(p0 + Z_95 * se),
    lower998: clamp(p0 - Z_998 * se),
    upper998: clamp(p0 + Z_998 * se),
  };
}

/** Places each unit (x of n) on the funnel around target p₀. */
export function funnelPlot(p0: number, units: FunnelUnit[]): FunnelPoint[] {
  checkTarget(p0);
  return units.map((u, i) => {
    if (!Number.isInteger(u.n) || u.n < 0 || !Number.isInteger(u.x) || u.x < 0 || u.x > u.n) {
      throw new RangeError(`unit ${i}: x = ${u.x} of n = ${u.n} must be whole numbers, 0 ≤ x ≤ n`);
    }
    if (u.n === 0) return { ...u, p: null, limits: null, zone: 'no-data', side: null };
    const p = u.x / u.n;
    const limits = funnelLimits(p0, u.n);
    const zone = zoneOf(p, limits);
    const side = zone === 'within' ? null : p > p0 ? 'above' : 'below';
    return { ...u, p, limits, zone, side };
  });
}

function zoneOf(p: number, l: FunnelLimits): FunnelZone {
  if (p > l.upper998 || p < l.lower998) return 'beyond-99.8';
  if (p > l.upper95 || p < l.lower95) return 'beyond-95';
  return 'within';
}

function checkTarget(p0: number) {
  if (!(p0 >= 0 && p0 <= 1)) throw new RangeError(`target p0 = ${p0} must lie in [0, 1]`);
}
