import type { LoginResponse } from '@upstroke/contracts';
import { aResuscitation } from '../factories';
import { demoSiteId, demoUsers } from '../test-app';
import { type AdminTestApp, startAdminTestApp } from './admin-helpers';

const recorder = demoUsers.find((u) => u.role === 'recorder')!;
const annexAdmin = { email: 'annex.admin@kestrel.test', name: 'Noor Haskett', role: 'admin' };
const annexNurse = { email: 'annex.nurse@kestrel.test', name: 'Cal Ferrow (RN)', role: 'recorder' };
const password = 'annex-pass-2026';

type Header = readonly [string, string];

/**
 * A scoped admin (one new site) against the organisation-wide demo admin (every site):
 * the scoped admin sees and changes only users, mail and audit entries of their own site.
 */
describe('admin scope: a site admin manages only their own site', () => {
  let t: AdminTestApp;
  let org: Header;
  let annex: Header;
  let annexSiteId: string;
  const ids: Record<string, string> = {};

  beforeAll(async () => {
    t = await startAdminTestApp();
    org = await t.as('admin');
    const site = await t
      .http()
      .post('/api/sites')
      .set(...org)
      .send({
        name: 'Kestrel Bay North Annex',
        etco2Unit: 'mmHg',
        paperSize: 'A4',
      });
    annexSiteId = site.body.id;
    for (const person of [annexAdmin, annexNurse]) {
      const res = await t
        .http()
        .post('/api/users')
        .set(...org)
        .send({ ...person, siteIds: [annexSiteId] });
      ids[person.email] = res.body.id;
      const token = await t.linkTokenFor(person.email);
      await t.http().post('/api/auth/set-password').send({ token, password });
    }
    const login = await t
      .http()
      .post('/api/auth/login')
      .send({ email: annexAdmin.email, password });
    annex = ['Authorization', `Bearer ${(login.body as LoginResponse).accessToken}`];
    // Mail and audit entries about the main site, which the annex admin must not see.
    await t
      .http()
      .post(`/api/users/${recorder.id}/reset-password`)
      .set(...org);
    await t
      .http()
      .post('/api/resuscitations')
      .set('Authorization', `Bearer ${await t.tokenFor('lead')}`)
      .send(aResuscitation());
  });
  afterAll(() => t.close());

  it('lists only the users of their site; the organisation admin lists everyone', async () => {
    const mine = await t
      .http()
      .get('/api/users')
      .set(...annex);
    expect(mine.status).toBe(200);
    expect(mine.body.items.map((u: { email: string }) => u.email).sort()).toEqual([
      annexAdmin.email,
      annexNurse.email,
    ]);
    const all = await t
      .http()
      .get('/api/users')
      .set(...org);
    expect(all.body.total).toBe(demoUsers.length + 2);
  });

  it('cannot rename, change the role of, deactivate or reset a user of another site', async () => {
    const before = await t.db('users').where({ id: recorder.id }).first();
    for (const patch of [{ name: 'Taken Over' }, { role: 'admin' }, { active: false }]) {
      const res = await t
        .http()
        .patch(`/api/users/${recorder.id}`)
        .set(...annex)
        .send(patch);
      expect(res.status).toBe(404);
    }
    const invitationsBefore = await t.db('userInvitations').where({ userId: recorder.id });
    const reset = await t
      .http()
      .post(`/api/users/${recorder.id}/reset-password`)
      .set(...annex);
    expect(reset.status).toBe(404);
    expect(await t.db('users').where({ id: recorder.id }).first()).toEqual(before);
    expect(await t.db('userInvitations').where({ userId: recorder.id })).toHaveLength(
      invitationsBefore.length,
    );
  });

  it('cannot manage an admin who also holds a site outside theirs', async () => {
    const res = await t
      .http()
      .post(`/api/users/${demoUsers.find((u) => u.role === 'admin')!.id}/reset-password`)
      .set(...annex);
    expect(res.status).toBe(404);
  });

  it('manages their own users, but gives access only to their own sites', async () => {
    const nurseId = ids[annexNurse.email];
    const renamed = await t
      .http()
      .patch(`/api/users/${nurseId}`)
      .set(...annex)
      .send({ name: 'Cal Ferrow (CNS)' });
    expect(renamed.status).toBe(200);
    const widen = await t
      .http()
      .patch(`/api/users/${nurseId}`)
      .set(...annex)
      .send({ siteIds: [annexSiteId, demoSiteId] });
    expect(widen.status).toBe(403);
    const reset = await t
      .http()
      .post(`/api/users/${nurseId}/reset-password`)
      .set(...annex);
    expect(reset.status).toBe(201);
  });

  it('reads only mail addressed to their own users', async () => {
    const recorderMail = await t
      .db('mailSinkMessages')
      .whereRaw('? = any(rcpt_to)', [recorder.email])
      .first<{ id: number }>('id');
    expect(recorderMail).toBeDefined();
    const mine = await t
      .http()
      .get('/api/admin/mail?limit=200')
      .set(...annex);
    expect(mine.status).toBe(200);
    const recipients = mine.body.sink.items.flatMap((m: { to: string[] }) => m.to);
    expect(recipients.length).toBeGreaterThan(0);
    expect(new Set(recipients)).toEqual(new Set([annexAdmin.email, annexNurse.email]));
    const other = await t
      .http()
      .get(`/api/admin/mail/${recorderMail!.id}`)
      .set(...annex);
    expect(other.status).toBe(404);
    const asOrg = await t
      .http()
      .get(`/api/admin/mail/${recorderMail!.id}`)
      .set(...org);
    expect(asOrg.status).toBe(200);
  });

  it('reads only audit entries about their site, its users and its records', async () => {
    const entries = async (auth: Header) =>
      (
        await t
          .http()
          .get('/api/audit?limit=500')
          .set(...auth)
      ).body.items as {
        entity: string;
        entityId: string | null;
        resuscitationId: string | null;
        details: { siteId?: string };
      }[];
    const mine = await entries(annex);
    expect(mine.length).toBeGreaterThan(0);
    const annexUsers = Object.values(ids);
    for (const e of mine) {
      const aboutAnnex =
        (e.entity === 'site' && e.entityId === annexSiteId) ||
        (e.entity === 'protocol-profile' && e.details.siteId === annexSiteId) ||
        (e.entity === 'user' && annexUsers.includes(e.entityId ?? ''));
      expect({ entry: e, aboutAnnex }).toEqual({ entry: e, aboutAnnex: true });
    }
    const all = await entries(org);
    expect(all.some((e) => e.entityId === recorder.id)).toBe(true);
    expect(all.some((e) => e.resuscitationId !== null)).toBe(true);
    const csv = await t
      .http()
      .get('/api/audit/export.csv')
      .set(...annex);
    expect(csv.status).toBe(200);
    expect(csv.text).not.toContain(recorder.id);
  });

  it('keeps the organisation admin organisation-wide when a site admin adds a site', async () => {
    const created = await t
      .http()
      .post('/api/sites')
      .set(...annex)
      .send({
        name: 'Kestrel Bay North Annex 2',
        etco2Unit: 'kPa',
        paperSize: 'A4',
      });
    expect(created.status).toBe(201);
    const me = await t
      .http()
      .get('/api/auth/me')
      .set(...org);
    expect(me.body.siteIds).toContain(created.body.id);
    const sites = await t
      .http()
      .get('/api/sites')
      .set(...org);
    expect(sites.body.total).toBe(3);
  });
});
