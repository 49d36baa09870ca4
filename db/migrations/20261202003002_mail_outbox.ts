import type { Knex } from 'knex';

/**
 * Outgoing e-mail, written before any SMTP attempt so that a message is never lost: a
 * worker sends queued rows and retries failures with back-off until `maxAttempts`.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('mail_outbox', (t) => {
    t.uuid('id').primary();
    t.specificType('to', 'text[]').notNullable();
    t.text('subject').notNullable();
    t.text('body').notNullable();
    t.text('attachment_name');
    t.text('attachment_type');
    // The PDF as rendered when the lead pressed send (a signed record does not change).
    t.binary('attachment');
    t.uuid('resuscitation_id').references('resuscitations.id');
    t.text('status').notNullable().defaultTo('queued').checkIn(['queued', 'sent', 'failed']);
    t.integer('attempts').notNullable().defaultTo(0);
    t.text('last_error');
    t.timestamp('next_attempt_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('sent_at', { useTz: true });
    t.uuid('created_by').references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['status', 'next_attempt_at']);
    t.index(['created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('mail_outbox');
}
