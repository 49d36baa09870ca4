/**
 * How an EtCO2 value or threshold is written for people. Values are stored and analysed in
 * mmHg; a site that works in kPa sees kPa on every screen, prompt, finding, PDF, CSV and
 * e-mail, written by these functions only, so no output can drift to another unit.
 */
import type { z } from 'zod';
import type { etco2DisplayUnitSchema } from './display-settings.js';
import { formatPercent } from './formats.js';

export type Etco2DisplayUnit = z.infer<typeof etco2DisplayUnitSchema>;

/**
 * 1 kPa in mmHg. The mmHg is defined as 133.322387415 Pa, so 1 kPa = 1000 / 133.322387415
 * = 7.50062 mmHg (REFERENCE.md "Units and codes", checked).
 */
export const MMHG_PER_KPA = 7.50062;

/** Decimals a reading carries in each unit (monitors show whole mmHg and kPa to 0.1). */
export const etco2Digits: Readonly<Record<Etco2DisplayUnit, number>> = { mmHg: 0, kPa: 1 };

/** A value in mmHg expressed in the site's unit, unrounded. */
export function etco2InUnit(mmHg: number, unit: Etco2DisplayUnit): number {
  return unit === 'kPa' ? mmHg / MMHG_PER_KPA : mmHg;
}

/** A value typed in the site's unit, in mmHg. */
export function etco2ToMmHg(value: number, unit: Etco2DisplayUnit): number {
  return unit === 'kPa' ? value * MMHG_PER_KPA : value;
}

/** The number alone, rounded to the unit's precision ("2.7", "20"); "—" without a value. */
export function etco2Number(
  mmHg: number | null | undefined,
  unit: Etco2DisplayUnit,
  digits = etco2Digits[unit],
): string {
  if (mmHg === null || mmHg === undefined || !Number.isFinite(mmHg)) return '—';
  const v = etco2InUnit(mmHg, unit);
  const f = 10 ** digits;
  return (Math.round(v * f) / f).toFixed(digits);
}

/**
 * "20 mmHg" or "2.7 kPa"; with `besideMmHg` a kPa value also gives mmHg in brackets
 * ("2.7 kPa (20 mmHg)"), for thresholds whose published source is written in mmHg.
 */
export function formatEtco2(
  mmHg: number | null | undefined,
  unit: Etco2DisplayUnit,
  opts: { besideMmHg?: boolean; digits?: number } = {},
): string {
  const n = etco2Number(mmHg, unit, opts.digits);
  if (n === '—') return n;
  if (unit === 'kPa' && opts.besideMmHg) return `${n} kPa (${etco2Number(mmHg, 'mmHg')} mmHg)`;
  return `${n} ${unit}`;
}

/**
 * A recorded reading (value and the unit it came in) for a site: as recorded when the units
 * agree, else in the site's unit; `showRecorded` adds the original ("2.0 kPa (recorded as
 * 15 mmHg)") where the record itself is shown. A % reading needs its barometric pressure to
 * convert, which the entry does not carry, so it is shown as recorded.
 */
export function formatEtco2Reading(
  v: { value: number; unit: 'mmHg' | 'kPa' | '%' },
  siteUnit: Etco2DisplayUnit,
  opts: { showRecorded?: boolean } = {},
): string {
  const recorded = `${v.value} ${v.unit}`;
  if (v.unit === siteUnit || v.unit === '%') return recorded;
  const shown = formatEtco2(etco2ToMmHg(v.value, v.unit), siteUnit);
  return opts.showRecorded ? `${shown} (recorded as ${recorded})` : shown;
}

/**
 * Both units, mmHg first ("10 mmHg (1.3 kPa)"), for outputs that span sites with different
 * units (the committee's trends and CSV), where one site's unit cannot be chosen.
 */
export function formatEtco2Both(mmHg: number | null | undefined): string {
  const m = formatEtco2(mmHg, 'mmHg');
  return m === '—' ? m : `${m} (${formatEtco2(mmHg, 'kPa')})`;
}

/** A heading that names the unit: "EtCO2 (kPa)". */
export function etco2Heading(unit: Etco2DisplayUnit, what = 'EtCO2'): string {
  return `${what} (${unit})`;
}

/** The EtCO2 process measures as the analysis returns them (`measures.etco2`). */
interface Etco2Measures {
  medianMmHg: number | null;
  fractionAtOrAbove10: number | null;
  fractionAtOrAbove20: number | null;
  targetMmHg?: number;
  fractionAtOrAboveTarget?: number | null;
}

/**
 * The EtCO2 measures as the Debrief screen, the PDF and the e-mail word them, in the site's
 * unit. The second is the share of CPR time at or above 10 mmHg (below it suggests poor CPR,
 * AHA 2020); the third at or above the profile's own target (default 20 mmHg, Meaney 2013).
 * An analysis from before the target was measured falls back to its fixed 20 mmHg share.
 */
export function etco2MeasureRows(
  e: Etco2Measures,
  unit: Etco2DisplayUnit,
): { key: 'etco2Median' | 'etco2Above10' | 'etco2AboveTarget'; title: string; value: string }[] {
  const target = e.targetMmHg ?? 20;
  const atTarget = e.fractionAtOrAboveTarget ?? (target === 20 ? e.fractionAtOrAbove20 : null);
  return [
    { key: 'etco2Median', title: 'EtCO2 median', value: formatEtco2(e.medianMmHg, unit) },
    {
      key: 'etco2Above10',
      title: `CPR time EtCO2 ≥ ${formatEtco2(10, unit)}`,
      value: formatPercent(e.fractionAtOrAbove10),
    },
    {
      key: 'etco2AboveTarget',
      title: `CPR time EtCO2 ≥ target ${formatEtco2(target, unit)}`,
      value: formatPercent(atTarget),
    },
  ];
}
