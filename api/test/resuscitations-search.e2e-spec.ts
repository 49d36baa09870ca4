import { aResuscitation } from './factories';
import { demoUnits, startTestApp, type TestApp } from './test-app';

type Item = { id: string; location: string | null; unitName: string | null; status: string };

describe('finding a record: search, filters and pages', () => {
  let t: TestApp;
  const ids: Record<string, string> = {};
  const list = async (query: string, role: 'lead' | 'recorder' = 'lead') =>
    t
      .http()
      .get(`/api/resuscitations?${query}`)
      .set('Authorization', `Bearer ${await t.tokenFor(role)}`);

  beforeAll(async () => {
    t = await startTestApp();
    const make = async (name: string, role: 'lead' | 'recorder', o: Record<string, unknown>) => {
      const body = aResuscitation(o);
      ids[name] = body.id;
      const res = await t
        .http()
        .post('/api/resuscitations')
        .set('Authorization', `Bearer ${await t.tokenFor(role)}`)
        .send(body);
      expect(res.status).toBe(201);
    };
    await make('bay', 'lead', { location: 'Bay 50% side', arrestAt: '2026-03-04T10:00:00Z' });
    await make('ward', 'recorder', {
      location: 'Side room',
      unitId: demoUnits[1].id,
      arrestAt: '2026-03-05T10:00:00Z',
    });
    await make('other', 'recorder', { location: 'Corridor', arrestAt: '2026-03-06T10:00:00Z' });
    await t.db('resuscitations').where({ id: ids.other }).update({ status: 'closed' });
  });
  afterAll(() => t.close());

  it('searches location and unit name, with % matching itself', async () => {
    const res = await list('q=50%25');
    expect(res.status).toBe(200);
    expect(res.body.items.map((r: Item) => r.id)).toEqual([ids.bay]);
    const byUnit = await list(`q=${encodeURIComponent(demoUnits[1].name.toUpperCase())}`);
    expect(byUnit.body.items.map((r: Item) => r.id)).toContain(ids.ward);
    expect(byUnit.body.items[0].unitName).toBe(demoUnits[1].name);
  });

  it('filters by unit, date, status, signed and mine', async () => {
    const unit = await list(`unitId=${demoUnits[1].id}`);
    expect(unit.body.items.map((r: Item) => r.id)).toEqual([ids.ward]);
    const day = await list('from=2026-03-05T00:00:00Z&to=2026-03-06T00:00:00Z');
    expect(day.body.items.map((r: Item) => r.id)).toEqual([ids.ward]);
    const closed = await list('status=closed');
    expect(closed.body.items.map((r: Item) => r.id)).toEqual([ids.other]);
    const unsigned = await list('signed=unsigned');
    expect(unsigned.body.total).toBe(3);
    expect((await list('signed=signed')).body.total).toBe(0);
    const mine = await list('mine=true');
    expect(mine.body.items.map((r: Item) => r.id)).toEqual([ids.bay]);
    const theirs = await list('mine=true', 'recorder');
    expect(theirs.body.items.map((r: Item) => r.id).sort()).toEqual([ids.ward, ids.other].sort());
  });

  it('pages newest first, with the total of every page', async () => {
    const first = await list('limit=2&offset=0');
    const second = await list('limit=2&offset=2');
    expect(first.body.total).toBe(3);
    expect(first.body.items.map((r: Item) => r.id)).toEqual([ids.other, ids.ward]);
    expect(second.body.items.map((r: Item) => r.id)).toEqual([ids.bay]);
  });

  it.each([
    ['limit=0', 'limit'],
    ['offset=-1', 'offset'],
    ['unitId=ward-6b', 'unitId'],
    ['signed=maybe', 'signed'],
    ['mine=yes', 'mine'],
    ['from=2026-03-06T00:00:00Z&to=2026-03-05T00:00:00Z', 'to'],
    [`q=${'x'.repeat(101)}`, 'q'],
    ['sort=name', ''],
  ])('answers 400 naming the field for %s', async (query, field) => {
    const res = await list(query);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain(field);
  });
});
