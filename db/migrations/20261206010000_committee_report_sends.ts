import type { Knex } from 'knex';

/**
 * One row per site and month once the monthly committee report has been sent: the primary
 * key makes the scheduled job send it exactly once, however many API instances run it.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('committee_report_sends', (t) => {
    t.uuid('site_id').notNullable().references('sites.id');
    t.text('month').notNullable();
    t.timestamp('sent_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['site_id', 'month']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('committee_report_sends');
}
