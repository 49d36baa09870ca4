import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';

/** The sites, their quality users and the claims that make each month's send happen once. */
@Injectable()
export class CommitteeReportSendsRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  siteIds(): Promise<string[]> {
    return this.db('sites').orderBy('name').pluck('id');
  }

  /** Active quality users of a site: the committee the report goes to. */
  qualityUsers(siteId: string): Promise<{ id: string; email: string }[]> {
    return this.db('users as u')
      .join('userSites as us', 'us.userId', 'u.id')
      .where({ 'us.siteId': siteId, 'u.role': 'quality', 'u.active': true })
      .orderBy('u.email')
      .select('u.id', 'u.email');
  }

  async isSent(siteId: string, month: string): Promise<boolean> {
    return Boolean(await this.db('committeeReportSends').where({ siteId, month }).first('month'));
  }

  /**
   * Claims the month's send for a site and, in the same transaction, runs `queue` (which
   * queues the message): the claim and the queued message commit together, so a process that
   * dies after the claim cannot leave a month claimed but never sent. Returns `queue`'s result
   * for the one caller whose claim went in, null for every other, in this process or another
   * (the primary key decides).
   */
  claimAndQueue<T>(siteId: string, month: string, queue: (trx: Db) => Promise<T>) {
    return this.db.transaction(async (trx): Promise<T | null> => {
      const rows = await trx('committeeReportSends')
        .insert({ siteId, month })
        .onConflict(['siteId', 'month'])
        .ignore()
        .returning('month');
      return rows.length === 1 ? queue(trx) : null;
    });
  }
}
