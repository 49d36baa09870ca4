import type { Thresholds } from '@upstroke/contracts';

/** The adult doses that cap a child's weight-based dose (common practice, site may differ). */
export const ADULT_EPINEPHRINE_MG = 1;
export const ADULT_MAX_SHOCK_J = 360;

export interface WeightDose {
  value: number;
  /** The arithmetic shown beside the preset, e.g. "0.01 mg/kg × 18 kg = 0.18 mg". */
  working: string;
  capped: boolean;
}

const round = (n: number, step: number) => Math.round(n / step) * step;
const fmt = (n: number) => String(Number(n.toFixed(3)));

function perKg(
  perKgValue: number,
  weightKg: number,
  unit: string,
  cap: number,
  step: number,
): WeightDose {
  const raw = perKgValue * weightKg;
  const capped = raw > cap;
  const value = capped ? cap : round(raw, step);
  const working = `${fmt(perKgValue)} ${unit}/kg × ${fmt(weightKg)} kg = ${fmt(round(raw, step))} ${unit}${capped ? ` → adult ${fmt(cap)} ${unit}` : ''}`;
  return { value, working, capped };
}

/** Epinephrine per kg from the site profile, never above the adult dose. */
export function paediatricEpinephrine(t: Thresholds, weightKg: number): WeightDose {
  return perKg(t.paediatricEpinephrineMgPerKg, weightKg, 'mg', ADULT_EPINEPHRINE_MG, 0.01);
}

/** First shock, then later shocks, per kg from the site profile (whole joules). */
export function paediatricShock(t: Thresholds, weightKg: number, shocksGiven: number): WeightDose {
  const jPerKg = shocksGiven === 0 ? t.paediatricFirstShockJPerKg : t.paediatricLaterShockJPerKg;
  return perKg(jPerKg, weightKg, 'J', ADULT_MAX_SHOCK_J, 1);
}
