export * from './event-labels.js';
import { z } from 'zod';
import { analysisOutputSchema, etco2PointSchema, etco2SourceSchema } from './analysis.js';
import { co2UnitSchema, isoDateTimeSchema, uuidSchema } from './common.js';
import { displayFormatSchema, etco2DisplayUnitSchema } from './display-settings.js';
import { eventKindSchema } from './events.js';
import { thresholdsSchema } from './profile-schema.js';
import { patchResuscitationSchema, resuscitationSchema } from './resuscitations.js';
import { timelineModelSchema } from './timeline.js';

/** One stored event as the debrief and the chart record show it (corrections visible). */
export const debriefEventSchema = z.object({
  id: z.string(),
  at: isoDateTimeSchema,
  tSec: z.number(),
  kind: eventKindSchema,
  data: z.record(z.string(), z.unknown()),
  recordedBy: z.string().nullable(),
  /** The recorder's name, when the server knows it (a tablet's own debrief does not). */
  recordedByName: z.string().nullable().optional(),
  /** Added after signing, through the amendment named here. */
  amendment: z.boolean(),
  amendmentId: z.string().nullable(),
  /** Id of the correction that replaced or removed this event, if any. */
  supersededBy: z.string().nullable(),
});
export type DebriefEvent = z.infer<typeof debriefEventSchema>;

/**
 * One EtCO2 value as it was entered: every typed value, and any value a correction took
 * back (Live's Undo), which stays listed struck through, never silently absent.
 */
export const debriefEtco2EntrySchema = z.object({
  id: z.string(),
  at: isoDateTimeSchema,
  tSec: z.number(),
  value: z.number(),
  unit: co2UnitSchema,
  source: etco2SourceSchema,
  /** Id of the correction that took the value back, if any. */
  supersededBy: z.string().nullable(),
});
export type DebriefEtco2Entry = z.infer<typeof debriefEtco2EntrySchema>;

export const amendmentSchema = z.object({
  id: uuidSchema,
  resuscitationId: uuidSchema,
  reason: z.string(),
  fields: z.record(z.string(), z.unknown()),
  eventIds: z.array(z.string()),
  createdBy: z.string(),
  createdByName: z.string().nullable(),
  createdAt: isoDateTimeSchema,
});
export type Amendment = z.infer<typeof amendmentSchema>;

/** An event added by an amendment: a correction of a signed event, or a missed one. */
export const amendmentEventSchema = z
  .object({
    id: uuidSchema,
    at: isoDateTimeSchema,
    kind: eventKindSchema,
    data: z.record(z.string(), z.unknown()),
  })
  .strict();

/** `POST /api/resuscitations/:id/amendments`: a correction after signing, with its reason. */
export const createAmendmentSchema = z
  .object({
    reason: z.string().trim().min(1, 'A reason is required').max(2000),
    events: z.array(amendmentEventSchema).max(200).optional(),
    fields: patchResuscitationSchema.omit({ status: true }).optional(),
  })
  .strict()
  .refine((a) => (a.events?.length ?? 0) > 0 || Object.keys(a.fields ?? {}).length > 0, {
    path: ['events'],
    error: 'An amendment must add an event or change a closing detail',
  });
export type CreateAmendment = z.infer<typeof createAmendmentSchema>;

/** The header of the record as the debrief and exports show it. */
export const debriefRecordSchema = resuscitationSchema.extend({
  siteName: z.string(),
  unitName: z.string().nullable(),
  paperSize: z.enum(['A4', 'Letter']),
  etco2Unit: etco2DisplayUnitSchema,
  display: displayFormatSchema,
  createdByName: z.string().nullable(),
  signedByName: z.string().nullable(),
});
export type DebriefRecord = z.infer<typeof debriefRecordSchema>;

export const debriefProfileSchema = z.object({
  id: z.string().nullable(),
  version: z.number().int().nullable(),
  name: z.string(),
  thresholds: thresholdsSchema,
});
export type DebriefProfile = z.infer<typeof debriefProfileSchema>;

/** A capnogram reduced for drawing: min/max per bucket keeps every breath's peak visible. */
export const waveformTraceSchema = z.object({
  tSec: z.array(z.number()),
  mmHg: z.array(z.number()),
  source: z.string(),
});
export type WaveformTrace = z.infer<typeof waveformTraceSchema>;

/** `GET /api/resuscitations/:id/debrief`: capno's analysis plus what the screen draws. */
export const debriefSchema = analysisOutputSchema.extend({
  record: debriefRecordSchema,
  profile: debriefProfileSchema,
  etco2Series: z.array(etco2PointSchema),
  waveformTrace: waveformTraceSchema.nullable(),
  events: z.array(debriefEventSchema),
  /** Typed EtCO2 values and undone values, in time order (absent from older answers). */
  etco2Entries: z.array(debriefEtco2EntrySchema).default([]),
  amendments: z.array(amendmentSchema),
  /** What every drawing of the timeline reads (capno's `composeDebrief`). */
  timeline: timelineModelSchema,
  /** Where the analysis ran: the server, or this tablet from its own store (offline). */
  computedBy: z.enum(['server', 'device']),
});
export type Debrief = z.infer<typeof debriefSchema>;

/** `POST /api/resuscitations/:id/email`. */
export const sendDebriefEmailSchema = z
  .object({
    recipients: z.array(z.email()).min(1, 'Add at least one recipient').max(20),
    message: z.string().max(2000).optional(),
  })
  .strict();
export type SendDebriefEmail = z.infer<typeof sendDebriefEmailSchema>;

export const mailStatusSchema = z.enum(['queued', 'sent', 'failed']);
export const mailOutboxItemSchema = z.object({
  id: uuidSchema,
  to: z.array(z.string()),
  subject: z.string(),
  status: mailStatusSchema,
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  nextAttemptAt: isoDateTimeSchema,
  sentAt: isoDateTimeSchema.nullable(),
  createdAt: isoDateTimeSchema,
  createdBy: z.string().nullable(),
  resuscitationId: z.string().nullable(),
  attachmentName: z.string().nullable(),
});
export type MailOutboxItem = z.infer<typeof mailOutboxItemSchema>;
