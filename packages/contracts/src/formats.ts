/**
 * How dates, times and shares are written for people: in the site's locale and time zone,
 * with a 24-hour clock unless the site chose 12 hours. Screens, the PDF, CSV and e-mail use
 * these, so a record reads the same in every output. Machine values (ISO-8601 in the API and
 * FHIR) are never formatted here.
 */
import type { z } from 'zod';
import type { displayFormatSchema } from './display-settings.js';

/** A site's way of writing dates and times (checked by `displayFormatSchema`). */
export type DisplayFormat = z.infer<typeof displayFormatSchema>;

/** Until a site says otherwise (common practice for clinical records: 24-hour clock). */
export const defaultDisplayFormat: DisplayFormat = {
  locale: 'en-GB',
  timeZone: 'UTC',
  clock: '24h',
};

type Parts = Intl.DateTimeFormatOptions;
const dateParts: Parts = { day: 'numeric', month: 'short', year: 'numeric' };
const timeParts: Parts = { hour: '2-digit', minute: '2-digit' };

function format(iso: string | null | undefined, fmt: DisplayFormat, parts: Parts): string {
  if (!iso) return '—';
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return '—';
  return new Intl.DateTimeFormat(fmt.locale, {
    ...parts,
    timeZone: fmt.timeZone,
    ...(parts.hour ? { hourCycle: fmt.clock === '24h' ? 'h23' : 'h12' } : {}),
  })
    .format(d)
    .replace(/\u202f/g, ' '); // ICU's narrow space before AM/PM: not in every PDF font
}

/** "3 Dec 2026, 14:05" (en-GB, 24 h). */
export function formatDateTime(iso: string | null | undefined, fmt: DisplayFormat): string {
  return format(iso, fmt, { ...dateParts, ...timeParts });
}

export function formatDate(iso: string | null | undefined, fmt: DisplayFormat): string {
  return format(iso, fmt, dateParts);
}

/** "14:05:09" with seconds (event times), "14:05" without. */
export function formatTime(
  iso: string | null | undefined,
  fmt: DisplayFormat,
  seconds = false,
): string {
  return format(iso, fmt, seconds ? { ...timeParts, second: '2-digit' } : timeParts);
}

/** The zone's short name at that moment ("GMT", "CET", "UTC+1"), for headers of printouts. */
export function timeZoneName(iso: string, fmt: DisplayFormat): string {
  const part = new Intl.DateTimeFormat(fmt.locale, {
    timeZone: fmt.timeZone,
    timeZoneName: 'short',
  })
    .formatToParts(new Date(iso))
    .find((p) => p.type === 'timeZoneName');
  return part?.value ?? fmt.timeZone;
}

/**
 * A calendar month ("2026-03", as trends and control charts key them) in the site's language:
 * "Mar 2026" in en-GB. Anything that is not such a month is returned as it is.
 */
export function formatMonth(month: string, fmt: DisplayFormat): string {
  const m = /^(\d{4})-(\d{2})$/.exec(month);
  if (!m) return month;
  return new Intl.DateTimeFormat(fmt.locale, {
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  }).format(Date.UTC(Number(m[1]), Number(m[2]) - 1, 1));
}

/** A share as "92 %" everywhere (screens, PDF, e-mail); "—" when there is none. */
export function formatPercent(fraction: number | null | undefined, digits = 0): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return '—';
  return `${(fraction * 100).toFixed(digits)} %`;
}

/** A number rounded to what it means (CSV, tables); null stays empty. */
export function roundTo(value: number | null | undefined, digits: number): number | null {
  if (value === null || value === undefined || !Number.isFinite(value)) return null;
  const f = 10 ** digits;
  return Math.round(value * f) / f;
}
