import { z } from 'zod';
import { findingKindSchema } from './analysis.js';
import { ageGroupSchema, isoDateSchema, isoDateTimeSchema, uuidSchema } from './common.js';
import { outcomeSchema } from './resuscitations.js';
import { endReasonSchema, rhythmSchema } from './events.js';

/**
 * The stored per-record audit row (`record_summaries`): where the record sits (site, unit,
 * time) plus its `RecordSummary`, flattened into columns that trends query in SQL.
 */
export const recordSummaryRowSchema = z.object({
  resuscitationId: uuidSchema,
  siteId: uuidSchema,
  unitId: uuidSchema.nullable(),
  arrestAt: isoDateTimeSchema,
  ageGroup: ageGroupSchema.nullable(),
  firstRhythm: rhythmSchema.nullable(),
  shockable: z.boolean().nullable(),
  witnessed: z.boolean().nullable(),
  monitored: z.boolean().nullable(),
  outcome: outcomeSchema.nullable(),
  endReason: endReasonSchema.nullable(),
  anyRosc: z.boolean(),
  sustainedRosc: z.boolean(),
  compressionFraction: z.number().nullable(),
  longestPauseSec: z.number().nullable(),
  preshockLongCount: z.number().int().nonnegative(),
  timeToFirstCompressionSec: z.number().nullable(),
  timeToFirstShockSec: z.number().nullable(),
  timeToFirstEpinephrineSec: z.number().nullable(),
  etco2Documented: z.boolean(),
  medianEtco2: z.number().nullable(),
  fractionGe10: z.number().nullable(),
  fractionGe20: z.number().nullable(),
  findingCounts: z.record(findingKindSchema, z.number().int().nonnegative()),
  durationSec: z.number(),
  profileVersion: z.number().int().nullable(),
});
export type RecordSummaryRow = z.infer<typeof recordSummaryRowSchema>;

export const reviewStatusSchema = z.enum(['pending', 'reviewed', 'needs-follow-up']);
export type ReviewStatus = z.infer<typeof reviewStatusSchema>;

const dateOrDateTime = z.union([isoDateSchema, isoDateTimeSchema]);

/** Filters shared by the trends series, the records table, the Utstein summary and exports. */
export const trendsFilterSchema = z
  .object({
    siteId: uuidSchema.optional(),
    unitId: uuidSchema.optional(),
    /** Inclusive start (a date means its midnight UTC). */
    from: dateOrDateTime.optional(),
    /** Exclusive end (a date means its midnight UTC). */
    to: dateOrDateTime.optional(),
    firstRhythm: z.enum(['shockable', 'non-shockable']).optional(),
    outcome: outcomeSchema.optional(),
  })
  .strict();
export type TrendsFilter = z.infer<typeof trendsFilterSchema>;

export const trendsRecordsQuerySchema = trendsFilterSchema
  .extend({
    sort: z
      .enum([
        'arrestAt',
        'compressionFraction',
        'fractionGe10',
        'timeToFirstShockSec',
        'timeToFirstEpinephrineSec',
        'preshockLongCount',
        'durationSec',
      ])
      .default('arrestAt'),
    order: z.enum(['asc', 'desc']).default('desc'),
    limit: z.coerce.number().int().min(1).max(500).default(50),
    offset: z.coerce.number().int().min(0).default(0),
  })
  .strict();
export type TrendsRecordsQuery = z.infer<typeof trendsRecordsQuerySchema>;

/** One month of one measure: the value (null when no record qualifies) and its n. */
export const trendPointSchema = z.object({
  month: z.string().regex(/^\d{4}-\d{2}$/),
  value: z.number().nullable(),
  n: z.number().int().nonnegative(),
});
export type TrendPoint = z.infer<typeof trendPointSchema>;

export const trendMeasureSchema = z.enum([
  'compressionFraction',
  'etco2Documented',
  'fractionGe10',
  'timeToFirstShockSec',
  'timeToFirstEpinephrineSec',
  'preshockLongPerRecord',
  'anyRosc',
  'sustainedRosc',
]);
export type TrendMeasure = z.infer<typeof trendMeasureSchema>;

export const trendsResponseSchema = z.object({
  months: z.array(z.string()),
  series: z.record(trendMeasureSchema, z.array(trendPointSchema)),
  /** Target lines from the site's protocol profile (null when sites disagree or none applies). */
  targets: z.object({
    compressionFraction: z.number().nullable(),
    fractionGe10: z.number().nullable(),
    timeToFirstShockSec: z.number().nullable(),
    timeToFirstEpinephrineSec: z.number().nullable(),
    preshockLongPerRecord: z.number().nullable(),
  }),
  total: z.number().int().nonnegative(),
});
export type TrendsResponse = z.infer<typeof trendsResponseSchema>;

export const trendsRecordSchema = recordSummaryRowSchema.extend({
  siteName: z.string(),
  unitName: z.string().nullable(),
  reviewStatus: reviewStatusSchema.nullable(),
});
export type TrendsRecord = z.infer<typeof trendsRecordSchema>;

/** One Utstein-style line: a count out of a denominator, with its percentage. */
export const utsteinLineSchema = z.object({
  key: z.string(),
  label: z.string(),
  count: z.number().int().nonnegative(),
  denominator: z.number().int().nonnegative(),
  percent: z.number().nullable(),
});
export type UtsteinLine = z.infer<typeof utsteinLineSchema>;

export const utsteinSummarySchema = z.object({
  from: z.string().nullable(),
  to: z.string().nullable(),
  total: z.number().int().nonnegative(),
  lines: z.array(utsteinLineSchema),
  medians: z.array(
    z.object({ key: z.string(), label: z.string(), value: z.number().nullable(), n: z.number() }),
  ),
});
export type UtsteinSummary = z.infer<typeof utsteinSummarySchema>;

export const reviewInputSchema = z
  .object({ status: reviewStatusSchema, comment: z.string().trim().max(2000).default('') })
  .strict();
export type ReviewInput = z.infer<typeof reviewInputSchema>;

export const reviewSchema = z.object({
  id: z.number().int(),
  resuscitationId: uuidSchema,
  status: reviewStatusSchema,
  comment: z.string(),
  reviewerId: uuidSchema,
  reviewerName: z.string(),
  at: isoDateTimeSchema,
});
export type Review = z.infer<typeof reviewSchema>;

export const reviewQueueQuerySchema = z
  .object({
    siteId: uuidSchema.optional(),
    /** `awaiting`: no review yet or last status `pending` (the default queue). */
    status: z.enum(['awaiting', 'needs-follow-up', 'reviewed', 'all']).default('awaiting'),
    limit: z.coerce.number().int().min(1).max(500).default(100),
    offset: z.coerce.number().int().min(0).default(0),
  })
  .strict();
export type ReviewQueueQuery = z.infer<typeof reviewQueueQuerySchema>;

export const reviewQueueItemSchema = z.object({
  resuscitationId: uuidSchema,
  siteId: uuidSchema,
  siteName: z.string(),
  unitName: z.string().nullable(),
  arrestAt: isoDateTimeSchema,
  signedAt: isoDateTimeSchema.nullable(),
  firstRhythm: rhythmSchema.nullable(),
  outcome: outcomeSchema.nullable(),
  status: reviewStatusSchema.nullable(),
  lastComment: z.string().nullable(),
  lastReviewAt: isoDateTimeSchema.nullable(),
});
export type ReviewQueueItem = z.infer<typeof reviewQueueItemSchema>;
