import { thresholdDefaults } from '@upstroke/contracts';
import { demoSiteId, demoUnits, demoUsers } from '../test-app';
import { type AdminTestApp, startAdminTestApp } from './admin-helpers';

const adminId = demoUsers.find((u) => u.role === 'admin')!.id;

describe('admin: sites and units, audit log, mail viewer', () => {
  let t: AdminTestApp;
  beforeAll(async () => {
    t = await startAdminTestApp();
  });
  afterAll(() => t.close());

  it('creates a site with its units, guideline profile v1 and the creator as member', async () => {
    const auth = await t.as('admin');
    const res = await t
      .http()
      .post('/api/sites')
      .set(...auth)
      .set('X-Device-Id', 'admin-desk-1')
      .send({
        name: 'Kestrel Bay Satellite Clinic',
        etco2Unit: 'kPa',
        paperSize: 'Letter',
        units: ['Day Surgery'],
      });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      etco2Unit: 'kPa',
      paperSize: 'Letter',
      units: [{ name: 'Day Surgery' }],
      profile: { version: 1, name: 'Guideline defaults' },
    });
    const profile = await t.db('protocolProfiles').where({ id: res.body.profile.id }).first();
    expect(profile.thresholds).toEqual(thresholdDefaults);
    const me = await t
      .http()
      .get('/api/auth/me')
      .set(...(await t.as('admin')));
    expect(me.body.siteIds).toContain(res.body.id);
    const dup = await t
      .http()
      .post('/api/sites')
      .set(...auth)
      .send({ name: 'kestrel bay satellite clinic', etco2Unit: 'mmHg', paperSize: 'A4' });
    expect(dup.status).toBe(409);
  });

  it('renames a site and a unit, keeping ids; refuses a unit name used twice', async () => {
    const auth = await t.as('admin');
    const site = await t
      .http()
      .patch(`/api/sites/${demoSiteId}`)
      .set(...auth)
      .send({ paperSize: 'Letter' });
    expect(site.body.paperSize).toBe('Letter');
    const unit = await t
      .http()
      .patch(`/api/sites/${demoSiteId}/units/${demoUnits[2].id}`)
      .set(...auth)
      .send({ name: 'Ward 6B (Cardiology)' });
    expect(unit.body.units.find((u: { id: string }) => u.id === demoUnits[2].id).name).toBe(
      'Ward 6B (Cardiology)',
    );
    const twice = await t
      .http()
      .post(`/api/sites/${demoSiteId}/units`)
      .set(...auth)
      .send({ name: 'emergency' });
    expect(twice.status).toBe(409);
    const blank = await t
      .http()
      .post(`/api/sites/${demoSiteId}/units`)
      .set(...auth)
      .send({ name: '  ' });
    expect(blank.body.details[0]).toEqual({ path: 'name', message: 'Enter the unit name' });
  });

  it('keeps each site’s language, time zone, clock and mail domains; refuses an unknown zone', async () => {
    const auth = await t.as('admin');
    const ok = await t
      .http()
      .patch(`/api/sites/${demoSiteId}`)
      .set(...auth)
      .send({ timeZone: 'Pacific/Auckland', clock: '12h', mailDomains: ['Kestrel.test'] });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({
      locale: 'en-GB',
      timeZone: 'Pacific/Auckland',
      clock: '12h',
      mailDomains: ['kestrel.test'],
    });
    const context = await t
      .http()
      .get('/api/context')
      .set(...auth);
    expect(context.body.sites[0].display).toEqual({
      locale: 'en-GB',
      timeZone: 'Pacific/Auckland',
      clock: '12h',
    });
    const bad = await t
      .http()
      .patch(`/api/sites/${demoSiteId}`)
      .set(...auth)
      .send({ timeZone: 'Atlantis/Capital' });
    expect(bad.status).toBe(400);
    expect(bad.body.details[0]).toEqual({
      path: 'timeZone',
      message: 'Enter a time zone such as Europe/London',
    });
    const after = await t.db('sites').where({ id: demoSiteId }).first();
    expect(after.timeZone).toBe('Pacific/Auckland');
    await t
      .db('sites')
      .where({ id: demoSiteId })
      .update({ timeZone: 'Europe/London', clock: '24h' });
  });

  it('lists the audit trail with filters and paging, and exports it as CSV', async () => {
    const auth = await t.as('admin');
    const all = await t
      .http()
      .get('/api/audit')
      .set(...auth);
    expect(all.status).toBe(200);
    expect(all.body.total).toBeGreaterThanOrEqual(4);
    const sites = await t
      .http()
      .get('/api/audit?entity=site&action=site.create')
      .set(...auth);
    expect(sites.body.items).toHaveLength(1);
    expect(sites.body.items[0]).toMatchObject({
      userId: adminId,
      userEmail: 'admin@kestrel.test',
      deviceId: 'admin-desk-1',
      details: { name: 'Kestrel Bay Satellite Clinic' },
    });
    const page = await t
      .http()
      .get('/api/audit?limit=1&offset=1')
      .set(...auth);
    expect(page.body.items).toHaveLength(1);
    expect(page.body.items[0].id).toBe(all.body.items[1].id);
    const future = await t
      .http()
      .get('/api/audit?from=2100-01-01T00:00:00Z')
      .set(...auth);
    expect(future.body).toEqual({ items: [], total: 0 });
    const bad = await t
      .http()
      .get('/api/audit?from=yesterday')
      .set(...auth);
    expect(bad.status).toBe(400);
    expect(bad.body.details[0].path).toBe('from');

    const csv = await t
      .http()
      .get('/api/audit/export.csv?entity=site')
      .set(...auth);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    const lines = csv.text.trim().split('\r\n');
    expect(lines[0]).toBe(
      'Time (ISO 8601 UTC),User e-mail,User name,Action,Action code,About,About id,Record id,Device id,Details (JSON)',
    );
    expect(lines).toHaveLength(1 + (await t.db('auditLog').where({ entity: 'site' })).length);
    // Actions and what they were about in words; times in ISO 8601 UTC as the header says.
    expect(lines[1]).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z,/);
    const worded = /,(Site created|Site changed|Unit added|Unit renamed),(site|unit)\.[a-z]+,Site,/;
    expect(lines.slice(1).filter((l) => !worded.test(l))).toEqual([]);
  });

  it('shows the sink messages with their decoded text and the outbox status', async () => {
    const auth = await t.as('admin');
    await t
      .http()
      .post('/api/users')
      .set(...auth)
      .send({ email: 'wren@kestrel.test', name: 'Wren Dalby', role: 'lead', siteIds: [demoSiteId] })
      .expect(201);
    const list = await t
      .http()
      .get('/api/admin/mail')
      .set(...auth);
    expect(list.body.outbox).toEqual({ sent: 1 });
    expect(list.body.sink.items[0]).toMatchObject({
      to: ['wren@kestrel.test'],
      subject: 'Your Upstroke account',
    });
    const one = await t
      .http()
      .get(`/api/admin/mail/${list.body.sink.items[0].id}`)
      .set(...auth);
    expect(one.body.text).toMatch(/Hello Wren Dalby,/);
    expect(one.body.text).toMatch(
      /http:\/\/upstroke\.test\/set-password\?token=[A-Za-z0-9_-]{43}\n/,
    );
    expect(
      (
        await t
          .http()
          .get('/api/admin/mail/999999')
          .set(...auth)
      ).status,
    ).toBe(404);
  });
});
