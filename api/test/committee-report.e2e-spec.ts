import { execFileSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { ControlChartResponse, UtsteinSummary } from '@upstroke/contracts';
import { binaryBody } from './binary-body';
import { type FixtureRow, insertFixture } from './quality-fixtures';
import { demoSiteId, demoUnits, startTestApp, type TestApp } from './test-app';

const [ed] = demoUnits.map((u) => u.id);
const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'upstroke-committee-'));

/** `count` invented records in a month, the first `rosc` with ROSC. */
function monthRows(
  siteId: string,
  unitId: string | null,
  month: string,
  count: number,
  rosc: number,
  cf = 0.6,
) {
  return Array.from({ length: count }, (_, i): FixtureRow => ({
    id: randomUUID(),
    siteId,
    unitId,
    arrestAt: `${month}-${String(10 + i).padStart(2, '0')}T12:00:00Z`,
    shockable: i % 3 === 0,
    witnessed: true,
    outcome: i < rosc ? 'rosc-sustained' : 'died',
    anyRosc: i < rosc,
    sustainedRosc: i < rosc,
    compressionFraction: cf + i / 100,
    fractionGe10: null,
    timeToFirstShockSec: i % 3 === 0 ? 90 + 10 * i : null,
    timeToFirstEpinephrineSec: i % 3 === 0 ? null : 100 + 10 * i,
    preshockLongCount: 0,
    etco2Documented: i % 2 === 0,
  }));
}

// Emergency: 3 of 10 with ROSC each month, January to September 2025, then 10 of 10 in
// October (the month reported). Another site has 6 records in October the user may not see.
const months = ['01', '02', '03', '04', '05', '06', '07', '08', '09'];
const october = monthRows(demoSiteId, ed, '2025-10', 10, 10);
const otherSite = randomUUID();
const rows = [
  ...months.flatMap((m, i) => monthRows(demoSiteId, ed, `2025-${m}`, 10, 3, 0.6 + (i % 3) / 50)),
  ...october,
  ...monthRows(otherSite, null, '2025-10', 6, 0),
];

const squash = (s: string) => s.replace(/\s+/g, ' ');
const pct = (v: number | null) => (v === null ? '—' : `${(v * 100).toFixed(1)} %`);

describe('monthly committee report', () => {
  let t: TestApp;
  const auth = async (role: 'recorder' | 'lead' | 'quality' | 'admin') =>
    ['Authorization', `Bearer ${await t.tokenFor(role)}`] as [string, string];
  const get = async (url: string, role: 'recorder' | 'lead' | 'quality' | 'admin' = 'quality') =>
    t
      .http()
      .get(url)
      .set(...(await auth(role)));

  async function reportText(query: string, role: 'quality' | 'admin' = 'quality') {
    const header = await auth(role);
    const res = await t
      .http()
      .get(`/api/trends/monthly-report.pdf?${query}`)
      .set(...header)
      .buffer(true)
      .parse(binaryBody);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const file = path.join(tmp, `${randomUUID()}.pdf`);
    fs.writeFileSync(file, res.body as Buffer);
    return squash(execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }));
  }

  beforeAll(async () => {
    t = await startTestApp();
    await t.db('sites').insert({ id: otherSite, name: 'Elsewhere Hospital' });
    await insertFixture(t.db, rows);
    // October's queue: 2 reviewed, 1 needing follow-up, 7 awaiting; and one draft.
    const review = async (id: string, status: string) =>
      t
        .http()
        .post(`/api/reviews/${id}`)
        .set(...(await auth('quality')))
        .send({ status, comment: 'Looked at by the committee' })
        .expect(201);
    await review(october[0].id, 'reviewed');
    await review(october[1].id, 'reviewed');
    await review(october[2].id, 'needs-follow-up');
    await t.db('resuscitations').insert({
      id: randomUUID(),
      siteId: demoSiteId,
      unitId: ed,
      arrestAt: '2025-10-30T08:00:00Z',
    });
  });
  afterAll(async () => {
    await t.close();
    if (!process.env.KEEP_PDF) fs.rmSync(tmp, { recursive: true, force: true });
  });

  it("prints the Trends API's figures for the month: charts, signals, Utstein, review queue", async () => {
    const text = await reportText(`month=2025-10&unitId=${ed}`);
    const window = `from=2024-11-01&to=2025-11-01&unitId=${ed}`;
    for (const measure of ['anyRosc', 'compressionFractionMet', 'etco2Documented']) {
      const api = await get(`/api/trends/control-chart?measure=${measure}&${window}`);
      const c = api.body as ControlChartResponse;
      const p = c.points.find((q) => q.month === '2025-10')!;
      expect(text).toContain(
        `2025-10: ${pct(p.value)} (${p.x} of ${p.n}); centre ${pct(c.centre)}; limits ${pct(p.lower)} to ${pct(p.upper)}`,
      );
      for (const s of c.signals) expect(text).toContain(squash(`${s.month}: ${s.explanation}`));
    }
    const rosc = (await get(`/api/trends/control-chart?measure=anyRosc&${window}`))
      .body as ControlChartResponse;
    // The fixture: 10 of 10 in October against 30 % before; the API flags it, so must the PDF.
    expect(rosc.points.find((q) => q.month === '2025-10')).toMatchObject({ x: 10, n: 10 });
    expect(rosc.signals.length).toBeGreaterThan(0);
    const u = (await get(`/api/trends/utstein?from=2025-10-01&to=2025-11-01&unitId=${ed}`))
      .body as UtsteinSummary;
    expect(u.total).toBe(10);
    for (const line of u.lines) {
      const share = line.percent === null ? '—' : `${line.percent.toFixed(1)} %`;
      expect(text).toContain(`${line.label} ${line.count} ${share}`);
    }
    expect(text).toContain('Signed records Awaiting review Needs follow-up Reviewed Drafts');
    expect(text).toMatch(/Drafts not yet signed 10 7 1 2 1/);
  });

  it('keeps a scoped user to their own sites, and audits the download as an export', async () => {
    const text = await reportText('month=2025-10');
    expect(text).toContain('Kestrel Bay');
    expect(text).not.toContain('Elsewhere Hospital');
    expect(text).toContain('Treated arrests 10 100.0 %');
    const refused = await get(`/api/trends/monthly-report.pdf?month=2025-10&siteId=${otherSite}`);
    expect(refused.status).toBe(403);
    const audit = await t
      .db('auditLog')
      .where({ action: 'export.pdf', entity: 'committee-report' });
    expect(audit.length).toBeGreaterThanOrEqual(1);
    expect(audit[0].details).toMatchObject({ query: { month: '2025-10' } });
  });

  it('answers 400 naming the field for a bad month or baseline, 403 for other roles', async () => {
    for (const month of ['2025-13', '2025-1', 'october', '']) {
      const res = await get(`/api/trends/monthly-report.pdf?month=${month}`);
      expect(res.status).toBe(400);
      expect(res.body.details[0].path).toBe('month');
    }
    const missing = await get('/api/trends/monthly-report.pdf');
    expect(missing.status).toBe(400);
    const baseline = await get('/api/trends/monthly-report.pdf?month=2025-10&baselineFrom=2023-01');
    expect(baseline.status).toBe(400);
    expect(baseline.body.details[0].path).toBe('baselineFrom');
    for (const role of ['recorder', 'lead'] as const) {
      expect((await get('/api/trends/monthly-report.pdf?month=2025-10', role)).status).toBe(403);
    }
    await reportText('month=2025-10', 'admin');
  });
});
