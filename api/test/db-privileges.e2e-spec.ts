import knex, { type Knex } from 'knex';
import { signedRecord } from './debrief-fixtures';
import { anEvent, aResuscitation } from './factories';
import { startTestApp, type TestApp } from './test-app';

/** The test database as the API's least-privilege role (made by the global set-up). */
function asAppRole(): Knex {
  const url = new URL(process.env.DATABASE_URL as string);
  url.username = 'upstroke_app';
  return knex({ client: 'pg', connection: url.toString(), pool: { min: 0, max: 2 } });
}

describe("the API's database role has only the privileges it needs", () => {
  let t: TestApp;
  let app: Knex;
  let signedId: string;
  beforeAll(async () => {
    t = await startTestApp();
    app = asAppRole();
    signedId = (await signedRecord(t)).rec.id;
  });
  afterAll(async () => {
    await app.destroy();
    await t.close();
  });

  const refused = async (sql: string, bindings: Knex.RawBinding[], reason: RegExp) => {
    await expect(app.raw(sql, bindings)).rejects.toThrow(reason);
  };

  it('is no superuser and cannot switch the lock triggers off', async () => {
    const me = await app.raw<{ rows: { rolsuper: boolean }[] }>(
      'select rolsuper from pg_roles where rolname = current_user',
    );
    expect(me.rows).toEqual([{ rolsuper: false }]);
    await refused('set session_replication_role = replica', [], /permission denied/);
    await refused(
      'alter table resuscitation_events disable trigger all',
      [],
      /must be owner|permission denied/,
    );
    await refused('truncate resuscitation_events', [], /permission denied/);
  });

  it('cannot update or delete entries, amendments, reviews or the audit trail', async () => {
    for (const table of ['resuscitation_events', 'amendments', 'audit_log', 'record_reviews']) {
      await refused(`update ${table} set id = id`, [], /permission denied/);
      await refused(`delete from ${table}`, [], /permission denied/);
    }
    await refused('update etco2_samples set value_mmhg = 0', [], /permission denied/);
    await refused('delete from etco2_samples', [], /permission denied/);
    await refused('update waveform_chunks set samples = null', [], /permission denied/);
    await refused('delete from waveform_chunks', [], /permission denied/);
  });

  it('cannot change a signed record, its roster or its summary', async () => {
    await refused(
      'update resuscitations set outcome = ? where id = ?',
      ['rosc', signedId],
      /signed and locked/,
    );
    await refused("update resuscitations set roster = '[]' where id = ?", [signedId], /roster/);
    await refused(
      "update record_summaries set outcome = 'rosc' where resuscitation_id = ?",
      [signedId],
      /signed and locked/,
    );
    await refused('delete from record_summaries where resuscitation_id = ?', [signedId], /./);
    const event = anEvent('note', 30, { text: 'late' });
    await refused(
      'insert into resuscitation_events (id, resuscitation_id, at, kind, data) values (?, ?, ?, ?, ?)',
      [event.id, signedId, event.at, event.kind, JSON.stringify(event.data)],
      /signed and locked/,
    );
    const stored = await t.db('resuscitations').where({ id: signedId }).first();
    expect(stored.status).toBe('signed');
    expect(stored.roster).toHaveLength(2);
  });

  it('still does its work: reads, and appends to an open record', async () => {
    const lead = await t.tokenFor('lead');
    const rec = aResuscitation();
    await t.http().post('/api/resuscitations').set('Authorization', `Bearer ${lead}`).send(rec);
    const event = anEvent('note', 10, { text: 'by the app role' });
    await app('resuscitation_events').insert({
      id: event.id,
      resuscitation_id: rec.id,
      at: event.at,
      kind: event.kind,
      data: event.data,
    });
    const rows = await app('resuscitation_events').where({ resuscitation_id: rec.id });
    expect(rows).toHaveLength(1);
    await app('resuscitations').where({ id: rec.id }).update({ location: 'Bay 2' });
  });
});
