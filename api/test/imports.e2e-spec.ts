import { aResuscitation, anEvent } from './factories';
import { monitorCsv } from './monitor-files';
import { startTestApp, type TestApp } from './test-app';

type Role = 'recorder' | 'lead' | 'quality' | 'admin';

describe('monitor file import', () => {
  let t: TestApp;
  const bearer = async (role: Role) => `Bearer ${await t.tokenFor(role)}`;
  const newRecord = async (events: object[] = []) => {
    const rec = aResuscitation();
    await t
      .http()
      .post('/api/resuscitations')
      .set('Authorization', await bearer('lead'))
      .send(rec);
    if (events.length > 0)
      await t
        .http()
        .post(`/api/resuscitations/${rec.id}/events/batch`)
        .set('Authorization', await bearer('lead'))
        .send({ events });
    return rec.id as string;
  };
  const upload = async (
    id: string,
    body: string | Buffer,
    role: Role = 'recorder',
    name = 'monitor.csv',
  ) =>
    t
      .http()
      .post(`/api/resuscitations/${id}/imports`)
      .set('Authorization', await bearer(role))
      .attach('file', Buffer.isBuffer(body) ? body : Buffer.from(body, 'utf8'), name);
  const stored = async (id: string) => {
    const count = async (table: string) =>
      Number((await t.db(table).where({ resuscitationId: id }).count({ n: '*' }))[0].n);
    return {
      imports: await count('imports'),
      chunks: await count('waveformChunks'),
      etco2: await count('etco2Samples'),
    };
  };

  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('imports a file: rows, chunks and per-breath EtCO2 at aligned times', async () => {
    const id = await newRecord();
    const csv = monitorCsv({
      startIso: '2026-03-04T10:00:00Z',
      durationSec: 120,
      sampleRateHz: 50,
    });
    const res = await upload(id, csv);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ rows: 6000, unit: 'mmHg', sampleRateHz: 50, offsetSec: 0 });
    expect(res.body.residualSec).toBeNull();
    // 10 ventilations/min in the synthetic file (capno synthDefaults): ~20 breaths in 2 min.
    expect(res.body.breaths).toBeGreaterThanOrEqual(17);
    expect(res.body.breaths).toBeLessThanOrEqual(21);
    const s = await stored(id);
    expect(s).toEqual({ imports: 1, chunks: 2, etco2: res.body.breaths });
    const chunk = await t
      .db('waveformChunks')
      .where({ resuscitationId: id })
      .orderBy('startAt')
      .first();
    expect(chunk.source).toBe('import');
    expect(chunk.importId).toBe(res.body.id);
    expect(chunk.samples.length).toBe(chunk.sampleCount * 4); // float32
    const list = await t
      .http()
      .get(`/api/resuscitations/${id}/imports`)
      .set('Authorization', await bearer('quality'));
    expect(list.body.total).toBe(1);
    expect(list.body.items[0].sha256).toMatch(/^[0-9a-f]{64}$/);
  });

  it('recognises the same file uploaded twice (409) and stores it once', async () => {
    const id = await newRecord();
    const csv = monitorCsv({ startIso: '2026-03-04T10:00:00Z', durationSec: 20, sampleRateHz: 50 });
    expect((await upload(id, csv)).status).toBe(201);
    const again = await upload(id, csv, 'recorder', 'renamed.csv');
    expect(again.status).toBe(409);
    expect(again.body.message).toMatch(/already imported/i);
    expect((await stored(id)).imports).toBe(1);
  });

  it('aligns a file whose clock is 97 s ahead from three shocks, within 1 s; the lead can adjust', async () => {
    const shocks = [125, 250, 371];
    const id = await newRecord(shocks.map((s) => anEvent('shock', s, { energyJ: 200 })));
    // Monitor clock 97 s ahead: its row for record time T is stamped T + 97 s. The file starts
    // at record time +60 s; markers sit a few hundred ms off the tablet's taps.
    const fileStart = new Date(Date.parse('2026-03-04T10:01:00Z') + 97_000).toISOString();
    const csv = monitorCsv({
      startIso: fileStart,
      durationSec: 360,
      sampleRateHz: 25,
      shocksSec: shocks.map((s, i) => s - 60 + [0.3, -0.4, 0.2][i]),
    });
    const res = await upload(id, csv);
    expect(res.status).toBe(201);
    expect(Math.abs(res.body.offsetSec - 97)).toBeLessThan(1);
    expect(res.body).toMatchObject({ offsetMethod: 'auto', markers: 3, matchedMarkers: 3 });
    expect(res.body.residualSec).toBeLessThan(1);
    const first = await t
      .db('waveformChunks')
      .where({ importId: res.body.id })
      .orderBy('startAt')
      .first();
    expect(Math.abs(first.startAt.getTime() - Date.parse('2026-03-04T10:01:00Z'))).toBeLessThan(
      1000,
    );

    const url = `/api/resuscitations/${id}/imports/${res.body.id}`;
    const byRecorder = await t
      .http()
      .patch(url)
      .set('Authorization', await bearer('recorder'))
      .send({ offsetSec: 90 });
    expect(byRecorder.status).toBe(403);
    const byLead = await t
      .http()
      .patch(url)
      .set('Authorization', await bearer('lead'))
      .send({ offsetSec: 90 });
    expect(byLead.status).toBe(200);
    expect(byLead.body).toMatchObject({ offsetSec: 90, offsetMethod: 'manual' });
    expect(byLead.body.offsetChosenBy).toBeTruthy();
    const moved = await t
      .db('waveformChunks')
      .where({ importId: res.body.id })
      .orderBy('startAt')
      .first();
    // 7 s less offset → samples 7 s later (aligned = file time − offset).
    expect(moved.startAt.getTime() - first.startAt.getTime()).toBeCloseTo(
      (res.body.offsetSec - 90) * 1000,
      -1,
    );
    const bad = await t
      .http()
      .patch(url)
      .set('Authorization', await bearer('lead'))
      .send({ offsetSec: 'soon' });
    expect(bad.status).toBe(400);
  });

  it('refuses imports on a signed record (409) and from roles without clinical writes', async () => {
    const id = await newRecord();
    const csv = monitorCsv({ startIso: '2026-03-04T10:00:00Z', durationSec: 10, sampleRateHz: 50 });
    expect((await upload(id, csv, 'quality')).status).toBe(403);
    await t.db('resuscitations').where({ id }).update({ status: 'signed', signedAt: new Date() });
    const res = await upload(id, csv, 'lead');
    expect(res.status).toBe(409);
    expect(await stored(id)).toEqual({ imports: 0, chunks: 0, etco2: 0 });
  });
});
