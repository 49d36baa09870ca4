import type { Knex } from 'knex';
import { filtered, type ScopedFilter } from './trends.queries';

const median = (col: string, where?: string) =>
  `percentile_cont(0.5) within group (order by ${col})${where ? ` filter (where ${where})` : ''}`;
const count = (where: string) => `(count(*) filter (where ${where}))::int`;

/**
 * Each site's compression-fraction target from its latest protocol profile, or the
 * guideline default when a site has none.
 */
function withTargets(db: Knex, f: ScopedFilter, defaultTarget: number): Knex.QueryBuilder {
  const targets = db('protocolProfiles')
    .distinctOn('siteId')
    .whereIn('siteId', f.siteIds)
    .orderBy([{ column: 'siteId' }, { column: 'version', order: 'desc' }])
    .select('siteId', db.raw(`(thresholds->>'compressionFractionTarget')::float8 as cf_target`));
  return filtered(db, f)
    .leftJoin(targets.as('t'), 't.siteId', 'rs.siteId')
    .select(db.raw('coalesce(max(t.cf_target), ?)::float8 as cf_target_max', [defaultTarget]))
    .select(db.raw('coalesce(min(t.cf_target), ?)::float8 as cf_target_min', [defaultTarget]))
    .select(
      db.raw('count(*)::int as n'),
      db.raw(`${count('rs.any_rosc')} as rosc_x`),
      db.raw(`${count('rs.etco2_documented')} as etco2_x`),
      db.raw('count(rs.compression_fraction)::int as cf_n'),
      db.raw(`${count('rs.compression_fraction >= coalesce(t.cf_target, ?)')} as cf_met_x`, [
        defaultTarget,
      ]),
    );
}

/**
 * Per calendar month (UTC): counts for the p-charts and medians for the XmR charts. Time to
 * first shock counts shockable first rhythms only, time to first epinephrine non-shockable
 * ones, as in the trends series.
 */
export function monthlyCountsQuery(
  db: Knex,
  f: ScopedFilter,
  defaultTarget: number,
  withMedians = true,
) {
  const q = withTargets(db, f, defaultTarget).select(
    db.raw(`to_char(date_trunc('month', rs.arrest_at at time zone 'UTC'), 'YYYY-MM') as month`),
    db.raw(`count(rs.time_to_first_shock_sec) filter (where rs.shockable)::int as shock_n`),
    db.raw(
      `count(rs.time_to_first_epinephrine_sec) filter (where rs.shockable = false)::int as epi_n`,
    ),
  );
  // Medians sort each month's rows: a p-chart does without them.
  if (withMedians) {
    q.select(
      db.raw(`${median('rs.compression_fraction')} as cf`),
      db.raw(`${median('rs.time_to_first_shock_sec', 'rs.shockable')} as shock`),
      db.raw(`${median('rs.time_to_first_epinephrine_sec', 'rs.shockable = false')} as epi`),
    );
  }
  return q.groupBy('month').orderBy('month');
}

/** Counts per unit (null: no unit recorded) or per site, over the whole filtered period. */
export function groupCountsQuery(
  db: Knex,
  f: ScopedFilter,
  by: 'unit' | 'site',
  defaultTarget: number,
) {
  const col = by === 'unit' ? 'rs.unitId' : 'rs.siteId';
  return withTargets(db, f, defaultTarget).select(`${col} as groupId`).groupBy(col);
}

/** Every unit of the given sites (a unit with no records still shows, with n = 0). */
export function unitsQuery(db: Knex, siteIds: string[]) {
  return db('units as u')
    .join('sites as s', 's.id', 'u.siteId')
    .whereIn('u.siteId', siteIds)
    .select('u.id', 'u.name', 's.name as siteName')
    .orderBy(['s.name', 'u.name']);
}

export function sitesQuery(db: Knex, siteIds: string[]) {
  return db('sites').whereIn('id', siteIds).select('id', 'name').orderBy('name');
}
