import { describe, expect, it } from 'vitest';
import { thresholdDefaults } from '@upstroke/contracts';
import { arrayToMmHg, MMHG_PER_KPA, toMmHg } from './units.js';
import { resolveThresholds } from './profile.js';

describe('unit conversion to mmHg', () => {
  it('kPa', () => {
    // 1 kPa = 7.50062 mmHg — definition of the mmHg, 133.322387415 Pa (REFERENCE.md, checked)
    expect(MMHG_PER_KPA).toBeCloseTo(1000 / 133.322387415, 5);
    expect(toMmHg(1, 'kPa')).toBeCloseTo(7.50062, 5);
    // 1.9 kPa → 14.25 mmHg — REFERENCE.md units row (checked); Kolar 2008 quotes it as 14.3
    expect(toMmHg(1.9, 'kPa')).toBeCloseTo(14.25, 2);
    expect(Math.round(toMmHg(1.9, 'kPa') * 10) / 10).toBe(14.3);
  });

  it('% of barometric pressure', () => {
    // PCO2 = FCO2 × PB; 5 % at 760 mmHg = 38.0 mmHg — LOINC 19890-3 note (REFERENCE.md, checked)
    expect(toMmHg(5, '%')).toBeCloseTo(38.0, 6);
    expect(toMmHg(5, '%', 760)).toBeCloseTo(38.0, 6);
    // 35.7 mmHg only if water vapour (47 mmHg) is subtracted — we do not (REFERENCE.md, summary)
    expect(toMmHg(5, '%', 760 - 47)).toBeCloseTo(35.65, 2);
    expect(toMmHg(5, '%', 600)).toBeCloseTo(30, 6);
  });

  it('mmHg passes through; arrays convert element-wise', () => {
    expect(toMmHg(12.5, 'mmHg')).toBe(12.5);
    expect(Array.from(arrayToMmHg([0, 2, 4], 'kPa'))).toEqual([0, 2, 4].map((v) => v * 7.50062));
  });
});

describe('protocol thresholds', () => {
  it('default to the guideline values of REFERENCE.md', () => {
    const t = resolveThresholds();
    expect(t.lowEtco2MmHg).toBe(10); // AHA 2020 ALS; Sandroni 2018 (summary)
    expect(t.targetEtco2MmHg).toBe(20); // Meaney 2013 (summary)
    expect(t.riseMmHg).toBe(10); // Lui 2016: rise ≥ 10 mmHg (checked)
    expect(t.prognosisAfterSec).toBe(20 * 60); // Paiva 2018: 20 min (checked)
    expect(t.pauseMaxSec).toBe(10); // AHA BLS: interruptions < 10 s (checked)
    expect(t.rhythmCheckIntervalSec).toBe(120); // AHA 2019/2020; RCUK 2021: every 2 min (summary)
    expect([t.epinephrineMinSec, t.epinephrineMaxSec]).toEqual([180, 300]); // AHA 2020: 3–5 min (summary)
    expect(t.ventilationMaxPerMin).toBe(10); // AHA 2020: 1 breath / 6 s with an airway (summary)
  });

  it('take the profile over the defaults, key by key', () => {
    const t = resolveThresholds({ lowEtco2MmHg: 14.3, pauseMaxSec: 5 });
    expect(t.lowEtco2MmHg).toBe(14.3); // Kolar 2008 cut-off as a site setting (checked)
    expect(t.pauseMaxSec).toBe(5);
    expect(t.riseMmHg).toBe(thresholdDefaults.riseMmHg);
  });
});
