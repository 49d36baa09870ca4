import type { Knex } from 'knex';

/** Sites, units, users and protocol profiles: who may do what, where, by which rules. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sites', (t) => {
    t.uuid('id').primary();
    t.text('name').notNullable().unique();
    t.text('etco2_unit').notNullable().defaultTo('mmHg').checkIn(['mmHg', 'kPa']);
    t.text('paper_size').notNullable().defaultTo('A4').checkIn(['A4', 'Letter']);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable('units', (t) => {
    t.uuid('id').primary();
    t.uuid('site_id').notNullable().references('sites.id');
    t.text('name').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['site_id', 'name']);
  });
  await knex.schema.createTable('users', (t) => {
    t.uuid('id').primary();
    t.text('email').notNullable();
    t.text('name').notNullable();
    t.text('role').notNullable().checkIn(['recorder', 'lead', 'quality', 'admin']);
    t.text('password_hash');
    t.boolean('active').notNullable().defaultTo(true);
    // Bumped on deactivation or password change so that tokens issued before stop working.
    t.integer('token_version').notNullable().defaultTo(0);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw('create unique index users_email_lower on users (lower(email))');
  await knex.schema.createTable('user_sites', (t) => {
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.uuid('site_id').notNullable().references('sites.id');
    t.primary(['user_id', 'site_id']);
  });
  await knex.schema.createTable('protocol_profiles', (t) => {
    t.uuid('id').primary();
    t.uuid('site_id').notNullable().references('sites.id');
    t.integer('version').notNullable();
    t.text('name').notNullable();
    t.jsonb('thresholds').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid('created_by').references('users.id');
    t.unique(['site_id', 'version']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['protocol_profiles', 'user_sites', 'users', 'units', 'sites']) {
    await knex.schema.dropTableIfExists(table);
  }
}
