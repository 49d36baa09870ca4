import { randomUUID } from 'node:crypto';
import { aResuscitation, anEtco2, anEvent } from './factories';
import { startTestApp, type TestApp } from './test-app';

/** Hostile or implausible items are refused one by one; the good ones of a batch are kept. */
describe('plausibility bounds on writes', () => {
  let t: TestApp;
  let bearer: string;
  beforeAll(async () => {
    t = await startTestApp();
    bearer = `Bearer ${await t.tokenFor('lead')}`;
  });
  afterAll(() => t.close());

  const post = (url: string, body: object) =>
    t.http().post(url).set('Authorization', bearer).send(body);

  async function newRecord(overrides: Record<string, unknown> = {}) {
    const rec = aResuscitation(overrides);
    expect((await post('/api/resuscitations', rec)).status).toBe(201);
    return rec.id as string;
  }

  function deep(levels: number): Record<string, unknown> {
    let v: Record<string, unknown> = { leaf: 1 };
    for (let i = 0; i < levels; i += 1) v = { v };
    return v;
  }

  const hostileEvents: [string, Record<string, unknown>, RegExp][] = [
    ['NUL in a note', anEvent('note', 10, { text: 'a\u0000b' }), /NUL/],
    ['lone surrogate', anEvent('note', 10, { text: 'x\ud800y' }), /surrogate/],
    ['year 0000', { ...anEvent('rosc', 10), at: '0000-01-01T00:00:00Z' }, /year/],
    ['50 years later', { ...anEvent('rosc', 10), at: '2076-03-04T10:00:00Z' }, /24 h after/],
    ['2 h before', anEvent('rosc', -7200), /1 h before/],
    [
      '10,000 g of epinephrine',
      anEvent('drug', 20, { drug: 'epinephrine', dose: 10000, unit: 'g' }),
      /dose/,
    ],
    [
      'nesting deeper than 20',
      anEvent('correction', 30, {
        supersedes: randomUUID(),
        replacement: { kind: 'note', data: deep(25), at: '2026-03-04T10:00:30Z' },
      }),
      /deeper than 20/,
    ],
  ];

  it.each(hostileEvents)(
    'refuses an event with %s alone, storing the two good ones',
    async (_, bad, reason) => {
      const id = await newRecord();
      const good = [anEvent('arrest', 0), anEvent('compressions-start', 5)];
      const res = await post(`/api/resuscitations/${id}/events/batch`, {
        events: [good[0], bad, good[1]],
      });
      expect(res.status).toBe(201);
      expect(res.body.accepted).toBe(2);
      expect(res.body.rejected).toEqual([{ id: bad.id, reason: expect.stringMatching(reason) }]);
      const stored = await t.db('resuscitationEvents').where({ resuscitationId: id }).pluck('id');
      expect(stored.sort()).toEqual(good.map((e) => e.id).sort());
    },
  );

  it('refuses EtCO2 values outside the record window and waveform chunks out of range', async () => {
    const id = await newRecord();
    const etco2 = [anEtco2(60, 30), anEtco2(60 + 26 * 3600, 30), anEtco2(61, 32)];
    const e = await post(`/api/resuscitations/${id}/etco2/batch`, { samples: etco2 });
    expect(e.body).toMatchObject({ accepted: 2, rejected: [{ id: etco2[1].id }] });
    const chunk = (extra: Record<string, unknown>) => ({
      id: randomUUID(),
      startAt: '2026-03-04T10:01:00Z',
      sampleRateHz: 25,
      unit: 'mmHg',
      values: [1, 2, 3],
      ...extra,
    });
    const chunks = [
      chunk({ seq: 1 }),
      chunk({ seq: 2 ** 31 }),
      chunk({ values: [1, 1e39] }),
      chunk({ values: [-50] }),
      chunk({ values: [10000] }),
      chunk({ startAt: '2027-03-04T10:00:00Z' }),
    ];
    const w = await post(`/api/resuscitations/${id}/waveform/batch`, { chunks });
    expect(w.status).toBe(201);
    expect(w.body.accepted).toBe(1);
    expect(w.body.rejected.map((r: { id: string }) => r.id)).toEqual(
      chunks.slice(1).map((c) => c.id),
    );
    expect(await t.db('waveformChunks').where({ resuscitationId: id }).pluck('id')).toEqual([
      chunks[0].id,
    ]);
  });

  it('refuses a record with an implausible weight or arrest time', async () => {
    for (const bad of [
      { weightKg: 0.0001 },
      { weightKg: 400 },
      { arrestAt: '1900-01-01T00:00:00Z' },
      { arrestAt: '9999-01-01T00:00:00Z' },
      { arrestAt: new Date(Date.now() + 2 * 3600_000).toISOString() },
      { location: 'Bay\u00003' },
    ]) {
      const res = await post('/api/resuscitations', aResuscitation(bad));
      expect(res.status).toBe(400);
      expect(res.body.message).toMatch(/weightKg|arrestAt|location/);
    }
    expect((await post('/api/resuscitations', aResuscitation({ weightKg: 0.5 }))).status).toBe(201);
  });

  it('answers 400 to a wild clock offset and stores nothing of the batch', async () => {
    const id = await newRecord();
    for (const offset of ['2147483648', '-90000000', 'soon', '1e30']) {
      const res = await t
        .http()
        .post(`/api/resuscitations/${id}/events/batch`)
        .set('Authorization', bearer)
        .set('X-Clock-Offset-Ms', offset)
        .send({ events: [anEvent('arrest', 0)] });
      expect(res.status).toBe(400);
      expect(res.body.details[0].path).toBe('X-Clock-Offset-Ms');
      expect(res.body.message).toMatch(/tablet's date and time/);
    }
    expect(await t.db('resuscitationEvents').where({ resuscitationId: id })).toHaveLength(0);
  });

  it('refuses EtCO2 and waveform ids already used by another record, never as duplicates', async () => {
    const [a, b] = [await newRecord(), await newRecord()];
    const value = anEtco2(60, 30);
    await post(`/api/resuscitations/${a}/etco2/batch`, { samples: [value] });
    const res = await post(`/api/resuscitations/${b}/etco2/batch`, {
      samples: [value, anEtco2(61, 31)],
    });
    expect(res.body).toEqual({
      accepted: 1,
      duplicates: 0,
      rejected: [{ id: value.id, reason: expect.stringMatching(/another record/) }],
    });
  });

  it.each([
    '/api/trends?from=0000-01-01',
    '/api/trends/records?from=0000-01-01',
    '/api/trends/utstein?to=9999-13-01',
    '/api/trends/export.csv?from=0000-01-01T00:00:00Z',
    '/api/audit?from=0000-01-01T00:00:00Z',
    '/api/resuscitations?from=0000-01-01T00:00:00Z',
    '/api/resuscitations?status=open%00',
  ])('answers 400 to a date or text no record can hold: %s', async (url) => {
    const role = url.startsWith('/api/audit') ? 'admin' : 'lead';
    const res = await t
      .http()
      .get(url)
      .set('Authorization', `Bearer ${await t.tokenFor(role)}`);
    expect(res.status).toBe(400);
  });
});
