import { randomUUID } from 'node:crypto';
import { synthCapnogram } from '@upstroke/capno';
import { aResuscitation, anEtco2, anEvent } from './factories';
import { monitorCsv } from './monitor-files';
import { demoSiteId, type TestApp } from './test-app';

const ARREST = Date.parse('2026-03-04T10:00:00Z');
const at = (sec: number) => new Date(ARREST + sec * 1000).toISOString();

/** A new version of the demo site's profile with one value changed; returns its id. */
async function profileVersion(t: TestApp, lowEtco2MmHg: number): Promise<string> {
  const latest = await t
    .db('protocolProfiles')
    .where({ siteId: demoSiteId })
    .orderBy('version', 'desc')
    .first();
  const id = randomUUID();
  await t.db('protocolProfiles').insert({
    id,
    siteId: demoSiteId,
    version: latest.version + 1,
    name: `Ward profile ${latest.version + 1}`,
    thresholds: JSON.stringify({ ...latest.thresholds, lowEtco2MmHg }),
  });
  return id;
}

/** The events: a shock corrected and the correction undone, a rhythm removed. */
function clinicalEvents() {
  const shock = anEvent('shock', 140, { energyJ: 150 });
  const asystole = anEvent('rhythm', 60, { rhythm: 'asystole' });
  const fix = anEvent('correction', 150, {
    supersedes: shock.id,
    replacement: { kind: 'shock', data: { energyJ: 200 }, at: at(140) },
  });
  return [
    anEvent('arrest', 0, { witnessed: true }),
    anEvent('compressions-start', 10),
    anEvent('rhythm', 15, { rhythm: 'vf' }),
    asystole,
    anEvent('correction', 70, { supersedes: asystole.id, reason: 'Entered on the wrong line' }),
    anEvent('compressions-stop', 120),
    shock,
    anEvent('compressions-start', 142),
    fix,
    // Undoes the correction: the 150 J shock stands.
    anEvent('correction', 160, { supersedes: fix.id }),
    anEvent('drug', 200, { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'iv' }),
    anEvent('airway', 230, { device: 'tracheal-tube', confirmation: 'waveform-capnography' }),
    anEvent('compressions-stop', 400),
    anEvent('rosc', 405),
    anEvent('end', 500, { reason: 'rosc-sustained' }),
  ];
}

/** A capnogram streamed from the bedside link in 10-s chunks, 230–500 s at 50 Hz. */
function streamChunks() {
  const rate = 50;
  const s = synthCapnogram({
    seed: 5,
    durationSec: 270,
    sampleRateHz: rate,
    levels: [
      [0, 12],
      [170, 16],
      [270, 30],
    ],
    compressions: [[0, 170]],
  });
  const values = Array.from(s.values, (v) => Math.round(v * 100) / 100);
  const chunks = [];
  for (let k = 0; k < values.length; k += rate * 10)
    chunks.push({
      id: randomUUID(),
      startAt: at(230 + k / rate),
      sampleRateHz: rate,
      unit: 'mmHg',
      seq: chunks.length,
      values: values.slice(k, k + rate * 10),
    });
  return chunks;
}

/**
 * One invented record with every path an output can take: a non-default profile version
 * (a later one exists), typed, streamed and imported EtCO2, a streamed capnogram, a
 * correction, an undone correction, signing and an amendment.
 */
export async function onePathRecord(t: TestApp) {
  const profileId = await profileVersion(t, 14);
  const token = await t.tokenFor('lead');
  const set = ['Authorization', `Bearer ${token}`] as const;
  const rec = aResuscitation({ location: 'Bay 2', patientRef: 'MRN-ONE-PATH' });
  await t
    .http()
    .post('/api/resuscitations')
    .set(...set)
    .send(rec)
    .expect(201);
  await profileVersion(t, 18);
  const url = `/api/resuscitations/${rec.id}`;
  const post = (p: string, body: object) =>
    t
      .http()
      .post(`${url}${p}`)
      .set(...set)
      .send(body)
      .expect(201);
  await post('/events/batch', { events: clinicalEvents() });
  // 6 mmHg typed during the first two minutes of compressions: under 14 mmHg (this profile).
  const typed = [20, 40, 60, 80, 100, 120].map((s) => anEtco2(s, 6));
  const streamed = [250, 300, 350].map((s) => ({ ...anEtco2(s, 13), source: 'stream' }));
  await post('/etco2/batch', { samples: [...typed, ...streamed] });
  await post('/waveform/batch', { chunks: streamChunks() });
  const file = monitorCsv({ startIso: at(160), durationSec: 40, sampleRateHz: 25, seed: 3 });
  await t
    .http()
    .post(`${url}/imports`)
    .set(...set)
    .attach('file', Buffer.from(file, 'utf8'), 'monitor.csv')
    .expect(201);
  await t
    .http()
    .patch(url)
    .set(...set)
    .send({ outcome: 'rosc-sustained', firstRhythm: 'vf', witnessed: true, monitored: true })
    .expect(200);
  await t
    .http()
    .post(`${url}/sign`)
    .set(...set)
    .expect(200);
  await post('/amendments', {
    reason: 'A second line was placed and not entered',
    events: [{ id: randomUUID(), at: at(250), kind: 'note', data: { text: 'Second IV line' } }],
  });
  return { url, id: rec.id as string, profileId, token };
}
