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
        `select r.id as resuscitation_id, r.site_id, s.name as site_name, u.name as unit_name,
          r.arrest_at, r.signed_at, r.first_rhythm, r.outcome, lr.status,
          lr.comment as last_comment, lr.at as last_review_at
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
