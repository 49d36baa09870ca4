import { randomUUID } from 'node:crypto';
import { thresholdDefaults } from '@upstroke/contracts';
import { aResuscitation, anEtco2, anEvent } from '../factories';
import { monitorCsv } from '../monitor-files';
import { demoSiteId, demoUnits, type TestApp } from '../test-app';

const ARREST = Date.parse('2026-03-04T10:00:00Z');
const at = (sec: number) => new Date(ARREST + sec * 1000).toISOString();

/** Real ids the fuzzed routes start from (a hostile id replaces one now and then). */
export interface FuzzIds {
  /** A fresh open record with entries and an import, one per route that writes to it. */
  record: () => Promise<{ id: string; importId: string }>;
  signed: { id: string; importId: string };
  user: string;
  profile: string;
  mail: string;
}

async function openRecord(t: TestApp): Promise<{ id: string; importId: string }> {
  const lead = ['Authorization', `Bearer ${await t.tokenFor('lead')}`] as const;
  const rec = aResuscitation();
  const url = `/api/resuscitations/${rec.id}`;
  await t
    .http()
    .post('/api/resuscitations')
    .set(...lead)
    .send(rec)
    .expect(201);
  const events = [anEvent('arrest', 0), anEvent('compressions-start', 5), anEvent('rosc', 300)];
  await t
    .http()
    .post(`${url}/events/batch`)
    .set(...lead)
    .send({ events })
    .expect(201);
  const file = monitorCsv({ startIso: at(60), durationSec: 10, sampleRateHz: 25 });
  const imp = await t
    .http()
    .post(`${url}/imports`)
    .set(...lead)
    .attach('file', Buffer.from(file), 'monitor.csv')
    .expect(201);
  return { id: rec.id, importId: (imp.body as { id: string }).id };
}

export async function fuzzIds(t: TestApp): Promise<FuzzIds> {
  const signedRec = await openRecord(t);
  await t
    .http()
    .patch(`/api/resuscitations/${signedRec.id}`)
    .set('Authorization', `Bearer ${await t.tokenFor('lead')}`)
    .send({ outcome: 'rosc-sustained', firstRhythm: 'vf', witnessed: true, monitored: true })
    .expect(200);
  await t
    .http()
    .post(`/api/resuscitations/${signedRec.id}/sign`)
    .set('Authorization', `Bearer ${await t.tokenFor('lead')}`)
    .expect(200);
  const admin = `Bearer ${await t.tokenFor('admin')}`;
  const user = await t
    .http()
    .post('/api/users')
    .set('Authorization', admin)
    .send({
      email: 'fuzz.target@kestrel.test',
      name: 'Fuzz Target',
      role: 'recorder',
      siteIds: [demoSiteId],
    })
    .expect(201);
  const profile = await t.db('protocolProfiles').where({ siteId: demoSiteId }).first('id');
  const mail = await t.db('mailSinkMessages').first('id');
  return {
    record: () => openRecord(t),
    signed: signedRec,
    user: (user.body as { id: string }).id,
    profile: (profile as { id: string }).id,
    mail: String((mail as { id?: unknown } | undefined)?.id ?? 1),
  };
}

const event = (kind: string, sec: number, data: Record<string, unknown> = {}) =>
  anEvent(kind, sec, data);

