import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { signedRecord } from './debrief-fixtures';
import { startTestApp, type TestApp } from './test-app';

type Json = Record<string, unknown>;
interface Bundle {
  entry: { fullUrl: string; resource: Json }[];
}

/**
 * An amendment corrects a drug's dose and time: bounds are checked (the drug's plausible dose,
 * the record's window), and the FHIR export marks the struck entry `entered-in-error` and
 * links its replacement to it with a Provenance; the PDF says what was replaced.
 */
describe('amending a dose and a time', () => {
  let t: TestApp;
  let url: string;
  let drug: { id: string; at: string };
  const auth = async () => ['Authorization', `Bearer ${await t.tokenFor('lead')}`] as const;
  const reason = 'Dose and time read from the drug chart';

  beforeAll(async () => {
    t = await startTestApp();
    const made = await signedRecord(t);
    url = made.url;
    drug = made.events.find((e) => e.kind === 'drug') as { id: string; at: string };
  });
  afterAll(() => t.close());

  const amend = async (dose: number, at: string) =>
    t
      .http()
      .post(`${url}/amendments`)
      .set(...(await auth()))
      .send({
        reason,
        events: [
          {
            id: randomUUID(),
            at: new Date().toISOString(),
            kind: 'correction',
            data: {
              supersedes: drug.id,
              reason,
              replacement: {
                kind: 'drug',
                data: { drug: 'epinephrine', dose, unit: 'mg', route: 'iv' },
                at,
              },
            },
          },
        ],
      });

  const minus60 = () => new Date(Date.parse(drug.at) - 60_000).toISOString();

  it('refuses a dose outside the drug range or a time outside the record window (400)', async () => {
    const tooMuch = await amend(10_000, drug.at);
    expect(tooMuch.status).toBe(400);
    expect(tooMuch.body.message).toMatch(/^events\.0\.data\.replacement\.data\.dose: /);
    const twoDaysLater = new Date(Date.parse(drug.at) + 48 * 3600_000).toISOString();
    const late = await amend(0.5, twoDaysLater);
    expect(late.status).toBe(400);
    expect(late.body.message).toMatch(/^events\.0\.data\.replacement\.at: .*24 h after/);
    expect(await t.db('amendments')).toHaveLength(0);
  });

  it('stores a valid correction; FHIR marks the struck dose entered-in-error and links the new one', async () => {
    expect((await amend(0.5, minus60())).status).toBe(201);
    const res = await t
      .http()
      .get(`${url}/fhir`)
      .set(...(await auth()));
    expect(res.status).toBe(200);
    const bundle = JSON.parse(res.text) as Bundle;
    const meds = bundle.entry.filter((e) => e.resource.resourceType === 'MedicationAdministration');
    // R4 MedicationAdministration.status: `entered-in-error` for the struck entry.
    const struck = meds.filter((m) => m.resource.status === 'entered-in-error');
    const kept = meds.filter((m) => m.resource.status === 'completed');
    expect(struck).toHaveLength(1);
    expect(kept).toHaveLength(1);
    expect(struck[0].resource).toMatchObject({
      effectiveDateTime: drug.at,
      dosage: { dose: { value: 1, unit: 'mg' } },
      note: [{ text: `Replaced: ${reason}` }],
    });
    expect(kept[0].resource).toMatchObject({
      effectiveDateTime: minus60(),
      dosage: { dose: { value: 0.5, unit: 'mg' } },
      note: [{ text: `Replaces an entry entered in error: ${reason}` }],
    });
    // R4 Provenance: target the replacement, entity role `revision` naming the struck one.
    const provenance = bundle.entry.filter((e) => e.resource.resourceType === 'Provenance');
    expect(provenance).toHaveLength(1);
    expect(provenance[0].resource).toMatchObject({
      target: [{ reference: kept[0].fullUrl }],
      entity: [{ role: 'revision', what: { reference: struck[0].fullUrl } }],
      activity: { coding: [{ code: 'UPDATE' }], text: 'Amended after signing' },
      reason: [{ text: reason }],
      agent: [{ who: { display: expect.any(String) } }],
    });
    expect(typeof provenance[0].resource.recorded).toBe('string');
  });

  it('prints the replacement with its new dose and time beside the struck entry', async () => {
    const res = await t
      .http()
      .get(`${url}/report.pdf`)
      .set(...(await auth()))
      .buffer(true)
      .parse((r, cb) => {
        const parts: Buffer[] = [];
        r.on('data', (c: Buffer) => parts.push(c));
        r.on('end', () => cb(null, Buffer.concat(parts)));
      });
    expect(res.status).toBe(200);
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'upstroke-amend-'));
    const file = path.join(dir, 'record.pdf');
    fs.writeFileSync(file, res.body as Buffer);
    const text = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    fs.rmSync(dir, { recursive: true, force: true });
    // The status column ("amendment 1") is printed between the words of the details.
    expect(text).toContain('Replaces Epinephrine 1 mg IV with Epinephrine 0.5 mg');
    // The fixture's drug at 10:03:20 (Europe/London, GMT in March), moved 60 s earlier.
    expect(text).toContain('IV at 10:02:20 — Dose and time read from the drug chart');
  });
});
