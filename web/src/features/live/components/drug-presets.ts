import type { DrugName, EventData, Thresholds } from '@upstroke/contracts';
import { paediatricEpinephrine } from '../lib/paediatric';

export interface DrugPreset {
  label: string;
  data: EventData<'drug'>;
  hint?: string;
}

/** Usual adult doses (REFERENCE.md / common practice); the team confirms, the site may differ. */
const adult: { drug: DrugName; label: string; dose?: number; unit?: 'mg' | 'mmol' | 'mL' | 'g' }[] =
  [
    { drug: 'epinephrine', label: 'Epinephrine 1 mg', dose: 1, unit: 'mg' },
    { drug: 'amiodarone', label: 'Amiodarone 300 mg', dose: 300, unit: 'mg' },
    { drug: 'amiodarone', label: 'Amiodarone 150 mg', dose: 150, unit: 'mg' },
    { drug: 'lidocaine', label: 'Lidocaine 100 mg', dose: 100, unit: 'mg' },
    { drug: 'sodium-bicarbonate', label: 'Sodium bicarbonate 50 mmol', dose: 50, unit: 'mmol' },
    { drug: 'calcium', label: 'Calcium 10 mL', dose: 10, unit: 'mL' },
    { drug: 'magnesium', label: 'Magnesium 2 g', dose: 2, unit: 'g' },
    { drug: 'other', label: 'Other' },
  ];

export function drugPresets(
  route: 'iv' | 'io',
  thresholds: Thresholds,
  weightKg?: number,
): DrugPreset[] {
  const list: DrugPreset[] = adult.map((d) => ({
    label: d.label,
    data: {
      drug: d.drug,
      dose: d.dose,
      unit: d.unit,
      route,
      ...(d.drug === 'other' ? { name: 'Other' } : {}),
    },
  }));
  if (weightKg) {
    const epi = paediatricEpinephrine(thresholds, weightKg);
    list.unshift({
      label: `Epinephrine ${epi.value} mg`,
      hint: epi.working,
      data: { drug: 'epinephrine', dose: epi.value, unit: 'mg', route },
    });
  }
  return list;
}
