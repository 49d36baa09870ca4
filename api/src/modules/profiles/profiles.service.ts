import { Injectable } from '@nestjs/common';
import {
  type CreateProfileVersion,
  type List,
  localSourcesOf,
  type ProtocolProfile,
  type Thresholds,
  thresholdDefaults,
  thresholdKeys,
} from '@upstroke/contracts';
import { type AuthUser, canSeeSite } from '../../common/auth.decorators';
import { forbidden, notFound } from '../../common/errors';
import type { Db } from '../../db/knex';
import { AuditService } from '../audit/audit.service';
import { type ProfileRow, ProfilesRepository } from './profiles.repository';

export function toProfile(row: ProfileRow): ProtocolProfile {
  return {
    id: row.id,
    siteId: row.siteId,
    version: row.version,
    name: row.name,
    // Versions saved before a threshold existed read it at its default.
    thresholds: { ...thresholdDefaults, ...row.thresholds },
    localSources: row.localSources ?? {},
    createdAt: row.createdAt.toISOString(),
    createdBy: row.createdBy,
  };
}

@Injectable()
export class ProfilesService {
  constructor(
    private readonly profiles: ProfilesRepository,
    private readonly audit: AuditService,
  ) {}

  async list(admin: AuthUser, siteId?: string): Promise<List<ProtocolProfile>> {
    const siteIds = siteId ? admin.siteIds.filter((s) => s === siteId) : admin.siteIds;
    const rows = await this.profiles.listBySites(siteIds);
    return { items: rows.map(toProfile), total: rows.length };
  }

  async get(admin: AuthUser, id: string): Promise<ProtocolProfile> {
    const row = await this.profiles.findById(id);
    if (!row || !canSeeSite(admin, row.siteId)) throw notFound('Protocol profile');
    return toProfile(row);
  }

  /** Saves version N+1; records analysed before keep the version they were made under. */
  async create(
    admin: AuthUser,
    body: CreateProfileVersion,
    deviceId?: string,
  ): Promise<ProtocolProfile> {
    if (!canSeeSite(admin, body.siteId))
      throw forbidden('You can change profiles only of sites you manage');
    const { siteId, name, thresholds } = body;
    const version = { siteId, name, thresholds, localSources: localSourcesOf(body) };
    const id = await this.profiles.inTransaction((trx) =>
      this.saveVersion(admin, version, deviceId, trx),
    );
    return toProfile((await this.profiles.findById(id)) as ProfileRow);
  }

  /**
   * Inside the caller's transaction (a new site saves its first version this way too). The
   * audit entry records every changed value as old → new (from null on a first version).
   */
  async saveVersion(
    admin: AuthUser,
    body: { siteId: string; name: string; thresholds: Thresholds; localSources?: LocalSources },
    deviceId: string | undefined,
    trx: Db,
  ): Promise<string> {
    const previous = await this.profiles.lockLatestVersion(body.siteId, trx);
    const before =
      previous > 0 ? await this.profiles.findVersion(body.siteId, previous, trx) : undefined;
    const version = previous + 1;
    const localSources = body.localSources ?? {};
    const { siteId, name, thresholds } = body;
    const id = await this.profiles.insertVersion(
      { siteId, name, thresholds, localSources, version, createdBy: admin.id },
      trx,
    );
    const changes = profileChanges(before ? toProfile(before) : undefined, body, localSources);
    await this.audit.insert(
      {
        userId: admin.id,
        action: 'profile.create',
        entity: 'protocol-profile',
        entityId: id,
        deviceId,
        details: { siteId: body.siteId, version, changed: Object.keys(changes), changes },
      },
      trx,
    );
    return id;
  }
}

type LocalSources = Partial<Record<keyof Thresholds, string>>;

/** Each changed threshold (or local reason) as { from, to, reason? }; all of them on a first version. */
export function profileChanges(
  old: ProtocolProfile | undefined,
  body: { thresholds: Thresholds },
  localSources: LocalSources,
): Record<string, { from: number | null; to: number; reason?: string }> {
  const out: Record<string, { from: number | null; to: number; reason?: string }> = {};
  for (const k of thresholdKeys) {
    const from = old ? old.thresholds[k] : null;
    const to = body.thresholds[k];
    const reason = localSources[k];
    const oldReason = old?.localSources?.[k];
    if (from === to && reason === oldReason) continue;
    out[k] = reason ? { from, to, reason } : { from, to };
  }
  return out;
}
