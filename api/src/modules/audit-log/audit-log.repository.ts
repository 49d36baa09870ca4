import { Inject, Injectable } from '@nestjs/common';
import type { AuditQuery } from '@upstroke/contracts';
import type { Knex } from 'knex';
import { KNEX, type Db } from '../../db/knex';
import type { AdminScope } from '../../db/admin-scope.sql';

export interface AuditRow {
  id: number;
  at: Date;
  userId: string | null;
  userEmail: string | null;
  userName: string | null;
  action: string;
  entity: string;
  entityId: string | null;
  resuscitationId: string | null;
  deviceId: string | null;
  details: Record<string, unknown>;
}

export type AuditFilter = Omit<AuditQuery, 'limit' | 'offset'>;

/** Reads the audit trail with its filters (writing stays with AuditRepository). */
@Injectable()
export class AuditLogRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /**
   * What concerns a scoped admin's sites: entries about records of those sites, about those
   * sites and their protocol profiles, and about users they manage.
   */
  private concerns(q: Knex.QueryBuilder, sites: string[]): void {
    q.where((w) =>
      w
        .whereIn(
          'a.resuscitationId',
          this.db('resuscitations').whereIn('siteId', sites).select('id'),
        )
        .orWhereRaw(`a.entity = 'site' and a.entity_id = any(?::text[])`, [sites])
        // Discards name their site (the record may never have reached the server).
        .orWhereRaw(`a.action = 'discard-refused' and a.details->>'siteId' = any(?::text[])`, [
          sites,
        ])
        .orWhereRaw(`a.entity = 'protocol-profile' and a.details->>'siteId' = any(?::text[])`, [
          sites,
        ])
        .orWhereRaw(
          `a.entity = 'user' and a.entity_id in (select user_id::text from user_sites
             group by user_id having bool_and(site_id = any(?::uuid[])))`,
          [sites],
        ),
    );
  }

  private filtered(filter: AuditFilter, scope: AdminScope): Knex.QueryBuilder {
    const q = this.db('auditLog as a').leftJoin('users as u', 'u.id', 'a.userId');
    if (!scope.organisationWide) this.concerns(q, scope.siteIds);
    if (filter.userId) q.where('a.userId', filter.userId);
    if (filter.action) q.where('a.action', filter.action);
    if (filter.entity) q.where('a.entity', filter.entity);
    if (filter.resuscitationId) q.where('a.resuscitationId', filter.resuscitationId);
    if (filter.from) q.where('a.at', '>=', filter.from);
    if (filter.to) q.where('a.at', '<', filter.to);
    return q;
  }

  async list(
    filter: AuditFilter,
    limit: number,
    offset: number,
    scope: AdminScope,
  ): Promise<{ items: AuditRow[]; total: number }> {
    const q = this.filtered(filter, scope);
    const [{ count }] = await q.clone().count<{ count: number }[]>({ count: '*' });
    const items = await q
      .orderBy([
        { column: 'a.at', order: 'desc' },
        { column: 'a.id', order: 'desc' },
      ])
      .limit(limit)
      .offset(offset)
      .select<AuditRow[]>(
        'a.id',
        'a.at',
        'a.userId',
        'u.email as userEmail',
        'u.name as userName',
        'a.action',
        'a.entity',
        'a.entityId',
        'a.resuscitationId',
        'a.deviceId',
        'a.details',
      );
    return { items, total: Number(count) };
  }

  /** Distinct actions and entities recorded so far, for the viewer's filter menus. */
  async vocabulary(): Promise<{ actions: string[]; entities: string[] }> {
    const actions = await this.db('auditLog')
      .distinct<{ action: string }[]>('action')
      .orderBy('action');
    const entities = await this.db('auditLog')
      .distinct<{ entity: string }[]>('entity')
      .orderBy('entity');
    return { actions: actions.map((r) => r.action), entities: entities.map((r) => r.entity) };
  }
}
