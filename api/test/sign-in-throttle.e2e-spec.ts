import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApp } from '../src/app.factory';
import { APP_CONFIG, type AppConfig, loadConfig } from '../src/config';
import { startTestApp, type TestApp } from './test-app';

const attempt = (app: INestApplication, email: string, from?: string) => {
  const req = request(app.getHttpServer()).post('/api/auth/login');
  if (from) req.set('X-Forwarded-For', from);
  return req.send({ email, password: 'not-the-password-1' }).then((r) => r.status);
};

/** Sign-in throttling per address and per e-mail, counted in PostgreSQL. */
describe('sign-in throttle', () => {
  let t: TestApp | undefined;
  afterEach(async () => {
    await t?.close();
    t = undefined;
  });

  it('does not trust X-Forwarded-For unless TRUST_PROXY says so', () => {
    expect(loadConfig({}).trustProxy).toBe(false);
    expect(loadConfig({ TRUST_PROXY: 'loopback' }).trustProxy).toBe('loopback');
  });

  it('limits one address across many e-mails, even with a rotating X-Forwarded-For', async () => {
    t = await startTestApp({ loginIpLimitPerMinute: 3, loginLimitPerMinute: 100 });
    const statuses = [];
    for (let i = 0; i < 4; i += 1)
      statuses.push(await attempt(t.app, `guess${i}@kestrel.test`, `203.0.113.${i}`));
    expect(statuses).toEqual([401, 401, 401, 429]);
  });

  it('audits a throttled key once each time it goes over its limit, not once per refusal', async () => {
    t = await startTestApp({ loginIpLimitPerMinute: 3, loginLimitPerMinute: 100 });
    const throttled = () =>
      t!.db('auditLog').where({ action: 'sign-in.throttled' }).orderBy('id').select('details');
    const statuses = [];
    for (let i = 0; i < 10; i += 1) statuses.push(await attempt(t.app, `spray${i}@kestrel.test`));
    expect(statuses).toEqual([401, 401, 401, ...Array(7).fill(429)]);
    const entry = {
      details: expect.objectContaining({ limitPerMinute: 3, path: '/api/auth/login' }),
    };
    expect(await throttled()).toEqual([entry]);
    const [{ details }] = await throttled();
    expect(details).toHaveProperty('address');
    expect(details).not.toHaveProperty('email');
    // A minute later (the attempts aged rather than waited for) a new flood is audited again.
    await t.db('signInAttempts').update({ at: t.db.raw("at - interval '2 minutes'") });
    for (let i = 0; i < 6; i += 1) await attempt(t.app, `again${i}@kestrel.test`);
    expect(await throttled()).toEqual([entry, entry]);
  });

  it('limits one e-mail across many addresses (behind a trusted proxy)', async () => {
    t = await startTestApp({
      loginIpLimitPerMinute: 100,
      loginLimitPerMinute: 3,
      trustProxy: 'loopback',
    });
    const statuses = [];
    for (let i = 0; i < 4; i += 1)
      statuses.push(await attempt(t.app, 'lead@kestrel.test', `198.51.100.${i}`));
    expect(statuses).toEqual([401, 401, 401, 429]);
    // Another e-mail from another address is not held back.
    expect(await attempt(t.app, 'quality@kestrel.test', '198.51.100.99')).toBe(401);
    const audited = await t.db('auditLog').where({ action: 'sign-in.throttled' }).select('details');
    expect(audited).toEqual([
      { details: { email: 'lead@kestrel.test', limitPerMinute: 3, path: '/api/auth/login' } },
    ]);
  });

  it('counts attempts made on another API instance (shared database)', async () => {
    t = await startTestApp({ loginIpLimitPerMinute: 100, loginLimitPerMinute: 3 });
    const other = await createApp(t.app.get<AppConfig>(APP_CONFIG));
    await other.init();
    try {
      const statuses = [
        await attempt(t.app, 'recorder@kestrel.test'),
        await attempt(other, 'recorder@kestrel.test'),
        await attempt(t.app, 'recorder@kestrel.test'),
        await attempt(other, 'recorder@kestrel.test'),
      ];
      expect(statuses).toEqual([401, 401, 401, 429]);
    } finally {
      await other.close();
    }
  });
});
