import type { Knex } from 'knex';

/**
 * Per-site settings for how people read records: language (dates, numbers), time zone and
 * clock (24 h by default), and the e-mail domains the organisation owns (debrief e-mail
 * goes only to addresses there; an empty list allows any address).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sites', (t) => {
    t.string('locale', 35).notNullable().defaultTo('en-GB');
    t.string('time_zone', 64).notNullable().defaultTo('UTC');
    t.string('clock', 3).notNullable().defaultTo('24h');
    t.specificType('mail_domains', 'text[]').notNullable().defaultTo('{}');
  });
  await knex.raw(
    `alter table sites add constraint sites_clock_check check (clock in ('24h', '12h'))`,
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sites', (t) => {
    t.dropChecks(['sites_clock_check']);
    t.dropColumn('mail_domains');
    t.dropColumn('clock');
    t.dropColumn('time_zone');
    t.dropColumn('locale');
  });
}
