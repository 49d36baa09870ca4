import { z } from 'zod';
import { isoDateTimeSchema, uuidSchema } from './common.js';
import { doseProblem } from './plausibility.js';

export const drugNameSchema = z.enum([
  'epinephrine',
  'amiodarone',
  'lidocaine',
  'sodium-bicarbonate',
  'calcium',
  'magnesium',
  'other',
]);
export type DrugName = z.infer<typeof drugNameSchema>;
export const rhythmSchema = z.enum(['vf', 'pvt', 'pea', 'asystole', 'organised']);
export type Rhythm = z.infer<typeof rhythmSchema>;
export const airwayDeviceSchema = z.enum(['bag-mask', 'supraglottic', 'tracheal-tube']);
export const airwayConfirmationSchema = z.enum([
  'waveform-capnography',
  'colorimetric',
  'auscultation',
  'none',
]);
export const accessRouteSchema = z.enum(['iv', 'io']);
export const endReasonSchema = z.enum(['rosc-sustained', 'terminated', 'transferred']);

const empty = z.object({}).strict();

/** `data` of each event kind (CONTRACT.md "Event kinds"). */
export const eventDataSchemas = {
  arrest: z
    .object({ witnessed: z.boolean().optional(), monitored: z.boolean().optional() })
    .strict(),
  'compressions-start': empty,
  'compressions-stop': empty,
  shock: z.object({ energyJ: z.number().positive().max(400) }).strict(),
  drug: z
    .object({
      drug: drugNameSchema,
      dose: z.number().positive().max(10000).optional(),
      unit: z.enum(['mg', 'mmol', 'mL', 'g']).optional(),
      route: accessRouteSchema.optional(),
      name: z.string().max(200).optional(),
    })
    .strict()
    .superRefine((d, ctx) => {
      const problem = d.dose === undefined ? null : doseProblem(d.drug, d.dose, d.unit);
      if (problem) ctx.addIssue({ code: 'custom', path: ['dose'], message: problem });
    }),
  airway: z
    .object({ device: airwayDeviceSchema, confirmation: airwayConfirmationSchema.optional() })
    .strict(),
  ventilation: z.object({ ratePerMin: z.number().min(0).max(80).optional() }).strict(),
  rhythm: z.object({ rhythm: rhythmSchema }).strict(),
  pulse: z.object({ present: z.boolean() }).strict(),
  rosc: empty,
  rearrest: empty,
  access: z.object({ route: accessRouteSchema }).strict(),
  note: z.object({ text: z.string().min(1).max(2000) }).strict(),
  end: z.object({ reason: endReasonSchema }).strict(),
  correction: z
    .object({
      supersedes: uuidSchema,
      reason: z.string().max(2000).optional(),
      replacement: z
        .object({
          kind: z.string(),
          data: z.record(z.string(), z.unknown()),
          at: isoDateTimeSchema,
        })
        .optional(),
    })
    .strict(),
} as const;

export type EventKind = keyof typeof eventDataSchemas;
export const eventKindSchema = z.enum(Object.keys(eventDataSchemas) as [EventKind, ...EventKind[]]);
export type EventData<K extends EventKind> = z.infer<(typeof eventDataSchemas)[K]>;

const baseFields = {
  id: uuidSchema,
  resuscitationId: uuidSchema,
  at: isoDateTimeSchema,
  recordedBy: z.string().max(200).optional(),
  deviceId: z.string().max(200).optional(),
};

const kinds = Object.keys(eventDataSchemas) as EventKind[];

function unionOf<S extends z.ZodRawShape>(shape: S) {
  const [first, ...rest] = kinds.map((kind) =>
    z.object({ ...shape, kind: z.literal(kind), data: eventDataSchemas[kind] }),
  );
  return z.discriminatedUnion('kind', [first, ...rest]);
}

type EventOf<K extends EventKind, Extra> = Extra & { kind: K; data: EventData<K> };
/** Events of every kind carrying the fields `Extra`, discriminated by `kind`. */
export type AnyEventOf<Extra> = { [K in EventKind]: EventOf<K, Extra> }[EventKind];

export type ResusEvent = AnyEventOf<{
  id: string;
  resuscitationId: string;
  at: string;
  recordedBy?: string;
  deviceId?: string;
}>;
/**
 * One recorded event, discriminated by `kind` (CONTRACT.md "Event kinds"). The union is built
 * over the kinds at run time, which TypeScript cannot follow: its output is declared as the
 * discriminated `ResusEvent` here, once, so every parse yields the narrowed type.
 */
export const eventSchema = unionOf(baseFields) as z.ZodType<ResusEvent>;

/**
 * Why a correction's replacement cannot stand, or null: its kind is not a recordable event
 * (or is a correction itself), or its data is not valid for that kind (a dose outside the
 * drug's plausible range, an unknown route…). Checked by the API on sync and on amendment.
 */
export function replacementProblem(e: { kind: string; data: unknown }): string | null {
  if (e.kind !== 'correction') return null;
  const r = (e.data as { replacement?: { kind: string; data: unknown } }).replacement;
  if (!r) return null;
  if (r.kind === 'correction' || !Object.hasOwn(eventDataSchemas, r.kind))
    return 'data.replacement.kind: not an event kind that can be recorded';
  const parsed = eventDataSchemas[r.kind as EventKind].safeParse(r.data);
  if (parsed.success) return null;
  const issue = parsed.error.issues[0];
  const path = ['data', 'replacement', 'data', ...issue.path.map(String)].join('.');
  return `${path}: ${issue.message}`;
}

/** An event as the analysis reads it (CONTRACT.md "Analysis on files"): id, time, kind, data. */
export const analysisEventSchema = unionOf({ id: z.string().min(1), at: isoDateTimeSchema });
export type AnalysisEvent = AnyEventOf<{ id: string; at: string }>;

export const eventBatchSchema = z.object({ events: z.array(z.unknown()).max(5000) });
