import { z } from 'zod';
import { uuidSchema } from './common.js';
import { yearProblem } from './plausibility.js';
import { trendsFilterSchema } from './quality.js';

/** A calendar month `YYYY-MM` in the years a record can carry. */
export const monthSchema = z
  .string()
  .regex(/^\d{4}-(0[1-9]|1[0-2])$/, 'a month as YYYY-MM')
  .refine((s) => yearProblem(`${s}-01`) === null, {
    error: (i) => yearProblem(`${String(i.input)}-01`),
  });

/** Proportions, charted on a p-chart and compared between units on a funnel plot. */
export const spcProportionSchema = z.enum(['anyRosc', 'compressionFractionMet', 'etco2Documented']);
export type SpcProportion = z.infer<typeof spcProportionSchema>;

/** Continuous measures (each month's median), charted on an individuals (XmR) chart. */
export const spcContinuousSchema = z.enum([
  'compressionFraction',
  'timeToFirstShockSec',
  'timeToFirstEpinephrineSec',
]);
export type SpcContinuous = z.infer<typeof spcContinuousSchema>;

export const spcMeasureSchema = z.enum([
  ...spcProportionSchema.options,
  ...spcContinuousSchema.options,
]);
export type SpcMeasure = z.infer<typeof spcMeasureSchema>;

export const isProportion = (m: SpcMeasure): m is SpcProportion =>
  (spcProportionSchema.options as readonly string[]).includes(m);

/**
 * The records behind one point, as filters of `GET /trends/records` (the caller's filters
 * narrowed to the point's month, unit or site, and the rhythm group the measure counts).
 */
export const spcRecordsFilterSchema = trendsFilterSchema;

/** First and last month (inclusive) of the baseline that fixes centre and limits. */
export const baselineShape = {
  baselineFrom: monthSchema.optional(),
  baselineTo: monthSchema.optional(),
};

/** Refinement of a query with a baseline: it must not end before it starts. */
export const baselineInOrder: [
  (q: { baselineFrom?: string; baselineTo?: string }) => boolean,
  { path: string[]; error: string },
] = [
  (q) => !q.baselineFrom || !q.baselineTo || q.baselineFrom <= q.baselineTo,
  { path: ['baselineTo'], error: 'the baseline must end on or after its first month' },
];

export const controlChartQuerySchema = trendsFilterSchema
  .extend({ measure: spcMeasureSchema, ...baselineShape })
  .strict()
  .refine(...baselineInOrder);
export type ControlChartQuery = z.infer<typeof controlChartQuerySchema>;

export const spcRuleSchema = z.enum(['beyond-limits', 'run-of-8']);
export type SpcRule = z.infer<typeof spcRuleSchema>;

export const controlChartPointSchema = z.object({
  month: z.string(),
  /** A share (p-chart) or the month's median (XmR); null for a month with no data (a gap). */
  value: z.number().nullable(),
  /** Records counted this month (the denominator of a share; the records with a value). */
  n: z.number().int().nonnegative(),
  /** Records meeting the measure (p-chart only). */
  x: z.number().int().nonnegative().nullable(),
  lower: z.number().nullable(),
  upper: z.number().nullable(),
  signal: z.boolean(),
  records: spcRecordsFilterSchema,
});
export type ControlChartPoint = z.infer<typeof controlChartPointSchema>;

export const controlChartSignalSchema = z.object({
  rule: spcRuleSchema,
  /** The month the rule fires at, and every month behind it. */
  month: z.string(),
  months: z.array(z.string()),
  explanation: z.string(),
});
export type ControlChartSignal = z.infer<typeof controlChartSignalSchema>;

export const controlChartResponseSchema = z.object({
  measure: spcMeasureSchema,
  kind: z.enum(['p', 'xmr']),
  centre: z.number().nullable(),
  baseline: z.object({ from: z.string(), to: z.string() }).nullable(),
  /** Compression-fraction target the share is counted against (null when not that measure). */
  target: z.number().nullable(),
  points: z.array(controlChartPointSchema),
  signals: z.array(controlChartSignalSchema),
  /** The rule set and where it comes from, to show beside the chart. */
  rules: z.object({ names: z.array(z.string()), source: z.string() }),
});
export type ControlChartResponse = z.infer<typeof controlChartResponseSchema>;

export const funnelQuerySchema = trendsFilterSchema
  .extend({
    measure: spcProportionSchema,
    /** Compare units (default) or, organisation-wide, sites. */
    by: z.enum(['unit', 'site']).default('unit'),
  })
  .strict();
export type FunnelQuery = z.infer<typeof funnelQuerySchema>;

const funnelLimitsSchema = z.object({
  n: z.number(),
  lower95: z.number(),
  upper95: z.number(),
  lower998: z.number(),
  upper998: z.number(),
});
export type FunnelLimitsLine = z.infer<typeof funnelLimitsSchema>;

export const funnelPointSchema = z.object({
  /** The unit's or site's id; null for records with no unit recorded. */
  id: uuidSchema.nullable(),
  name: z.string(),
  siteName: z.string(),
  x: z.number().int().nonnegative(),
  n: z.number().int().nonnegative(),
  p: z.number().nullable(),
  zone: z.enum(['within', 'beyond-95', 'beyond-99.8', 'no-data']),
  side: z.enum(['above', 'below']).nullable(),
  limits: funnelLimitsSchema.nullable(),
  /** Null for records with no unit: the records table cannot pick those out. */
  records: spcRecordsFilterSchema.nullable(),
});
export type FunnelPointRow = z.infer<typeof funnelPointSchema>;

export const funnelResponseSchema = z.object({
  measure: spcProportionSchema,
  by: z.enum(['unit', 'site']),
  /** The pooled share of every unit in view: the funnel's centre (null with no records). */
  target: z.number().nullable(),
  total: z.number().int().nonnegative(),
  points: z.array(funnelPointSchema),
  /** Limit lines for drawing the funnel, from n = 1 to the largest unit's n. */
  curve: z.array(funnelLimitsSchema),
  source: z.string(),
});
export type FunnelResponse = z.infer<typeof funnelResponseSchema>;
