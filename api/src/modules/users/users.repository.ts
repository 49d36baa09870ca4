import { Inject, Injectable } from '@nestjs/common';
import type { Role } from '@upstroke/contracts';
import { KNEX, type Db } from '../../db/knex';
import { managedUserIds } from '../../db/admin-scope.sql';

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

export type UserChanges = Partial<Pick<UserRow, 'name' | 'role' | 'active' | 'passwordHash'>>;

@Injectable()
export class UsersRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /** Runs `work` in one transaction; repositories take the `trx` it is given. */
  inTransaction<T>(work: (trx: Db) => Promise<T>): Promise<T> {
    return this.db.transaction((trx) => work(trx));
  }

  async findByEmail(email: string, trx?: Db): Promise<UserRow | undefined> {
    return (trx ?? this.db)<UserRow>('users').whereRaw('lower(email) = lower(?)', [email]).first();
  }

  /** With `lock` (inside a transaction) the user's row stays locked until it ends. */
  async findWithSites(id: string, trx?: Db, lock = false): Promise<UserWithSites | undefined> {
    const db = trx ?? this.db;
    const q = db<UserRow>('users').where({ id });
    const user = await (lock ? q.forUpdate() : q).first();
    if (!user) return undefined;
    const sites = await db('userSites')
      .where({ userId: id })
      .select<{ siteId: string }[]>('siteId');
    return { ...user, siteIds: sites.map((s) => s.siteId) };
  }

  /** Every user, or with `managedBy` only those whose sites all lie within those sites. */
  async listWithSites(managedBy?: string[]): Promise<UserWithSites[]> {
    const q = this.db<UserRow>('users');
    if (managedBy) q.whereIn('id', managedUserIds(this.db, managedBy));
    const users = await q.orderBy([
      { column: 'active', order: 'desc' },
      { column: 'name', order: 'asc' },
    ]);
    const links = await this.db('userSites').select<{ userId: string; siteId: string }[]>(
      'userId',
      'siteId',
    );
    return users.map((u) => ({
      ...u,
      siteIds: links.filter((l) => l.userId === u.id).map((l) => l.siteId),
    }));
  }

  async insert(row: Pick<UserRow, 'id' | 'email' | 'name' | 'role'>, trx?: Db): Promise<void> {
    await (trx ?? this.db)('users').insert({ ...row, active: true });
  }

  /** Applies the changes; `revokeTokens` makes every token issued before stop working. */
  async update(id: string, changes: UserChanges, revokeTokens: boolean, trx?: Db): Promise<void> {
    const db = trx ?? this.db;
    const q = db('users').where({ id });
    if (revokeTokens) await q.clone().increment('tokenVersion', 1);
    if (Object.keys(changes).length > 0) await q.clone().update(changes);
  }

  async replaceSites(userId: string, siteIds: string[], trx?: Db): Promise<void> {
    const db = trx ?? this.db;
    await db('userSites').where({ userId }).delete();
    if (siteIds.length > 0)
      await db('userSites').insert(siteIds.map((siteId) => ({ userId, siteId })));
  }

  async addSite(userId: string, siteId: string, trx?: Db): Promise<void> {
    await (trx ?? this.db)('userSites')
      .insert({ userId, siteId })
      .onConflict(['userId', 'siteId'])
      .ignore();
  }

  /** Active admins other than `exceptId`, with their rows locked until the transaction ends. */
  async lockOtherActiveAdmins(exceptId: string, trx: Db): Promise<number> {
    const rows = await trx('users')
      .where({ role: 'admin', active: true })
      .whereNot({ id: exceptId })
      .forUpdate()
      .select('id');
    return rows.length;
  }
}
