import { type TestApp, startTestApp } from './test-app';

describe('sign-in', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ loginLimitPerMinute: 5 });
  });
  afterAll(() => t.close());

  it('signs in a demo user and returns the token and user', async () => {
    const res = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'lead@kestrel.test', password: 'upstroke-demo' });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: 'lead@kestrel.test', role: 'lead' });
    expect(res.body.user.siteIds).toHaveLength(1);
    const me = await t
      .http()
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${res.body.accessToken}`);
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({
      email: 'lead@kestrel.test',
      role: 'lead',
      name: expect.any(String),
    });
  });

  it('answers a wrong password and an unknown e-mail with the same 401', async () => {
    const wrong = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'quality@kestrel.test', password: 'nope' });
    const unknown = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'nobody@kestrel.test', password: 'nope' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body).toEqual({
      statusCode: 401,
      error: 'Unauthorized',
      message: expect.any(String),
    });
  });

  it('refuses the 6th rapid attempt for one account with 429', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 6; i += 1) {
      const res = await t
        .http()
        .post('/api/auth/login')
        .send({ email: 'admin@kestrel.test', password: `guess-${i}` });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
    expect(statuses[5]).toBe(429);
  });

  it('answers malformed JSON with 400 in the error shape', async () => {
    const res = await t
      .http()
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: expect.stringMatching(/JSON/),
    });
  });

  it('names the field at fault when a body does not fit the schema', async () => {
    const res = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'not-an-email', password: 'x' });
    expect(res.status).toBe(400);
    expect(res.body.details[0]).toMatchObject({ path: 'email' });
  });

  it('refuses a missing, a forged and a revoked token with 401', async () => {
    expect((await t.http().get('/api/auth/me')).status).toBe(401);
    expect(
      (await t.http().get('/api/auth/me').set('Authorization', 'Bearer abc.def.ghi')).status,
    ).toBe(401);
    const token = await t.tokenFor('recorder');
    await t.db('users').where({ email: 'recorder@kestrel.test' }).increment('tokenVersion', 1);
    expect(
      (await t.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`)).status,
    ).toBe(401);
  });

  it('sends security headers and no CORS permission', async () => {
    const res = await t.http().get('/api/health').set('Origin', 'https://elsewhere.example');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
  });
});
