import { randomUUID } from 'node:crypto';
import { fixtureRows, insertFixture } from './quality-fixtures';
import { aResuscitation } from './factories';
import { startTestApp, type TestApp } from './test-app';

describe('review queue', () => {
  let t: TestApp;
  const rows = fixtureRows();
  const as = async (role: 'recorder' | 'lead' | 'quality' | 'admin') =>
    ['Authorization', `Bearer ${await t.tokenFor(role)}`] as [string, string];
  const queue = async () =>
    (
      await t
        .http()
        .get('/api/reviews')
        .set(...(await as('quality')))
    ).body as {
      items: { resuscitationId: string; arrestAt: string }[];
      total: number;
    };

  beforeAll(async () => {
    t = await startTestApp();
    await insertFixture(t.db, rows);
  });
  afterAll(() => t.close());

  it('lists signed records awaiting review, oldest first', async () => {
    const q = await queue();
    expect(q.total).toBe(rows.length);
    const times = q.items.map((i) => Date.parse(i.arrestAt));
    expect(times.every(Number.isFinite)).toBe(true);
    expect(times).toEqual([...times].sort((a, b) => a - b));
    expect(q.items.map((i) => i.resuscitationId).sort()).toEqual(rows.map((r) => r.id).sort());
    expect(q.items[0]).toMatchObject({ siteName: 'Kestrel Bay Regional Hospital', status: null });
  });

  it('records a status with a comment, keeps the history and shrinks the queue', async () => {
    const id = rows[0].id;
    const before = await queue();
    const first = await t
      .http()
      .post(`/api/reviews/${id}`)
      .set(...(await as('quality')))
      .send({ status: 'needs-follow-up', comment: 'Ask the team about the pre-shock pause' });
    expect(first.status).toBe(201);
    const done = await t
      .http()
      .post(`/api/reviews/${id}`)
      .set(...(await as('quality')))
      .send({ status: 'reviewed', comment: 'Discussed at the March meeting' });
    expect(done.body.items.map((r: { status: string }) => r.status)).toEqual([
      'reviewed',
      'needs-follow-up',
    ]);
    const after = await queue();
    expect(after.total).toBe(before.total - 1);
    expect(after.items.some((i) => i.resuscitationId === id)).toBe(false);
    // History is append-only in the database itself.
    await expect(t.db('recordReviews').where({ resuscitationId: id }).del()).rejects.toThrow(
      /append-only/,
    );
  });

  it('lets only quality write, names a bad field, refuses unsigned records', async () => {
    const id = rows[1].id;
    for (const role of ['recorder', 'lead', 'admin'] as const) {
      const res = await t
        .http()
        .post(`/api/reviews/${id}`)
        .set(...(await as(role)))
        .send({ status: 'reviewed', comment: '' });
      expect(res.status).toBe(403);
    }
    const bad = await t
      .http()
      .post(`/api/reviews/${id}`)
      .set(...(await as('quality')))
      .send({ status: 'done' });
    expect(bad.status).toBe(400);
    expect(bad.body.details[0].path).toBe('status');
    expect(await t.db('recordReviews').where({ resuscitationId: id })).toHaveLength(0);
    const open = aResuscitation();
    await t.db('resuscitations').insert(open);
    const unsigned = await t
      .http()
      .post(`/api/reviews/${open.id}`)
      .set(...(await as('quality')))
      .send({ status: 'reviewed' });
    expect(unsigned.status).toBe(409);
    const unknown = await t
      .http()
      .post(`/api/reviews/${randomUUID()}`)
      .set(...(await as('quality')))
      .send({ status: 'reviewed' });
    expect(unknown.status).toBe(404);
  });

  it('quality reads records of its sites but cannot change clinical data', async () => {
    const id = rows[2].id;
    const read = await t
      .http()
      .get(`/api/resuscitations/${id}`)
      .set(...(await as('quality')));
    expect(read.status).toBe(200);
    const patch = await t
      .http()
      .patch(`/api/resuscitations/${id}`)
      .set(...(await as('quality')))
      .send({ location: 'Bay 1' });
    expect(patch.status).toBe(403);
    const events = await t
      .http()
      .post(`/api/resuscitations/${id}/events/batch`)
      .set(...(await as('quality')))
      .send({ events: [] });
    expect(events.status).toBe(403);
    const other = aResuscitation({ siteId: randomUUID() });
    await t.db('sites').insert({ id: other.siteId, name: 'Far Away Hospital' });
    await t.db('resuscitations').insert({ ...other, unitId: null });
    const hidden = await t
      .http()
      .get(`/api/resuscitations/${other.id}`)
      .set(...(await as('quality')));
    expect(hidden.status).toBe(404);
  });
});
