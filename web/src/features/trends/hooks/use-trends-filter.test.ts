import { describe, expect, it } from 'vitest';
import { trendsFilterFrom } from './use-trends-filter';

describe('trendsFilterFrom', () => {
  it('reads every known filter from the URL', () => {
    const siteId = '6f1c1f0e-8a51-4d5e-9d8e-2f1c8c3c0a11';
    const params = new URLSearchParams(
      `siteId=${siteId}&from=2026-01-01&to=2026-07-01&firstRhythm=shockable&outcome=died`,
    );
    expect(trendsFilterFrom(params)).toEqual({
      siteId,
      from: '2026-01-01',
      to: '2026-07-01',
      firstRhythm: 'shockable',
      outcome: 'died',
    });
  });

  it('drops a value that does not parse and ignores unknown keys, keeping the rest', () => {
    const params = new URLSearchParams('siteId=not-a-uuid&firstRhythm=pvt&from=2026-02-01&x=1');
    expect(trendsFilterFrom(params)).toEqual({ from: '2026-02-01' });
  });
});
