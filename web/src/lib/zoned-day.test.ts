import { describe, expect, it } from 'vitest';
import { nextDay, zonedDayStart } from './zoned-day';

// Offsets from the IANA time zone database (tzdata): Europe/London is UTC+0 in winter and
// UTC+1 in summer (BST from 29 March 2026); America/New_York is UTC-5 (EST) in winter;
// Australia/Sydney is UTC+11 (AEDT) in January.
describe('zonedDayStart', () => {
  it('starts the day at local midnight in the site time zone', () => {
    expect(zonedDayStart('2026-01-15', 'UTC')?.toISOString()).toBe('2026-01-15T00:00:00.000Z');
    expect(zonedDayStart('2026-01-15', 'Europe/London')?.toISOString()).toBe(
      '2026-01-15T00:00:00.000Z',
    );
    expect(zonedDayStart('2026-07-15', 'Europe/London')?.toISOString()).toBe(
      '2026-07-14T23:00:00.000Z',
    );
    expect(zonedDayStart('2026-01-15', 'America/New_York')?.toISOString()).toBe(
      '2026-01-15T05:00:00.000Z',
    );
    expect(zonedDayStart('2026-01-15', 'Australia/Sydney')?.toISOString()).toBe(
      '2026-01-14T13:00:00.000Z',
    );
  });

  it('handles the day clocks go forward and refuses a malformed day', () => {
    // 29 March 2026: London goes from GMT to BST at 01:00 UTC; midnight is still GMT.
    expect(zonedDayStart('2026-03-29', 'Europe/London')?.toISOString()).toBe(
      '2026-03-29T00:00:00.000Z',
    );
    expect(zonedDayStart('2026-03-30', 'Europe/London')?.toISOString()).toBe(
      '2026-03-29T23:00:00.000Z',
    );
    expect(zonedDayStart('15/01/2026', 'UTC')).toBeNull();
  });

  it('steps to the next calendar day across month ends', () => {
    expect(nextDay('2026-01-31')).toBe('2026-02-01');
    expect(nextDay('2028-02-28')).toBe('2028-02-29');
  });
});
