import { z } from 'zod';
import { etco2DisplayUnitSchema } from './etco2-units.js';
import { isoDateTimeSchema, uuidSchema } from './common.js';
import { displayFormatSchema } from './formats.js';
import { thresholdsSchema } from './profile.js';

/** Who was at the bedside and in which role (filled during or after the code). */
export const rosterRoleSchema = z.enum(['lead', 'compressor', 'airway', 'drugs', 'recorder']);
export type RosterRole = z.infer<typeof rosterRoleSchema>;

export const rosterMemberSchema = z
  .object({
    name: z.string().trim().min(1).max(120),
    role: rosterRoleSchema,
    // Optional: the debrief can be e-mailed to the people present.
    email: z.email().max(254).optional(),
  })
  .strict();
export type RosterMember = z.infer<typeof rosterMemberSchema>;
export const rosterSchema = z.array(rosterMemberSchema).max(40);

/** One site as the tablet needs it to record: units, EtCO2 unit, current thresholds. */
export const siteContextSchema = z.object({
  id: uuidSchema,
  name: z.string(),
  etco2Unit: etco2DisplayUnitSchema,
  /** How dates and times are written for this site (absent in a tablet's older cache). */
  display: displayFormatSchema.optional(),
  units: z.array(z.object({ id: uuidSchema, name: z.string() })),
  profile: z
    .object({ id: uuidSchema, version: z.number().int(), thresholds: thresholdsSchema })
    .nullable(),
});
export type SiteContext = z.infer<typeof siteContextSchema>;

/** `GET /api/context`: the signed-in user's sites, with the server clock for offset estimates. */
export const recordingContextSchema = z.object({
  serverTime: isoDateTimeSchema,
  sites: z.array(siteContextSchema),
});
export type RecordingContext = z.infer<typeof recordingContextSchema>;
