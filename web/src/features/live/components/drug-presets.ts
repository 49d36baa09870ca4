import type { DrugName, EventData, Thresholds } from '@upstroke/contracts';
import { paediatricEpinephrine, perKg, type WeightDose } from '../lib/paediatric';

export interface DrugPreset {
  label: string;
  data: EventData<'drug'>;
  hint?: string;
}

type Unit = 'mg' | 'mmol' | 'mL' | 'g';

/**
 * Usual adult fixed doses, for adults only: epinephrine 1 mg (AHA 2020), amiodarone 300 mg
 * then 150 mg (ERC 2021), lidocaine 100 mg (about 1–1.5 mg/kg, secondary summaries of AHA),
 * sodium bicarbonate 50 mmol, calcium chloride 10 % 10 mL, magnesium 2 g (common practice).
 * The team confirms; the site may differ.
 */
const adult: { drug: DrugName; label: string; dose?: number; unit?: Unit; name?: string }[] = [
  { drug: 'epinephrine', label: 'Epinephrine 1 mg', dose: 1, unit: 'mg' },
  { drug: 'amiodarone', label: 'Amiodarone 300 mg', dose: 300, unit: 'mg' },
  { drug: 'amiodarone', label: 'Amiodarone 150 mg', dose: 150, unit: 'mg' },
  { drug: 'lidocaine', label: 'Lidocaine 100 mg', dose: 100, unit: 'mg' },
  { drug: 'sodium-bicarbonate', label: 'Sodium bicarbonate 50 mmol', dose: 50, unit: 'mmol' },
  {
    drug: 'calcium',
    label: 'Calcium chloride 10 % 10 mL',
    dose: 10,
    unit: 'mL',
    name: 'Calcium chloride 10 %',
  },
  { drug: 'magnesium', label: 'Magnesium sulfate 2 g', dose: 2, unit: 'g' },
];

const other = (route: 'iv' | 'io'): DrugPreset => ({
  label: 'Other',
  data: { drug: 'other', route, name: 'Other' },
});

/** The adult fixed doses (Live shows them to a child only behind the "Adult doses" step). */
export function adultDrugPresets(route: 'iv' | 'io'): DrugPreset[] {
  return [
    ...adult.map((d) => ({
      label: d.label,
      data: {
        drug: d.drug,
        dose: d.dose,
        unit: d.unit,
        route,
        ...(d.name ? { name: d.name } : {}),
      },
    })),
    other(route),
  ];
}

function preset(
  drug: DrugName,
  title: string,
  unit: Unit,
  dose: WeightDose,
  route: 'iv' | 'io',
  name?: string,
): DrugPreset {
  return {
    label: `${title} ${dose.value} ${unit}`,
    hint: dose.working,
    data: { drug, dose: dose.value, unit, route, ...(name ? { name } : {}) },
  };
}

/**
 * Weight-based doses from the site profile, each with its arithmetic and cap (values and
 * sources: packages/contracts/src/paediatric-profile.ts and docs/paediatric-values.md).
 */
export function paediatricDrugPresets(
  route: 'iv' | 'io',
  t: Thresholds,
  weightKg: number,
): DrugPreset[] {
  const max = (value: number) => ({ value, label: 'max' });
  const w = weightKg;
  return [
    preset('epinephrine', 'Epinephrine', 'mg', paediatricEpinephrine(t, w), route),
    preset(
      'amiodarone',
      'Amiodarone',
      'mg',
      perKg(t.paediatricAmiodaroneMgPerKg, w, 'mg', 0.1, max(t.paediatricAmiodaroneMaxMg)),
      route,
    ),
    preset(
      'lidocaine',
      'Lidocaine',
      'mg',
      perKg(t.paediatricLidocaineMgPerKg, w, 'mg', 0.1),
      route,
    ),
    preset(
      'sodium-bicarbonate',
      'Sodium bicarbonate',
      'mmol',
      perKg(t.paediatricBicarbonateMmolPerKg, w, 'mmol', 0.1, max(t.paediatricBicarbonateMaxMmol)),
      route,
    ),
    preset(
      'calcium',
      'Calcium chloride 10 %',
      'mL',
      perKg(
        t.paediatricCalciumChlorideMlPerKg,
        w,
        'mL',
        0.1,
        max(t.paediatricCalciumChlorideMaxMl),
      ),
      route,
      'Calcium chloride 10 %',
    ),
    preset(
      'magnesium',
      'Magnesium sulfate',
      'mg',
      perKg(t.paediatricMagnesiumMgPerKg, w, 'mg', 10, max(t.paediatricMagnesiumMaxMg)),
      route,
    ),
    other(route),
  ];
}
