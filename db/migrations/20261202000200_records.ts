import type { Knex } from 'knex';

/** Resuscitation records and their clinical data: events, EtCO2 values, raw waveform. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('resuscitations', (t) => {
    t.uuid('id').primary();
    t.uuid('site_id').notNullable().references('sites.id');
    t.uuid('unit_id').references('units.id');
    t.timestamp('arrest_at', { useTz: true }).notNullable();
    t.text('location');
    t.text('patient_ref');
    t.text('age_group').checkIn(['adult', 'child', 'infant']);
    t.double('weight_kg');
    t.text('status').notNullable().defaultTo('open').checkIn(['open', 'closed', 'signed']);
    t.boolean('witnessed');
    t.boolean('monitored');
    t.text('first_rhythm');
    t.text('outcome');
    t.text('end_reason');
    t.text('notes_went_well');
    t.text('notes_to_change');
    t.uuid('profile_id').references('protocol_profiles.id');
    t.uuid('created_by').references('users.id');
    t.text('device_id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('signed_at', { useTz: true });
    t.uuid('signed_by').references('users.id');
    t.index(['site_id', 'arrest_at']);
    t.index(['status', 'arrest_at']);
  });
  await knex.schema.createTable('resuscitation_events', (t) => {
    t.uuid('id').primary();
    t.uuid('resuscitation_id').notNullable().references('resuscitations.id');
    t.timestamp('at', { useTz: true }).notNullable();
    t.text('kind').notNullable();
    t.jsonb('data').notNullable().defaultTo('{}');
    t.uuid('recorded_by').references('users.id');
    t.text('device_id');
    // Tablet clock minus server clock at upload, as estimated by the sync (milliseconds).
    t.integer('clock_offset_ms');
    t.boolean('amendment').notNullable().defaultTo(false);
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['resuscitation_id', 'at']);
  });
  await knex.schema.createTable('etco2_samples', (t) => {
    t.uuid('id').primary();
    t.uuid('resuscitation_id').notNullable().references('resuscitations.id');
    t.timestamp('at', { useTz: true }).notNullable();
    t.double('value').notNullable();
    t.text('unit').notNullable().checkIn(['mmHg', 'kPa', '%']);
    t.double('value_mmhg').notNullable();
    t.text('source').notNullable();
    t.uuid('import_id');
    t.uuid('recorded_by').references('users.id');
    t.text('device_id');
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['resuscitation_id', 'at']);
  });
  await knex.schema.createTable('waveform_chunks', (t) => {
    t.uuid('id').primary();
    t.uuid('resuscitation_id').notNullable().references('resuscitations.id');
    t.timestamp('start_at', { useTz: true }).notNullable();
    t.double('sample_rate_hz').notNullable();
    t.text('unit').notNullable().checkIn(['mmHg', 'kPa', '%']);
    t.integer('seq');
    t.integer('sample_count').notNullable();
    // Raw values as little-endian float32: compact, and read back in one pass.
    t.binary('samples').notNullable();
    t.text('source').notNullable().defaultTo('stream');
    t.uuid('import_id');
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['resuscitation_id', 'start_at']);
  });
  await knex.schema.createTable('audit_log', (t) => {
    t.bigIncrements('id');
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid('user_id').references('users.id');
    t.text('action').notNullable();
    t.text('entity').notNullable();
    t.text('entity_id');
    t.uuid('resuscitation_id');
    t.text('device_id');
    t.jsonb('details').notNullable().defaultTo('{}');
    t.index(['at']);
    t.index(['resuscitation_id']);
  });
  // Events are append-only: a correction is a new event, never an edit or a delete.
  await knex.raw(`
    create function refuse_event_change() returns trigger language plpgsql as $$
    begin
      raise exception 'resuscitation events are append-only (% refused)', tg_op
        using errcode = 'check_violation';
    end $$;
    create trigger resuscitation_events_append_only
      before update or delete on resuscitation_events
      for each row execute function refuse_event_change();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop trigger if exists resuscitation_events_append_only on resuscitation_events');
  await knex.raw('drop function if exists refuse_event_change()');
  for (const table of [
    'audit_log',
    'waveform_chunks',
    'etco2_samples',
    'resuscitation_events',
    'resuscitations',
  ]) {
    await knex.schema.dropTableIfExists(table);
  }
}
