import { randomUUID } from 'node:crypto';
import { anEtco2, anEvent, aResuscitation } from './factories';
import { startTestApp, type TestApp } from './test-app';

const writers = 6;
const trials = 20;

/**
 * Signing while several tablets are still sending: every entry either commits before the
 * signature or is refused (409). The outcome must not depend on timing, so each trial signs
 * only once every writer has had a batch accepted, and checks the database afterwards.
 */
describe('signing is atomic with concurrent writers', () => {
  let t: TestApp;
  let lead: readonly [string, string];
  beforeAll(async () => {
    t = await startTestApp();
    lead = ['Authorization', `Bearer ${await t.tokenFor('lead')}`] as const;
  });
  afterAll(() => t.close());

  async function openRecord(): Promise<string> {
    const rec = aResuscitation();
    await t
      .http()
      .post('/api/resuscitations')
      .set(...lead)
      .send(rec)
      .expect(201);
    const closing = { outcome: 'died', firstRhythm: 'vf', witnessed: true, monitored: true };
    await t
      .http()
      .patch(`/api/resuscitations/${rec.id}`)
      .set(...lead)
      .send(closing)
      .expect(200);
    return rec.id;
  }

  /** Sends batches until the record refuses them; returns every status it got. */
  async function write(url: string, n: number, started: () => void): Promise<number[]> {
    const statuses: number[] = [];
    for (let i = 0; i < 200; i += 1) {
      const second = n * 1000 + i;
      const res =
        i % 3 === 2
          ? await t
              .http()
              .post(`${url}/waveform/batch`)
              .set(...lead)
              .send({ chunks: [chunk(second)] })
          : i % 3 === 1
            ? await t
                .http()
                .post(`${url}/etco2/batch`)
                .set(...lead)
                .send({ samples: [anEtco2(second, 30)] })
            : await t
                .http()
                .post(`${url}/events/batch`)
                .set(...lead)
                .send({
                  events: [anEvent('note', second, { text: `w${n} b${i}` })],
                });
      statuses.push(res.status);
      if (res.status === 201) started();
      if (res.status !== 201) break;
    }
    return statuses;
  }

  it(`holds across ${trials} trials of ${writers} writers and one signature`, async () => {
    for (let trial = 0; trial < trials; trial += 1) {
      const id = await openRecord();
      const url = `/api/resuscitations/${id}`;
      let ready = 0;
      let allStarted!: () => void;
      const gate = new Promise<void>((resolve) => (allStarted = resolve));
      const running = Array.from({ length: writers }, (_, n) => {
        let counted = false;
        return write(url, n, () => {
          if (counted) return;
          counted = true;
          ready += 1;
          if (ready === writers) allStarted();
        });
      });
      await gate;
      const sign = await t
        .http()
        .post(`${url}/sign`)
        .set(...lead);
      const statuses = (await Promise.all(running)).flat();
      expect(sign.status).toBe(200);
      expect(statuses.filter((s) => s !== 201 && s !== 409)).toEqual([]);
      const late = await t.db.raw<{ rows: { table: string; n: number }[] }>(
        `select 'events' as table, count(*)::int as n from resuscitation_events e
           join resuscitations r on r.id = e.resuscitation_id
          where r.id = ? and e.received_at > r.signed_at
         union all
         select 'etco2', count(*)::int from etco2_samples s
           join resuscitations r on r.id = s.resuscitation_id
          where r.id = ? and s.received_at > r.signed_at
         union all
         select 'waveform', count(*)::int from waveform_chunks w
           join resuscitations r on r.id = w.resuscitation_id
          where r.id = ? and w.received_at > r.signed_at`,
        [id, id, id],
      );
      expect({ trial, late: late.rows }).toEqual({
        trial,
        late: [
          { table: 'events', n: 0 },
          { table: 'etco2', n: 0 },
          { table: 'waveform', n: 0 },
        ],
      });
      // The committee's row was written by the signing transaction (same xmin as the record).
      const same = await t.db.raw<{ rows: { same: boolean }[] }>(
        `select s.xmin::text = r.xmin::text as same from record_summaries s
           join resuscitations r on r.id = s.resuscitation_id
          where s.resuscitation_id = ?`,
        [id],
      );
      expect(same.rows).toEqual([{ same: true }]);
    }
  });
});

function chunk(second: number) {
  const startAt = new Date(Date.parse('2026-03-04T10:00:00Z') + second * 1000).toISOString();
  return {
    id: randomUUID(),
    startAt,
    sampleRateHz: 25,
    unit: 'mmHg',
    seq: second,
    values: [30, 31],
  };
}
