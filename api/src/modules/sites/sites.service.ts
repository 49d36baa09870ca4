import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { changesOf } from '../../common/changes';
import {
  type CreateSite,
  defaultDisplayFormat,
  type List,
  type Site,
  thresholdDefaults,
  type UnitName,
  type UpdateSite,
} from '@upstroke/contracts';
import { type AuthUser, canSeeSite } from '../../common/auth.decorators';
import { conflict, notFound } from '../../common/errors';
import type { Db } from '../../db/knex';
import { AdminScopeService } from '../admin-scope/admin-scope.service';
import { AuditService } from '../audit/audit.service';
import { ProfilesService } from '../profiles/profiles.service';
import { AccountsService } from '../users/accounts.service';
import { SitesRepository } from './sites.repository';

const nameTaken = () => conflict('Another site already has this name');
const unitTaken = () => conflict('This site already has a unit with this name');

/** Sites and units, managed by the admins who belong to them. */
@Injectable()
export class SitesService {
  constructor(
    private readonly sites: SitesRepository,
    private readonly users: AccountsService,
    private readonly profiles: ProfilesService,
    private readonly audit: AuditService,
    private readonly scope: AdminScopeService,
  ) {}

  async list(admin: AuthUser): Promise<List<Site>> {
    const rows = await this.sites.listByIds(admin.siteIds);
    const ids = rows.map((r) => r.id);
    const [units, profiles] = await Promise.all([
      this.sites.unitsOf(ids),
      this.sites.latestProfiles(ids),
    ]);
    const items = rows.map((site) => {
      const profile = profiles.find((p) => p.siteId === site.id);
      return {
        ...site,
        units: units.filter((u) => u.siteId === site.id).map(({ id, name }) => ({ id, name })),
        profile: profile ? { id: profile.id, version: profile.version, name: profile.name } : null,
      };
    });
    return { items, total: items.length };
  }

  async get(admin: AuthUser, id: string): Promise<Site> {
    const site = (await this.list(admin)).items.find((s) => s.id === id);
    if (!site) throw notFound('Site');
    return site;
  }

  /**
   * A new site starts with guideline defaults as profile v1, its creator as a member, and
   * every organisation-wide admin as a member (so they stay organisation-wide).
   */
  async create(admin: AuthUser, body: CreateSite, deviceId?: string): Promise<Site> {
    if (await this.sites.findByName(body.name)) throw nameTaken();
    const id = randomUUID();
    const unitNames = [...new Map((body.units ?? []).map((n) => [n.toLowerCase(), n])).values()];
    await this.sites.inTransaction(async (trx) => {
      const organisationAdmins = await this.scope.organisationAdminIds(trx);
      await this.sites.insert(
        {
          id,
          name: body.name,
          etco2Unit: body.etco2Unit,
          paperSize: body.paperSize,
          locale: body.locale ?? defaultDisplayFormat.locale,
          timeZone: body.timeZone ?? defaultDisplayFormat.timeZone,
          clock: body.clock ?? defaultDisplayFormat.clock,
          mailDomains: body.mailDomains ?? [],
        },
        trx,
      );
      for (const name of unitNames) await this.sites.insertUnit(id, name, trx);
      for (const userId of new Set([admin.id, ...organisationAdmins]))
        await this.users.addSite(userId, id, trx);
      await this.record(
        admin,
        'site.create',
        id,
        { name: body.name, units: unitNames },
        deviceId,
        trx,
      );
      const withSite = { ...admin, siteIds: [...admin.siteIds, id] };
      const profile = { siteId: id, name: 'Guideline defaults', thresholds: thresholdDefaults };
      await this.profiles.saveVersion(withSite, profile, deviceId, trx);
    });
    return this.get({ ...admin, siteIds: [...admin.siteIds, id] }, id);
  }

  async update(admin: AuthUser, id: string, patch: UpdateSite, deviceId?: string): Promise<Site> {
    if (!canSeeSite(admin, id)) throw notFound('Site');
    if (patch.name) {
      const same = await this.sites.findByName(patch.name);
      if (same && same.id !== id) throw nameTaken();
    }
    const [before] = await this.sites.listByIds([id]);
    await this.sites.inTransaction(async (trx) => {
      await this.sites.update(id, patch, trx);
      const changes = before ? changesOf(before, patch) : {};
      await this.record(admin, 'site.update', id, { ...patch, changes }, deviceId, trx);
    });
    return this.get(admin, id);
  }

  async addUnit(admin: AuthUser, siteId: string, body: UnitName, deviceId?: string): Promise<Site> {
    if (!canSeeSite(admin, siteId)) throw notFound('Site');
    if (await this.sites.findUnitByName(siteId, body.name)) throw unitTaken();
    await this.sites.inTransaction(async (trx) => {
      const unitId = await this.sites.insertUnit(siteId, body.name, trx);
      await this.record(admin, 'unit.create', siteId, { unitId, name: body.name }, deviceId, trx);
    });
    return this.get(admin, siteId);
  }

  /** Renaming keeps the unit's id, so records made in it stay linked. */
  async renameUnit(
    admin: AuthUser,
    siteId: string,
    unitId: string,
    body: UnitName,
    deviceId?: string,
  ): Promise<Site> {
    if (!canSeeSite(admin, siteId) || !(await this.sites.findUnit(siteId, unitId)))
      throw notFound('Unit');
    const same = await this.sites.findUnitByName(siteId, body.name);
    if (same && same.id !== unitId) throw unitTaken();
    await this.sites.inTransaction(async (trx) => {
      await this.sites.renameUnit(unitId, body.name, trx);
      await this.record(admin, 'unit.rename', siteId, { unitId, name: body.name }, deviceId, trx);
    });
    return this.get(admin, siteId);
  }

  private record(
    admin: AuthUser,
    action: string,
    siteId: string,
    details: Record<string, unknown>,
    deviceId: string | undefined,
    trx: Db,
  ): Promise<void> {
    return this.audit.insert(
      { userId: admin.id, action, entity: 'site', entityId: siteId, deviceId, details },
      trx,
    );
  }
}
