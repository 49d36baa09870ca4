import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';

@Injectable()
export class HealthRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /** Whether the database answers within two seconds (a hung one must not hang the check). */
  async databaseAnswers(): Promise<boolean> {
    try {
      await this.db.raw('select 1').timeout(2000, { cancel: true });
      return true;
    } catch {
      return false;
    }
  }
}
