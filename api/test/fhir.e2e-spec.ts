import { signedRecord } from './debrief-fixtures';
import { startTestApp, type TestApp } from './test-app';

type Json = Record<string, unknown>;

/**
 * Required elements (cardinality 1..1 / 1..*) of the R4 resources the export writes, from
 * the HL7 FHIR R4 resource pages (hl7.org/fhir/R4/<resource>.html; REFERENCE.md: FHIR R4,
 * checked / memory). `effective` and `medication` are choice elements: one [x] variant.
 */
const required: Record<string, string[]> = {
  Patient: [],
  Encounter: ['status', 'class'],
  Condition: ['subject'],
  Procedure: ['status', 'subject'],
  MedicationAdministration: ['status', 'medication[x]', 'subject', 'effective[x]'],
  Observation: ['status', 'code'],
};
const allowedStatus: Record<string, string[]> = {
  Encounter: [
    'planned',
    'arrived',
    'triaged',
    'in-progress',
    'onleave',
    'finished',
    'cancelled',
    'entered-in-error',
    'unknown',
  ],
  Procedure: [
    'preparation',
    'in-progress',
    'not-done',
    'on-hold',
    'stopped',
    'completed',
    'entered-in-error',
    'unknown',
  ],
  MedicationAdministration: [
    'in-progress',
    'not-done',
    'on-hold',
    'completed',
    'entered-in-error',
    'stopped',
    'unknown',
  ],
  Observation: [
    'registered',
    'preliminary',
    'final',
    'amended',
    'corrected',
    'cancelled',
    'entered-in-error',
    'unknown',
  ],
};

function problems(r: Json): string[] {
  const type = String(r.resourceType);
  const need = required[type];
  if (!need) return [`unexpected resourceType ${type}`];
  const out: string[] = [];
  for (const el of need) {
    const present = el.endsWith('[x]')
      ? Object.keys(r).some((k) => k.startsWith(el.slice(0, -3)) && k.length > el.length - 3)
      : r[el] !== undefined && r[el] !== null;
    if (!present) out.push(`${type}.${el} missing`);
  }
  if (allowedStatus[type] && !allowedStatus[type].includes(String(r.status)))
    out.push(`${type}.status ${String(r.status)} not in the R4 value set`);
  // R4 MedicationAdministration.context references an Encounter (or EpisodeOfCare).
  if (type === 'MedicationAdministration' && !(r.context as Json | undefined)?.reference)
    out.push('MedicationAdministration.context missing');
  return out;
}

describe('FHIR R4 Bundle', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('is a collection of structurally valid, Encounter-linked resources with the right codes', async () => {
    const { url, events } = await signedRecord(t, true);
    const res = await t
      .http()
      .get(`${url}/fhir`)
      .set('Authorization', `Bearer ${await t.tokenFor('lead')}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^application\/fhir\+json/);
    const bundle = JSON.parse(res.text) as {
      resourceType: string;
      type: string;
      entry: { fullUrl: string; resource: Json }[];
    };
    expect(bundle.resourceType).toBe('Bundle');
    expect(bundle.type).toBe('collection');
    const all = bundle.entry.flatMap((e) => problems(e.resource));
    expect(all).toEqual([]);
    const byType = (type: string) =>
      bundle.entry.filter((e) => e.resource.resourceType === type).map((e) => e.resource);
    const encounterUrl = bundle.entry.find((e) => e.resource.resourceType === 'Encounter')?.fullUrl;
    expect(encounterUrl).toMatch(
      /^urn:uuid:[0-9a-f]{8}-[0-9a-f]{4}-5[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/,
    );
    const fullUrls = new Set(bundle.entry.map((e) => e.fullUrl));
    expect(fullUrls.size).toBe(bundle.entry.length);

    // SNOMED CT 410429000 Cardiac arrest (disorder) (REFERENCE.md, checked).
    const [condition] = byType('Condition');
    expect(condition.code).toMatchObject({
      coding: [{ system: 'http://snomed.info/sct', code: '410429000' }],
    });
    // SNOMED CT 89666000 Cardiopulmonary resuscitation (REFERENCE.md, checked / memory).
    const procedures = byType('Procedure');
    expect(procedures.some((p) => JSON.stringify(p.code).includes('"89666000"'))).toBe(true);
    const shocks = events.filter((e) => e.kind === 'shock').length;
    expect(procedures).toHaveLength(1 + shocks);
    const meds = byType('MedicationAdministration');
    expect(meds).toHaveLength(events.filter((e) => e.kind === 'drug').length);
    for (const m of meds) expect((m.context as Json).reference).toBe(encounterUrl);

    const observations = byType('Observation');
    for (const o of observations) {
      // LOINC 19891-1 CO2 [Partial pressure] in exhaled gas at end expiration (REFERENCE.md, checked).
      expect(o.code).toMatchObject({ coding: [{ system: 'http://loinc.org', code: '19891-1' }] });
      expect((o.encounter as Json).reference).toBe(encounterUrl);
    }
    const values = observations.filter((o) => o.valueQuantity);
    expect(values).toHaveLength(10);
    // UCUM code for millimetres of mercury is mm[Hg] (REFERENCE.md, checked).
    for (const v of values)
      expect(v.valueQuantity).toMatchObject({
        system: 'http://unitsofmeasure.org',
        code: 'mm[Hg]',
      });
    const wave = observations.find((o) => o.valueSampledData)?.valueSampledData as Json;
    // R4 SampledData: origin, period (ms between samples), dimensions are required; 50 Hz → 20 ms.
    expect(wave).toMatchObject({ origin: { code: 'mm[Hg]' }, period: 20, dimensions: 1 });
    expect(String(wave.data).split(' ')).toHaveLength(270 * 50);

    // Deterministic: a second export gives the same fullUrls.
    const again = await t
      .http()
      .get(`${url}/fhir`)
      .set('Authorization', `Bearer ${await t.tokenFor('quality')}`);
    expect((JSON.parse(again.text) as typeof bundle).entry.map((e) => e.fullUrl)).toEqual(
      bundle.entry.map((e) => e.fullUrl),
    );
  });
});
