import type { Knex } from 'knex';

/**
 * Administration: one-time set-password links, and protocol profiles made append-only so
 * that the thresholds a record was analysed with can never change under it.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('user_invitations', (t) => {
    t.uuid('id').primary();
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    // SHA-256 of the token: the link itself is never stored, so a database copy cannot use it.
    t.text('token_hash').notNullable().unique();
    t.text('purpose').notNullable().checkIn(['invite', 'reset']);
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('used_at', { useTz: true });
    t.uuid('created_by').references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['user_id']);
  });
  await knex.schema.alterTable('audit_log', (t) => {
    t.index(['user_id', 'at']);
    t.index(['entity', 'at']);
  });
  // A new version is a new row; editing a version would silently re-analyse signed records.
  await knex.raw(`
    create function refuse_profile_update() returns trigger language plpgsql as $$
    begin
      raise exception 'protocol profile versions are immutable: save a new version instead'
        using errcode = 'check_violation';
    end $$;
    create trigger protocol_profiles_immutable
      before update on protocol_profiles
      for each row execute function refuse_profile_update();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop trigger if exists protocol_profiles_immutable on protocol_profiles');
  await knex.raw('drop function if exists refuse_profile_update()');
  await knex.schema.alterTable('audit_log', (t) => {
    t.dropIndex(['user_id', 'at']);
    t.dropIndex(['entity', 'at']);
  });
  await knex.schema.dropTableIfExists('user_invitations');
}