/** A valid body per write route (OpenAPI key): the fuzz test mutates it. Others get `{}`. */
export const validBodies: Record<string, () => unknown> = {
  'POST /api/auth/login': () => ({ email: 'lead@kestrel.test', password: 'upstroke-demo' }),
  'POST /api/auth/set-password': () => ({ token: 'x'.repeat(40), password: 'correct-horse-9' }),
  'POST /api/resuscitations': () =>
    aResuscitation({
      arrestAt: new Date(Date.now() - 3_600_000).toISOString(),
      location: 'Bay 1',
      patientRef: 'MRN-FUZZ',
      ageGroup: 'adult',
      weightKg: 70,
    }),
  'PATCH /api/resuscitations/{id}': () => ({
    location: 'Bay 2',
    weightKg: 70,
    arrestAt: at(0),
    outcome: 'rosc-sustained',
    notesWentWell: 'Early defibrillation',
    roster: [{ name: 'Dr Caskey', role: 'lead', email: 'lead@kestrel.test' }],
  }),
  'POST /api/resuscitations/{id}/events/batch': () => ({
    events: [
      event('note', 10, { text: 'Family informed' }),
      event('drug', 20, { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'iv' }),
      event('correction', 30, {
        supersedes: randomUUID(),
        replacement: { kind: 'shock', data: { energyJ: 150 }, at: at(25) },
      }),
    ],
  }),
  'POST /api/resuscitations/{id}/etco2/batch': () => ({ samples: [anEtco2(60, 30)] }),
  'POST /api/resuscitations/{id}/waveform/batch': () => ({
    chunks: [
      { id: randomUUID(), startAt: at(60), sampleRateHz: 25, unit: 'mmHg', seq: 0, values: [1, 2] },
    ],
  }),
  'POST /api/resuscitations/{id}/discards': () => ({
    reason: 'Entered on the wrong code',
    items: [
      {
        id: randomUUID(),
        kind: 'events',
        refusal: 'at: more than 24 h after the arrest',
        content: '{"kind":"note","data":{"text":"Wrong code"}}',
      },
    ],
  }),
  'POST /api/resuscitations/{id}/amendments': () => ({
    reason: 'A second line was placed and not entered',
    events: [{ id: randomUUID(), at: at(250), kind: 'note', data: { text: 'Second IV line' } }],
    fields: { weightKg: 72 },
  }),
  'POST /api/resuscitations/{id}/email': () => ({
    recipients: ['team@kestrel.test'],
    message: 'Thanks, all.',
  }),
  'PATCH /api/resuscitations/{id}/imports/{importId}': () => ({ offsetSec: 30 }),
  'POST /api/users': () => ({
    email: `fuzz.${randomUUID().slice(0, 8)}@kestrel.test`,
    name: 'Fuzz Person',
    role: 'recorder',
    siteIds: [demoSiteId],
  }),
  'PATCH /api/users/{id}': () => ({
    name: 'Fuzz Renamed',
    role: 'recorder',
    siteIds: [demoSiteId],
    active: true,
  }),
  'POST /api/sites': () => ({
    name: 'Fuzz Site',
    etco2Unit: 'mmHg',
    paperSize: 'A4',
    locale: 'en-GB',
    timeZone: 'Europe/London',
    clock: '24h',
    mailDomains: ['kestrel.test'],
    units: ['Emergency department'],
  }),
  'PATCH /api/sites/{id}': () => ({ name: 'Kestrel Bay Regional Hospital', paperSize: 'A4' }),
  'POST /api/sites/{id}/units': () => ({ name: 'Fuzz unit' }),
  'PATCH /api/sites/{id}/units/{unitId}': () => ({ name: demoUnits[0].name }),
  'POST /api/protocol-profiles': () => ({
    siteId: demoSiteId,
    name: 'Fuzz profile',
    thresholds: { ...thresholdDefaults },
  }),
  'POST /api/reviews/{resuscitationId}': () => ({ status: 'reviewed', comment: 'Discussed' }),
};

/** Routes whose record must be signed for the handler to go past its first check. */
export const needsSigned = new Set([
  'POST /api/resuscitations/{id}/amendments',
  'POST /api/resuscitations/{id}/email',
  'GET /api/reviews/{resuscitationId}',
  'POST /api/reviews/{resuscitationId}',
  'GET /api/resuscitations/{id}/report.pdf',
  'GET /api/resuscitations/{id}/fhir',
]);

/** Upload routes: a monitor file with one line made hostile. */
export const uploadRoutes = new Set(['POST /api/resuscitations/{id}/imports']);

export function monitorFileLines(): string[] {
  return monitorCsv({ startIso: at(60), durationSec: 4, sampleRateHz: 25 }).split('\n');
}
