import { Injectable } from '@nestjs/common';
import type { Db } from '../../db/knex';
import { type UserRow, type UserWithSites, UsersRepository } from './users.repository';

export type { UserRow, UserWithSites };

/** User accounts as other modules need them: sign-in and sessions, a new site's admins. */
@Injectable()
export class AccountsService {
  constructor(private readonly users: UsersRepository) {}

  findByEmail(email: string, trx?: Db): Promise<UserRow | undefined> {
    return this.users.findByEmail(email, trx);
  }

  findWithSites(id: string, trx?: Db): Promise<UserWithSites | undefined> {
    return this.users.findWithSites(id, trx);
  }

  addSite(userId: string, siteId: string, trx?: Db): Promise<void> {
    return this.users.addSite(userId, siteId, trx);
  }
}
