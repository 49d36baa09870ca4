import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../../common/auth.decorators';
import { KNEX, type Db } from '../../db/knex';

/**
 * What an admin may administer. An admin is organisation-wide when they belong to every
 * site (a new site is added to every such admin, see `organisationAdminIds`); otherwise
 * they are scoped to their sites and manage only users whose sites all lie within them.
 */
export interface AdminScope {
  organisationWide: boolean;
  siteIds: string[];
}

/**
 * Ids of users the scoped admin manages: users with at least one site, all of them among
 * `siteIds`. A subquery for `whereIn`, so callers filter in SQL.
 */
export function managedUserIds(db: Db, siteIds: string[]): Knex.QueryBuilder {
  return db('userSites')
    .select('userId')
    .groupBy('userId')
    .havingRaw('bool_and(site_id = any(?::uuid[]))', [siteIds]);
}

/** SQL: every address in the array `column` belongs to a user managed within `?` sites. */
export const onlyManagedRecipients = (column: string) =>
  `cardinality(${column}) > 0 and not exists (
     select 1 from unnest(${column}) as r(address)
      where lower(r.address) not in (
        select lower(u.email) from users u join user_sites us on us.user_id = u.id
         group by u.id having bool_and(us.site_id = any(?::uuid[]))))`;

/**
 * Narrows a `mail_outbox` query to a scoped admin's mail: about records of their sites, or
 * addressed only to users they manage.
 */
export function scopeOutbox(db: Db, q: Knex.QueryBuilder, scope: AdminScope): Knex.QueryBuilder {
  if (scope.organisationWide) return q;
  return q.where((w) =>
    w
      .whereIn(
        'resuscitationId',
        db('resuscitations').whereIn('siteId', scope.siteIds).select('id'),
      )
      .orWhereRaw(onlyManagedRecipients('"to"'), [scope.siteIds]),
  );
}

@Injectable()
export class AdminScopeRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async scopeOf(admin: AuthUser, trx?: Db): Promise<AdminScope> {
    const outside = await (trx ?? this.db)('sites')
      .whereRaw('not (id = any(?::uuid[]))', [admin.siteIds])
      .first('id');
    return { organisationWide: admin.role === 'admin' && !outside, siteIds: admin.siteIds };
  }

  /** Active admins who belong to every site, read before a new site is added. */
  async organisationAdminIds(trx: Db): Promise<string[]> {
    const rows = await trx('users as u')
      .where({ 'u.role': 'admin', 'u.active': true })
      .whereNotExists(
        trx('sites as s')
          .select(trx.raw('1'))
          .whereNotExists(
            trx('userSites as us')
              .select(trx.raw('1'))
              .whereRaw('us.user_id = u.id and us.site_id = s.id'),
          ),
      )
      .select<{ id: string }[]>('u.id');
    return rows.map((r) => r.id);
  }
}

/** Whether the admin may change, deactivate or reset a user who belongs to `userSiteIds`. */
export function managesUser(scope: AdminScope, userSiteIds: string[]): boolean {
  if (scope.organisationWide) return true;
  return userSiteIds.length > 0 && userSiteIds.every((s) => scope.siteIds.includes(s));
}
