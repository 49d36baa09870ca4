import request from 'supertest';
import { createApp } from '../../src/app.factory';
import { loadConfig } from '../../src/config';
import { demoSiteId, demoUsers } from '../test-app';
import { freePort } from '../free-port';
import { type AdminTestApp, startAdminTestApp } from './admin-helpers';

const userId = (role: string) => demoUsers.find((u) => u.role === role)!.id;

describe('admin: deactivation, role changes, password resets and the last admin', () => {
  let t: AdminTestApp;
  beforeAll(async () => {
    t = await startAdminTestApp();
  });
  afterAll(() => t.close());

  const patch = async (id: string, body: Record<string, unknown>) =>
    t
      .http()
      .patch(`/api/users/${id}`)
      .set(...(await t.as('admin')))
      .send(body);
  const me = (token: string) =>
    t.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`);

  it('deactivation refuses a token issued before it, at once, and refuses sign-in', async () => {
    const [, bearer] = await t.as('quality');
    const token = bearer.slice('Bearer '.length);
    expect((await me(token)).status).toBe(200);
    const res = await patch(userId('quality'), { active: false });
    expect(res.status).toBe(200);
    expect(res.body.active).toBe(false);
    expect((await me(token)).status).toBe(401);
    const login = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'quality@kestrel.test', password: 'upstroke-demo' });
    expect(login.status).toBe(401);
    const audit = await t
      .db('auditLog')
      .where({ action: 'user.update', entityId: userId('quality') });
    expect(audit[0].details).toMatchObject({ active: false });
    expect(audit[0].userId).toBe(userId('admin'));
    // Reactivated, the person signs in again with a fresh token.
    await patch(userId('quality'), { active: true });
    const again = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'quality@kestrel.test', password: 'upstroke-demo' });
    expect(again.status).toBe(200);
  });

  it('a role change revokes tokens; a site change takes effect on the next request', async () => {
    const [, bearer] = await t.as('recorder');
    const token = bearer.slice('Bearer '.length);
    const res = await patch(userId('recorder'), { role: 'lead', siteIds: [demoSiteId] });
    expect(res.body).toMatchObject({ role: 'lead', siteIds: [demoSiteId] });
    expect((await me(token)).status).toBe(401);
    await patch(userId('recorder'), { role: 'recorder' });
  });

  it('never removes the last active admin (409), and allows it once another exists', async () => {
    const demote = await patch(userId('admin'), { role: 'lead' });
    expect(demote.status).toBe(409);
    expect(demote.body.message).toMatch(/last active admin/);
    const deactivate = await patch(userId('admin'), { active: false });
    expect(deactivate.status).toBe(409);
    expect(
      (
        await t
          .db('users')
          .where({ id: userId('admin') })
          .first()
      ).role,
    ).toBe('admin');
    await patch(userId('lead'), { role: 'admin' });
    const now = await patch(userId('admin'), { role: 'lead' });
    expect(now.status).toBe(200);
    // Put the demo roles back, signed in as the other admin.
    const other = await t.as('lead');
    await t
      .http()
      .patch(`/api/users/${userId('admin')}`)
      .set(...other)
      .send({ role: 'admin' });
    const restore = await patch(userId('lead'), { role: 'lead' });
    expect(restore.body.role).toBe('lead');
  });

  it('a password reset signs the user out, clears the password and mails a new link', async () => {
    const [, bearer] = await t.as('lead');
    const token = bearer.slice('Bearer '.length);
    const res = await t
      .http()
      .post(`/api/users/${userId('lead')}/reset-password`)
      .set(...(await t.as('admin')))
      .send({});
    expect(res.status).toBe(201);
    expect(res.body.passwordSet).toBe(false);
    expect((await me(token)).status).toBe(401);
    const oldPassword = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'lead@kestrel.test', password: 'upstroke-demo' });
    expect(oldPassword.status).toBe(401);
    const first = await t.linkTokenFor('lead@kestrel.test');
    // A second reset replaces the first link.
    await t
      .http()
      .post(`/api/users/${userId('lead')}/reset-password`)
      .set(...(await t.as('admin')));
    const second = await t.linkTokenFor('lead@kestrel.test');
    const body = (tk: string) => ({ token: tk, password: 'new-lead-pass-7' });
    expect((await t.http().post('/api/auth/set-password').send(body(first))).status).toBe(400);
    expect((await t.http().post('/api/auth/set-password').send(body(second))).status).toBe(200);
  });

  it('stores nothing when the invitation e-mail cannot be sent (503)', async () => {
    // A free port: no SMTP server listens there.
    const config = {
      ...loadConfig(),
      jwtSecret: 'test-secret',
      // Sign-in attempts are counted in PostgreSQL, shared with the other test app.
      loginLimitPerMinute: 1000,
      loginIpLimitPerMinute: 1000,
      smtp: { host: '127.0.0.1', port: await freePort(), from: 'x@kestrel.test' },
    };
    const app = await createApp(config);
    await app.init();
    try {
      const adminToken = (
        await request(app.getHttpServer())
          .post('/api/auth/login')
          .send({ email: 'admin@kestrel.test', password: 'upstroke-demo' })
      ).body.accessToken as string;
      const res = await request(app.getHttpServer())
        .post('/api/users')
        .set('Authorization', `Bearer ${adminToken}`)
        .send({
          email: 'nomail@kestrel.test',
          name: 'No Mail',
          role: 'recorder',
          siteIds: [demoSiteId],
        });
      expect(res.status).toBe(503);
      expect(await t.db('users').where({ email: 'nomail@kestrel.test' })).toHaveLength(0);
      expect(await t.db('auditLog').where({ action: 'user.invite' })).toHaveLength(0);
      expect(await t.db('mailOutbox').whereRaw('\'nomail@kestrel.test\' = any("to")')).toHaveLength(
        0,
      );
    } finally {
      await app.close();
    }
  });
});
