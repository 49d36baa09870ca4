import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';

export interface SiteRow {
  id: string;
  name: string;
  etco2Unit: 'mmHg' | 'kPa';
  locale: string;
  timeZone: string;
  clock: '24h' | '12h';
  mailDomains: string[];
}
export interface UnitRow {
  id: string;
  siteId: string;
  name: string;
}
export interface ProfileRow {
  id: string;
  siteId: string;
  version: number;
  thresholds: Record<string, unknown>;
}

/** SQL for what a tablet needs to record on a site; no rules here. */
@Injectable()
export class SiteContextRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async sitesByIds(ids: string[]): Promise<SiteRow[]> {
    if (ids.length === 0) return [];
    return this.db<SiteRow>('sites')
      .whereIn('id', ids)
      .orderBy('name')
      .select('id', 'name', 'etco2Unit', 'locale', 'timeZone', 'clock', 'mailDomains');
  }

  /** The organisation's e-mail domains set on a site (empty: any address). */
  async mailDomains(siteId: string): Promise<string[]> {
    const row = await this.db('sites')
      .where({ id: siteId })
      .first<{ mailDomains: string[] }>('mailDomains');
    return row?.mailDomains ?? [];
  }

  async unitsBySites(siteIds: string[]): Promise<UnitRow[]> {
    if (siteIds.length === 0) return [];
    return this.db<UnitRow>('units')
      .whereIn('siteId', siteIds)
      .orderBy('name')
      .select('id', 'siteId', 'name');
  }

  /** The newest profile version of each site. */
  async latestProfiles(siteIds: string[]): Promise<ProfileRow[]> {
    if (siteIds.length === 0) return [];
    return this.db<ProfileRow>('protocolProfiles')
      .distinctOn('siteId')
      .whereIn('siteId', siteIds)
      .orderBy([{ column: 'siteId' }, { column: 'version', order: 'desc' }])
      .select('id', 'siteId', 'version', 'thresholds');
  }
}
