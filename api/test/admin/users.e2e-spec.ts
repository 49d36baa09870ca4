import { demoSiteId } from '../test-app';
import { type AdminTestApp, startAdminTestApp } from './admin-helpers';

const newcomer = { email: 'ash.penrose@kestrel.test', name: 'Ash Penrose (RN)', role: 'recorder' };

describe('admin: users, invitations and passwords', () => {
  let t: AdminTestApp;
  beforeAll(async () => {
    t = await startAdminTestApp();
  });
  afterAll(() => t.close());

  const invite = async (body: Record<string, unknown>) =>
    t
      .http()
      .post('/api/users')
      .set(...(await t.as('admin')))
      .send({ siteIds: [demoSiteId], ...body });
  const login = (email: string, password: string) =>
    t.http().post('/api/auth/login').send({ email, password });
  const setPassword = (token: string, password: string) =>
    t.http().post('/api/auth/set-password').send({ token, password });

  it('invites a user by e-mail; the one-time link sets the password, then is spent', async () => {
    const res = await invite(newcomer);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ ...newcomer, active: true, passwordSet: false });
    const mail = await t.db('mailSinkMessages').where({ subject: 'Your Upstroke account' });
    expect(mail).toHaveLength(1);
    expect(mail[0].rcptTo).toEqual([newcomer.email]);
    // Written to the delivery queue first, then sent at once.
    const queued = await t.db('mailOutbox').where({ subject: 'Your Upstroke account' });
    expect(queued.map((q) => [q.to, q.status])).toEqual([[[newcomer.email], 'sent']]);
    const token = await t.linkTokenFor(newcomer.email);
    // The link is stored only as a hash: the database never holds a usable token.
    const stored = await t.db('userInvitations').where({ userId: res.body.id }).first();
    expect(stored.tokenHash).not.toContain(token);
    expect((await login(newcomer.email, 'whatever-123')).status).toBe(401);

    const set = await setPassword(token, 'kestrel-bay-2026');
    expect(set.status).toBe(200);
    expect(set.body).toEqual({ email: newcomer.email });
    const signedIn = await login(newcomer.email, 'kestrel-bay-2026');
    expect(signedIn.status).toBe(200);
    expect(signedIn.body.user).toMatchObject({ role: 'recorder', siteIds: [demoSiteId] });

    const again = await setPassword(token, 'another-pass-99');
    expect(again.status).toBe(400);
    expect(again.body.details).toEqual([{ path: 'token', message: expect.any(String) }]);
    expect((await login(newcomer.email, 'another-pass-99')).status).toBe(401);
  });

  it('refuses weak passwords with a message naming the rule', async () => {
    await invite({ ...newcomer, email: 'weak@kestrel.test' });
    const token = await t.linkTokenFor('weak@kestrel.test');
    const short = await setPassword(token, 'abc1');
    expect(short.status).toBe(400);
    expect(short.body.details[0]).toEqual({
      path: 'password',
      message: 'Use at least 10 characters',
    });
    const noDigit = await setPassword(token, 'only-letters-here');
    expect(noDigit.body.details[0].message).toBe('Include at least one digit');
    // A refused attempt does not spend the link.
    expect((await setPassword(token, 'strong-enough-42')).status).toBe(200);
  });

  it('refuses an expired link', async () => {
    const res = await invite({ ...newcomer, email: 'late@kestrel.test' });
    const token = await t.linkTokenFor('late@kestrel.test');
    await t
      .db('userInvitations')
      .where({ userId: res.body.id })
      .update({ expiresAt: new Date(Date.now() - 1000) });
    const late = await setPassword(token, 'kestrel-bay-2026');
    expect(late.status).toBe(400);
    expect(late.body.message).toMatch(/no longer valid/);
  });

  it('refuses a second account for the same e-mail, in any letter case', async () => {
    const res = await invite({ ...newcomer, email: 'RECORDER@kestrel.test' });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/already exists/);
  });

  it('names the field at fault and stores nothing when the body is wrong', async () => {
    const before = await t.db('users').count<{ count: number }[]>({ count: '*' });
    const res = await invite({ email: 'x@kestrel.test', name: 'X', role: 'surgeon' });
    expect(res.status).toBe(400);
    expect(res.body.details[0].path).toBe('role');
    const after = await t.db('users').count<{ count: number }[]>({ count: '*' });
    expect(after[0].count).toBe(before[0].count);
  });

  it('gives access only to sites the admin manages', async () => {
    const res = await invite({
      ...newcomer,
      email: 'elsewhere@kestrel.test',
      siteIds: ['00000000-0000-4000-8000-000000000001'],
    });
    expect(res.status).toBe(403);
    expect(await t.db('users').where({ email: 'elsewhere@kestrel.test' })).toHaveLength(0);
  });
});
