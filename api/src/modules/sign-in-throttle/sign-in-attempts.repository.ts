import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';

/** Sign-in attempts, in PostgreSQL so that every API instance counts the same ones. */
@Injectable()
export class SignInAttemptsRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  /**
   * Records one attempt under each key and returns, per key, how many attempts came before
   * it within the last `windowSec` seconds. Attempts older than an hour are dropped.
   */
  async recordAndCount(keys: string[], windowSec: number): Promise<Record<string, number>> {
    const { rows } = await this.db.raw<{ rows: { key: string; n: number }[] }>(
      `with added as (insert into sign_in_attempts (key) select unnest(?::text[]))
       select k.key, (select count(*)::int from sign_in_attempts a
                       where a.key = k.key and a.at > now() - make_interval(secs => ?)) as n
         from unnest(?::text[]) as k(key)`,
      [keys, windowSec, keys],
    );
    await this.db('signInAttempts')
      .where('at', '<', this.db.raw("now() - interval '1 hour'"))
      .delete();
    return Object.fromEntries(rows.map((r) => [r.key, r.n]));
  }
}
