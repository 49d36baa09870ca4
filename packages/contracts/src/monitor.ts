import { z } from 'zod';
import { co2UnitSchema, isoDateTimeSchema, listSchema, uuidSchema } from './common.js';
import { PLAUSIBLE } from './plausibility.js';

/** Monitor link (CONTRACT.md "Monitor link"): the first frame from the server. */
export const linkHelloSchema = z.object({
  type: z.literal('hello'),
  sampleRateHz: z.number().min(10).max(200),
  unit: co2UnitSchema,
  startAt: isoDateTimeSchema,
  /** Optional, ours: what is on the other end (e.g. `simulator:rosc`, `file:export.csv`). */
  source: z.string().optional(),
});
export type LinkHello = z.infer<typeof linkHelloSchema>;

/** A batch of consecutive samples; `seq` increases by one per batch, so gaps show. */
export const linkSamplesSchema = z.object({
  type: z.literal('samples'),
  seq: z.number().int().nonnegative().max(PLAUSIBLE.int32Max),
  t0: isoDateTimeSchema,
  values: z.array(z.number()),
});
export type LinkSamples = z.infer<typeof linkSamplesSchema>;

export const linkMessageSchema = z.discriminatedUnion('type', [linkHelloSchema, linkSamplesSchema]);
export type LinkMessage = z.infer<typeof linkMessageSchema>;

export const simulatorScenarioSchema = z.enum([
  'poor-cpr',
  'improving-cpr',
  'rosc',
  'dislodged-tube',
]);
export type SimulatorScenario = z.infer<typeof simulatorScenarioSchema>;

/** Query of `ws://…/api/link/simulator`. `speed` > 1 compresses time (tests, demos). */
export const simulatorQuerySchema = z.object({
  scenario: simulatorScenarioSchema,
  seed: z.coerce
    .number()
    .int()
    .min(0)
    .max(2 ** 31)
    .default(1),
  speed: z.coerce.number().min(0.1).max(100).default(1),
  /** Start this many seconds into the scenario (demos; the tests use it to reach ROSC). */
  from: z.coerce.number().min(0).max(3600).default(0),
  /**
   * A simulated link drop (a cable pulled out): this many seconds of the stream after the
   * simulated monitor first connected, the link falls silent for `dropFor` seconds while the
   * monitor keeps running; reconnecting meanwhile is refused, and afterwards the link resumes
   * at the present. The same address is the same monitor, so a reconnect finds it still running.
   */
  dropAfter: z.coerce.number().min(0).max(3600).optional(),
  dropFor: z.coerce.number().min(1).max(600).default(20),
});
export type SimulatorQuery = z.infer<typeof simulatorQuerySchema>;

export const offsetMethodSchema = z.enum(['auto', 'manual']);

/** One imported monitor file (`GET/POST /resuscitations/:id/imports`). */
export const monitorImportSchema = z.object({
  id: uuidSchema,
  resuscitationId: uuidSchema,
  fileName: z.string(),
  sha256: z.string(),
  rows: z.number().int().nonnegative(),
  /** First and last sample on the file's own clock. */
  startedAt: isoDateTimeSchema,
  endedAt: isoDateTimeSchema,
  unit: co2UnitSchema,
  sampleRateHz: z.number(),
  /** File clock minus record clock (s): positive when the monitor ran ahead. */
  offsetSec: z.number(),
  offsetMethod: offsetMethodSchema,
  offsetChosenBy: uuidSchema.nullable(),
  /** Median absolute residual of the matched shock markers; null without markers. */
  residualSec: z.number().nullable(),
  markers: z.number().int().nonnegative(),
  matchedMarkers: z.number().int().nonnegative(),
  breaths: z.number().int().nonnegative(),
  createdAt: isoDateTimeSchema,
  createdBy: uuidSchema.nullable(),
});
export type MonitorImport = z.infer<typeof monitorImportSchema>;
export const monitorImportListSchema = listSchema(monitorImportSchema);

/** `PATCH /resuscitations/:id/imports/:importId`: the lead's chosen offset. */
export const patchImportSchema = z
  .object({ offsetSec: z.number().finite().min(-86_400).max(86_400) })
  .strict();
export type PatchImport = z.infer<typeof patchImportSchema>;

/** The largest monitor file accepted (CONTRACT.md: limit 50 MB). */
export const IMPORT_MAX_BYTES = 50 * 1024 * 1024;
/** How many line errors a rejected file reports. */
export const IMPORT_MAX_ERRORS = 20;
