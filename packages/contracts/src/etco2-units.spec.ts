import { describe, expect, it } from 'vitest';
import {
  etco2InUnit,
  etco2MeasureRows,
  etco2Number,
  etco2ToMmHg,
  formatEtco2,
  formatEtco2Both,
  formatEtco2Reading,
  MMHG_PER_KPA,
} from './etco2-units.js';

describe('EtCO2 in the site unit', () => {
  it('converts with 1 kPa = 7.50062 mmHg', () => {
    // Definition of the mmHg: 1 mmHg = 133.322387415 Pa, so 1 kPa = 1000 / 133.322387415 mmHg
    // (REFERENCE.md "Units and codes", checked).
    expect(MMHG_PER_KPA).toBeCloseTo(1000 / 133.322387415, 5);
    expect(etco2InUnit(7.50062, 'kPa')).toBeCloseTo(1, 9);
    expect(etco2ToMmHg(1.9, 'kPa')).toBeCloseTo(14.25, 2); // Kolar 2008's 1.9 kPa (REFERENCE.md)
    expect(etco2InUnit(20, 'mmHg')).toBe(20);
  });

  it('writes whole mmHg and kPa to 0.1, mmHg beside kPa on request', () => {
    // 10 mmHg = 1.333 kPa; 20 mmHg = 2.666 kPa (1 kPa = 7.50062 mmHg, definition).
    expect(formatEtco2(10, 'mmHg')).toBe('10 mmHg');
    expect(formatEtco2(10, 'kPa')).toBe('1.3 kPa');
    expect(formatEtco2(20, 'kPa')).toBe('2.7 kPa');
    expect(formatEtco2(20, 'kPa', { besideMmHg: true })).toBe('2.7 kPa (20 mmHg)');
    expect(formatEtco2(14.25, 'mmHg', { besideMmHg: true })).toBe('14 mmHg');
    expect(formatEtco2(null, 'kPa')).toBe('—');
    expect(formatEtco2(Number.NaN, 'mmHg')).toBe('—');
    expect(etco2Number(30, 'kPa', 0)).toBe('4');
    expect(formatEtco2Both(10)).toBe('10 mmHg (1.3 kPa)');
    // 15 mmHg = 2.0 kPa (1 kPa = 7.50062 mmHg, definition of the mmHg).
    expect(formatEtco2Reading({ value: 15, unit: 'mmHg' }, 'kPa')).toBe('2.0 kPa');
    expect(formatEtco2Reading({ value: 15, unit: 'mmHg' }, 'kPa', { showRecorded: true })).toBe(
      '2.0 kPa (recorded as 15 mmHg)',
    );
    expect(formatEtco2Reading({ value: 2.65, unit: 'kPa' }, 'kPa')).toBe('2.65 kPa');
    expect(formatEtco2Reading({ value: 2, unit: 'kPa' }, 'mmHg')).toBe('15 mmHg');
  });

  it('words the measures in the unit, with the profile target', () => {
    const e = {
      medianMmHg: 22.4,
      fractionAtOrAbove10: 0.9,
      fractionAtOrAbove20: 0.6,
      targetMmHg: 25,
      fractionAtOrAboveTarget: 0.4,
    };
    expect(etco2MeasureRows(e, 'kPa')).toEqual([
      { key: 'etco2Median', title: 'EtCO2 median', value: '3.0 kPa' },
      { key: 'etco2Above10', title: 'CPR time EtCO2 ≥ 1.3 kPa', value: '90 %' },
      { key: 'etco2AboveTarget', title: 'CPR time EtCO2 ≥ target 3.3 kPa', value: '40 %' },
    ]);
    expect(etco2MeasureRows(e, 'mmHg').map((r) => r.title)).toEqual([
      'EtCO2 median',
      'CPR time EtCO2 ≥ 10 mmHg',
      'CPR time EtCO2 ≥ target 25 mmHg',
    ]);
    // An analysis from before the target was measured: its fixed 20 mmHg share stands in.
    const old = { medianMmHg: null, fractionAtOrAbove10: 0.5, fractionAtOrAbove20: 0.2 };
    expect(etco2MeasureRows(old, 'mmHg')[2].value).toBe('20 %');
  });
});
