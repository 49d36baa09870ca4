import { z } from 'zod';
import { ageGroupSchema, co2UnitSchema, isoDateTimeSchema, uuidSchema } from './common.js';
import { arrestTimeProblem, PLAUSIBLE } from './plausibility.js';
import { etco2SourceSchema } from './analysis.js';
import { endReasonSchema, eventKindSchema, rhythmSchema } from './events.js';
import { rosterSchema } from './site-context.js';

export const resuscitationStatusSchema = z.enum(['open', 'closed', 'signed']);
export type ResuscitationStatus = z.infer<typeof resuscitationStatusSchema>;

/** Weight in kg within PLAUSIBLE.weightKg (the forms and the API share it). */
export const weightKgSchema = z
  .number()
  .min(PLAUSIBLE.weightKg.min, `at least ${PLAUSIBLE.weightKg.min} kg`)
  .max(PLAUSIBLE.weightKg.max, `at most ${PLAUSIBLE.weightKg.max} kg`);

/** An arrest time within the last 10 years and not more than 1 h ahead (checked when parsed). */
export const arrestAtSchema = isoDateTimeSchema.refine((s) => arrestTimeProblem(s) === null, {
  error: (i) => arrestTimeProblem(String(i.input)),
});

export const createResuscitationSchema = z
  .object({
    id: uuidSchema,
    siteId: uuidSchema,
    unitId: uuidSchema.optional(),
    arrestAt: arrestAtSchema,
    location: z.string().max(200).optional(),
    patientRef: z.string().max(100).optional(),
    ageGroup: ageGroupSchema.optional(),
    weightKg: weightKgSchema.optional(),
  })
  .strict();
export type CreateResuscitation = z.infer<typeof createResuscitationSchema>;

export const outcomeSchema = z.enum([
  'rosc-sustained',
  'rosc-not-sustained',
  'died',
  'transferred',
]);

/** Closing details (Utstein core fields), editable until the record is signed. */
export const patchResuscitationSchema = z
  .object({
    unitId: uuidSchema.nullable(),
    arrestAt: arrestAtSchema,
    location: z.string().max(200).nullable(),
    patientRef: z.string().max(100).nullable(),
    ageGroup: ageGroupSchema.nullable(),
    weightKg: weightKgSchema.nullable(),
    status: z.enum(['open', 'closed']),
    witnessed: z.boolean().nullable(),
    monitored: z.boolean().nullable(),
    firstRhythm: rhythmSchema.nullable(),
    outcome: outcomeSchema.nullable(),
    endReason: endReasonSchema.nullable(),
    notesWentWell: z.string().max(5000).nullable(),
    notesToChange: z.string().max(5000).nullable(),
    roster: rosterSchema,
  })
  .partial()
  .strict();
export type PatchResuscitation = z.infer<typeof patchResuscitationSchema>;

export const resuscitationSchema = z.object({
  id: uuidSchema,
  siteId: uuidSchema,
  unitId: uuidSchema.nullable(),
  arrestAt: isoDateTimeSchema,
  location: z.string().nullable(),
  patientRef: z.string().nullable(),
  ageGroup: ageGroupSchema.nullable(),
  weightKg: z.number().nullable(),
  status: resuscitationStatusSchema,
  witnessed: z.boolean().nullable(),
  monitored: z.boolean().nullable(),
  firstRhythm: rhythmSchema.nullable(),
  outcome: outcomeSchema.nullable(),
  endReason: endReasonSchema.nullable(),
  notesWentWell: z.string().nullable(),
  notesToChange: z.string().nullable(),
  createdBy: z.string().nullable(),
  createdAt: isoDateTimeSchema,
  signedAt: isoDateTimeSchema.nullable(),
  signedBy: z.string().nullable(),
  roster: rosterSchema.optional(),
});
export type Resuscitation = z.infer<typeof resuscitationSchema>;

/**
 * `GET /api/resuscitations`: the Board's search and filters, one page at a time. `q` looks in
 * the location, patient reference and unit name; `signed` splits signed from not yet signed;
 * `mine` keeps the records the user started or signed.
 */
export const listResuscitationsQuerySchema = z
  .object({
    status: resuscitationStatusSchema.optional(),
    siteId: uuidSchema.optional(),
    unitId: uuidSchema.optional(),
    from: isoDateTimeSchema.optional(),
    to: isoDateTimeSchema.optional(),
    q: z.string().trim().max(100, 'at most 100 characters').optional(),
    signed: z.enum(['signed', 'unsigned']).optional(),
    mine: z
      .enum(['true', 'false'], { error: 'mine is true or false' })
      .transform((v) => v === 'true')
      .optional(),
    limit: z.coerce.number().int().min(1).max(500).default(100),
    offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
  })
  .strict()
  .refine((f) => !f.from || !f.to || f.from < f.to, {
    path: ['to'],
    error: 'to must be after from',
  });
export type ListResuscitationsQuery = z.input<typeof listResuscitationsQuerySchema>;

/** One row of the list: the record with its unit's name. */
export const resuscitationListItemSchema = resuscitationSchema.extend({
  unitName: z.string().nullable().optional(),
});
export type ResuscitationListItem = z.infer<typeof resuscitationListItemSchema>;

/** One EtCO2 value as synced from a tablet (`POST …/etco2/batch`). */
export const etco2SampleSchema = z
  .object({
    id: uuidSchema,
    at: isoDateTimeSchema,
    value: z.number().finite().min(0).max(150),
    unit: co2UnitSchema,
    source: etco2SourceSchema,
    deviceId: z.string().max(200).optional(),
  })
  .strict();
export type Etco2Sample = z.infer<typeof etco2SampleSchema>;

/** A chunk of raw capnogram, stored as sent (`POST …/waveform/batch`). */
export const waveformChunkSchema = z
  .object({
    id: uuidSchema,
    startAt: isoDateTimeSchema,
    sampleRateHz: z.number().min(10).max(200),
    unit: co2UnitSchema,
    seq: z.number().int().nonnegative().max(PLAUSIBLE.int32Max).optional(),
    values: z.array(z.number().finite()).min(1).max(60000),
  })
  .strict();
export type WaveformChunk = z.infer<typeof waveformChunkSchema>;

/** `GET /api/resuscitations/:id/entries?since=`: what the server received after `since`. */
export const entriesQuerySchema = z.object({ since: isoDateTimeSchema.optional() });

/**
 * Events and EtCO2 values of a record received after `since` (all without it), for tablets
 * recording the same code. `serverTime` is the next `since` (ask with some overlap: an entry
 * is stamped when its transaction began).
 */
export const recordEntriesSchema = z.object({
  serverTime: isoDateTimeSchema,
  events: z.array(
    z.object({
      id: uuidSchema,
      at: isoDateTimeSchema,
      kind: eventKindSchema,
      data: z.record(z.string(), z.unknown()),
      deviceId: z.string().nullable(),
    }),
  ),
  etco2: z.array(
    z.object({
      id: uuidSchema,
      at: isoDateTimeSchema,
      value: z.number(),
      unit: co2UnitSchema,
      source: etco2SourceSchema,
      deviceId: z.string().nullable(),
    }),
  ),
});
export type RecordEntries = z.infer<typeof recordEntriesSchema>;
