import { Inject, Injectable } from '@nestjs/common';
import type { Thresholds } from '@upstroke/contracts';
import { KNEX, type Db } from '../../db/knex';
import {
  monthlySeriesQuery,
  recordsQuery,
  type ScopedFilter,
  utsteinQuery,
} from './trends.queries';

export interface MonthRow {
  month: string;
  n: number;
  cf: number | null;
  cfN: number;
  etco2Doc: number;
  ge10: number | null;
  ge10N: number;
  shock: number | null;
  shockN: number;
  epi: number | null;
  epiN: number;
  preshock: number | null;
  preshockN: number;
  anyRosc: number;
  sustainedRosc: number;
}

export type UtsteinRow = Record<string, number | null>;

export interface RecordsPage {
  sort: string;
  order: 'asc' | 'desc';
  limit: number;
  offset: number;
}

/** SQL over `record_summaries` (never events or samples); no rules here. */
@Injectable()
export class TrendsRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  monthly(f: ScopedFilter): Promise<MonthRow[]> {
    return monthlySeriesQuery(this.db, f);
  }

  async utstein(f: ScopedFilter): Promise<UtsteinRow> {
    return (await utsteinQuery(this.db, f)) as UtsteinRow;
  }

  async records(f: ScopedFilter, page: RecordsPage) {
    const [{ total }] = await this.db
      .from(recordsQuery(this.db, f).as('x'))
      .count<{ total: number }[]>({ total: '*' });
    const items = await recordsQuery(this.db, f)
      .orderByRaw(`?? ${page.order} nulls last, rs.resuscitation_id`, [`rs.${page.sort}`])
      .limit(page.limit)
      .offset(page.offset);
    return { items: items as Record<string, unknown>[], total: Number(total) };
  }

  /** One keyset page of the export, oldest first, after the last row already sent. */
  exportPage(f: ScopedFilter, after: { arrestAt: Date; id: string } | null, size: number) {
    const q = recordsQuery(this.db, f)
      .orderBy([{ column: 'rs.arrestAt' }, { column: 'rs.resuscitationId' }])
      .limit(size);
    if (after) {
      q.whereRaw('(rs.arrest_at, rs.resuscitation_id) > (?, ?)', [after.arrestAt, after.id]);
    }
    return q as Promise<Record<string, unknown>[]>;
  }

  /** Each site's latest protocol profile thresholds (targets for the charts). */
  async latestThresholds(siteIds: string[]): Promise<Partial<Thresholds>[]> {
    const rows = await this.db('protocolProfiles')
      .distinctOn('siteId')
      .whereIn('siteId', siteIds)
      .orderBy([{ column: 'siteId' }, { column: 'version', order: 'desc' }])
      .select<{ thresholds: Partial<Thresholds> }[]>('siteId', 'thresholds');
    return rows.map((r) => r.thresholds);
  }
}
