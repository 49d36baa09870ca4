import type { Knex } from 'knex';
import type { Db } from './knex';

// SQL fragments shared by the repositories that list what a scoped admin may see (users,
// mail, the audit trail); the scope itself is resolved by the admin-scope module.

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
