import { signedRecord } from '../debrief-fixtures';
import { demoPassword, demoSiteId, demoUsers } from '../test-app';
import { type AdminTestApp, startAdminTestApp } from './admin-helpers';

const leadId = demoUsers.find((u) => u.role === 'lead')!.id;

describe('audit trail: sign-in, sign-out and every export; debrief mail to the organisation', () => {
  let t: AdminTestApp;
  beforeAll(async () => {
    t = await startAdminTestApp();
  });
  afterAll(() => t.close());

  const entries = (action: string) =>
    t
      .db('auditLog')
      .where({ action })
      .orderBy('id')
      .select('userId', 'entity', 'resuscitationId', 'deviceId', 'details');

  it('audits a failed sign-in with the address and reason, a sign-in and a sign-out', async () => {
    await t
      .http()
      .post('/api/auth/login')
      .set('X-Device-Id', 'ward-tablet-3')
      .send({ email: 'lead@kestrel.test', password: 'not-the-password' })
      .expect(401);
    const unknown = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'nobody@kestrel.test', password: 'whatever-it-is' });
    // The answer does not tell which part was wrong; only the audit says so.
    expect(unknown.status).toBe(401);
    expect(await entries('sign-in.failed')).toEqual([
      expect.objectContaining({
        userId: leadId,
        deviceId: 'ward-tablet-3',
        details: { email: 'lead@kestrel.test', reason: 'wrong password' },
      }),
      expect.objectContaining({
        userId: null,
        details: { email: 'nobody@kestrel.test', reason: 'unknown e-mail' },
      }),
    ]);
    const ok = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'lead@kestrel.test', password: demoPassword })
      .expect(200);
    const auth = ['Authorization', `Bearer ${ok.body.accessToken}`] as const;
    await t
      .http()
      .post('/api/auth/logout')
      .set(...auth)
      .expect(204);
    await t.http().post('/api/auth/logout').expect(401);
    expect(await entries('sign-in')).toEqual([
      expect.objectContaining({ userId: leadId, entity: 'user' }),
    ]);
    expect(await entries('sign-out')).toEqual([
      expect.objectContaining({ userId: leadId, entity: 'user' }),
    ]);
  });

  it('audits PDF, FHIR and every CSV export with what it held', async () => {
    const { url, rec } = await signedRecord(t);
    const lead = ['Authorization', `Bearer ${await t.tokenFor('lead')}`] as const;
    await t
      .http()
      .get(`${url}/report.pdf`)
      .set(...lead)
      .expect(200);
    await t
      .http()
      .get(`${url}/fhir`)
      .set(...lead)
      .expect(200);
    const quality = ['Authorization', `Bearer ${await t.tokenFor('quality')}`] as const;
    await t
      .http()
      .get(`/api/trends/export.csv?siteId=${demoSiteId}`)
      .set(...quality)
      .expect(200);
    await t
      .http()
      .get('/api/trends/utstein.csv')
      .set(...quality)
      .expect(200);
    await t
      .http()
      .get('/api/audit/export.csv?action=sign')
      .set(...(await t.as('admin')))
      .expect(200);
    expect(await entries('export.pdf')).toEqual([
      expect.objectContaining({
        entity: 'resuscitation',
        resuscitationId: rec.id,
        details: { file: expect.stringMatching(/\.pdf$/) },
      }),
    ]);
    expect(await entries('export.fhir')).toEqual([
      expect.objectContaining({ resuscitationId: rec.id, details: { status: 'signed' } }),
    ]);
    const csv = await entries('export.csv');
    expect(csv.map((e) => [e.entity, e.details.filter])).toEqual([
      ['records', { siteId: demoSiteId }],
      ['utstein', {}],
      ['audit-log', { action: 'sign' }],
    ]);
  });

  it('refuses recipients outside the site e-mail domains, naming each; nothing is queued', async () => {
    await t
      .http()
      .patch(`/api/sites/${demoSiteId}`)
      .set(...(await t.as('admin')))
      .send({ mailDomains: ['kestrel.test'] })
      .expect(200);
    const { url, rec } = await signedRecord(t);
    const lead = ['Authorization', `Bearer ${await t.tokenFor('lead')}`] as const;
    // The lead's e-mail form reads the domains from the recording context, to hint and check.
    const context = await t
      .http()
      .get('/api/context')
      .set(...lead);
    expect(context.body.sites[0].mailDomains).toEqual(['kestrel.test']);
    const refused = await t
      .http()
      .post(`${url}/email`)
      .set(...lead)
      .send({
        recipients: ['team@kestrel.test', 'someone@gmail.example', 'x@kestrel.test.evil.example'],
      });
    expect(refused.status).toBe(400);
    expect(refused.body.message).toContain('someone@gmail.example');
    expect(refused.body.details.map((d: { path: string }) => d.path)).toEqual([
      'recipients.1',
      'recipients.2',
    ]);
    expect(await t.db('mailOutbox').where({ resuscitationId: rec.id })).toHaveLength(0);
    await t
      .http()
      .post(`${url}/email`)
      .set(...lead)
      .send({ recipients: ['team@kestrel.test', 'icu@ward.kestrel.test'] })
      .expect(202);
    expect(await entries('email')).toEqual([
      expect.objectContaining({
        resuscitationId: rec.id,
        details: expect.objectContaining({ to: ['team@kestrel.test', 'icu@ward.kestrel.test'] }),
      }),
    ]);
  });

  it('shows a sink message with its decoded subject and the PDF attachment listed', async () => {
    const auth = await t.as('admin');
    const list = await t
      .http()
      .get('/api/admin/mail')
      .set(...auth)
      .expect(200);
    const sent = list.body.sink.items.find((m: { subject: string }) =>
      m.subject.includes('debrief'),
    );
    // The stored header is RFC 2047 encoded (the subject has an em dash); the list shows it decoded.
    const raw = await t.db('mailSinkMessages').where({ id: sent.id }).first('raw');
    expect(raw.raw).toMatch(/^Subject: =\?UTF-8\?[QB]\?/m);
    expect(sent.subject).toMatch(/^Resuscitation debrief — Kestrel Bay/);
    const one = await t
      .http()
      .get(`/api/admin/mail/${sent.id}`)
      .set(...auth)
      .expect(200);
    expect(one.body.subject).toBe(sent.subject);
    expect(one.body.text).toMatch(/Open the debrief: http:\/\/upstroke\.test\/debrief\//);
    expect(one.body.attachments).toEqual([
      {
        filename: expect.stringMatching(/^resuscitation-.*\.pdf$/),
        contentType: 'application/pdf',
        sizeBytes: expect.any(Number),
      },
    ]);
    expect(one.body.attachments[0].sizeBytes).toBeGreaterThan(1000);
  });
});
