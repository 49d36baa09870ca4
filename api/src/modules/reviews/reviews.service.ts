import { Injectable } from '@nestjs/common';
import type { Review, ReviewInput, ReviewQueueQuery } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { conflict, forbidden } from '../../common/errors';
import { AuditService } from '../audit/audit.service';
import { ResuscitationAccess } from '../resuscitations/resuscitation-access.service';
import { type ReviewRow, ReviewsRepository } from './reviews.repository';

const iso = (d: unknown) => (d instanceof Date ? d.toISOString() : (d ?? null));

function toReview(r: ReviewRow): Review {
  return {
    id: Number(r.id),
    resuscitationId: r.resuscitationId,
    status: r.status,
    comment: r.comment,
    reviewerId: r.reviewerId,
    reviewerName: r.reviewerName,
    at: r.at.toISOString(),
  };
}

/** The committee's review queue: status and comment per signed record, history kept. */
@Injectable()
export class ReviewsService {
  constructor(
    private readonly repo: ReviewsRepository,
    private readonly access: ResuscitationAccess,
    private readonly audit: AuditService,
  ) {}

  async queue(user: AuthUser, q: ReviewQueueQuery) {
    if (q.siteId && !user.siteIds.includes(q.siteId)) throw forbidden('You cannot see this site');
    const { siteId, ...rest } = q;
    const { items, total } = await this.repo.queue(siteId ? [siteId] : user.siteIds, rest);
    return {
      items: items.map((i) => ({
        ...i,
        arrestAt: iso(i.arrestAt),
        signedAt: iso(i.signedAt),
        lastReviewAt: iso(i.lastReviewAt),
      })),
      total,
    };
  }

  async history(user: AuthUser, resuscitationId: string): Promise<{ items: Review[] }> {
    await this.access.readable(user, resuscitationId);
    return { items: (await this.repo.history(resuscitationId)).map(toReview) };
  }

  /** A new status is a new history row; only signed records are reviewed. */
  async review(user: AuthUser, resuscitationId: string, input: ReviewInput) {
    const record = await this.access.readable(user, resuscitationId);
    if (record.status !== 'signed') throw conflict('Only signed records can be reviewed');
    await this.repo.insert({ resuscitationId, reviewerId: user.id, ...input });
    await this.audit.insert({
      userId: user.id,
      action: 'review',
      entity: 'resuscitation',
      entityId: resuscitationId,
      resuscitationId,
      details: { status: input.status },
    });
    return this.history(user, resuscitationId);
  }
}
