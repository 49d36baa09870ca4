import type { Knex } from 'knex';

/** The team roster of a resuscitation: who was present and in which role (issue 4). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('resuscitations', (t) => {
    // An array of { name, role, email? }; small, always read with the record, never queried.
    t.jsonb('roster').notNullable().defaultTo('[]');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('resuscitations', (t) => {
    t.dropColumn('roster');
  });
}
