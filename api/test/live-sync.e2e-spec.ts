import { randomUUID } from 'node:crypto';
import { aResuscitation, anEtco2, anEvent } from './factories';
import { demoSiteId, demoUnits, startTestApp, type TestApp } from './test-app';

type Role = 'recorder' | 'lead' | 'quality' | 'admin';

describe('live recording: context, roster, merging tablets, replays', () => {
  let t: TestApp;
  let auth: (role: Role) => Promise<[string, string]>;
  beforeAll(async () => {
    t = await startTestApp();
    auth = async (role) => ['Authorization', `Bearer ${await t.tokenFor(role)}`];
  });
  afterAll(() => t.close());

  async function create(role: Role = 'recorder') {
    const rec = aResuscitation();
    await t
      .http()
      .post('/api/resuscitations')
      .set(...(await auth(role)))
      .send(rec)
      .expect(201);
    return rec;
  }

  const post = async (id: string, path: string, body: object, device: string, offset = '0') =>
    t
      .http()
      .post(`/api/resuscitations/${id}/${path}`)
      .set(...(await auth('recorder')))
      .set('X-Device-Id', device)
      .set('X-Clock-Offset-Ms', offset)
      .send(body);

  it.each<Role>(['recorder', 'lead', 'quality', 'admin'])(
    'gives the %s their sites with units, EtCO2 unit, thresholds and the server time',
    async (role) => {
      const before = Date.now();
      const res = await t
        .http()
        .get('/api/context')
        .set(...(await auth(role)));
      expect(res.status).toBe(200);
      expect(res.body.sites).toHaveLength(1);
      const [site] = res.body.sites;
      expect(site.id).toBe(demoSiteId);
      expect(site.etco2Unit).toBe('mmHg');
      expect(site.units.map((u: { id: string }) => u.id).sort()).toEqual(
        demoUnits.map((u) => u.id).sort(),
      );
      // AHA 2020 paediatric: epinephrine 0.01 mg/kg (from memory; the seeded profile's default).
      expect(site.profile.thresholds.paediatricEpinephrineMgPerKg).toBe(0.01);
      const serverMs = Date.parse(res.body.serverTime);
      expect(serverMs).toBeGreaterThanOrEqual(before - 5);
      expect(serverMs).toBeLessThanOrEqual(Date.now() + 5);
    },
  );

  it('refuses the context without a token', async () => {
    expect((await t.http().get('/api/context')).status).toBe(401);
  });

  it('stores a roster on the record and returns it; a bad member is named and nothing saved', async () => {
    const rec = await create();
    const roster = [
      { name: 'A. Lead', role: 'lead', email: 'a.lead@kestrel.test' },
      { name: 'B. Compressor', role: 'compressor' },
    ];
    const ok = await t
      .http()
      .patch(`/api/resuscitations/${rec.id}`)
      .set(...(await auth('recorder')))
      .send({ roster });
    expect(ok.status).toBe(200);
    expect(ok.body.roster).toEqual(roster);
    const bad = await t
      .http()
      .patch(`/api/resuscitations/${rec.id}`)
      .set(...(await auth('recorder')))
      .send({ roster: [{ name: 'C', role: 'chef' }] });
    expect(bad.status).toBe(400);
    expect(bad.body.details[0].path).toBe('roster.0.role');
    const got = await t
      .http()
      .get(`/api/resuscitations/${rec.id}`)
      .set(...(await auth('lead')));
    expect(got.body.roster).toEqual(roster);
  });

  it('merges two tablets recording the same code into one time-ordered record', async () => {
    const rec = await create();
    const a = [
      anEvent('arrest', 0),
      anEvent('compressions-start', 4),
      anEvent('shock', 70, { energyJ: 200 }),
    ];
    const b = [
      anEvent('access', 30, { route: 'io' }),
      anEvent('drug', 95, { drug: 'epinephrine', dose: 1, unit: 'mg' }),
    ];
    // Tablet B syncs first, with a late clock; tablet A afterwards.
    expect(
      (await post(rec.id, 'events/batch', { events: b }, 'tablet-b', '-1500')).body.accepted,
    ).toBe(2);
    expect(
      (await post(rec.id, 'events/batch', { events: a }, 'tablet-a', '250')).body.accepted,
    ).toBe(3);
    await post(rec.id, 'etco2/batch', { samples: [anEtco2(50, 14)] }, 'tablet-b');
    await post(rec.id, 'etco2/batch', { samples: [anEtco2(20, 9)] }, 'tablet-a');
    const got = await t
      .http()
      .get(`/api/resuscitations/${rec.id}`)
      .set(...(await auth('lead')));
    expect(got.body.events.map((e: { kind: string }) => e.kind)).toEqual([
      'arrest',
      'compressions-start',
      'access',
      'shock',
      'drug',
    ]);
    expect(got.body.events.map((e: { deviceId: string }) => e.deviceId)).toEqual([
      'tablet-a',
      'tablet-a',
      'tablet-b',
      'tablet-a',
      'tablet-b',
    ]);
    expect(got.body.etco2.map((s: { value: number }) => s.value)).toEqual([9, 14]);
    const offsets = await t
      .db('resuscitationEvents')
      .where({ resuscitationId: rec.id })
      .select('deviceId', 'clockOffsetMs');
    expect(new Set(offsets.map((o) => `${o.deviceId}:${o.clockOffsetMs}`))).toEqual(
      new Set(['tablet-a:250', 'tablet-b:-1500']),
    );
  });

  it("gives a tablet only what the server received since its last ask (other tablets' taps)", async () => {
    const rec = await create();
    const entries = async (since?: string) =>
      t
        .http()
        .get(`/api/resuscitations/${rec.id}/entries`)
        .query(since ? { since } : {})
        .set(...(await auth('recorder')));
    await post(rec.id, 'events/batch', { events: [anEvent('arrest', 0)] }, 'tablet-a');
    await post(rec.id, 'etco2/batch', { samples: [anEtco2(20, 9)] }, 'tablet-a');
    const first = await entries();
    expect(first.status).toBe(200);
    expect(first.body.events.map((e: { kind: string }) => e.kind)).toEqual(['arrest']);
    expect(first.body.etco2).toMatchObject([{ value: 9, unit: 'mmHg', deviceId: 'tablet-a' }]);

    const dose = anEvent('drug', 95, { drug: 'epinephrine', dose: 1, unit: 'mg' });
    await post(rec.id, 'events/batch', { events: [dose] }, 'tablet-b');
    const next = await entries(first.body.serverTime);
    expect(next.body.events).toEqual([
      { id: dose.id, at: dose.at, kind: 'drug', data: dose.data, deviceId: 'tablet-b' },
    ]);
    expect(next.body.etco2).toEqual([]);
    expect(Date.parse(next.body.serverTime)).toBeGreaterThanOrEqual(
      Date.parse(first.body.serverTime),
    );

    const bad = await entries('yesterday');
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.details)).toContain('since');
  });

  it('loses nothing and duplicates nothing when a response is lost mid-sync and the tablet resends', async () => {
    const rec = await create();
    const events = Array.from({ length: 30 }, (_, i) => anEvent('note', i, { text: `n${i}` }));
    const samples = Array.from({ length: 10 }, (_, i) => anEtco2(i * 6, 8 + i));
    // The server stored the first half, then the connection dropped before the tablet heard back.
    await post(rec.id, 'events/batch', { events: events.slice(0, 15) }, 'tablet-a');
    await post(rec.id, 'etco2/batch', { samples: samples.slice(0, 4) }, 'tablet-a');
    // The tablet resends everything it has not had acknowledged, three times over.
    for (let i = 0; i < 3; i++) {
      const ev = await post(rec.id, 'events/batch', { events }, 'tablet-a');
      const et = await post(rec.id, 'etco2/batch', { samples }, 'tablet-a');
      expect(ev.body).toEqual({
        accepted: i === 0 ? 15 : 0,
        duplicates: i === 0 ? 15 : 30,
        rejected: [],
      });
      expect(et.body).toEqual({
        accepted: i === 0 ? 6 : 0,
        duplicates: i === 0 ? 4 : 10,
        rejected: [],
      });
    }
    const [{ n }] = await t
      .db('resuscitationEvents')
      .where({ resuscitationId: rec.id })
      .count({ n: '*' });
    const [{ m }] = await t.db('etco2Samples').where({ resuscitationId: rec.id }).count({ m: '*' });
    expect([Number(n), Number(m)]).toEqual([30, 10]);
  });

  it('refuses an event id already used by another record, keeping the valid ones', async () => {
    const first = await create();
    const second = await create();
    const shared = anEvent('rosc', 10);
    await post(first.id, 'events/batch', { events: [shared] }, 'tablet-a');
    const res = await post(
      second.id,
      'events/batch',
      { events: [shared, anEvent('rosc', 12)] },
      'tablet-a',
    );
    expect(res.body.accepted).toBe(1);
    expect(res.body.rejected).toEqual([
      { id: shared.id, reason: expect.stringMatching(/another record/) },
    ]);
    expect(randomUUID()).not.toBe(shared.id);
  });
});
