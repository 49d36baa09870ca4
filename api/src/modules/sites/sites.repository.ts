import { randomUUID } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';

export interface SiteRow {
  id: string;
  name: string;
  etco2Unit: 'mmHg' | 'kPa';
  paperSize: 'A4' | 'Letter';
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

export interface ProfileHead {
  id: string;
  siteId: string;
  version: number;
  name: string;
}

/** SQL for sites and their units. */
@Injectable()
export class SitesRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  inTransaction<T>(work: (trx: Db) => Promise<T>): Promise<T> {
    return this.db.transaction((trx) => work(trx));
  }

  async listByIds(ids: string[]): Promise<SiteRow[]> {
    return this.db<SiteRow>('sites')
      .whereIn('id', ids)
      .orderBy('name')
      .select('id', 'name', 'etco2Unit', 'paperSize', 'locale', 'timeZone', 'clock', 'mailDomains');
  }

  async unitsOf(siteIds: string[]): Promise<UnitRow[]> {
    return this.db<UnitRow>('units')
      .whereIn('siteId', siteIds)
      .orderBy('name')
      .select('id', 'siteId', 'name');
  }

  /** The newest profile version of each site. */
  async latestProfiles(siteIds: string[]): Promise<ProfileHead[]> {
    return this.db('protocolProfiles')
      .whereIn('siteId', siteIds)
      .distinctOn('siteId')
      .orderBy([{ column: 'siteId' }, { column: 'version', order: 'desc' }])
      .select<ProfileHead[]>('id', 'siteId', 'version', 'name');
  }

  async findByName(name: string, trx?: Db): Promise<SiteRow | undefined> {
    return (trx ?? this.db)<SiteRow>('sites').whereRaw('lower(name) = lower(?)', [name]).first();
  }

  async insert(row: SiteRow, trx: Db): Promise<void> {
    await trx('sites').insert(row);
  }

  async update(id: string, changes: Partial<Omit<SiteRow, 'id'>>, trx?: Db): Promise<void> {
    await (trx ?? this.db)('sites').where({ id }).update(changes);
  }

  async findUnit(siteId: string, unitId: string): Promise<UnitRow | undefined> {
    return this.db<UnitRow>('units').where({ id: unitId, siteId }).first();
  }

  async findUnitByName(siteId: string, name: string, trx?: Db): Promise<UnitRow | undefined> {
    return (trx ?? this.db)<UnitRow>('units')
      .where({ siteId })
      .whereRaw('lower(name) = lower(?)', [name])
      .first();
  }

  async insertUnit(siteId: string, name: string, trx?: Db): Promise<string> {
    const id = randomUUID();
    await (trx ?? this.db)('units').insert({ id, siteId, name });
    return id;
  }

  async renameUnit(unitId: string, name: string, trx?: Db): Promise<void> {
    await (trx ?? this.db)('units').where({ id: unitId }).update({ name });
  }
}
