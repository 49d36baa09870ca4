import { Inject, Injectable } from '@nestjs/common';
import type { AuthUser } from '../../common/auth.decorators';
import type { AdminScope } from '../../db/admin-scope.sql';
import { KNEX, type Db } from '../../db/knex';

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
