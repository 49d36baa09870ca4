import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiRequestError } from '../api-client';
import { createOfflineDb, type OfflineDb } from './db';
import { FakeServer } from './fake-server';
import { countRefused, countWaiting, drainOutbox } from './outbox';
import { recordEtco2, recordEvent, startResuscitation } from './record';
import { discardRefused } from './discard-refused';
import { listSyncProblems, retrySyncProblems } from './sync-problems';

const siteId = '0b7e6a50-3b1e-4c55-9a51-6a0b7d2d1a01';
let db: OfflineDb;
let server: FakeServer;
beforeEach(() => {
  db = createOfflineDb(`problems-${crypto.randomUUID()}`);
  server = new FakeServer();
});
afterEach(async () => {
  await db.delete();
});

describe('sync problems', () => {
  it('lists a refused value with its reason, then sends it again and keeps everything', async () => {
    const rec = await startResuscitation({ siteId }, db);
    await recordEvent(rec.id, 'rosc', {}, { db });
    const bad = await recordEtco2(rec.id, 12, 'mmHg', { db });
    server.refuseIds.add(bad.id);
    await drainOutbox(db, server);

    const problems = await listSyncProblems(db);
    expect(problems.ops).toEqual([]);
    expect(problems.items).toEqual([
      {
        id: bad.id,
        resuscitationId: rec.id,
        what: 'EtCO2 value',
        at: bad.at,
        label: 'EtCO2 12 mmHg',
        reason: 'value: bad',
      },
    ]);

    // The server would now take it (say, the site's range was corrected): send it again.
    server.refuseIds.clear();
    expect(await retrySyncProblems(db)).toBe(1);
    expect(await countWaiting(db)).toBe(1);
    await drainOutbox(db, server);
    expect(server.stored.etco2.has(bad.id)).toBe(true);
    expect(await countRefused(db)).toBe(0);
    expect(await db.etco2.get(bad.id)).toMatchObject({ value: 12, unit: 'mmHg' });
  });

  it('names a refused record start and counts the entries it holds back, then retries it', async () => {
    const rec = await startResuscitation({ siteId }, db);
    await recordEvent(rec.id, 'rosc', {}, { db });
    await recordEvent(rec.id, 'rearrest', {}, { db });
    const refuse = server.create;
    server.create = () => Promise.reject(new ApiRequestError(403, null));
    await drainOutbox(db, server);

    const problems = await listSyncProblems(db);
    expect(problems.ops).toMatchObject([
      { op: 'create', resuscitationId: rec.id, reason: 'Request failed (403)' },
    ]);
    expect(problems.heldBack).toBe(2);

    server.create = refuse;
    expect(await retrySyncProblems(db)).toBe(1);
    await drainOutbox(db, server);
    expect(server.records.has(rec.id)).toBe(true);
    expect(server.stored.events.size).toBe(2);
    expect(await listSyncProblems(db)).toEqual({ ops: [], items: [], heldBack: 0 });
  });

  it('discards a refused value with its content, after the server audited it; the badge clears', async () => {
    const rec = await startResuscitation({ siteId }, db);
    const bad = await recordEtco2(rec.id, 12, 'mmHg', { db });
    server.refuseIds.add(bad.id);
    await drainOutbox(db, server);
    expect(await countRefused(db)).toBe(1);

    // The server refuses the audit: nothing changes on the tablet.
    const audit = server.discard.bind(server);
    server.discard = () => Promise.reject(new ApiRequestError(403, null));
    await expect(discardRefused(db, server, 'Typed on the wrong code')).rejects.toThrow();
    expect(await countRefused(db)).toBe(1);

    server.discard = audit;
    expect(await discardRefused(db, server, 'Typed on the wrong code', rec.id)).toBe(1);
    const [sent] = server.discards;
    expect(sent.id).toBe(rec.id);
    expect(sent.body).toMatchObject({ reason: 'Typed on the wrong code', siteId });
    expect(sent.body.items).toEqual([
      { id: bad.id, kind: 'etco2', refusal: 'value: bad', content: expect.any(String) },
    ]);
    expect(JSON.parse(sent.body.items[0].content as string)).toMatchObject({ value: 12 });
    expect(await countRefused(db)).toBe(0);
    expect(await countWaiting(db)).toBe(0);
    expect(await db.etco2.get(bad.id)).toMatchObject({ value: 12 }); // kept, marked discarded
    expect(await db.acks.get(bad.id)).toMatchObject({
      state: 3,
      discardReason: 'Typed on the wrong code',
    });
  });

  it('discards a refused record start with the entries it held back, and nothing is sent later', async () => {
    const rec = await startResuscitation({ siteId }, db);
    const rosc = await recordEvent(rec.id, 'rosc', {}, { db });
    server.create = () => Promise.reject(new ApiRequestError(403, null));
    await drainOutbox(db, server);
    expect(await countRefused(db)).toBe(1);

    expect(await discardRefused(db, server, 'Demo code on a training tablet')).toBe(2);
    const items = server.discards[0].body.items;
    expect(items.map((i) => [i.kind, i.id, i.refusal])).toEqual([
      ['record', rec.id, 'Request failed (403)'],
      ['events', rosc.id, ''],
    ]);
    expect(JSON.parse(items[0].content as string)).toMatchObject({ op: 'create', siteId });
    expect(await listSyncProblems(db)).toEqual({ ops: [], items: [], heldBack: 0 });
    expect(await countWaiting(db)).toBe(0);
    await drainOutbox(db, server);
    expect(server.stored.events.size).toBe(0);
    expect(await db.events.get(rosc.id)).toBeDefined();
  });
});
