import { randomUUID } from 'node:crypto';
import { aResuscitation, anEtco2, anEvent } from './factories';
import { startTestApp, type TestApp } from './test-app';

describe('resuscitations and sync', () => {
  let t: TestApp;
  let auth: (role: 'recorder' | 'lead' | 'quality' | 'admin') => Promise<[string, string]>;
  beforeAll(async () => {
    t = await startTestApp();
    auth = async (role) => ['Authorization', `Bearer ${await t.tokenFor(role)}`];
  });
  afterAll(() => t.close());

  it('creates a record once: a replay returns it unchanged', async () => {
    const body = aResuscitation({ location: 'Bay 3' });
    const first = await t
      .http()
      .post('/api/resuscitations')
      .set(...(await auth('recorder')))
      .send(body);
    expect(first.status).toBe(201);
    const again = await t
      .http()
      .post('/api/resuscitations')
      .set(...(await auth('recorder')))
      .send({ ...body, location: 'Bay 9' });
    expect(again.status).toBe(200);
    expect(again.body.location).toBe('Bay 3');
    expect(await t.db('resuscitations').where({ id: body.id }).count({ n: '*' })).toEqual([
      { n: 1 },
    ]);
  });

  it('refuses a site the user does not belong to and names a bad field', async () => {
    const other = await t
      .http()
      .post('/api/resuscitations')
      .set(...(await auth('recorder')))
      .send(aResuscitation({ siteId: randomUUID() }));
    expect(other.status).toBe(403);
    const bad = await t
      .http()
      .post('/api/resuscitations')
      .set(...(await auth('recorder')))
      .send(aResuscitation({ arrestAt: 'yesterday' }));
    expect(bad.status).toBe(400);
    expect(bad.body.details[0].path).toBe('arrestAt');
  });

  it('stores a batch of events exactly once, however often it is replayed', async () => {
    const rec = aResuscitation();
    await t
      .http()
      .post('/api/resuscitations')
      .set(...(await auth('recorder')))
      .send(rec);
    const events = [
      anEvent('arrest', 0, { witnessed: true }),
      anEvent('compressions-start', 5),
      anEvent('shock', 60, { energyJ: 200 }),
    ];
    const url = `/api/resuscitations/${rec.id}/events/batch`;
    const first = await t
      .http()
      .post(url)
      .set(...(await auth('recorder')))
      .set('X-Clock-Offset-Ms', '-1200')
      .send({ events });
    expect(first.body).toEqual({ accepted: 3, duplicates: 0, rejected: [] });
    for (let i = 0; i < 3; i += 1) {
      const replay = await t
        .http()
        .post(url)
        .set(...(await auth('recorder')))
        .send({ events });
      expect(replay.body).toEqual({ accepted: 0, duplicates: 3, rejected: [] });
    }
    const stored = await t.db('resuscitationEvents').where({ resuscitationId: rec.id });
    expect(stored).toHaveLength(3);
    expect(stored.every((e: { clockOffsetMs: number }) => e.clockOffsetMs === -1200)).toBe(true);
  });

  it('keeps the valid items of a batch and names the invalid one with its reason', async () => {
    const rec = aResuscitation();
    await t
      .http()
      .post('/api/resuscitations')
      .set(...(await auth('recorder')))
      .send(rec);
    const bad = anEvent('shock', 30, { energyJ: -5 });
    const res = await t
      .http()
      .post(`/api/resuscitations/${rec.id}/events/batch`)
      .set(...(await auth('recorder')))
      .send({ events: [anEvent('compressions-start', 2), bad] });
    expect(res.body.accepted).toBe(1);
    expect(res.body.rejected).toEqual([
      { id: bad.id, reason: expect.stringContaining('data.energyJ') },
    ]);
  });

  it('stores EtCO2 in its unit and in mmHg (1 kPa = 7.50062 mmHg, definition of the mmHg)', async () => {
    const rec = aResuscitation();
    await t
      .http()
      .post('/api/resuscitations')
      .set(...(await auth('lead')))
      .send(rec);
    const kpa = anEtco2(60, 1.9, 'kPa');
    const res = await t
      .http()
      .post(`/api/resuscitations/${rec.id}/etco2/batch`)
      .set(...(await auth('lead')))
      .send({ samples: [kpa, anEtco2(90, 12)] });
    expect(res.body).toEqual({ accepted: 2, duplicates: 0, rejected: [] });
    const row = await t.db('etco2Samples').where({ id: kpa.id }).first();
    expect(row.valueMmhg).toBeCloseTo(14.25, 2); // 1.9 kPa → 14.25 mmHg (REFERENCE.md, checked)
    const record = await t
      .http()
      .get(`/api/resuscitations/${rec.id}`)
      .set(...(await auth('quality')));
    expect(record.body.etco2).toHaveLength(2);
  });

  it('lets quality read but never write, and hides other sites', async () => {
    const rec = aResuscitation();
    await t
      .http()
      .post('/api/resuscitations')
      .set(...(await auth('recorder')))
      .send(rec);
    const write = await t
      .http()
      .post(`/api/resuscitations/${rec.id}/events/batch`)
      .set(...(await auth('quality')))
      .send({ events: [] });
    expect(write.status).toBe(403);
    const list = await t
      .http()
      .get('/api/resuscitations?status=open')
      .set(...(await auth('quality')));
    expect(list.body.total).toBeGreaterThanOrEqual(1);
    expect(list.body.items.every((r: { status: string }) => r.status === 'open')).toBe(true);
  });

  it('keeps events append-only in the database itself', async () => {
    const rec = aResuscitation();
    await t
      .http()
      .post('/api/resuscitations')
      .set(...(await auth('recorder')))
      .send(rec);
    const e = anEvent('rosc', 300);
    await t
      .http()
      .post(`/api/resuscitations/${rec.id}/events/batch`)
      .set(...(await auth('recorder')))
      .send({ events: [e] });
    await expect(
      t.db('resuscitationEvents').where({ id: e.id }).update({ kind: 'note' }),
    ).rejects.toThrow(/append-only/);
    await expect(t.db('resuscitationEvents').where({ id: e.id }).delete()).rejects.toThrow(
      /append-only/,
    );
  });
});
