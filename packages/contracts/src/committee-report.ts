import { z } from 'zod';
import { trendsFilterSchema, type UtsteinSummary } from './quality.js';
import {
  baselineInOrder,
  baselineShape,
  type ControlChartResponse,
  monthSchema,
  type SpcMeasure,
} from './spc.js';
import { type DisplayFormat, formatPercent } from './formats.js';

/**
 * The monthly committee report for one calendar month (UTC), with the Trends filters
 * (site, unit, first rhythm, outcome) and the committee's baseline; the month replaces the
 * date range.
 */
export const committeeReportQuerySchema = trendsFilterSchema
  .omit({ from: true, to: true })
  .extend({ month: monthSchema, ...baselineShape })
  .strict()
  .refine(...baselineInOrder);
export type CommitteeReportQuery = z.infer<typeof committeeReportQuerySchema>;

/** Months of history each control chart in the report shows, ending with the report month. */
export const COMMITTEE_REPORT_MONTHS = 12;

/** Signed records of the month by their latest review status, and the drafts not yet signed. */
export interface ReviewStatusCounts {
  signed: number;
  awaiting: number;
  needsFollowUp: number;
  reviewed: number;
  drafts: number;
}

/** Everything the PDF shows, gathered by the API and rendered in a worker thread. */
export interface CommitteeReportData {
  month: string;
  scope: string;
  filters: string;
  display: DisplayFormat;
  paperSize: 'A4' | 'Letter';
  charts: ControlChartResponse[];
  utstein: UtsteinSummary;
  reviews: ReviewStatusCounts;
}

const isSeconds = (m: SpcMeasure) =>
  m === 'timeToFirstShockSec' || m === 'timeToFirstEpinephrineSec';

/** A control-chart value in words: percent to one decimal for shares, whole seconds for times. */
export const formatSpcValue = (m: SpcMeasure, v: number | null) =>
  v === null ? '—' : isSeconds(m) ? `${Math.round(v)} s` : formatPercent(v, 1);
