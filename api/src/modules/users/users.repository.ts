import { Inject, Injectable } from '@nestjs/common';
import type { Role } from '@upstroke/contracts';
import { KNEX, type Db } from '../../db/knex';

export interface UserRow {
  id: string;
  email: string;
  name: string;
  role: Role;
  passwordHash: string | null;
  active: boolean;
  tokenVersion: number;
  createdAt: Date;
}

export interface UserWithSites extends UserRow {
  siteIds: string[];
}

@Injectable()
export class UsersRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async findByEmail(email: string): Promise<UserRow | undefined> {
    return this.db<UserRow>('users').whereRaw('lower(email) = lower(?)', [email]).first();
  }

  async findWithSites(id: string): Promise<UserWithSites | undefined> {
    const user = await this.db<UserRow>('users').where({ id }).first();
    if (!user) return undefined;
    const sites = await this.db('userSites')
      .where({ userId: id })
      .select<{ siteId: string }[]>('siteId');
    return { ...user, siteIds: sites.map((s) => s.siteId) };
  }
}
