import { thresholdDefaults } from '@upstroke/contracts';
import { describe, expect, it } from 'vitest';
import { adultDrugPresets, paediatricDrugPresets } from '../components/drug-presets';
import { estimateWeight, paediatricEpinephrine, paediatricShocks } from './paediatric';

describe('paediatric presets from the site profile', () => {
  it('epinephrine 0.01 mg/kg, capped at 1 mg', () => {
    // AHA paediatric drug table (Kleinman 2010, Table 1; kept in AHA 2020): 0.01 mg/kg IV/IO, max 1 mg.
    expect(paediatricEpinephrine(thresholdDefaults, 18)).toEqual({
      value: 0.18,
      working: '0.01 mg/kg × 18 kg = 0.18 mg (max 1 mg)',
      capped: false,
    });
    const big = paediatricEpinephrine(thresholdDefaults, 120);
    expect(big).toEqual({
      value: 1,
      working: '0.01 mg/kg × 120 kg = 1.2 mg → max 1 mg',
      capped: true,
    });
    // A 3.5 kg infant: 0.035 mg, not rounded to 0.04.
    expect(paediatricEpinephrine(thresholdDefaults, 3.5).value).toBe(0.035);
  });

  it('a 20 kg child gets weight-based drugs only, each with arithmetic and cap', () => {
    // Same table: amiodarone 5 mg/kg (max 300 mg), lidocaine 1 mg/kg, sodium bicarbonate
    // 1 mEq/kg, calcium chloride 10 % 0.2 mL/kg (max 2 g = 20 mL), magnesium 25–50 mg/kg (max 2 g).
    const list = paediatricDrugPresets('io', thresholdDefaults, 20);
    expect(list.map((p) => [p.label, p.hint])).toEqual([
      ['Epinephrine 0.2 mg', '0.01 mg/kg × 20 kg = 0.2 mg (max 1 mg)'],
      ['Amiodarone 100 mg', '5 mg/kg × 20 kg = 100 mg (max 300 mg)'],
      ['Lidocaine 20 mg', '1 mg/kg × 20 kg = 20 mg'],
      ['Sodium bicarbonate 20 mmol', '1 mmol/kg × 20 kg = 20 mmol (max 50 mmol)'],
      ['Calcium chloride 10 % 4 mL', '0.2 mL/kg × 20 kg = 4 mL (max 20 mL)'],
      ['Magnesium sulfate 1000 mg', '50 mg/kg × 20 kg = 1000 mg (max 2000 mg)'],
      ['Other', undefined],
    ]);
    expect(list[4].data).toEqual({
      drug: 'calcium',
      dose: 4,
      unit: 'mL',
      route: 'io',
      name: 'Calcium chloride 10 %',
    });
    const adultLabels = adultDrugPresets('io').map((p) => p.label);
    for (const p of list) if (p.label !== 'Other') expect(adultLabels).not.toContain(p.label);
  });

  it('amiodarone stops at 300 mg for a 70 kg adolescent', () => {
    const amio = paediatricDrugPresets('iv', thresholdDefaults, 70)[1];
    expect(amio.label).toBe('Amiodarone 300 mg');
    expect(amio.hint).toBe('5 mg/kg × 70 kg = 350 mg → max 300 mg');
  });

  it('shocks 2 J/kg first, then 4 J/kg, then up to 10 J/kg or the adult dose', () => {
    // AHA 2020 paediatric guideline: 2 J/kg, then 4 J/kg, later up to 10 J/kg or the adult
    // dose (from memory; docs/paediatric-values.md).
    expect(paediatricShocks(thresholdDefaults, 20, 0).map((d) => d.value)).toEqual([40]);
    expect(paediatricShocks(thresholdDefaults, 20, 1)).toEqual([
      { value: 80, working: '4 J/kg × 20 kg = 80 J (max 200 J)', capped: false },
    ]);
    expect(paediatricShocks(thresholdDefaults, 20, 2).map((d) => d.working)).toEqual([
      '4 J/kg × 20 kg = 80 J (max 200 J)',
      '10 J/kg × 20 kg = 200 J (max 200 J)',
    ]);
    expect(paediatricShocks(thresholdDefaults, 60, 1)[0].working).toBe(
      '4 J/kg × 60 kg = 240 J → adult dose 200 J',
    );
  });

  it('follows an edited profile value: 4 J/kg for every shock (ERC 2021)', () => {
    const site = { ...thresholdDefaults, paediatricFirstShockJPerKg: 4 };
    expect(paediatricShocks(site, 10, 0)[0].value).toBe(40);
  });

  it('estimates weight from age with the APLS formulae, named beside it', () => {
    // APLS manual (2011 revision) formulae — from memory (REFERENCE.md).
    expect(estimateWeight({ months: 6 })).toEqual({
      kg: 7,
      formula: 'APLS formula for under 12 months: (0.5 × age in months) + 4',
    });
    expect(estimateWeight({ years: 3 })?.kg).toBe(14);
    expect(estimateWeight({ years: 4 })?.kg).toBe(16);
    expect(estimateWeight({ years: 8 })).toEqual({
      kg: 31,
      formula: 'APLS formula for 6–12 years: (3 × age in years) + 7',
    });
    expect(estimateWeight({ years: 15 })).toBeNull();
    expect(estimateWeight({ months: 14 })).toBeNull();
  });
});
