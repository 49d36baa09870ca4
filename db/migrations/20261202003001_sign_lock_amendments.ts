import type { Knex } from 'knex';

/**
 * Signing locks a record in the database itself. After `status = 'signed'`:
 * - the record's clinical columns, its events, EtCO2 values and waveform chunks cannot be
 *   updated or deleted, and no new plain event, value or chunk can be added;
 * - the only way in is an amendment: a row in `amendments` (reason required, append-only)
 *   written in the SAME transaction as the change. Amendment events reference that row
 *   (`amendment_id`, `amendment = true`); closing-detail changes are let through when an
 *   amendment of this record was written by the current transaction (`txid_current()`).
 * So no application bug or hand-typed SQL can change a signed record without leaving an
 * amendment with who, when and why.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('amendments', (t) => {
    t.uuid('id').primary();
    t.uuid('resuscitation_id').notNullable().references('resuscitations.id');
    t.text('reason').notNullable();
    t.jsonb('fields').notNullable().defaultTo('{}');
    t.specificType('event_ids', 'uuid[]').notNullable().defaultTo('{}');
    t.uuid('created_by').notNullable().references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    // The writing transaction: lets the lock triggers recognise "this transaction amends".
    t.bigInteger('txid').notNullable().defaultTo(knex.raw('txid_current()'));
    t.index(['resuscitation_id', 'created_at']);
  });
  await knex.raw(`alter table amendments add constraint amendments_reason_not_blank
    check (length(btrim(reason)) > 0 and length(reason) <= 2000)`);
  await knex.schema.alterTable('resuscitation_events', (t) => {
    t.uuid('amendment_id').references('amendments.id');
  });
  await knex.raw(lockSql);
}

const lockSql = `
create function record_is_signed(rid uuid) returns boolean language sql stable as $$
  select coalesce((select status = 'signed' from resuscitations where id = rid), false)
$$;

create function amending_in_this_transaction(rid uuid) returns boolean language sql stable as $$
  select exists (select 1 from amendments where resuscitation_id = rid and txid = txid_current())
$$;

create function refuse_amendment_change() returns trigger language plpgsql as $$
begin
  raise exception 'amendments are append-only (% refused)', tg_op using errcode = 'check_violation';
end $$;
create trigger amendments_append_only before update or delete on amendments
  for each row execute function refuse_amendment_change();

-- New events on a signed record: only amendment events tied to an amendment of this
-- record written in this same transaction.
create function guard_signed_event_insert() returns trigger language plpgsql as $$
begin
  if record_is_signed(new.resuscitation_id) and not (
    new.amendment and new.amendment_id is not null and exists (
      select 1 from amendments a where a.id = new.amendment_id
        and a.resuscitation_id = new.resuscitation_id and a.txid = txid_current())
  ) then
    raise exception 'record % is signed and locked: events can only be added by an amendment',
      new.resuscitation_id using errcode = 'check_violation';
  end if;
  return new;
end $$;
create trigger resuscitation_events_signed_lock before insert on resuscitation_events
  for each row execute function guard_signed_event_insert();

-- EtCO2 values and waveform chunks of a signed record: no insert, update or delete.
create function guard_signed_samples() returns trigger language plpgsql as $$
declare rid uuid;
begin
  rid := case when tg_op = 'INSERT' then new.resuscitation_id else old.resuscitation_id end;
  if record_is_signed(rid) or (tg_op = 'UPDATE' and record_is_signed(new.resuscitation_id)) then
    raise exception 'record % is signed and locked: % on % refused', rid, tg_op, tg_table_name
      using errcode = 'check_violation';
  end if;
  return case when tg_op = 'DELETE' then old else new end;
end $$;
create trigger etco2_samples_signed_lock before insert or update or delete on etco2_samples
  for each row execute function guard_signed_samples();
create trigger waveform_chunks_signed_lock before insert or update or delete on waveform_chunks
  for each row execute function guard_signed_samples();

-- The record row once signed: never deleted; clinical columns change only inside an
-- amendment transaction, and even then the signature and site stay as signed.
create function guard_signed_record() returns trigger language plpgsql as $$
begin
  if old.status <> 'signed' then
    return case when tg_op = 'DELETE' then old else new end;
  end if;
  if tg_op = 'DELETE' then
    raise exception 'record % is signed and locked: delete refused', old.id
      using errcode = 'check_violation';
  end if;
  if new.id is distinct from old.id or new.site_id is distinct from old.site_id
     or new.status is distinct from old.status or new.signed_at is distinct from old.signed_at
     or new.signed_by is distinct from old.signed_by or new.created_by is distinct from old.created_by
     or new.created_at is distinct from old.created_at or new.profile_id is distinct from old.profile_id then
    raise exception 'record % is signed: its signature, site and status cannot change', old.id
      using errcode = 'check_violation';
  end if;
  if (new.unit_id, new.arrest_at, new.location, new.patient_ref, new.age_group, new.weight_kg,
      new.witnessed, new.monitored, new.first_rhythm, new.outcome, new.end_reason,
      new.notes_went_well, new.notes_to_change, new.device_id)
     is distinct from
     (old.unit_id, old.arrest_at, old.location, old.patient_ref, old.age_group, old.weight_kg,
      old.witnessed, old.monitored, old.first_rhythm, old.outcome, old.end_reason,
      old.notes_went_well, old.notes_to_change, old.device_id)
     and not amending_in_this_transaction(old.id) then
    raise exception 'record % is signed and locked: changes need an amendment with a reason', old.id
      using errcode = 'check_violation';
  end if;
  return new;
end $$;
create trigger resuscitations_signed_lock before update or delete on resuscitations
  for each row execute function guard_signed_record();
`;

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`
    drop trigger if exists resuscitations_signed_lock on resuscitations;
    drop trigger if exists waveform_chunks_signed_lock on waveform_chunks;
    drop trigger if exists etco2_samples_signed_lock on etco2_samples;
    drop trigger if exists resuscitation_events_signed_lock on resuscitation_events;
    drop trigger if exists amendments_append_only on amendments;
    drop function if exists guard_signed_record();
    drop function if exists guard_signed_samples();
    drop function if exists guard_signed_event_insert();
    drop function if exists refuse_amendment_change();
    drop function if exists amending_in_this_transaction(uuid);
    drop function if exists record_is_signed(uuid);
  `);
  await knex.schema.alterTable('resuscitation_events', (t) => {
    t.dropColumn('amendment_id');
  });
  await knex.schema.dropTableIfExists('amendments');
}
