import { describe, expect, it } from 'vitest';
import { baselineFrom, withBaseline } from './use-baseline';
import { filtersInto } from './use-trends-filter';

describe('baseline in the URL', () => {
  it('reads both months, dropping one that does not parse', () => {
    expect(baselineFrom(new URLSearchParams('baselineFrom=2025-01&baselineTo=2025-09'))).toEqual({
      baselineFrom: '2025-01',
      baselineTo: '2025-09',
    });
    expect(baselineFrom(new URLSearchParams('baselineFrom=2025-13&baselineTo=2025-09'))).toEqual({
      baselineTo: '2025-09',
    });
  });

  it('sets and clears the baseline keeping the filters, and a filter change keeps it', () => {
    const url = new URLSearchParams('from=2025-01-01&unitId=x');
    const set = withBaseline(url, { baselineFrom: '2025-01', baselineTo: '2025-06' });
    expect(set.toString()).toBe('from=2025-01-01&unitId=x&baselineFrom=2025-01&baselineTo=2025-06');
    expect(withBaseline(set, { baselineTo: '2025-06' }).get('baselineFrom')).toBeNull();
    const filtered = filtersInto(set, { from: '2025-02-01' });
    expect(baselineFrom(filtered)).toEqual({ baselineFrom: '2025-01', baselineTo: '2025-06' });
    expect(filtered.get('from')).toBe('2025-02-01');
  });
});
