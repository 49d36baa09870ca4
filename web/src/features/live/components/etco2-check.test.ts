import { describe, expect, it } from 'vitest';
import { checkEtco2 } from './etco2-check';

describe('checkEtco2 (typed EtCO2 range check, 0–150 mmHg)', () => {
  it('accepts a usual value in mmHg', () => {
    expect(checkEtco2('18', 'mmHg')).toEqual({ kind: 'ok', mmHg: 18 });
  });

  it('converts kPa with 1 kPa = 7.50062 mmHg before checking', () => {
    // 1 kPa = 7.50062 mmHg (physical definition; REFERENCE.md).
    const r = checkEtco2('4.0', 'kPa');
    expect(r.kind).toBe('ok');
    expect(r.kind === 'ok' && r.mmHg).toBeCloseTo(30.00248, 4);
  });

  it('asks to confirm an unusually high value and refuses one outside 0–150 mmHg', () => {
    expect(checkEtco2('75', 'mmHg').kind).toBe('confirm');
    expect(checkEtco2('151', 'mmHg')).toMatchObject({ kind: 'refuse' });
    expect(checkEtco2('21', 'kPa')).toMatchObject({ kind: 'refuse' }); // 157.5 mmHg
    expect(checkEtco2('abc', 'mmHg')).toMatchObject({ kind: 'refuse', message: 'Type a number' });
  });
});
