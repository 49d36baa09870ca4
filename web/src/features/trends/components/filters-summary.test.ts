import { defaultDisplayFormat } from '@upstroke/contracts';
import { describe, expect, it } from 'vitest';
import { periodText } from './filters-summary';

describe('periodText', () => {
  const fmt = { ...defaultDisplayFormat, timeZone: 'Pacific/Auckland' };
  it('names the last day inside an exclusive end, whatever the site time zone', () => {
    expect(periodText({ from: '2026-01-01', to: '2026-07-01' }, fmt)).toBe(
      '1 Jan 2026 to 30 Jun 2026',
    );
    expect(periodText({ to: '2026-03-01' }, fmt)).toBe('Up to 28 Feb 2026');
    expect(periodText({}, fmt)).toBe('All dates');
  });
});
