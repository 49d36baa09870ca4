import { thresholdDefaults } from '@upstroke/contracts';
import { describe, expect, it } from 'vitest';
import { paediatricEpinephrine, paediatricShock } from './paediatric';

describe('paediatric presets from the site profile', () => {
  it('epinephrine 0.01 mg/kg, capped at the adult 1 mg', () => {
    // AHA 2020 paediatric ALS: 0.01 mg/kg IV/IO, max 1 mg (from memory; REFERENCE.md).
    expect(paediatricEpinephrine(thresholdDefaults, 18)).toEqual({
      value: 0.18,
      working: '0.01 mg/kg × 18 kg = 0.18 mg',
      capped: false,
    });
    const big = paediatricEpinephrine(thresholdDefaults, 120);
    expect(big.value).toBe(1);
    expect(big.capped).toBe(true);
  });

  it('shocks 2 J/kg first, then 4 J/kg', () => {
    // AHA 2020 paediatric ALS: 2 J/kg, then 4 J/kg (from memory; REFERENCE.md).
    expect(paediatricShock(thresholdDefaults, 18, 0).value).toBe(36);
    expect(paediatricShock(thresholdDefaults, 18, 1).value).toBe(72);
    expect(paediatricShock(thresholdDefaults, 18, 1).working).toBe('4 J/kg × 18 kg = 72 J');
  });

  it('follows an edited profile value', () => {
    const site = { ...thresholdDefaults, paediatricFirstShockJPerKg: 4 };
    expect(paediatricShock(site, 10, 0).value).toBe(40);
  });
});
