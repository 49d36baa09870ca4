import { randomUUID } from 'node:crypto';
import type { LoginResponse } from '@upstroke/contracts';
import { aResuscitation, anEvent } from './factories';
import { demoSiteId } from './test-app';
import { type AdminTestApp, startAdminTestApp } from './admin/admin-helpers';

type Header = readonly [string, string];

interface AuditItem {
  action: string;
  resuscitationId: string | null;
  details: Record<string, unknown>;
}

/**
 * A lead discards entries the server refused, with a reason: the audit log keeps the entry's
 * content, the server's reason and the lead's, for records on the server and for records the
 * server never received; only leads may, and only for their own sites.
 */
describe('discarding refused entries (POST /resuscitations/:id/discards)', () => {
  let t: AdminTestApp;
  let lead: Header;
  let org: Header;
  let annex: Header;
  let main: Header;
  let annexSiteId: string;

  /** An admin of one site only (the demo admin belongs to every site). */
  async function scopedAdmin(email: string, siteId: string): Promise<Header> {
    await t
      .http()
      .post('/api/users')
      .set(...org)
      .send({ email, name: 'Noor Haskett', role: 'admin', siteIds: [siteId] });
    const password = 'scoped-pass-2026';
    await t
      .http()
      .post('/api/auth/set-password')
      .send({ token: await t.linkTokenFor(email), password });
    const login = await t.http().post('/api/auth/login').send({ email, password });
    return ['Authorization', `Bearer ${(login.body as LoginResponse).accessToken}`] as const;
  }

  beforeAll(async () => {
    t = await startAdminTestApp();
    lead = await t.as('lead');
    org = await t.as('admin');
    const site = await t
      .http()
      .post('/api/sites')
      .set(...org)
      .send({ name: 'Kestrel Bay North Annex', etco2Unit: 'mmHg', paperSize: 'A4' });
    annexSiteId = site.body.id;
    annex = await scopedAdmin('annex.admin@kestrel.test', annexSiteId);
    main = await scopedAdmin('main.admin@kestrel.test', demoSiteId);
  });
  afterAll(() => t.close());

  const discard = (who: Header, id: string, body: object) =>
    t
      .http()
      .post(`/api/resuscitations/${id}/discards`)
      .set(...who)
      .send(body);

  const refusedNote = () => {
    const event = anEvent('note', 90_000, { text: 'Wrong code' });
    return {
      id: event.id,
      kind: 'events',
      refusal: 'at: more than 24 h after the arrest',
      content: JSON.stringify(event),
    };
  };

  async function auditOf(who: Header, id: string): Promise<AuditItem[]> {
    const res = await t
      .http()
      .get(`/api/audit?action=discard-refused&resuscitationId=${id}`)
      .set(...who);
    expect(res.status).toBe(200);
    return res.body.items as AuditItem[];
  }

  it('keeps content, both reasons and the site for a record on the server', async () => {
    const rec = aResuscitation();
    expect(
      (
        await t
          .http()
          .post('/api/resuscitations')
          .set(...lead)
          .send(rec)
      ).status,
    ).toBe(201);
    const item = refusedNote();
    const res = await discard(lead, rec.id, { reason: 'Typed on the wrong code', items: [item] });
    expect(res.status).toBe(201);
    expect(res.body).toEqual({ discarded: 1 });
    const [entry] = await auditOf(org, rec.id);
    expect(entry.details).toEqual({
      reason: 'Typed on the wrong code',
      siteId: demoSiteId,
      recordOnServer: true,
      items: [item],
    });
    // Nothing clinical was stored or removed by the discard.
    expect(await t.db('resuscitationEvents').where({ resuscitationId: rec.id })).toHaveLength(0);
  });

  it('audits a record the server never received, under the site the tablet names', async () => {
    const id = randomUUID();
    const start = {
      id,
      kind: 'record',
      refusal: 'Request failed (403)',
      content: JSON.stringify(aResuscitation({ id })),
    };
    const held = { ...refusedNote(), refusal: '' };
    const noSite = await discard(lead, id, { reason: 'Test code on a demo tablet', items: [held] });
    expect(noSite.status).toBe(400);
    expect(noSite.body.message).toMatch(/siteId/);
    const otherSite = await discard(lead, id, {
      reason: 'Test code on a demo tablet',
      siteId: annexSiteId,
      items: [held],
    });
    expect(otherSite.status).toBe(403);
    const res = await discard(lead, id, {
      reason: 'Test code on a demo tablet',
      siteId: demoSiteId,
      items: [start, held],
    });
    expect(res.status).toBe(201);
    expect(await t.db('resuscitations').where({ id })).toHaveLength(0);
    const [entry] = await auditOf(org, id);
    expect(entry.details).toMatchObject({ siteId: demoSiteId, recordOnServer: false });
    expect(entry.details.items).toEqual([start, held]);
    // An admin of that site sees it (no record row names the site); one of another does not.
    expect(await auditOf(main, id)).toHaveLength(1);
    expect(await auditOf(annex, id)).toEqual([]);
  });

  it.each(['recorder', 'quality', 'admin'] as const)('refuses a %s (403)', async (role) => {
    const res = await discard(await t.as(role), randomUUID(), {
      reason: 'Not mine to discard',
      siteId: demoSiteId,
      items: [refusedNote()],
    });
    expect(res.status).toBe(403);
  });

  it('answers 400 naming the field for a missing reason or raw NUL content', async () => {
    const id = randomUUID();
    const blank = await discard(lead, id, {
      reason: ' ',
      siteId: demoSiteId,
      items: [refusedNote()],
    });
    expect(blank.status).toBe(400);
    expect(JSON.stringify(blank.body)).toMatch(/reason/);
    const raw = { ...refusedNote(), content: 'a\u0000b' };
    const nul = await discard(lead, id, { reason: 'Bad note', siteId: demoSiteId, items: [raw] });
    expect(nul.status).toBe(400);
    expect(await t.db('auditLog').where({ resuscitationId: id })).toHaveLength(0);
  });
});
