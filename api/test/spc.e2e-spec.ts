import { randomUUID } from 'node:crypto';
import type { ControlChartResponse, FunnelResponse } from '@upstroke/contracts';
import { type FixtureRow, insertFixture } from './quality-fixtures';
import { demoSiteId, demoUnits, startTestApp, type TestApp } from './test-app';

const [ed, icu, ward] = demoUnits.map((u) => u.id);

/** `count` records in a unit and month, the first `rosc` of them with ROSC (invented). */
function monthRows(unitId: string, month: string, count: number, rosc: number, cf: number) {
  return Array.from({ length: count }, (_, i): FixtureRow => ({
    id: randomUUID(),
    siteId: demoSiteId,
    unitId,
    arrestAt: `${month}-${String(10 + i).padStart(2, '0')}T12:00:00Z`,
    shockable: false,
    witnessed: true,
    outcome: i < rosc ? 'rosc-sustained' : 'died',
    anyRosc: i < rosc,
    sustainedRosc: i < rosc,
    compressionFraction: cf,
    fractionGe10: null,
    timeToFirstShockSec: null,
    timeToFirstEpinephrineSec: 100 + 10 * i,
    preshockLongCount: 0,
    etco2Documented: i % 2 === 0,
  }));
}

// Emergency: 10 codes a month, 3 with ROSC, January to September 2025; 10 of 10 in October;
// none in November (a gap); December 2 of 5 there and 0 of 4 on the ward. ICU: none at all.
const baselineMonths = ['01', '02', '03', '04', '05', '06', '07', '08', '09'];
const rows = [
  ...baselineMonths.flatMap((m, i) => monthRows(ed, `2025-${m}`, 10, 3, i % 2 ? 0.64 : 0.6)),
  ...monthRows(ed, '2025-10', 10, 10, 0.85),
  ...monthRows(ed, '2025-12', 5, 2, 0.85),
  ...monthRows(ward, '2025-12', 4, 0, 0.5),
];

/** Textbook p-chart limits, p̄ ± 3·√(p̄(1 − p̄)/n), clamped to [0, 1] (Benneyan 2003). */
const pLimits = (p: number, n: number) => {
  const h = 3 * Math.sqrt((p * (1 - p)) / n);
  return [Math.max(0, p - h), Math.min(1, p + h)];
};

