import { randomUUID } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import type { Thresholds } from '@upstroke/contracts';
import { KNEX, type Db } from '../../db/knex';

export interface ProfileRow {
  id: string;
  siteId: string;
  version: number;
  name: string;
  thresholds: Partial<Thresholds>;
  localSources: Record<string, string> | null;
  createdAt: Date;
  createdBy: string | null;
}

/** Protocol profile versions: inserted, never updated (a trigger refuses updates). */
@Injectable()
export class ProfilesRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  inTransaction<T>(work: (trx: Db) => Promise<T>): Promise<T> {
    return this.db.transaction((trx) => work(trx));
  }

  async listBySites(siteIds: string[]): Promise<ProfileRow[]> {
    return this.db<ProfileRow>('protocolProfiles')
      .whereIn('siteId', siteIds)
      .orderBy([{ column: 'siteId' }, { column: 'version', order: 'desc' }]);
  }

  async findById(id: string): Promise<ProfileRow | undefined> {
    return this.db<ProfileRow>('protocolProfiles').where({ id }).first();
  }

  async findVersion(siteId: string, version: number, trx?: Db): Promise<ProfileRow | undefined> {
    return (trx ?? this.db)<ProfileRow>('protocolProfiles').where({ siteId, version }).first();
  }

  /**
   * The newest version number of a site, with the site row locked so that two admins
   * saving at once get versions N+1 and N+2 rather than a clash.
   */
  async lockLatestVersion(siteId: string, trx: Db): Promise<number> {
    await trx('sites').where({ id: siteId }).forUpdate().select('id');
    const row = await trx('protocolProfiles')
      .where({ siteId })
      .max<{ max: number | null }>('version as max')
      .first();
    return row?.max ?? 0;
  }

  async insertVersion(
    row: Pick<ProfileRow, 'siteId' | 'version' | 'name' | 'createdBy'> & {
      thresholds: Thresholds;
      localSources: Record<string, string>;
    },
    trx: Db,
  ): Promise<string> {
    const id = randomUUID();
    await trx('protocolProfiles').insert({
      id,
      ...row,
      thresholds: JSON.stringify(row.thresholds),
      localSources: JSON.stringify(row.localSources),
    });
    return id;
  }
}
