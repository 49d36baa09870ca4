import type { Knex } from 'knex';

/** Filters after access checks: the sites the caller may see, then what they asked for. */
export interface ScopedFilter {
  siteIds: string[];
  unitId?: string;
  from?: string;
  to?: string;
  firstRhythm?: 'shockable' | 'non-shockable';
  outcome?: string;
}

/** `record_summaries as rs`, filtered. Every trends figure starts from this. */
export function filtered(db: Knex, f: ScopedFilter): Knex.QueryBuilder {
  const q = db('recordSummaries as rs').whereIn('rs.siteId', f.siteIds);
  if (f.unitId) q.where('rs.unitId', f.unitId);
  if (f.from) q.where('rs.arrestAt', '>=', f.from);
  if (f.to) q.where('rs.arrestAt', '<', f.to);
  if (f.firstRhythm) q.where('rs.shockable', f.firstRhythm === 'shockable');
  if (f.outcome) q.where('rs.outcome', f.outcome);
  return q;
}

const median = (col: string, where?: string) =>
  `percentile_cont(0.5) within group (order by ${col})${where ? ` filter (where ${where})` : ''}`;
const counted = (col: string, where?: string) =>
  `count(${col})${where ? ` filter (where ${where})` : ''}`;

/**
 * Monthly series (calendar months in UTC). Medians are `percentile_cont(0.5)` over records
 * with a value; rates are the share of all records in the month; pre-shock figures count
 * only records with at least one shock.
 */
export function monthlySeriesQuery(db: Knex, f: ScopedFilter): Knex.QueryBuilder {
  const shocked = 'time_to_first_shock_sec is not null';
  return filtered(db, f)
    .select(
      db.raw(`to_char(date_trunc('month', rs.arrest_at at time zone 'UTC'), 'YYYY-MM') as month`),
      db.raw('count(*)::int as n'),
      db.raw(`${median('compression_fraction')} as cf`),
      db.raw(`${counted('compression_fraction')}::int as cf_n`),
      db.raw('avg(etco2_documented::int)::float8 as etco2_doc'),
      db.raw(`${median('fraction_ge10')} as ge10`),
      db.raw(`${counted('fraction_ge10')}::int as ge10_n`),
      db.raw(`${median('time_to_first_shock_sec', 'shockable')} as shock`),
      db.raw(`${counted('time_to_first_shock_sec', 'shockable')}::int as shock_n`),
      db.raw(`${median('time_to_first_epinephrine_sec', 'shockable = false')} as epi`),
      db.raw(`${counted('time_to_first_epinephrine_sec', 'shockable = false')}::int as epi_n`),
      db.raw(`(sum(preshock_long_count) filter (where ${shocked}))::float8
        / nullif(count(*) filter (where ${shocked}), 0) as preshock`),
      db.raw(`(count(*) filter (where ${shocked}))::int as preshock_n`),
      db.raw('avg(any_rosc::int)::float8 as any_rosc'),
      db.raw('avg(sustained_rosc::int)::float8 as sustained_rosc'),
    )
    .groupByRaw('1')
    .orderByRaw('1');
}

/** Utstein-style counts for a period: one pass over the filtered rows. */
export function utsteinQuery(db: Knex, f: ScopedFilter): Knex.QueryBuilder {
  const n = (where: string) => db.raw(`(count(*) filter (where ${where}))::int`);
  return filtered(db, f).first({
    total: db.raw('count(*)::int'),
    witnessedYes: n('witnessed'),
    witnessedNo: n('witnessed = false'),
    monitoredYes: n('monitored'),
    monitoredNo: n('monitored = false'),
    shockable: n('shockable'),
    nonShockable: n('shockable = false'),
    etco2Documented: n('etco2_documented'),
    anyRosc: n('any_rosc'),
    sustainedRosc: n('sustained_rosc'),
    outcomeRoscSustained: n(`outcome = 'rosc-sustained'`),
    outcomeRoscNotSustained: n(`outcome = 'rosc-not-sustained'`),
    outcomeDied: n(`outcome = 'died'`),
    outcomeTransferred: n(`outcome = 'transferred'`),
    timeToCpr: db.raw(median('time_to_first_compression_sec')),
    timeToCprN: db.raw(`${counted('time_to_first_compression_sec')}::int`),
    timeToShock: db.raw(median('time_to_first_shock_sec', 'shockable')),
    timeToShockN: db.raw(`${counted('time_to_first_shock_sec', 'shockable')}::int`),
    timeToEpi: db.raw(median('time_to_first_epinephrine_sec', 'shockable = false')),
    timeToEpiN: db.raw(`${counted('time_to_first_epinephrine_sec', 'shockable = false')}::int`),
    compressionFraction: db.raw(median('compression_fraction')),
    compressionFractionN: db.raw(`${counted('compression_fraction')}::int`),
    medianEtco2: db.raw(median('median_etco2')),
    medianEtco2N: db.raw(`${counted('median_etco2')}::int`),
  });
}

export const recordColumns = [
  'rs.resuscitationId',
  'rs.siteId',
  'rs.unitId',
  'rs.arrestAt',
  'rs.ageGroup',
  'rs.firstRhythm',
  'rs.shockable',
  'rs.witnessed',
  'rs.monitored',
  'rs.outcome',
  'rs.endReason',
  'rs.anyRosc',
  'rs.sustainedRosc',
  'rs.compressionFraction',
  'rs.longestPauseSec',
  'rs.preshockLongCount',
  'rs.timeToFirstCompressionSec',
  'rs.timeToFirstShockSec',
  'rs.timeToFirstEpinephrineSec',
  'rs.etco2Documented',
  'rs.medianEtco2',
  'rs.fractionGe10',
  'rs.fractionGe20',
  'rs.findingCounts',
  'rs.durationSec',
  'rs.profileVersion',
];

/** The records table: summary columns, site and unit names, the latest review status. */
export function recordsQuery(db: Knex, f: ScopedFilter): Knex.QueryBuilder {
  return filtered(db, f)
    .join('sites as s', 's.id', 'rs.siteId')
    .leftJoin('units as u', 'u.id', 'rs.unitId')
    .select(...recordColumns, 's.name as siteName', 'u.name as unitName')
    .select(
      db.raw(`(select rr.status from record_reviews rr where rr.resuscitation_id = rs.resuscitation_id
        order by rr.id desc limit 1) as review_status`),
    );
}
