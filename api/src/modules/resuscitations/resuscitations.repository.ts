import { Inject, Injectable } from '@nestjs/common';
import type { Resuscitation, ResuscitationStatus } from '@upstroke/contracts';
import { KNEX, type Db } from '../../db/knex';

export interface ResuscitationRow extends Omit<
  Resuscitation,
  'arrestAt' | 'createdAt' | 'signedAt'
> {
  arrestAt: Date;
  createdAt: Date;
  signedAt: Date | null;
  profileId: string | null;
  deviceId: string | null;
  updatedAt: Date;
}

export interface ListFilter {
  siteIds: string[];
  status?: ResuscitationStatus;
  unitId?: string;
  from?: string;
  to?: string;
  q?: string;
  signed?: 'signed' | 'unsigned';
  /** Records this user started or signed. */
  mineOf?: string;
  limit: number;
  offset: number;
}

/** `%`, `_` and `\` match themselves in a search. */
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

const columns = [
  'id',
  'siteId',
  'unitId',
  'arrestAt',
  'location',
  'patientRef',
  'ageGroup',
  'weightKg',
  'status',
  'witnessed',
  'monitored',
  'firstRhythm',
  'outcome',
  'endReason',
  'notesWentWell',
  'notesToChange',
  'createdBy',
  'createdAt',
  'signedAt',
  'signedBy',
  'profileId',
  'deviceId',
  'updatedAt',
  'roster',
];

/** SQL for resuscitation records; no rules here. */
@Injectable()
export class ResuscitationsRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async findById(id: string, trx?: Db): Promise<ResuscitationRow | undefined> {
    return (trx ?? this.db)<ResuscitationRow>('resuscitations').where({ id }).first(columns);
  }

  /**
   * The record with its row locked until the transaction ends. Entry inserts take the same
   * row in share mode (lock triggers), so while this is held no entry can commit.
   */
  async lockById(id: string, trx: Db): Promise<ResuscitationRow | undefined> {
    return trx<ResuscitationRow>('resuscitations').where({ id }).forUpdate().first(columns);
  }

  /** Inserts unless the id exists; returns true when a row was added. */
  async insertIfAbsent(row: Record<string, unknown>, trx?: Db): Promise<boolean> {
    const added = await (trx ?? this.db)('resuscitations')
      .insert(row)
      .onConflict('id')
      .ignore()
      .returning('id');
    return added.length > 0;
  }

  async update(id: string, patch: Record<string, unknown>, trx?: Db): Promise<void> {
    await (trx ?? this.db)('resuscitations')
      .where({ id })
      .update({ ...patch, updatedAt: new Date() });
  }

  async list(
    filter: ListFilter,
  ): Promise<{ items: (ResuscitationRow & { unitName: string | null })[]; total: number }> {
    const q = this.db('resuscitations as r')
      .leftJoin('units as u', 'u.id', 'r.unitId')
      .whereIn('r.siteId', filter.siteIds);
    if (filter.status) q.where('r.status', filter.status);
    if (filter.unitId) q.where('r.unitId', filter.unitId);
    if (filter.signed) q.where('r.status', filter.signed === 'signed' ? '=' : '<>', 'signed');
    if (filter.mineOf) {
      const me = filter.mineOf;
      q.where((w) => void w.where('r.createdBy', me).orWhere('r.signedBy', me));
    }
    if (filter.from) q.where('r.arrestAt', '>=', filter.from);
    if (filter.to) q.where('r.arrestAt', '<', filter.to);
    if (filter.q) {
      const like = `%${likeEscape(filter.q)}%`;
      q.where((w) => {
        for (const col of ['r.location', 'r.patientRef', 'u.name'])
          void w.orWhereRaw(`?? ilike ? escape '\\'`, [col, like]);
      });
    }
    const [{ count }] = await q.clone().count<{ count: number }[]>({ count: '*' });
    const items = await q
      .orderBy('r.arrestAt', 'desc')
      .orderBy('r.id')
      .limit(filter.limit)
      .offset(filter.offset)
      .select<(ResuscitationRow & { unitName: string | null })[]>([
        ...columns.map((c) => `r.${c}`),
        'u.name as unitName',
      ]);
    return { items, total: Number(count) };
  }

  async unitBelongsToSite(unitId: string, siteId: string): Promise<boolean> {
    return Boolean(await this.db('units').where({ id: unitId, siteId }).first('id'));
  }

  async latestProfileId(siteId: string): Promise<string | null> {
    const row = await this.db('protocolProfiles')
      .where({ siteId })
      .orderBy('version', 'desc')
      .first<{ id: string }>('id');
    return row?.id ?? null;
  }
}
