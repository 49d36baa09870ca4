import { Inject, Injectable } from '@nestjs/common';
import type { ReviewQueueQuery, ReviewStatus } from '@upstroke/contracts';
import { KNEX, type Db } from '../../db/knex';

export interface ReviewRow {
  id: number;
  resuscitationId: string;
  status: ReviewStatus;
  comment: string;
  reviewerId: string;
  reviewerName: string;
  at: Date;
}

const latest = `left join lateral (
    select rr.status, rr.comment, rr.at from record_reviews rr
    where rr.resuscitation_id = r.id order by rr.id desc limit 1
  ) lr on true`;

const statusWhere: Record<ReviewQueueQuery['status'], string> = {
  awaiting: `(lr.status is null or lr.status = 'pending')`,
  'needs-follow-up': `lr.status = 'needs-follow-up'`,
  reviewed: `lr.status = 'reviewed'`,
  all: 'true',
};

/** Review history (append-only) and the queue of signed records; no rules here. */
@Injectable()
export class ReviewsRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /** Signed records of these sites by their latest review status, oldest arrest first. */
  async queue(siteIds: string[], q: Omit<ReviewQueueQuery, 'siteId'>) {
    const from = `from resuscitations r join sites s on s.id = r.site_id
      left join units u on u.id = r.unit_id ${latest}
      where r.status = 'signed' and r.site_id = any(?) and ${statusWhere[q.status]}`;
    const [{ rows: items }, { rows: count }] = await Promise.all([
      this.db.raw<{ rows: Record<string, unknown>[] }>(
        // Raw rows are not renamed by the knex wrapper: camelCase aliases here.
        `select r.id as "resuscitationId", r.site_id as "siteId", s.name as "siteName",
          u.name as "unitName", r.arrest_at as "arrestAt", r.signed_at as "signedAt",
          r.first_rhythm as "firstRhythm", r.outcome, lr.status,
          lr.comment as "lastComment", lr.at as "lastReviewAt"
        ${from} order by r.arrest_at, r.id limit ? offset ?`,
        [siteIds, q.limit, q.offset],
      ),
      this.db.raw<{ rows: { total: number }[] }>(`select count(*)::int as total ${from}`, [
        siteIds,
      ]),
    ]);
    return { items, total: count[0].total };
  }

  history(resuscitationId: string): Promise<ReviewRow[]> {
    return this.db('recordReviews as rr')
      .join('users as u', 'u.id', 'rr.reviewerId')
      .where('rr.resuscitationId', resuscitationId)
      .orderBy('rr.id', 'desc')
      .select<ReviewRow[]>('rr.*', 'u.name as reviewerName');
  }

  async insert(row: {
    resuscitationId: string;
    status: ReviewStatus;
    comment: string;
    reviewerId: string;
  }): Promise<void> {
    await this.db('recordReviews').insert(row);
  }
}
