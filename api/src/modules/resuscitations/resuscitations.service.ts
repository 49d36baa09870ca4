import { Injectable } from '@nestjs/common';
import type { z } from 'zod';
import type {
  CreateResuscitation,
  listResuscitationsQuerySchema,
  PatchResuscitation,
  RecordEntries,
  Resuscitation,
} from '@upstroke/contracts';
import { type AuthUser, canSeeSite } from '../../common/auth.decorators';
import { badRequest, conflict, forbidden } from '../../common/errors';
import { AuditService } from '../audit/audit.service';
import { ClinicalDataRepository } from './clinical-data.repository';
import { ResuscitationAccess } from './resuscitation-access.service';
import { type ResuscitationRow, ResuscitationsRepository } from './resuscitations.repository';

export function toResuscitation(
  row: ResuscitationRow,
): Resuscitation & { profileId: string | null } {
  return {
    ...row,
    arrestAt: row.arrestAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
    signedAt: row.signedAt ? row.signedAt.toISOString() : null,
  };
}

type ListResuscitationsQueryOut = z.infer<typeof listResuscitationsQuerySchema>;

@Injectable()
export class ResuscitationsService {
  constructor(
    private readonly records: ResuscitationsRepository,
    private readonly data: ClinicalDataRepository,
    private readonly access: ResuscitationAccess,
    private readonly audit: AuditService,
  ) {}

  /** Idempotent on the client's id: a replay returns the stored record unchanged. */
  async create(
    user: AuthUser,
    body: CreateResuscitation,
    deviceId?: string,
  ): Promise<{ created: boolean; record: Resuscitation }> {
    if (!canSeeSite(user, body.siteId)) throw forbidden('You cannot record on this site');
    if (body.unitId && !(await this.records.unitBelongsToSite(body.unitId, body.siteId))) {
      throw badRequest('unitId: this unit is not part of the site', [
        { path: 'unitId', message: 'Unknown unit for this site' },
      ]);
    }
    const existing = await this.records.findById(body.id);
    if (existing) {
      if (existing.siteId !== body.siteId)
        throw conflict('A different record already uses this id');
      return { created: false, record: toResuscitation(existing) };
    }
    const profileId = await this.records.latestProfileId(body.siteId);
    const created = await this.records.insertIfAbsent({
      ...body,
      profileId,
      createdBy: user.id,
      deviceId: deviceId ?? null,
    });
    if (created) {
      await this.audit.insert({
        userId: user.id,
        action: 'create',
        entity: 'resuscitation',
        entityId: body.id,
        resuscitationId: body.id,
        deviceId,
      });
    }
    const record = await this.access.readable(user, body.id);
    return { created, record: toResuscitation(record) };
  }

  async list(user: AuthUser, query: ListResuscitationsQueryOut) {
    const { siteId, mine, ...rest } = query;
    const siteIds = siteId ? user.siteIds.filter((s) => s === siteId) : user.siteIds;
    const mineOf = mine ? user.id : undefined;
    const { items, total } = await this.records.list({ ...rest, siteIds, mineOf });
    return { items: items.map((r) => ({ ...toResuscitation(r), unitName: r.unitName })), total };
  }

  async get(user: AuthUser, id: string) {
    const record = await this.access.readable(user, id);
    const [events, etco2] = await Promise.all([this.data.events(id), this.data.etco2(id)]);
    return {
      ...toResuscitation(record),
      events: events.map((e) => ({
        ...e,
        at: e.at.toISOString(),
        receivedAt: e.receivedAt.toISOString(),
      })),
      etco2: etco2.map((s) => ({ ...s, at: s.at.toISOString() })),
    };
  }

  /** What the server received for a record after `since`: other tablets' taps for Live. */
  async entries(user: AuthUser, id: string, since?: string): Promise<RecordEntries> {
    await this.access.readable(user, id);
    const r = await this.data.entriesSince(id, since ? new Date(since) : undefined);
    return {
      serverTime: r.serverTime.toISOString(),
      events: r.events.map((e) => ({ ...e, at: e.at.toISOString() })),
      etco2: r.etco2.map((v) => ({ ...v, at: v.at.toISOString() })),
    };
  }

  async patch(
    user: AuthUser,
    id: string,
    patch: PatchResuscitation,
    deviceId?: string,
  ): Promise<Resuscitation> {
    const record = await this.access.writable(user, id);
    if (patch.unitId && !(await this.records.unitBelongsToSite(patch.unitId, record.siteId))) {
      throw badRequest('unitId: this unit is not part of the site', [
        { path: 'unitId', message: 'Unknown unit for this site' },
      ]);
    }
    // jsonb arrays must be sent as JSON text: the driver would write a Postgres array otherwise.
    const { roster, ...rest } = patch;
    await this.records.update(id, roster ? { ...rest, roster: JSON.stringify(roster) } : rest);
    await this.audit.insert({
      userId: user.id,
      action: 'update',
      entity: 'resuscitation',
      entityId: id,
      resuscitationId: id,
      deviceId,
      details: { fields: Object.keys(patch) },
    });
    return toResuscitation((await this.records.findById(id)) as ResuscitationRow);
  }
}
