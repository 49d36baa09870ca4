import { z } from 'zod';
import { yearProblem } from './plausibility.js';

/** Client-generated identifiers for clinical rows (resuscitations, events, samples). */
export const uuidSchema = z.uuid();

/**
 * ISO-8601 date-time with an offset (`Z` or `+hh:mm`), as every clinical time is stored, in
 * the years a record can carry (PLAUSIBLE.years).
 */
export const isoDateTimeSchema = z.iso
  .datetime({ offset: true })
  .refine((s) => yearProblem(s) === null, { error: (i) => yearProblem(String(i.input)) });

/** A calendar date (`2026-03-04`) in the same years. */
export const isoDateSchema = z.iso
  .date()
  .refine((s) => yearProblem(s) === null, { error: (i) => yearProblem(String(i.input)) });

export const roleSchema = z.enum(['recorder', 'lead', 'quality', 'admin']);
export type Role = z.infer<typeof roleSchema>;

export const co2UnitSchema = z.enum(['mmHg', 'kPa', '%']);
export type Co2Unit = z.infer<typeof co2UnitSchema>;

export function listSchema<T extends z.ZodType>(item: T) {
  return z.object({ items: z.array(item), total: z.number().int().nonnegative() });
}
export interface List<T> {
  items: T[];
  total: number;
}

/** The one error shape every API failure uses. */
export const apiErrorSchema = z.object({
  statusCode: z.number().int(),
  error: z.string(),
  message: z.string(),
  details: z.array(z.object({ path: z.string(), message: z.string() })).optional(),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

/** Result of an idempotent batch upload (events, EtCO2 values, waveform chunks). */
export const batchResultSchema = z.object({
  accepted: z.number().int().nonnegative(),
  duplicates: z.number().int().nonnegative(),
  rejected: z.array(z.object({ id: z.string(), reason: z.string() })),
});
export type BatchResult = z.infer<typeof batchResultSchema>;

export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  db: z.enum(['ok', 'down']),
});
export type Health = z.infer<typeof healthSchema>;

/** Adult, child or infant: child and infant records use the profile's paediatric values. */
export const ageGroupSchema = z.enum(['adult', 'child', 'infant']);
export type AgeGroup = z.infer<typeof ageGroupSchema>;
