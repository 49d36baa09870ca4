import { randomUUID } from 'node:crypto';
import { synthCapnogram } from '@upstroke/capno';
import { aResuscitation, anEtco2, anEvent } from './factories';
import type { TestApp } from './test-app';

const ARREST = Date.parse('2026-03-04T10:00:00Z');

/**
 * An invented record with something to find: low EtCO2 during compressions, a long
 * pre-shock pause, epinephrine, ROSC; optionally a capnogram streamed in 10-s chunks.
 */
export async function recordWithFindings(t: TestApp, token: string, withWaveform = false) {
  const rec = aResuscitation({ location: 'Bay 4', patientRef: 'MRN-TEST-1' });
  const set = ['Authorization', `Bearer ${token}`] as const;
  await t
    .http()
    .post('/api/resuscitations')
    .set(...set)
    .send(rec)
    .expect(201);
  const events = [
    anEvent('arrest', 0, { witnessed: true }),
    anEvent('compressions-start', 10),
    anEvent('rhythm', 15, { rhythm: 'vf' }),
    anEvent('compressions-stop', 120),
    anEvent('shock', 140, { energyJ: 200 }),
    anEvent('compressions-start', 142),
    anEvent('drug', 200, { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'iv' }),
    anEvent('airway', 230, { device: 'tracheal-tube', confirmation: 'waveform-capnography' }),
    anEvent('compressions-stop', 400),
    anEvent('rosc', 405),
    anEvent('end', 500, { reason: 'rosc-sustained' }),
  ];
  const url = `/api/resuscitations/${rec.id}`;
  await t
    .http()
    .post(`${url}/events/batch`)
    .set(...set)
    .send({ events })
    .expect(201);
  // 5 mmHg during two minutes of compressions: below the 10 mmHg default (AHA 2020; Sandroni 2018).
  const samples = [20, 40, 60, 80, 100, 120, 200, 260, 320, 380].map((s, i) =>
    anEtco2(s, i < 6 ? 5 : 25),
  );
  await t
    .http()
    .post(`${url}/etco2/batch`)
    .set(...set)
    .send({ samples })
    .expect(201);
  if (withWaveform) {
    const rate = 50;
    const s = synthCapnogram({
      seed: 7,
      durationSec: 270,
      sampleRateHz: rate,
      levels: [
        [0, 14],
        [270, 28],
      ],
      compressions: [[0, 170]],
    });
    const values = Array.from(s.values, (v) => Math.round(v * 100) / 100);
    const chunks = [];
    for (let k = 0; k < values.length; k += rate * 10) {
      chunks.push({
        id: randomUUID(),
        startAt: new Date(ARREST + (230 + k / rate) * 1000).toISOString(),
        sampleRateHz: rate,
        unit: 'mmHg',
        seq: chunks.length,
        values: values.slice(k, k + rate * 10),
      });
    }
    await t
      .http()
      .post(`${url}/waveform/batch`)
      .set(...set)
      .send({ chunks })
      .expect(201);
  }
  return { rec, events, url };
}

/** The same record, closed with the Utstein core details and signed by the lead. */
export async function signedRecord(t: TestApp, withWaveform = false) {
  const lead = await t.tokenFor('lead');
  const made = await recordWithFindings(t, lead, withWaveform);
  const set = ['Authorization', `Bearer ${lead}`] as const;
  await t
    .http()
    .patch(made.url)
    .set(...set)
    .send({
      outcome: 'died',
      firstRhythm: 'vf',
      witnessed: true,
      monitored: true,
      roster: [
        { name: 'A. Lead', role: 'lead', email: 'a.lead@kestrel.test' },
        { name: 'B. Airway', role: 'airway' },
      ],
    })
    .expect(200);
  await t
    .http()
    .post(`${made.url}/sign`)
    .set(...set)
    .expect(200);
  return made;
}
