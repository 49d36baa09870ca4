import { Inject, Injectable } from '@nestjs/common';
import type { AuditQuery } from '@upstroke/contracts';
import type { Knex } from 'knex';
import { KNEX, type Db } from '../../db/knex';

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

  private filtered(filter: AuditFilter): Knex.QueryBuilder {
    const q = this.db('auditLog as a').leftJoin('users as u', 'u.id', 'a.userId');
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
  ): Promise<{ items: AuditRow[]; total: number }> {
    const q = this.filtered(filter);
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