describe('trends: control charts and funnel plots', () => {
  let t: TestApp;
  const as = async (role: 'recorder' | 'lead' | 'quality' | 'admin') =>
    ['Authorization', `Bearer ${await t.tokenFor(role)}`] as [string, string];
  const get = async (path: string, role: 'lead' | 'quality' | 'admin' = 'quality') =>
    t
      .http()
      .get(path)
      .set(...(await as(role)));

  beforeAll(async () => {
    t = await startTestApp();
    await insertFixture(t.db, rows);
  });
  afterAll(() => t.close());

  it('p-chart of ROSC: centre from the baseline, limits from each n, the gap and the signal', async () => {
    const res = await get(
      '/api/trends/control-chart?measure=anyRosc&baselineFrom=2025-01&baselineTo=2025-09',
    );
    expect(res.status).toBe(200);
    const c = res.body as ControlChartResponse;
    expect(c.kind).toBe('p');
    expect(c.baseline).toEqual({ from: '2025-01', to: '2025-09' });
    expect(c.centre).toBeCloseTo(27 / 90, 12);
    expect(c.points.map((p) => p.month)).toEqual([
      ...baselineMonths.map((m) => `2025-${m}`),
      '2025-10',
      '2025-11',
      '2025-12',
    ]);
    const [lo10, hi10] = pLimits(0.3, 10);
    expect(c.points[0]).toMatchObject({ x: 3, n: 10, value: 0.3, signal: false });
    expect(c.points[0].lower).toBeCloseTo(lo10, 12);
    expect(c.points[0].upper).toBeCloseTo(hi10, 12);
    const dec = c.points[11];
    expect(dec).toMatchObject({ x: 2, n: 9 });
    expect(dec.upper).toBeCloseTo(pLimits(0.3, 9)[1], 12);
    // November had no codes: a gap, never a zero.
    expect(c.points[10]).toMatchObject({ n: 0, value: null, lower: null, upper: null });
    // October: 10 of 10 is above 0.3 + 3·√(0.021) = 0.7347.
    expect(c.signals).toEqual([
      expect.objectContaining({ rule: 'beyond-limits', month: '2025-10', months: ['2025-10'] }),
    ]);
    expect(c.signals[0].explanation).toMatch(/month is above the upper control limit/);
    expect(c.points[9].signal).toBe(true);
    expect(c.rules.source).toMatch(/Nelson 1984/);
  });

  it('every point opens the records behind it', async () => {
    const c = (await get('/api/trends/control-chart?measure=anyRosc')).body as ControlChartResponse;
    const oct = c.points.find((p) => p.month === '2025-10')!;
    const records = await get(`/api/trends/records?${new URLSearchParams(oct.records)}`);
    expect(records.status).toBe(200);
    expect(records.body.total).toBe(10);
    expect(records.body.items.every((r: { anyRosc: boolean }) => r.anyRosc)).toBe(true);
    const dec = c.points.find((p) => p.month === '2025-12')!;
    const decRecords = await get(`/api/trends/records?${new URLSearchParams(dec.records)}`);
    expect(decRecords.body.total).toBe(dec.n);
  });

  it('without a baseline the centre is every month pooled', async () => {
    const c = (await get('/api/trends/control-chart?measure=anyRosc')).body as ControlChartResponse;
    expect(c.centre).toBeCloseTo(39 / 109, 12);
    expect(c.baseline).toEqual({ from: '2025-01', to: '2025-12' });
  });

  it('compression fraction ≥ target counts against the site profile target', async () => {
    const c = (await get('/api/trends/control-chart?measure=compressionFractionMet')).body;
    // Target 0.8: Meaney 2013 goal (REFERENCE.md, summary), the demo profile's default.
    expect(c.target).toBe(0.8);
    const dec = (c as ControlChartResponse).points[11];
    expect(dec).toMatchObject({ x: 5, n: 9 });
  });

  it('XmR chart of the monthly median compression fraction', async () => {
    const res = await get(
      '/api/trends/control-chart?measure=compressionFraction&baselineTo=2025-09',
    );
    const c = res.body as ControlChartResponse;
    expect(c.kind).toBe('xmr');
    const base = baselineMonths.map((_, i) => (i % 2 ? 0.64 : 0.6));
    const mean = base.reduce((s, v) => s + v, 0) / base.length;
    // Mean moving range of the baseline: every step is 0.04.
    const upper = mean + 2.66 * 0.04;
    expect(c.centre).toBeCloseTo(mean, 12);
    expect(c.points[0].upper).toBeCloseTo(upper, 12);
    expect(c.points[11].value).toBeCloseTo(0.85, 12); // median of 5 × 0.85 and 4 × 0.5
    expect(c.signals.map((s) => s.month)).toEqual(['2025-10', '2025-12']);
    const epi = (await get('/api/trends/control-chart?measure=timeToFirstEpinephrineSec')).body;
    expect(epi.points[0].records.firstRhythm).toBe('non-shockable');
    expect(epi.points[0].value).toBe(145); // median of 100, 110, … 190
  });

  it('funnel plot: every unit with its n, limits at 95 % and 99.8 % around the pooled share', async () => {
    const res = await get('/api/trends/funnel?measure=anyRosc');
    expect(res.status).toBe(200);
    const f = res.body as FunnelResponse;
    const p0 = 39 / 109;
    expect(f.target).toBeCloseTo(p0, 12);
    expect(f.total).toBe(109);
    const byId = new Map(f.points.map((p) => [p.id, p]));
    expect(new Set(byId.keys())).toEqual(new Set([ed, icu, ward]));
    expect(byId.get(icu)).toMatchObject({ n: 0, zone: 'no-data', p: null });
    const edPoint = byId.get(ed)!;
    expect(edPoint).toMatchObject({ x: 39, n: 105 });
    // z = 1.959964 and 3.090232, the normal quantiles (SciPy norm.ppf; Spiegelhalter 2005).
    const se = Math.sqrt((p0 * (1 - p0)) / 105);
    expect(edPoint.limits!.upper95).toBeCloseTo(p0 + 1.959964 * se, 9);
    expect(edPoint.limits!.lower998).toBeCloseTo(p0 - 3.090232 * se, 9);
    expect(byId.get(ward)).toMatchObject({ x: 0, n: 4, zone: 'within' });
    expect(f.curve.at(-1)!.n).toBe(105);
    const wardRecords = await get(
      `/api/trends/records?${new URLSearchParams(byId.get(ward)!.records!)}`,
    );
    expect(wardRecords.body.total).toBe(4);
    const sites = (await get('/api/trends/funnel?measure=etco2Documented&by=site', 'admin')).body;
    expect(sites.points).toHaveLength(1);
    expect(sites.points[0]).toMatchObject({ id: demoSiteId, n: 109 });
  });

  it('refuses bad input with a 400 naming the field, and keeps roles to their sites', async () => {
    const bad = await get('/api/trends/control-chart?measure=rosc');
    expect(bad.status).toBe(400);
    expect(bad.body.details[0].path).toBe('measure');
    const outside = await get('/api/trends/control-chart?measure=anyRosc&baselineFrom=2019-01');
    expect(outside.status).toBe(400);
    expect(outside.body.details[0].path).toBe('baselineFrom');
    const backwards = await get(
      '/api/trends/control-chart?measure=anyRosc&baselineFrom=2025-05&baselineTo=2025-02',
    );
    expect(backwards.status).toBe(400);
    expect(backwards.body.details[0].path).toBe('baselineTo');
    const noFunnelForMedians = await get('/api/trends/funnel?measure=compressionFraction');
    expect(noFunnelForMedians.status).toBe(400);
    const recorder = await t
      .http()
      .get('/api/trends/funnel?measure=anyRosc')
      .set(...(await as('recorder')));
    expect(recorder.status).toBe(403);
    const otherSite = await get(`/api/trends/funnel?measure=anyRosc&siteId=${randomUUID()}`);
    expect(otherSite.status).toBe(403);
  });

  it('an empty period answers an empty chart, not an error', async () => {
    const c = (await get('/api/trends/control-chart?measure=anyRosc&from=2030-01-01&to=2030-03-01'))
      .body as ControlChartResponse;
    expect(c.points.map((p) => [p.month, p.value])).toEqual([
      ['2030-01', null],
      ['2030-02', null],
    ]);
    expect(c.centre).toBeNull();
    expect(c.signals).toEqual([]);
  });
});
