import type { Knex } from 'knex';

/**
 * A protocol profile version keeps the local source or reason given for each value saved
 * far (more than 2×) from its guideline default, so a reviewer can see why it differs.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('protocol_profiles', (t) => {
    // { [thresholdKey]: reason }; small, always read with the version, never queried.
    t.jsonb('local_sources').notNullable().defaultTo('{}');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('protocol_profiles', (t) => {
    t.dropColumn('local_sources');
  });
}
