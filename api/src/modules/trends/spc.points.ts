import type { SpcMeasure, TrendsFilter } from '@upstroke/contracts';
import { badRequest } from '../../common/errors';
import type { SpcCounts, SpcMonthRow } from './spc.repository';
import { toInstant } from './trends.time';

/** The rule set and its sources, shown beside every control chart. */
export const SPC_RULES = {
  names: [
    'A point beyond a 3-sigma control limit (Nelson rule 1)',
    '8 points in a row on one side of the centre line (Nelson rule 2)',
  ],
  source:
    'Rules: Western Electric Statistical Quality Control Handbook (1956) and Nelson 1984, ' +
    'J Qual Technol 16:237, the pair recommended for healthcare by Benneyan, Lloyd & Plsek ' +
    '2003, Qual Saf Health Care 12:458. Limits: p-chart p̄ ± 3·√(p̄(1 − p̄)/n) from each ' +
    "month's n; XmR chart x̄ ± 2.66 × mean moving range.",
};

export const FUNNEL_SOURCE =
  'Funnel plot: Spiegelhalter 2005, Statistics in Medicine 24:1185. Limits at 95 % and ' +
  "99.8 % around the pooled share, p₀ ± z·√(p₀(1 − p₀)/n) for each unit's n.";

/** x of n for a proportion measure in one group of records. */
export function proportionOf(measure: SpcMeasure, c: SpcCounts | undefined) {
  if (!c) return { x: 0, n: 0 };
  if (measure === 'anyRosc') return { x: c.roscX, n: c.n };
  if (measure === 'etco2Documented') return { x: c.etco2X, n: c.n };
  return { x: c.cfMetX, n: c.cfN };
}

/** The month's median and how many records it rests on, for a continuous measure. */
export function medianOf(measure: SpcMeasure, row: SpcMonthRow | undefined) {
  if (!row) return { value: null, n: 0 };
  if (measure === 'timeToFirstShockSec') return { value: row.shock ?? null, n: row.shockN };
  if (measure === 'timeToFirstEpinephrineSec') return { value: row.epi ?? null, n: row.epiN };
  return { value: row.cf ?? null, n: row.cfN };
}

const nextMonth = (month: string) => {
  const [y, m] = month.split('-').map(Number);
  return m === 12 ? `${y + 1}-01` : `${y}-${String(m + 1).padStart(2, '0')}`;
};

/**
 * The records behind one month's point: the caller's filters narrowed to that month, and to
 * the first-rhythm group a time measure counts.
 */
export function monthRecords(filter: TrendsFilter, measure: SpcMeasure, month: string) {
  const start = `${month}-01`;
  const end = `${nextMonth(month)}-01`;
  const from = filter.from && toInstant(filter.from) > toInstant(start) ? filter.from : start;
  const to = filter.to && toInstant(filter.to) < toInstant(end) ? filter.to : end;
  const firstRhythm =
    measure === 'timeToFirstShockSec'
      ? 'shockable'
      : measure === 'timeToFirstEpinephrineSec'
        ? 'non-shockable'
        : filter.firstRhythm;
  return { ...filter, from, to, ...(firstRhythm ? { firstRhythm } : {}) };
}

/** Month bounds of the baseline as point indices (end exclusive); a 400 names the field. */
export function baselineIndices(months: string[], from?: string, to?: string) {
  const index = (field: 'baselineFrom' | 'baselineTo', month: string) => {
    const i = months.indexOf(month);
    if (i < 0) {
      const range = months.length ? `${months[0]} to ${months.at(-1)}` : 'none';
      throw badRequest(`${field} ${month} lies outside the charted months (${range})`, [
        { path: field, message: `must be one of the charted months (${range})` },
      ]);
    }
    return i;
  };
  const start = from ? index('baselineFrom', from) : 0;
  const end = to ? index('baselineTo', to) + 1 : months.length;
  if (start >= end) {
    throw badRequest('The baseline must end on or after its first month', [
      { path: 'baselineTo', message: 'must be on or after baselineFrom' },
    ]);
  }
  return { start, end };
}
