import { Inject, Injectable } from '@nestjs/common';
import type { DisplayFormat, ReviewStatusCounts } from '@upstroke/contracts';
import { KNEX, type Db } from '../../db/knex';
import { filtered, type ScopedFilter } from './trends.queries';

const count = (where: string) => `(count(*) filter (where ${where}))::int`;

export interface SiteRow {
  id: string;
  name: string;
  display: DisplayFormat;
  paperSize: 'A4' | 'Letter';
}

interface SiteColumns {
  id: string;
  name: string;
  locale: string;
  timeZone: string;
  clock: string;
  paperSize: 'A4' | 'Letter';
}

/** The monthly report's own figures: the review queue and the names in its heading. */
@Injectable()
export class CommitteeReportRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /**
   * Signed records of the period (the trends filters) by their latest review, and the
   * records of the same sites, unit and period still in draft.
   */
  async reviewCounts(f: ScopedFilter): Promise<ReviewStatusCounts> {
    const signed = filtered(this.db, f)
      .select(this.db.raw('count(*)::int as signed'))
      .select(this.db.raw(`${count(`coalesce(lr.status, 'pending') = 'pending'`)} as awaiting`))
      .select(this.db.raw(`${count(`lr.status = 'needs-follow-up'`)} as needs_follow_up`))
      .select(this.db.raw(`${count(`lr.status = 'reviewed'`)} as reviewed`))
      .joinRaw(
        `left join lateral (select rr.status from record_reviews rr
          where rr.resuscitation_id = rs.resuscitation_id order by rr.id desc limit 1) lr on true`,
      );
    const drafts = this.db('resuscitations as r')
      .whereIn('r.siteId', f.siteIds)
      .whereNot('r.status', 'signed')
      .count<{ drafts: string }[]>({ drafts: '*' });
    if (f.unitId) drafts.where('r.unitId', f.unitId);
    if (f.from) drafts.where('r.arrestAt', '>=', f.from);
    if (f.to) drafts.where('r.arrestAt', '<', f.to);
    const [[row], [d]] = await Promise.all([signed, drafts]);
    const r = row as Omit<ReviewStatusCounts, 'drafts'>;
    return { ...r, drafts: Number(d?.drafts ?? 0) };
  }

  async sites(siteIds: string[]): Promise<SiteRow[]> {
    const rows = await this.db('sites')
      .whereIn('id', siteIds)
      .orderBy('name')
      .select<SiteColumns[]>('id', 'name', 'locale', 'timeZone', 'clock', 'paperSize');
    return rows.map(({ locale, timeZone, clock, ...s }) => ({
      ...s,
      display: { locale, timeZone, clock } as DisplayFormat,
    }));
  }

  async unitName(unitId: string): Promise<string | null> {
    const row = await this.db('units').where('id', unitId).first<{ name: string }>('name');
    return row?.name ?? null;
  }
}
