import { z } from 'zod';
import { uuidSchema } from './common.js';
import {
  thresholdFields,
  thresholdKeys,
  thresholdRange,
  thresholdsInputSchema,
} from './profile-fields.js';
import { thresholdDefaults } from './profile.js';
import type { Thresholds } from './profile-schema.js';

/**
 * A value more than this factor away from the guideline default (above or below) is saved
 * only with an explicit confirmation and a local source or reason: a slip of a decimal
 * point (1 mg/kg for 0.01 mg/kg) must not become the site's dose. Common practice.
 */
export const CONFIRM_FACTOR = 2;

/** Whether a value lies outside default ÷ 2 … default × 2 and so needs a confirmation. */
export function needsConfirmation(key: keyof Thresholds, value: number): boolean {
  const d = thresholdDefaults[key];
  if (!Number.isFinite(value)) return false;
  if (d === 0) return value !== 0;
  return value > d * CONFIRM_FACTOR || value < d / CONFIRM_FACTOR;
}

/** Whether a value differs from the guideline default (the form marks it). */
export function differsFromDefault(key: keyof Thresholds, value: number): boolean {
  return Math.abs(value - thresholdDefaults[key]) > 1e-9;
}

export const profileConfirmationSchema = z
  .object({
    confirmed: z.literal(true, { error: 'Tick the box to confirm this value' }),
    reason: z
      .string()
      .trim()
      .min(3, { error: 'Give the local source or reason for this value' })
      .max(500, { error: 'Keep the reason under 500 characters' }),
  })
  .strict();
export type ProfileConfirmation = z.infer<typeof profileConfirmationSchema>;

const thresholdKeySchema = z.enum(thresholdKeys as [keyof Thresholds, ...(keyof Thresholds)[]]);

/** The message of a value that needs a confirmation, naming the field, its value and default. */
export function confirmationMessage(key: keyof Thresholds, value: number): string {
  const { label, unit } = thresholdFields[key];
  const u = unit ? ` ${unit}` : '';
  return `${label}: ${value}${u} is more than ${CONFIRM_FACTOR} times away from the guideline default (${thresholdDefaults[key]}${u}). Confirm it and give a local source or reason.`;
}

/**
 * Body of `POST /protocol-profiles` and the profile form. `confirmations` holds, per field,
 * the confirmation of a value far from the default with its local source or reason.
 */
export const createProfileVersionSchema = z
  .object({
    siteId: uuidSchema,
    name: z
      .string()
      .trim()
      .min(1, { error: 'Give the profile a name' })
      .max(120, { error: 'Keep the name under 120 characters' }),
    thresholds: thresholdsInputSchema,
    confirmations: z.partialRecord(thresholdKeySchema, profileConfirmationSchema).optional(),
  })
  .strict()
  .superRefine((body, ctx) => {
    for (const key of thresholdKeys) {
      const value = body.thresholds[key];
      const { min, max } = thresholdRange(key);
      // A value outside the hard range is already refused with its own message.
      if (typeof value !== 'number' || value < min || value > max) continue;
      if (!needsConfirmation(key, value) || body.confirmations?.[key]) continue;
      ctx.addIssue({
        code: 'custom',
        path: ['confirmations', key],
        message: confirmationMessage(key, value),
      });
    }
  });
export type CreateProfileVersion = z.infer<typeof createProfileVersionSchema>;

/** The local reasons kept with a saved version: only for values that differ from the default. */
export function localSourcesOf(
  body: CreateProfileVersion,
): Partial<Record<keyof Thresholds, string>> {
  const out: Partial<Record<keyof Thresholds, string>> = {};
  for (const key of thresholdKeys) {
    const c = body.confirmations?.[key];
    if (c && differsFromDefault(key, body.thresholds[key])) out[key] = c.reason;
  }
  return out;
}
