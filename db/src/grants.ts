import type { Knex } from 'knex';

type Privilege = 'select' | 'insert' | 'update' | 'delete';

/**
 * What the API's role may do to each table. Every table in `public` needs an entry here:
 * migrating fails on a table without one, so a new table is never left unreachable or
 * granted by accident. Clinical entries, amendments, reviews and the audit trail are
 * append-only (no update, no delete); the lock triggers guard signed records further.
 * A column list restricts `update` to those columns.
 */
export const tableGrants: Record<string, { privileges: Privilege[]; updateColumns?: string[] }> = {
  sites: { privileges: ['select', 'insert', 'update'] },
  units: { privileges: ['select', 'insert', 'update'] },
  users: { privileges: ['select', 'insert', 'update'] },
  user_sites: { privileges: ['select', 'insert', 'delete'] },
  user_invitations: { privileges: ['select', 'insert', 'update'] },
  protocol_profiles: { privileges: ['select', 'insert'] },
  resuscitations: { privileges: ['select', 'insert', 'update'] },
  resuscitation_events: { privileges: ['select', 'insert'] },
  // Aligning an import moves its samples in time (before signing); values never change.
  etco2_samples: { privileges: ['select', 'insert', 'update'], updateColumns: ['at'] },
  waveform_chunks: { privileges: ['select', 'insert', 'update'], updateColumns: ['start_at'] },
  imports: { privileges: ['select', 'insert', 'update'] },
  amendments: { privileges: ['select', 'insert'] },
  audit_log: { privileges: ['select', 'insert'] },
  record_summaries: { privileges: ['select', 'insert', 'update'] },
  record_reviews: { privileges: ['select', 'insert'] },
  mail_outbox: { privileges: ['select', 'insert', 'update'] },
  mail_sink_messages: { privileges: ['select', 'insert'] },
  sign_in_attempts: { privileges: ['select', 'insert', 'delete'] },
  // A month's send, claimed once per site; never changed afterwards.
  committee_report_sends: { privileges: ['select', 'insert'] },
  knex_migrations: { privileges: [] },
  knex_migrations_lock: { privileges: [] },
};

/** Tables in `public` that have no entry in `tableGrants`. */
export async function tablesWithoutGrants(db: Knex): Promise<string[]> {
  const { rows } = await db.raw<{ rows: { tablename: string }[] }>(
    "select tablename from pg_tables where schemaname = 'public' order by tablename",
  );
  return rows.map((r) => r.tablename).filter((t) => !(t in tableGrants));
}

/**
 * Grants the API's role exactly what `tableGrants` lists (revoking anything else). Throws
 * when a table has no entry. Without the role (a database run as one superuser) it only
 * checks the list.
 */
export async function applyGrants(db: Knex, appRole: string): Promise<void> {
  const missing = await tablesWithoutGrants(db);
  if (missing.length > 0)
    throw new Error(
      `No database privileges listed for ${missing.join(', ')}: add them to db/src/grants.ts`,
    );
  const role = await db.raw<{ rows: unknown[] }>('select 1 from pg_roles where rolname = ?', [
    appRole,
  ]);
  if (role.rows.length === 0) return;
  const { rows } = await db.raw<{ rows: { tablename: string }[] }>(
    "select tablename from pg_tables where schemaname = 'public'",
  );
  for (const { tablename } of rows) {
    const { privileges, updateColumns } = tableGrants[tablename];
    await db.raw('revoke all on table ?? from ??', [tablename, appRole]);
    const whole = privileges.filter((p) => !(p === 'update' && updateColumns));
    if (whole.length > 0)
      await db.raw(`grant ${whole.join(', ')} on table ?? to ??`, [tablename, appRole]);
    if (updateColumns && privileges.includes('update'))
      await db.raw(`grant update (${updateColumns.map(() => '??').join(', ')}) on table ?? to ??`, [
        ...updateColumns,
        tablename,
        appRole,
      ]);
  }
  await db.raw('grant usage, select on all sequences in schema public to ??', [appRole]);
}
