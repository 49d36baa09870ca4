import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { defaultDisplayFormat, type DisplayFormat } from '@upstroke/contracts';
import { KNEX, type Db } from '../../db/knex';

export interface RecordContext {
  siteName: string;
  paperSize: 'A4' | 'Letter';
  etco2Unit: 'mmHg' | 'kPa';
  display: DisplayFormat;
  unitName: string | null;
  createdByName: string | null;
  signedByName: string | null;
}

export interface AmendmentRow {
  id: string;
  resuscitationId: string;
  reason: string;
  fields: Record<string, unknown>;
  eventIds: string[];
  createdBy: string;
  createdByName: string | null;
  createdAt: Date;
}

/** SQL for the debrief, signing and amendments; no rules here. */
@Injectable()
export class DebriefRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /** Runs `work` in one transaction: everything it writes is kept, or nothing. */
  transaction<T>(work: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
    return this.db.transaction((trx) => work(trx));
  }

  async context(record: {
    siteId: string;
    unitId: string | null;
    createdBy: string | null;
    signedBy: string | null;
  }): Promise<RecordContext> {
    const site = await this.db('sites')
      .where({ id: record.siteId })
      .first<
        Omit<
          RecordContext,
          'siteName' | 'display' | 'unitName' | 'createdByName' | 'signedByName'
        > &
          DisplayFormat & { name: string }
      >('name', 'paperSize', 'etco2Unit', 'locale', 'timeZone', 'clock');
    const unit = record.unitId
      ? await this.db('units').where({ id: record.unitId }).first<{ name: string }>('name')
      : undefined;
    const names = await this.userNames([record.createdBy, record.signedBy]);
    return {
      siteName: site?.name ?? '',
      paperSize: site?.paperSize ?? 'A4',
      etco2Unit: site?.etco2Unit ?? 'mmHg',
      display: site
        ? { locale: site.locale, timeZone: site.timeZone, clock: site.clock }
        : defaultDisplayFormat,
      unitName: unit?.name ?? null,
      createdByName: record.createdBy ? (names.get(record.createdBy) ?? null) : null,
      signedByName: record.signedBy ? (names.get(record.signedBy) ?? null) : null,
    };
  }

  async userNames(ids: (string | null)[]): Promise<Map<string, string>> {
    const wanted = ids.filter((x): x is string => Boolean(x));
    if (wanted.length === 0) return new Map();
    const rows = await this.db('users')
      .whereIn('id', wanted)
      .select<{ id: string; name: string }[]>('id', 'name');
    return new Map(rows.map((r) => [r.id, r.name]));
  }

  async amendments(resuscitationId: string): Promise<AmendmentRow[]> {
    return this.db('amendments as a')
      .leftJoin('users as u', 'u.id', 'a.createdBy')
      .where('a.resuscitationId', resuscitationId)
      .orderBy('a.createdAt')
      .select<AmendmentRow[]>(
        'a.id',
        'a.resuscitationId',
        'a.reason',
        'a.fields',
        'a.eventIds',
        'a.createdBy',
        'u.name as createdByName',
        'a.createdAt',
      );
  }

  async insertAmendment(
    row: {
      id: string;
      resuscitationId: string;
      reason: string;
      fields: Record<string, unknown>;
      eventIds: string[];
      createdBy: string;
    },
    trx: Db,
  ): Promise<void> {
    await trx('amendments').insert({ ...row, fields: JSON.stringify(row.fields) });
  }

  /**
   * Marks the record signed unless it already is; returns false when it was. The time is
   * read now (not at transaction start) so it follows every entry committed before the
   * record's row lock was granted.
   */
  async markSigned(id: string, userId: string, trx: Db): Promise<boolean> {
    const n = await trx('resuscitations')
      .where({ id })
      .whereNot({ status: 'signed' })
      .update({
        status: 'signed',
        signedAt: trx.raw('clock_timestamp()'),
        signedBy: userId,
        updatedAt: trx.fn.now(),
      });
    return n > 0;
  }
}
