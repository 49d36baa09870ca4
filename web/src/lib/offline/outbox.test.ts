import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiRequestError } from '../api-client';
import { createOfflineDb, type OfflineDb } from './db';
import { FakeServer } from './fake-server';
import { BATCH_SIZE, countRefused, countWaiting, drainOutbox } from './outbox';
import { recordEtco2, recordEvent, startResuscitation, updateResuscitation } from './record';
import { SyncEngine } from './sync-engine';

const siteId = '0b7e6a50-3b1e-4c55-9a51-6a0b7d2d1a01';
let db: OfflineDb;
let server: FakeServer;

beforeEach(() => {
  db = createOfflineDb(`test-${crypto.randomUUID()}`);
  server = new FakeServer();
});
afterEach(async () => {
  await db.delete();
});

async function codeWith(events: number, values: number) {
  const rec = await startResuscitation({ siteId }, db);
  for (let i = 0; i < events; i++) await recordEvent(rec.id, 'note', { text: `n${i}` }, { db });
  for (let i = 0; i < values; i++) await recordEtco2(rec.id, 10 + i, 'mmHg', { db });
  return rec;
}

describe('outbox drain', () => {
  it('creates the record before sending its events and values, then reports all saved', async () => {
    const rec = await codeWith(30, 10);
    expect(await countWaiting(db)).toBe(41); // 1 create + 30 events + 10 values
    const result = await drainOutbox(db, server, 120);
    expect(result).toEqual({ sent: 40, refused: 0 });
    expect(server.calls[0].kind).toBe('create');
    expect(server.records.has(rec.id)).toBe(true);
    expect(server.stored.events.size).toBe(30);
    expect(server.stored.etco2.size).toBe(10);
    expect(server.calls.filter((c) => c.kind === 'events').every((c) => c.offset === 120)).toBe(
      true,
    );
    expect(await countWaiting(db)).toBe(0);
  });

  it('keeps everything queued when the request never reaches the server, and sends it once later', async () => {
    await codeWith(12, 3);
    server.failures = ['before'];
    await expect(drainOutbox(db, server)).rejects.toThrow('Failed to fetch');
    expect(server.stored.events.size).toBe(0);
    expect(await countWaiting(db)).toBe(15);
    await drainOutbox(db, server);
    expect([server.stored.events.size, server.stored.etco2.size]).toEqual([12, 3]);
    expect(await countWaiting(db)).toBe(0);
  });

  it('loses nothing and duplicates nothing when the answer is lost after the server stored the batch', async () => {
    await codeWith(30, 10);
    // The API dies between storing the events and answering: the tablet never hears back.
    server.failures = ['after'];
    await expect(drainOutbox(db, server)).rejects.toThrow();
    expect(await db.acks.count()).toBe(0);
    expect(await countWaiting(db)).toBe(40);
    // On retry the same ids are resent; the server counts them as duplicates.
    await drainOutbox(db, server);
    await drainOutbox(db, server);
    expect([server.stored.events.size, server.stored.etco2.size]).toEqual([30, 10]);
    expect(await db.acks.where('state').equals(1).count()).toBe(40);
    expect(await db.events.count()).toBe(30);
    expect(await countWaiting(db)).toBe(0);
  });

  it('keeps a refused value on the tablet with its reason and sends the rest', async () => {
    const rec = await codeWith(0, 3);
    const [bad] = await db.etco2.toArray();
    server.refuseIds.add(bad.id);
    expect(await drainOutbox(db, server)).toEqual({ sent: 2, refused: 1 });
    expect(await db.etco2.get(bad.id)).toMatchObject({ id: bad.id, resuscitationId: rec.id });
    expect(await db.acks.get(bad.id)).toEqual({
      id: bad.id,
      resuscitationId: rec.id,
      state: 2,
      reason: 'value: bad',
    });
    expect(await countRefused(db)).toBe(1);
    expect(await countWaiting(db)).toBe(0);
  });

  it('holds the events of a record the server refused to create, without losing them', async () => {
    const rec = await codeWith(2, 0);
    server.create = () => Promise.reject(new ApiRequestError(403, null));
    await drainOutbox(db, server);
    expect(server.stored.events.size).toBe(0);
    expect(await db.events.count()).toBe(2);
    expect(await db.acks.count()).toBe(0);
    expect((await db.outbox.toArray())[0]).toMatchObject({
      resuscitationId: rec.id,
      failed: 'Request failed (403)',
    });
  });

  it('sends patches after the create, in order, and splits large queues into batches', async () => {
    const rec = await codeWith(BATCH_SIZE * 2 + 7, 0);
    await updateResuscitation(rec.id, { roster: [{ name: 'A. Lead', role: 'lead' }] }, db);
    await drainOutbox(db, server);
    expect(server.records.get(rec.id)?.roster).toEqual([{ name: 'A. Lead', role: 'lead' }]);
    expect(server.calls.filter((c) => c.kind === 'events').map((c) => c.size)).toEqual([
      500, 500, 7,
    ]);
  });
});

describe('sync engine', () => {
  it('backs off after a failure, then syncs once the server answers, with the clock offset', async () => {
    await codeWith(5, 0);
    let now = Date.now(); // the tablet's clock, as plausible as the server's
    const engine = new SyncEngine(db, server, {
      isOnline: () => true,
      hasSession: () => true,
      now: () => now,
      backoff: { baseMs: 1000, random: () => 0 },
    });
    server.failures = ['before'];
    expect(await engine.syncNow()).toBeNull();
    expect(engine.getState().failures).toBe(1);
    // Within the back-off window a routine trigger does nothing.
    now += 400;
    expect(await engine.syncNow()).toBeNull();
    expect(server.calls.filter((c) => c.kind === 'events')).toHaveLength(1);
    now += 200; // past the 500 ms step (equal jitter, random = 0)
    server.clockSkewMs = 0;
    expect(await engine.syncNow()).toEqual({ sent: 5, refused: 0 });
    expect(engine.getState()).toMatchObject({ failures: 0, lastError: null });
    engine.stop();
  });

  it('does not try while offline and counts what waits', async () => {
    await codeWith(3, 1);
    const engine = new SyncEngine(db, server, { isOnline: () => false, hasSession: () => true });
    expect(await engine.syncNow(true)).toBeNull();
    expect(server.calls).toHaveLength(0);
    expect(await countWaiting(db)).toBe(5);
  });
});
