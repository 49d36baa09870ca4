import type { AgeGroup, Thresholds } from '@upstroke/contracts';

/** A weight-based dose or energy with the arithmetic shown beside it. */
export interface WeightDose {
  value: number;
  /** e.g. "0.01 mg/kg × 18 kg = 0.18 mg (max 1 mg)". */
  working: string;
  capped: boolean;
}

const round = (n: number, step: number) => Number((Math.round(n / step) * step).toFixed(6));
const fmt = (n: number) => String(Number(n.toFixed(3)));

/** Whether the record takes the profile's paediatric values (child or infant). */
export const isPaediatric = (ageGroup?: AgeGroup | null): boolean =>
  ageGroup === 'child' || ageGroup === 'infant';

/**
 * per-kg × weight, rounded to `step`, never above `cap` (when there is one). The working
 * names the per-kg value, the weight, the product and the cap, so the team can check it.
 */
export function perKg(
  perKgValue: number,
  weightKg: number,
  unit: string,
  step: number,
  cap?: { value: number; label: string },
): WeightDose {
  const raw = round(perKgValue * weightKg, step);
  const capped = cap !== undefined && raw > cap.value;
  const value = capped ? cap.value : raw;
  const product = `${fmt(perKgValue)} ${unit}/kg × ${fmt(weightKg)} kg = ${fmt(raw)} ${unit}`;
  const limit = cap
    ? capped
      ? ` → ${cap.label} ${fmt(cap.value)} ${unit}`
      : ` (max ${fmt(cap.value)} ${unit})`
    : '';
  return { value, working: product + limit, capped };
}

/** Epinephrine per kg from the site profile, never above the profile's largest dose. */
export function paediatricEpinephrine(t: Thresholds, weightKg: number): WeightDose {
  return perKg(t.paediatricEpinephrineMgPerKg, weightKg, 'mg', 0.001, {
    value: t.paediatricEpinephrineMaxMg,
    label: 'max',
  });
}

/**
 * The energy of the next shock: the first at the first-shock J/kg, later ones at the later
 * J/kg; from the third on, the largest per kg is offered as well (AHA 2020 paediatric: up to
 * 10 J/kg or the adult dose). Whole joules, never above the profile's adult dose.
 */
export function paediatricShocks(
  t: Thresholds,
  weightKg: number,
  shocksGiven: number,
): WeightDose[] {
  const cap = { value: t.paediatricShockMaxJ, label: 'adult dose' };
  const first = shocksGiven === 0;
  const next = perKg(
    first ? t.paediatricFirstShockJPerKg : t.paediatricLaterShockJPerKg,
    weightKg,
    'J',
    1,
    cap,
  );
  if (shocksGiven < 2) return [next];
  const most = perKg(t.paediatricShockMaxJPerKg, weightKg, 'J', 1, cap);
  return most.value > next.value ? [next, most] : [next];
}

/** A weight estimated from age, with the formula that gave it (named beside it on screen). */
export interface WeightEstimate {
  kg: number;
  formula: string;
}

/**
 * APLS age-based weight formulae (Advanced Paediatric Life Support manual, 2011 revision;
 * REFERENCE.md — from memory): < 12 months (0.5 × months) + 4; 1–5 years (2 × years) + 8;
 * 6–12 years (3 × years) + 7. Null outside 0–12 years: weigh or measure instead.
 */
export function estimateWeight(age: { months?: number; years?: number }): WeightEstimate | null {
  const { months, years } = age;
  if (months !== undefined && Number.isFinite(months) && months >= 0 && months < 12)
    return {
      kg: round(0.5 * months + 4, 0.1),
      formula: 'APLS formula for under 12 months: (0.5 × age in months) + 4',
    };
  if (years === undefined || !Number.isFinite(years) || years < 1 || years > 12) return null;
  if (years <= 5)
    return {
      kg: round(2 * years + 8, 0.1),
      formula: 'APLS formula for 1–5 years: (2 × age in years) + 8',
    };
  return {
    kg: round(3 * years + 7, 0.1),
    formula: 'APLS formula for 6–12 years: (3 × age in years) + 7',
  };
}
