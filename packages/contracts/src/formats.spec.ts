import { describe, expect, it } from 'vitest';
import { displayFormatSchema } from './display-settings.js';
import {
  defaultDisplayFormat,
  formatDate,
  formatDateTime,
  formatMonth,
  formatPercent,
  formatTime,
  roundTo,
  timeZoneName,
} from './formats.js';

// Offsets from the IANA time zone database: London is UTC+1 in July (BST) and UTC+0 in
// January; New York is UTC−4 in July (EDT).
const july = '2026-07-01T12:05:09Z';

describe('display formats', () => {
  it('writes the site zone with a 24-hour clock by default', () => {
    const london = { ...defaultDisplayFormat, timeZone: 'Europe/London' };
    expect(formatDateTime(july, london)).toBe('1 Jul 2026, 13:05');
    expect(formatTime(july, london, true)).toBe('13:05:09');
    expect(formatDate('2026-01-15T23:30:00Z', london)).toBe('15 Jan 2026');
    expect(timeZoneName(july, london)).toBe('BST');
  });

  it('follows the locale and a 12-hour clock when the site asks', () => {
    const ny = { locale: 'en-US', timeZone: 'America/New_York', clock: '12h' as const };
    expect(formatTime(july, ny)).toMatch(/^08:05\s?AM$/i);
    expect(formatDateTime(july, { ...ny, clock: '24h' })).toBe('Jul 1, 2026, 08:05');
  });

  it('names a month in the site language, whatever its time zone', () => {
    expect(formatMonth('2026-03', defaultDisplayFormat)).toBe('Mar 2026');
    const auckland = { ...defaultDisplayFormat, timeZone: 'Pacific/Auckland' };
    expect(formatMonth('2026-12', auckland)).toBe('Dec 2026');
    expect(formatMonth('2026-03', { ...defaultDisplayFormat, locale: 'fr-FR' })).toBe('mars 2026');
    expect(formatMonth('not a month', defaultDisplayFormat)).toBe('not a month');
  });

  it('never shows midnight as 24:00 on the 24-hour clock', () => {
    expect(formatTime('2026-07-01T00:00:00Z', defaultDisplayFormat)).toBe('00:00');
  });

  it('shows a dash for no date or a broken one', () => {
    expect(formatDateTime(null, defaultDisplayFormat)).toBe('—');
    expect(formatDateTime('not a date', defaultDisplayFormat)).toBe('—');
  });

  it('refuses a zone or language that does not exist, with a message', () => {
    const bad = displayFormatSchema.safeParse({
      locale: 'en-GB',
      timeZone: 'Mars/Base',
      clock: '24h',
    });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.path).toEqual(['timeZone']);
    expect(displayFormatSchema.safeParse({ ...defaultDisplayFormat, locale: '12_x' }).success).toBe(
      false,
    );
  });

  it('writes shares as percent and rounds numbers to their meaning', () => {
    expect(formatPercent(0.9017857142857143)).toBe('90 %');
    expect(formatPercent(0.9017857142857143, 1)).toBe('90.2 %');
    expect(formatPercent(null)).toBe('—');
    expect(roundTo(0.9017857142857143, 3)).toBe(0.902);
    expect(roundTo(undefined, 1)).toBeNull();
  });
});
