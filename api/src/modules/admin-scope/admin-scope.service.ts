import { Injectable } from '@nestjs/common';
import type { AuthUser } from '../../common/auth.decorators';
import type { AdminScope } from '../../db/admin-scope.sql';
import type { Db } from '../../db/knex';
import { AdminScopeRepository } from './admin-scope.repository';

export type { AdminScope };

/** What an admin may administer, for every module that lists or changes what admins manage. */
@Injectable()
export class AdminScopeService {
  constructor(private readonly repo: AdminScopeRepository) {}

  scopeOf(admin: AuthUser, trx?: Db): Promise<AdminScope> {
    return this.repo.scopeOf(admin, trx);
  }

  /** Active admins who belong to every site, read before a new site is added. */
  organisationAdminIds(trx: Db): Promise<string[]> {
    return this.repo.organisationAdminIds(trx);
  }
}

/** Whether the admin may change, deactivate or reset a user who belongs to `userSiteIds`. */
export function managesUser(scope: AdminScope, userSiteIds: string[]): boolean {
  if (scope.organisationWide) return true;
  return userSiteIds.length > 0 && userSiteIds.every((s) => scope.siteIds.includes(s));
}
