import type { Knex } from 'knex';

/** Generated demo resuscitations (filled in by the demo generator). Returns how many were added. */
export async function seedDemoRecords(_knex: Knex): Promise<number> {
  return 0;
}
