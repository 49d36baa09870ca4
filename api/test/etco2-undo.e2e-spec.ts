import { aResuscitation, anEtco2, anEvent } from './factories';
import { startTestApp, type TestApp } from './test-app';

/**
 * Live's Undo of a typed EtCO2 value is a correction event that supersedes the value's id:
 * the value stays stored (nothing is deleted) and leaves the analysis, the chart series and
 * the exports; the correction is listed with the events.
 */
describe('a typed EtCO2 value taken back by a correction', () => {
  let t: TestApp;
  let bearer: string;
  beforeAll(async () => {
    t = await startTestApp();
    bearer = `Bearer ${await t.tokenFor('recorder')}`;
  });
  afterAll(() => t.close());

  it('is stored, listed as corrected, and no longer analysed', async () => {
    const rec = aResuscitation();
    const http = () => t.http();
    await http().post('/api/resuscitations').set('Authorization', bearer).send(rec).expect(201);
    const kept = anEtco2(60, 25);
    const wrong = anEtco2(90, 81);
    const undo = anEvent('correction', 95, {
      supersedes: wrong.id,
      reason: 'Undo on the Live screen',
    });
    const base = `/api/resuscitations/${rec.id}`;
    await http()
      .post(`${base}/etco2/batch`)
      .set('Authorization', bearer)
      .send({ samples: [kept, wrong] })
      .expect(201);
    const events = [anEvent('compressions-start', 5), undo];
    const res = await http()
      .post(`${base}/events/batch`)
      .set('Authorization', bearer)
      .send({ events });
    expect(res.body).toEqual({ accepted: 2, duplicates: 0, rejected: [] });

    const record = await http().get(base).set('Authorization', bearer).expect(200);
    expect(record.body.etco2.map((v: { id: string }) => v.id).sort()).toEqual(
      [kept.id, wrong.id].sort(),
    );
    const debrief = await http().get(`${base}/debrief`).set('Authorization', bearer).expect(200);
    const series = debrief.body.etco2Series as { tSec: number; mmHg: number }[];
    expect(series.map((p) => p.mmHg)).toEqual([25]);
    expect(debrief.body.events.map((e: { kind: string }) => e.kind)).toContain('correction');
  });
});
