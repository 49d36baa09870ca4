import { describe, expect, it } from 'vitest';
import { apiQuery, filtersFrom, isFiltered } from './use-record-filters';

describe('Board filters', () => {
  it('reads the URL, ignoring values the API would refuse', () => {
    const f = filtersFrom(new URLSearchParams('q=bay&status=gone&signed=unsigned&mine=true'));
    expect(f).toMatchObject({ q: 'bay', status: '', signed: 'unsigned', mine: true });
    expect(isFiltered(f)).toBe(true);
    expect(isFiltered(filtersFrom(new URLSearchParams()))).toBe(false);
  });

  it("asks for whole days in the site's time zone, the last day included", () => {
    const f = filtersFrom(new URLSearchParams('from=2026-01-10&to=2026-01-10&q=%20bay%20'));
    // America/New_York is UTC-5 in January (IANA tzdata).
    const q = apiQuery(f, 'America/New_York');
    expect(q.get('from')).toBe('2026-01-10T05:00:00.000Z');
    expect(q.get('to')).toBe('2026-01-11T05:00:00.000Z');
    expect(q.get('q')).toBe('bay');
    expect(q.has('mine')).toBe(false);
  });
});
