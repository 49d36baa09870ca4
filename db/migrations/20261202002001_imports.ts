import type { Knex } from 'knex';

/** Imported monitor files and the clock offset chosen for each (issue 5). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('imports', (t) => {
    t.uuid('id').primary();
    t.uuid('resuscitation_id').notNullable().references('resuscitations.id');
    t.text('file_name').notNullable();
    t.text('sha256').notNullable();
    t.integer('rows').notNullable();
    // First and last sample on the file's own clock; stored samples are already aligned.
    t.timestamp('started_at', { useTz: true }).notNullable();
    t.timestamp('ended_at', { useTz: true }).notNullable();
    t.text('unit').notNullable().checkIn(['mmHg', 'kPa', '%']);
    t.double('sample_rate_hz').notNullable();
    // File clock minus record clock, seconds: positive when the monitor ran ahead.
    t.double('offset_sec').notNullable().defaultTo(0);
    t.uuid('offset_chosen_by').references('users.id');
    t.text('offset_method').notNullable().checkIn(['auto', 'manual']);
    t.double('residual_sec');
    t.integer('markers').notNullable().defaultTo(0);
    t.integer('matched_markers').notNullable().defaultTo(0);
    t.integer('breaths').notNullable().defaultTo(0);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid('created_by').references('users.id');
    // The same file twice on one record is a duplicate, whatever its name.
    t.unique(['resuscitation_id', 'sha256']);
  });
  await knex.schema.alterTable('waveform_chunks', (t) => t.index(['import_id']));
  await knex.schema.alterTable('etco2_samples', (t) => t.index(['import_id']));
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('etco2_samples', (t) => t.dropIndex(['import_id']));
  await knex.schema.alterTable('waveform_chunks', (t) => t.dropIndex(['import_id']));
  await knex.schema.dropTableIfExists('imports');
}
