import type { Knex } from 'knex';

/**
 * One audit row per signed record (rewritten on amendment), so that trends, the Utstein
 * summary and the CSV export never re-scan events or samples; and the committee's review
 * history, append-only.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('record_summaries', (t) => {
    t.uuid('resuscitation_id').primary().references('resuscitations.id');
    t.uuid('site_id').notNullable().references('sites.id');
    t.uuid('unit_id').references('units.id');
    t.timestamp('arrest_at', { useTz: true }).notNullable();
    t.text('age_group');
    t.text('first_rhythm');
    t.boolean('shockable');
    t.boolean('witnessed');
    t.boolean('monitored');
    t.text('outcome');
    t.text('end_reason');
    t.boolean('any_rosc').notNullable();
    t.boolean('sustained_rosc').notNullable();
    t.double('compression_fraction');
    t.double('longest_pause_sec');
    t.integer('preshock_long_count').notNullable().defaultTo(0);
    t.double('time_to_first_compression_sec');
    t.double('time_to_first_shock_sec');
    t.double('time_to_first_epinephrine_sec');
    t.boolean('etco2_documented').notNullable();
    t.double('median_etco2');
    t.double('fraction_ge10');
    t.double('fraction_ge20');
    t.jsonb('finding_counts').notNullable().defaultTo('{}');
    t.double('duration_sec').notNullable();
    t.integer('profile_version');
    t.timestamp('computed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  // Trends filter by site (always) and period, optionally by unit; the records table and the
  // export sort by arrest time. Both indexes lead with site_id so a multi-site query can use them.
  await knex.raw(
    'create index record_summaries_site_arrest on record_summaries (site_id, arrest_at)',
  );
  await knex.raw(
    'create index record_summaries_unit_arrest on record_summaries (unit_id, arrest_at)',
  );

  await knex.schema.createTable('record_reviews', (t) => {
    t.bigIncrements('id');
    t.uuid('resuscitation_id').notNullable().references('resuscitations.id');
    t.text('status').notNullable().checkIn(['pending', 'reviewed', 'needs-follow-up']);
    t.text('comment').notNullable().defaultTo('');
    t.uuid('reviewer_id').notNullable().references('users.id');
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(
    'create index record_reviews_latest on record_reviews (resuscitation_id, id desc)',
  );
  // Review history is kept: a new status is a new row, never an edit or a delete.
  await knex.raw(`
    create function refuse_review_change() returns trigger language plpgsql as $$
    begin
      raise exception 'record reviews are append-only (% refused)', tg_op
        using errcode = 'check_violation';
    end $$;
    create trigger record_reviews_append_only
      before update or delete on record_reviews
      for each row execute function refuse_review_change();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop trigger if exists record_reviews_append_only on record_reviews');
  await knex.raw('drop function if exists refuse_review_change()');
  await knex.schema.dropTableIfExists('record_reviews');
  await knex.schema.dropTableIfExists('record_summaries');
}
