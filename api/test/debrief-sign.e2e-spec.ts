import { randomUUID } from 'node:crypto';
import type { Debrief } from '@upstroke/contracts';
import { recordWithFindings, signedRecord as signed } from './debrief-fixtures';
import { anEvent } from './factories';
import { startTestApp, type TestApp } from './test-app';

type Role = 'recorder' | 'lead' | 'quality' | 'admin';

describe('debrief, signing and the lock', () => {
  let t: TestApp;
  const auth = async (role: Role) => ['Authorization', `Bearer ${await t.tokenFor(role)}`] as const;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('returns capno analysis with the profile, series and header to readers', async () => {
    const { rec, events } = await recordWithFindings(t, await t.tokenFor('recorder'));
    const res = await t
      .http()
      .get(`/api/resuscitations/${rec.id}/debrief`)
      .set(...(await auth('quality')));
    expect(res.status).toBe(200);
    const d = res.body as Debrief;
    expect(d.computedBy).toBe('server');
    expect(d.profile.version).toBe(1);
    expect(d.record.siteName).toBe('Kestrel Bay Regional Hospital');
    expect(d.record.location).toBe('Bay 4');
    expect(d.events).toHaveLength(events.length);
    expect(d.etco2Series).toHaveLength(10);
    expect(d.etco2Series.every((p) => p.source === 'manual')).toBe(true);
    // Shock at 140 s after arrest (events above), measured by capno from time zero.
    expect(d.measures.timeToFirstShockSec).toBe(140);
    expect(d.findings.map((f) => f.kind)).toEqual(
      expect.arrayContaining(['etco2-low', 'preshock-pause-long']),
    );
    expect(d.findings.every((f) => f.caution.length > 0)).toBe(true);
    const admin = await t
      .http()
      .get(`/api/resuscitations/${rec.id}/debrief`)
      .set(...(await auth('admin')));
    expect(admin.status).toBe(403);
  });

  it('signs only with the closing details, only as lead, and only once', async () => {
    const { rec } = await recordWithFindings(t, await t.tokenFor('lead'));
    const url = `/api/resuscitations/${rec.id}`;
    const early = await t
      .http()
      .post(`${url}/sign`)
      .set(...(await auth('lead')));
    expect(early.status).toBe(400);
    expect(early.body.details.map((d: { path: string }) => d.path)).toEqual([
      'outcome',
      'firstRhythm',
      'witnessed',
      'monitored',
    ]);
    await t
      .http()
      .patch(url)
      .set(...(await auth('lead')))
      .send({ outcome: 'rosc-sustained', firstRhythm: 'vf', witnessed: true, monitored: false })
      .expect(200);
    expect(
      (
        await t
          .http()
          .post(`${url}/sign`)
          .set(...(await auth('recorder')))
      ).status,
    ).toBe(403);
    const signed = await t
      .http()
      .post(`${url}/sign`)
      .set(...(await auth('lead')));
    expect(signed.status).toBe(200);
    expect(signed.body.status).toBe('signed');
    expect(signed.body.signedBy).toBeTruthy();
    expect(
      (
        await t
          .http()
          .post(`${url}/sign`)
          .set(...(await auth('lead')))
      ).status,
    ).toBe(409);
    const audit = await t.db('auditLog').where({ resuscitationId: rec.id, action: 'sign' });
    expect(audit).toHaveLength(1);
    // The audit summary row (trends read it) is written with the signature.
    expect(await t.db('recordSummaries').where({ resuscitationId: rec.id })).toHaveLength(1);
  });

  const signedRecord = () => signed(t);

  it('refuses API edits of a signed record with 409', async () => {
    const { url } = await signedRecord();
    const patch = await t
      .http()
      .patch(url)
      .set(...(await auth('lead')))
      .send({ location: 'Bay 9' });
    expect(patch.status).toBe(409);
    const more = await t
      .http()
      .post(`${url}/events/batch`)
      .set(...(await auth('lead')))
      .send({ events: [anEvent('note', 30, { text: 'late' })] });
    expect(more.status).toBe(409);
  });

  it('has the database itself refuse changes to a signed record', async () => {
    const { rec, events } = await signedRecord();
    const refused = /signed and locked|append-only|cannot change/;
    await expect(
      t.db('resuscitations').where({ id: rec.id }).update({ outcome: 'transferred' }),
    ).rejects.toThrow(refused);
    await expect(
      t.db('resuscitations').where({ id: rec.id }).update({ status: 'closed' }),
    ).rejects.toThrow(refused);
    await expect(t.db('resuscitations').where({ id: rec.id }).delete()).rejects.toThrow(refused);
    await expect(
      t.db('resuscitationEvents').where({ id: events[1].id }).update({ at: new Date() }),
    ).rejects.toThrow(refused);
    await expect(t.db('resuscitationEvents').where({ id: events[1].id }).delete()).rejects.toThrow(
      refused,
    );
    await expect(
      t.db('etco2Samples').where({ resuscitationId: rec.id }).update({ value: 40 }),
    ).rejects.toThrow(refused);
    await expect(t.db('etco2Samples').where({ resuscitationId: rec.id }).delete()).rejects.toThrow(
      refused,
    );
    const plain = {
      id: randomUUID(),
      resuscitationId: rec.id,
      at: new Date(),
      kind: 'note',
      data: '{"text":"x"}',
    };
    await expect(t.db('resuscitationEvents').insert(plain)).rejects.toThrow(refused);
    // Flagging an event as an amendment without an amendment row of this transaction fails too.
    await expect(t.db('resuscitationEvents').insert({ ...plain, amendment: true })).rejects.toThrow(
      refused,
    );
    await expect(
      t.db('etco2Samples').insert({
        id: randomUUID(),
        resuscitationId: rec.id,
        at: new Date(),
        value: 30,
        unit: 'mmHg',
        valueMmhg: 30,
        source: 'manual',
      }),
    ).rejects.toThrow(refused);
    await expect(
      t.db('waveformChunks').insert({
        id: randomUUID(),
        resuscitationId: rec.id,
        startAt: new Date(),
        sampleRateHz: 50,
        unit: 'mmHg',
        sampleCount: 1,
        samples: Buffer.alloc(4),
      }),
    ).rejects.toThrow(refused);
    const row = await t.db('resuscitations').where({ id: rec.id }).first();
    expect(row.outcome).toBe('died');
    // Work that is not clinical (e.g. a timestamp) still passes.
    await t.db('resuscitations').where({ id: rec.id }).update({ updatedAt: new Date() });
  });

  it('applies an amendment with a reason as flagged events and field changes, with audit', async () => {
    const { rec, events, url } = await signedRecord();
    const noReason = await t
      .http()
      .post(`${url}/amendments`)
      .set(...(await auth('lead')))
      .send({ reason: '   ', fields: { outcome: 'transferred' } });
    expect(noReason.status).toBe(400);
    expect(noReason.body.details[0].path).toBe('reason');
    const correction = anEvent('correction', 150, {
      supersedes: events[4].id,
      reason: 'Shock energy was 150 J',
      replacement: { kind: 'shock', data: { energyJ: 150 }, at: events[4].at },
    });
    const body = {
      reason: 'Shock energy misread from the defibrillator',
      events: [correction],
      fields: { outcome: 'transferred' },
    };
    expect(
      (
        await t
          .http()
          .post(`${url}/amendments`)
          .set(...(await auth('recorder')))
          .send(body)
      ).status,
    ).toBe(403);
    const res = await t
      .http()
      .post(`${url}/amendments`)
      .set(...(await auth('lead')))
      .send(body);
    expect(res.status).toBe(201);
    expect(res.body.reason).toBe(body.reason);
    expect(res.body.createdByName).toBeTruthy();
    const stored = await t.db('resuscitationEvents').where({ id: correction.id }).first();
    expect(stored.amendment).toBe(true);
    expect(stored.amendmentId).toBe(res.body.id);
    expect((await t.db('resuscitations').where({ id: rec.id }).first()).outcome).toBe(
      'transferred',
    );
    const d = (
      await t
        .http()
        .get(`${url}/debrief`)
        .set(...(await auth('lead')))
    ).body as Debrief;
    expect(d.amendments).toHaveLength(1);
    expect(d.events.find((e) => e.id === events[4].id)?.supersededBy).toBe(correction.id);
    expect(await t.db('auditLog').where({ resuscitationId: rec.id, action: 'amend' })).toHaveLength(
      1,
    );
    // The amendment row itself is append-only.
    await expect(
      t.db('amendments').where({ id: res.body.id }).update({ reason: 'x' }),
    ).rejects.toThrow(/append-only/);
  });

  it('stores nothing of an amendment with one bad event', async () => {
    const { rec, url } = await signedRecord();
    const bad = await t
      .http()
      .post(`${url}/amendments`)
      .set(...(await auth('lead')))
      .send({
        reason: 'Missed drug',
        events: [anEvent('note', 10, { text: 'ok' }), anEvent('drug', 20, { drug: 'aspirin' })],
      });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/^events\.1\.data\.drug/);
    expect(await t.db('amendments').where({ resuscitationId: rec.id })).toHaveLength(0);
  });
});
