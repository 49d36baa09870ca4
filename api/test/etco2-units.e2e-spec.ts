import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Debrief } from '@upstroke/contracts';
import { summaryText } from '../src/modules/debrief-mail/debrief-mail.service';
import { signedRecord } from './debrief-fixtures';
import { demoSiteId, startTestApp, type TestApp } from './test-app';

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'upstroke-units-'));
const squash = (s: string) => s.replace(/\s+/g, '');

function binary(
  res: { on: (e: string, cb: (c?: Buffer) => void) => void },
  cb: (e: Error | null, b: Buffer) => void,
) {
  const parts: Buffer[] = [];
  res.on('data', (c) => parts.push(c as Buffer));
  res.on('end', () => cb(null, Buffer.concat(parts)));
}

/**
 * A site that works in kPa reads kPa in the debrief's findings, the PDF and the e-mail.
 * The fixture's low values are 5 mmHg under the 10 mmHg default (AHA 2020 adult ALS; Sandroni
 * 2018 — summary); 1 kPa = 7.50062 mmHg by the definition of the mmHg (REFERENCE.md, checked),
 * so 10 mmHg = 1.3 kPa, 5 mmHg = 0.7 kPa and the 20 mmHg target (Meaney 2013) = 2.7 kPa.
 */
describe('EtCO2 in the site unit', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.db('sites').where({ id: demoSiteId }).update({ etco2Unit: 'mmHg' });
    await t.close();
    fs.rmSync(tmp, { recursive: true, force: true });
  });

  async function debriefAndPdf(url: string) {
    const set = ['Authorization', `Bearer ${await t.tokenFor('lead')}`] as const;
    const d = (
      await t
        .http()
        .get(`${url}/debrief`)
        .set(...set)
    ).body as Debrief;
    const res = await t
      .http()
      .get(`${url}/report.pdf`)
      .set(...set)
      .buffer(true)
      .parse(binary);
    expect(res.status).toBe(200);
    const file = path.join(tmp, `${path.basename(url)}.pdf`);
    fs.writeFileSync(file, res.body as Buffer);
    return { d, pdf: squash(execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' })) };
  }

  it('writes kPa in the findings, the PDF and the e-mail of a kPa site', async () => {
    await t.db('sites').where({ id: demoSiteId }).update({ etco2Unit: 'kPa' });
    const { url } = await signedRecord(t);
    const { d, pdf } = await debriefAndPdf(url);
    expect(d.record.etco2Unit).toBe('kPa');
    const low = d.findings.find((f) => f.kind === 'etco2-low');
    expect(low?.message).toMatch(
      /below 1\.3 kPa for \d+ s during compressions \(lowest 0\.7 kPa\)/,
    );
    for (const f of d.findings) expect(pdf).toContain(squash(f.message));
    expect(pdf).toContain(squash('CPR time EtCO2 ≥ 1.3 kPa'));
    expect(pdf).toContain(squash('CPR time EtCO2 ≥ target 2.7 kPa'));
    expect(pdf).toContain(squash('EtCO2 below 1.3 kPa'));
    // Values recorded in mmHg are listed in kPa, with the unit they came in beside them.
    expect(pdf).toContain(squash('0.7 kPa (recorded as 5 mmHg) (typed)'));
    expect(pdf.replace(/\(recordedas[\d.]+mmHg\)/g, '')).not.toMatch(/mmHg/);
    const mail = summaryText(d, 'http://localhost/debrief/x');
    // Six of the ten values during compressions are 5 mmHg, so the median is 5 mmHg = 0.7 kPa.
    expect(mail).toContain('EtCO2 median 0.7 kPa');
    expect(mail).toContain('CPR time EtCO2 ≥ 1.3 kPa');
    expect(mail).not.toMatch(/mmHg/);
  });

  it('keeps mmHg for an mmHg site', async () => {
    await t.db('sites').where({ id: demoSiteId }).update({ etco2Unit: 'mmHg' });
    const { url } = await signedRecord(t);
    const { d, pdf } = await debriefAndPdf(url);
    expect(d.findings.find((f) => f.kind === 'etco2-low')?.message).toMatch(/below 10 mmHg/);
    expect(pdf).toContain(squash('CPR time EtCO2 ≥ target 20 mmHg'));
    expect(pdf).not.toMatch(/kPa/);
  });
});
