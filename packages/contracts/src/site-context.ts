import { z } from 'zod';
import { displayFormatSchema, etco2DisplayUnitSchema } from './display-settings.js';
import { isoDateTimeSchema, uuidSchema } from './common.js';
import { thresholdsSchema } from './profile-schema.js';

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
  /** The organisation's e-mail domains: debrief e-mail goes only there (empty: any address). */
  mailDomains: z.array(z.string()).optional(),
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

/** True when the address is at one of the domains or below one; with no domains, any address. */
export function insideMailDomains(address: string, domains: readonly string[]): boolean {
  if (domains.length === 0) return true;
  const host = address
    .slice(address.lastIndexOf('@') + 1)
    .trim()
    .toLowerCase();
  return domains.some((d) => host === d || host.endsWith(`.${d}`));
}

/**
 * Each recipient outside the organisation's domains, with the same message in the e-mail form
 * and in the API's 400 (the path names the recipient's place in the list).
 */
export function mailDomainIssues(
  recipients: readonly string[],
  domains: readonly string[],
): { path: string; message: string }[] {
  return recipients
    .map((address, i) => ({ address, i }))
    .filter(({ address }) => !insideMailDomains(address, domains))
    .map(({ address, i }) => ({
      path: `recipients.${i}`,
      message: `${address} is outside the organisation's e-mail domains (${domains.join(', ')})`,
    }));
}
