/**
 * The schemas of a site's display settings: how dates and times are written (`formats.ts`)
 * and the EtCO2 unit (`etco2-units.ts`). Kept apart from the functions that use the settings,
 * so a screen that only writes values (Live) loads them without zod.
 */
import { z } from 'zod';

function isTimeZone(tz: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}

function isLocale(tag: string): boolean {
  try {
    return Intl.getCanonicalLocales(tag).length === 1;
  } catch {
    return false;
  }
}

export const clockSchema = z.enum(['24h', '12h']);
export const displayFormatSchema = z.object({
  locale: z
    .string()
    .trim()
    .max(35)
    .refine(isLocale, { error: 'Enter a language tag such as en-GB or fr-CA' }),
  timeZone: z
    .string()
    .trim()
    .max(64)
    .refine(isTimeZone, { error: 'Enter a time zone such as Europe/London' }),
  clock: clockSchema,
});

export const etco2DisplayUnitSchema = z.enum(['mmHg', 'kPa']);
