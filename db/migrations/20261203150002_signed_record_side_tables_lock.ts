import type { Knex } from 'knex';

/**
 * A signed record's roster, imports and committee summary are locked like its entries:
 * they change only in a transaction that amends the record (or, for the summary, the one
 * that signs it). Together with the API's role having no UPDATE/DELETE on entries, this
 * leaves no way to change a signed record without an amendment.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    create function signed_in_this_transaction(rid uuid) returns boolean
    language sql volatile as $$
      select exists (select 1 from resuscitations
                      where id = rid and status = 'signed'
                        and xmin::text = (txid_current() % 4294967296)::text)
    $$;

    create function guard_signed_roster() returns trigger language plpgsql as $$
    begin
      if old.status = 'signed' and new.roster is distinct from old.roster
         and not amending_in_this_transaction(old.id) then
        raise exception 'record % is signed and locked: the roster changes only by an amendment',
          old.id using errcode = 'check_violation';
      end if;
      return new;
    end $$;
    create trigger resuscitations_signed_roster_lock before update on resuscitations
      for each row execute function guard_signed_roster();

    create function guard_signed_side_row() returns trigger language plpgsql as $$
    begin
      if record_is_signed(old.resuscitation_id)
         and not amending_in_this_transaction(old.resuscitation_id)
         and not (tg_table_name = 'record_summaries'
                  and signed_in_this_transaction(old.resuscitation_id)) then
        raise exception 'record % is signed and locked: % on % refused',
          old.resuscitation_id, tg_op, tg_table_name using errcode = 'check_violation';
      end if;
      return case when tg_op = 'DELETE' then old else new end;
    end $$;
    create trigger imports_signed_lock before update or delete on imports
      for each row execute function guard_signed_side_row();
    create trigger record_summaries_signed_lock before update or delete on record_summaries
      for each row execute function guard_signed_side_row();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`
    drop trigger if exists record_summaries_signed_lock on record_summaries;
    drop trigger if exists imports_signed_lock on imports;
    drop trigger if exists resuscitations_signed_roster_lock on resuscitations;
    drop function if exists guard_signed_side_row();
    drop function if exists guard_signed_roster();
    drop function if exists signed_in_this_transaction(uuid);
  `);
}
