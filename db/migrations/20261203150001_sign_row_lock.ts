import type { Knex } from 'knex';

/**
 * Signing is atomic with the entries: the lock triggers read the record's status with the
 * row in share mode, and signing holds it in update mode. An entry insert either commits
 * before the signature (signing waits for it) or sees the record signed and is refused;
 * none can commit after the signature while reading the status from before it.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    create or replace function record_is_signed(rid uuid) returns boolean
    language plpgsql volatile as $$
    declare s text;
    begin
      select status into s from resuscitations where id = rid for share;
      return coalesce(s = 'signed', false);
    end $$;
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`
    create or replace function record_is_signed(rid uuid) returns boolean
    language sql stable as $$
      select coalesce((select status = 'signed' from resuscitations where id = rid), false)
    $$;
  `);
}
