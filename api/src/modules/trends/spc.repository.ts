import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';
import type { ScopedFilter } from './trends.queries';
import { groupCountsQuery, monthlyCountsQuery, sitesQuery, unitsQuery } from './spc.queries';

/** Counts of one group of records (a month, a unit or a site). */
export interface SpcCounts {
  n: number;
  roscX: number;
  etco2X: number;
  cfN: number;
  cfMetX: number;
  cfTargetMin: number;
  cfTargetMax: number;
}

export interface SpcMonthRow extends SpcCounts {
  month: string;
  /** Medians: absent when the query left them out. */
  cf?: number | null;
  shock?: number | null;
  shockN: number;
  epi?: number | null;
  epiN: number;
}

export interface SpcGroupRow extends SpcCounts {
  groupId: string | null;
}

export interface NamedGroup {
  id: string;
  name: string;
  siteName: string;
}

/** SQL over `record_summaries` for control charts and funnel plots; no rules here. */
@Injectable()
export class SpcRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  monthly(f: ScopedFilter, defaultTarget: number, withMedians: boolean): Promise<SpcMonthRow[]> {
    return monthlyCountsQuery(this.db, f, defaultTarget, withMedians);
  }

  groups(f: ScopedFilter, by: 'unit' | 'site', defaultTarget: number): Promise<SpcGroupRow[]> {
    return groupCountsQuery(this.db, f, by, defaultTarget);
  }

  units(siteIds: string[]): Promise<NamedGroup[]> {
    return unitsQuery(this.db, siteIds);
  }

  async sites(siteIds: string[]): Promise<NamedGroup[]> {
    const rows = (await sitesQuery(this.db, siteIds)) as { id: string; name: string }[];
    return rows.map((s) => ({ ...s, siteName: s.name }));
  }
}
