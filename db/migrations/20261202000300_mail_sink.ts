import type { Knex } from 'knex';

/** Messages received by the local SMTP sink (development stand-in for the hosted mail service). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('mail_sink_messages', (t) => {
    t.bigIncrements('id');
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('mail_from');
    t.specificType('rcpt_to', 'text[]').notNullable();
    t.text('subject');
    t.text('raw').notNullable();
    t.integer('size_bytes').notNullable();
    t.index(['received_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('mail_sink_messages');
}
