import type { Knex } from 'knex';

/**
 * Sign-in attempts by key (`ip:<address>` or `email:<address>`), counted over the last
 * minute by every API instance alike; rows older than an hour are removed as attempts come.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sign_in_attempts', (t) => {
    t.bigIncrements('id');
    t.text('key').notNullable();
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['key', 'at']);
    t.index(['at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('sign_in_attempts');
}
