import {
  defaultDisplayFormat,
  type DisplayFormat,
  formatDate,
  formatDateTime,
  formatMonth,
  formatTime,
} from '@upstroke/contracts';
import { useLiveQuery } from 'dexie-react-hooks';
import { useMemo } from 'react';
import { offlineDb } from '../lib/offline';

export interface Formatter {
  display: DisplayFormat;
  dateTime: (iso: string | null | undefined) => string;
  date: (iso: string | null | undefined) => string;
  time: (iso: string | null | undefined, seconds?: boolean) => string;
  /** "Mar 2026" from "2026-03". */
  month: (month: string) => string;
}

export function formatterFor(display: DisplayFormat): Formatter {
  return {
    display,
    dateTime: (iso) => formatDateTime(iso, display),
    date: (iso) => formatDate(iso, display),
    time: (iso, seconds) => formatTime(iso, display, seconds),
    month: (month) => formatMonth(month, display),
  };
}

/**
 * Dates and times in a site's locale, time zone and clock (Admin → Sites). The sites come
 * from the cached recording context, so the Board and Debrief format the same way offline.
 * Without a site, the user's first site; without any, the defaults (en-GB, UTC, 24 h).
 */
export function useDisplayFormat(siteId?: string | null): Formatter {
  const cached = useLiveQuery(() => offlineDb.meta.get('context'), []);
  const sites = cached && 'sites' in cached.value ? cached.value.sites : [];
  const { locale, timeZone, clock } =
    (sites.find((s) => s.id === siteId) ?? sites[0])?.display ?? defaultDisplayFormat;
  // One formatter per setting, so callers can list it in effect and query dependencies.
  return useMemo(() => formatterFor({ locale, timeZone, clock }), [locale, timeZone, clock]);
}
