import { randomUUID } from 'node:crypto';
import { type Debrief, thresholdDefaults } from '@upstroke/contracts';
import { aResuscitation, anEtco2, anEvent } from '../factories';
import { demoSiteId } from '../test-app';
import { type AdminTestApp, startAdminTestApp } from './admin-helpers';

/** A record with two minutes of compressions at 5 mmHg EtCO2 (invented values). */
async function lowEtco2Record(t: AdminTestApp): Promise<string> {
  const auth = await t.as('recorder');
  const rec = aResuscitation();
  await t
    .http()
    .post('/api/resuscitations')
    .set(...auth)
    .send(rec)
    .expect(201);
  const events = [
    anEvent('arrest', 0),
    anEvent('compressions-start', 10),
    anEvent('compressions-stop', 200),
  ];
  await t
    .http()
    .post(`/api/resuscitations/${rec.id}/events/batch`)
    .set(...auth)
    .send({ events });
  const samples = [20, 40, 60, 80, 100, 120, 140, 160].map((s) => anEtco2(s, 5));
  await t
    .http()
    .post(`/api/resuscitations/${rec.id}/etco2/batch`)
    .set(...auth)
    .send({ samples });
  return rec.id;
}

describe('admin: protocol profiles are versioned and records keep theirs', () => {
  let t: AdminTestApp;
  beforeAll(async () => {
    t = await startAdminTestApp();
  });
  afterAll(() => t.close());

  const save = async (
    thresholds: Record<string, unknown>,
    confirmations?: Record<string, unknown>,
    name = 'Kestrel Bay 2026',
  ) =>
    t
      .http()
      .post('/api/protocol-profiles')
      .set(...(await t.as('admin')))
      .send({
        siteId: demoSiteId,
        name,
        thresholds: { ...thresholdDefaults, ...thresholds },
        confirmations,
      });
  const debrief = async (id: string) =>
    (
      await t
        .http()
        .get(`/api/resuscitations/${id}/debrief`)
        .set(...(await t.as('lead')))
    ).body as Debrief;

  it('saves version N+1 and analyses each record with the version in force when it began', async () => {
    const before = await lowEtco2Record(t);
    const old = await debrief(before);
    // 5 mmHg is below the 10 mmHg default (AHA 2020 adult ALS; Sandroni 2018 — summary).
    expect(old.profile).toMatchObject({ version: 1, thresholds: { lowEtco2MmHg: 10 } });
    expect(old.findings.map((f) => f.kind)).toContain('etco2-low');

    // 3 mmHg is more than 2× below the default: saved only with a confirmation and a reason.
    const saved = await save(
      { lowEtco2MmHg: 3 },
      { lowEtco2MmHg: { confirmed: true, reason: 'Local audit trial 2026' } },
    );
    expect(saved.status).toBe(201);
    expect(saved.body).toMatchObject({ version: 2, thresholds: { lowEtco2MmHg: 3 } });

    const again = await debrief(before);
    expect(again.profile).toMatchObject({ version: 1, thresholds: { lowEtco2MmHg: 10 } });
    expect(again.findings.map((f) => f.kind)).toEqual(old.findings.map((f) => f.kind));

    const after = await lowEtco2Record(t);
    const fresh = await debrief(after);
    expect(fresh.profile).toMatchObject({ version: 2, thresholds: { lowEtco2MmHg: 3 } });
    // Under the new 3 mmHg limit, 5 mmHg is no longer low.
    expect(fresh.findings.map((f) => f.kind)).not.toContain('etco2-low');

    const list = await t
      .http()
      .get(`/api/protocol-profiles?siteId=${demoSiteId}`)
      .set(...(await t.as('admin')));
    expect(list.body.items.map((p: { version: number }) => p.version)).toEqual([2, 1]);
    const audit = await t.db('auditLog').where({ action: 'profile.create' }).first();
    expect(audit.details).toMatchObject({
      version: 2,
      changed: ['lowEtco2MmHg'],
      changes: { lowEtco2MmHg: { from: 10, to: 3, reason: 'Local audit trial 2026' } },
    });
  });

  it('the database refuses to edit a saved version', async () => {
    await expect(
      t.db('protocolProfiles').where({ siteId: demoSiteId, version: 1 }).update({ name: 'edited' }),
    ).rejects.toThrow(/immutable/);
  });

  it('rejects impossible thresholds with 400 naming the field, its range and unit', async () => {
    const count = async () =>
      (await t.db('protocolProfiles').count<{ c: number }[]>({ c: '*' }))[0].c;
    const n = await count();
    const low = await save({ lowEtco2MmHg: 0 });
    expect(low.status).toBe(400);
    expect(low.body.details).toEqual([
      { path: 'thresholds.lowEtco2MmHg', message: 'Low EtCO2 must be between 1 mmHg and 40 mmHg' },
    ]);
    const pause = await save({ pauseMaxSec: 900 });
    expect(pause.body.details[0]).toEqual({
      path: 'thresholds.pauseMaxSec',
      message: 'Longest acceptable pause must be between 2 s and 120 s',
    });
    const text = await save({ riseMmHg: 'ten' });
    expect(text.body.details[0]).toEqual({
      path: 'thresholds.riseMmHg',
      message: 'EtCO2 rise size: enter a number',
    });
    // Epinephrine every 3–5 min (AHA 2020): the shortest interval cannot exceed the longest.
    const order = await save({ epinephrineMinSec: 300, epinephrineMaxSec: 180 });
    expect(order.body.details[0].path).toBe('thresholds.epinephrineMaxSec');
    const unknown = await save({ madeUpSec: 4 });
    expect(unknown.status).toBe(400);
    expect(await count()).toBe(n);
  });

  it('refuses a profile for a site the admin does not manage', async () => {
    const res = await t
      .http()
      .post('/api/protocol-profiles')
      .set(...(await t.as('admin')))
      .send({ siteId: randomUUID(), name: 'x', thresholds: thresholdDefaults });
    expect(res.status).toBe(403);
  });
  const profileCount = async () =>
    Number((await t.db('protocolProfiles').count<{ c: string }[]>({ c: '*' }))[0].c);

  it('refuses paediatric epinephrine 1 mg/kg (100× the guideline) with 400 naming the field', async () => {
    const n = await profileCount();
    // AHA paediatric drug table (Kleinman 2010, Table 1; AHA 2020 keeps it): 0.01 mg/kg IV/IO.
    const res = await save(
      { paediatricEpinephrineMgPerKg: 1 },
      { paediatricEpinephrineMgPerKg: { confirmed: true, reason: 'typo test' } },
    );
    expect(res.status).toBe(400);
    expect(res.body.details[0]).toEqual({
      path: 'thresholds.paediatricEpinephrineMgPerKg',
      message: 'Epinephrine dose must be between 0.001 mg/kg and 0.1 mg/kg',
    });
    expect(await profileCount()).toBe(n);
  });

  it('asks for a confirmation and a reason for 0.03 mg/kg, then keeps the reason and old → new in the audit', async () => {
    const n = await profileCount();
    const bare = await save({ paediatricEpinephrineMgPerKg: 0.03 });
    expect(bare.status).toBe(400);
    expect(bare.body.details).toEqual([
      {
        path: 'confirmations.paediatricEpinephrineMgPerKg',
        message:
          'Epinephrine dose: 0.03 mg/kg is more than 2 times away from the guideline default (0.01 mg/kg). Confirm it and give a local source or reason.',
      },
    ]);
    const noReason = await save(
      { paediatricEpinephrineMgPerKg: 0.03 },
      { paediatricEpinephrineMgPerKg: { confirmed: true, reason: ' ' } },
    );
    expect(noReason.status).toBe(400);
    expect(noReason.body.details[0].path).toBe('confirmations.paediatricEpinephrineMgPerKg.reason');
    expect(await profileCount()).toBe(n);

    const ok = await save(
      { paediatricEpinephrineMgPerKg: 0.03, paediatricFirstShockJPerKg: 4 },
      { paediatricEpinephrineMgPerKg: { confirmed: true, reason: 'Pharmacy protocol PX-12' } },
    );
    expect(ok.status).toBe(201);
    expect(ok.body.localSources).toEqual({
      paediatricEpinephrineMgPerKg: 'Pharmacy protocol PX-12',
    });
    const audit = await t
      .db('auditLog')
      .where({ action: 'profile.create', entityId: ok.body.id })
      .first();
    // ERC 2021 paediatric (summary): 4 J/kg for every shock — within 2× of 2 J/kg, no reason needed.
    expect(audit.details.changes).toEqual({
      // Back to the default from the 3 mmHg of the first test's version.
      lowEtco2MmHg: { from: 3, to: 10 },
      paediatricEpinephrineMgPerKg: { from: 0.01, to: 0.03, reason: 'Pharmacy protocol PX-12' },
      paediatricFirstShockJPerKg: { from: 2, to: 4 },
    });
  });
});
