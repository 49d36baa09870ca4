import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import type { AdminUser, InviteUser, List, UpdateUser } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { changesOf } from '../../common/changes';
import { conflict, forbidden, notFound } from '../../common/errors';
import type { Db } from '../../db/knex';
import { AdminScopeService, managesUser } from '../admin-scope/admin-scope.service';
import { AuditService } from '../audit/audit.service';
import { InvitationsService } from './invitations.service';
import { type UserChanges, type UserWithSites, UsersRepository } from './users.repository';

export function toAdminUser(u: UserWithSites): AdminUser {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    role: u.role,
    siteIds: u.siteIds,
    active: u.active,
    passwordSet: u.passwordHash !== null,
    createdAt: u.createdAt.toISOString(),
  };
}

const lastAdmin = () =>
  conflict('This is the last active admin: make another user admin before changing this one');

/** Admins give access only to the sites they manage themselves. */
function assertManagesSites(admin: AuthUser, siteIds: string[]): void {
  const outside = siteIds.filter((s) => !admin.siteIds.includes(s));
  if (outside.length > 0) throw forbidden('You can give access only to sites you manage');
}

@Injectable()
export class UsersService {
  constructor(
    private readonly users: UsersRepository,
    private readonly invitations: InvitationsService,
    private readonly audit: AuditService,
    private readonly scope: AdminScopeService,
  ) {}

  /** The user, locked for this transaction, if this admin manages them (else not found). */
  private async managedUser(admin: AuthUser, id: string, trx: Db): Promise<UserWithSites> {
    const user = await this.users.findWithSites(id, trx, true);
    const scope = await this.scope.scopeOf(admin, trx);
    // Someone else's user is as invisible here as in the list.
    if (!user || !managesUser(scope, user.siteIds)) throw notFound('User');
    return user;
  }

  async list(admin: AuthUser): Promise<List<AdminUser>> {
    const scope = await this.scope.scopeOf(admin);
    const users = await this.users.listWithSites(
      scope.organisationWide ? undefined : scope.siteIds,
    );
    return { items: users.map(toAdminUser), total: users.length };
  }

  async invite(admin: AuthUser, body: InviteUser, deviceId?: string): Promise<AdminUser> {
    assertManagesSites(admin, body.siteIds);
    if (await this.users.findByEmail(body.email))
      throw conflict('A user with this e-mail address already exists');
    const id = randomUUID();
    await this.users
      .inTransaction(async (trx) => {
        const user = { id, email: body.email.trim(), name: body.name, role: body.role };
        await this.users.insert(user, trx);
        await this.users.replaceSites(id, body.siteIds, trx);
        await this.record(
          admin,
          'user.invite',
          id,
          { role: body.role, siteIds: body.siteIds },
          deviceId,
          trx,
        );
        await this.invitations.issue(user, 'invite', admin.id, trx);
      })
      .catch((error: unknown) => {
        // Two admins inviting the same address at once: the unique index decides.
        if ((error as { code?: string }).code === '23505')
          throw conflict('A user with this e-mail address already exists');
        throw error;
      });
    return toAdminUser((await this.users.findWithSites(id)) as UserWithSites);
  }

  async update(
    admin: AuthUser,
    id: string,
    patch: UpdateUser,
    deviceId?: string,
  ): Promise<AdminUser> {
    if (patch.siteIds) assertManagesSites(admin, patch.siteIds);
    await this.users.inTransaction(async (trx) => {
      const user = await this.managedUser(admin, id, trx);
      const losesAdmin =
        user.role === 'admin' &&
        user.active &&
        ((patch.role !== undefined && patch.role !== 'admin') || patch.active === false);
      if (losesAdmin && (await this.users.lockOtherActiveAdmins(id, trx)) === 0) throw lastAdmin();
      const changes: UserChanges = {};
      if (patch.name !== undefined && patch.name !== user.name) changes.name = patch.name;
      if (patch.role !== undefined && patch.role !== user.role) changes.role = patch.role;
      if (patch.active !== undefined && patch.active !== user.active) changes.active = patch.active;
      // A new role or a deactivation must not ride on tokens issued before it.
      const revoke = changes.role !== undefined || changes.active === false;
      await this.users.update(id, changes, revoke, trx);
      // A managed user has no site outside this admin's, so the new list replaces the old.
      if (patch.siteIds) await this.users.replaceSites(id, [...new Set(patch.siteIds)], trx);
      await this.record(
        admin,
        'user.update',
        id,
        {
          ...changes,
          siteIds: patch.siteIds,
          changes: changesOf(user, { ...changes, siteIds: patch.siteIds }),
        },
        deviceId,
        trx,
      );
    });
    return toAdminUser((await this.users.findWithSites(id)) as UserWithSites);
  }

  /** Clears the password, signs the user out everywhere and sends a new one-time link. */
  async resetPassword(admin: AuthUser, id: string, deviceId?: string): Promise<AdminUser> {
    await this.users.inTransaction(async (trx) => {
      const user = await this.managedUser(admin, id, trx);
      if (!user.active) throw conflict('This user is deactivated: reactivate them first');
      await this.users.update(id, { passwordHash: null }, true, trx);
      await this.record(admin, 'user.reset-password', id, {}, deviceId, trx);
      await this.invitations.issue(user, 'reset', admin.id, trx);
    });
    return toAdminUser((await this.users.findWithSites(id)) as UserWithSites);
  }

  private record(
    admin: AuthUser,
    action: string,
    userId: string,
    details: Record<string, unknown>,
    deviceId: string | undefined,
    trx: Db,
  ): Promise<void> {
    return this.audit.insert(
      { userId: admin.id, action, entity: 'user', entityId: userId, deviceId, details },
      trx,
    );
  }
}
