import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createOfflineDb, type OfflineDb } from './db';
import { FakeServer } from './fake-server';
import { countRefused, countWaiting, drainOutbox } from './outbox';
import { recordEtco2, recordEvent, startResuscitation } from './record';
import { ClockRefusedError } from './send-batch';
import { SyncEngine } from './sync-engine';
import { discardRefused } from './discard-refused';
import { listSyncProblems } from './sync-problems';

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

async function notes(n: number) {
  const rec = await startResuscitation({ siteId }, db);
  for (let i = 0; i < n; i++) await recordEvent(rec.id, 'note', { text: `n${i}` }, { db });
  return { rec, events: await db.events.toArray() };
}

const batchCalls = () => server.calls.filter((c) => c.kind === 'events').length;

describe('one bad item never stalls the outbox', () => {
  it('refuses the item a 4xx names and sends the rest of the batch', async () => {
    const { events } = await notes(6);
    server.namedRefusalIds.add(events[3].id);
    expect(await drainOutbox(db, server)).toEqual({ sent: 5, refused: 1 });
    expect(server.stored.events.size).toBe(5);
    expect(await db.acks.get(events[3].id)).toMatchObject({
      state: 2,
      reason: 'events.3.data: not storable',
    });
    expect(await countWaiting(db)).toBe(0);
  });

  it('splits a batch that keeps failing with 5xx: all but the poison item are stored', async () => {
    const { events } = await notes(40);
    const poison = events[17];
    server.poisonIds.add(poison.id);
    // Without bisection (first failures) the whole batch waits.
    await expect(drainOutbox(db, server)).rejects.toThrow('crashed');
    expect(server.stored.events.size).toBe(0);
    await expect(drainOutbox(db, server, undefined, true)).rejects.toThrow('crashed');
    expect(server.stored.events.size).toBe(39);
    expect(server.stored.events.has(poison.id)).toBe(false);
    // The poison item is neither lost nor marked refused: it waits for the server's fix.
    expect(await db.acks.get(poison.id)).toBeUndefined();
    expect(await countWaiting(db)).toBe(1);
    server.poisonIds.clear();
    await drainOutbox(db, server);
    expect(server.stored.events.size).toBe(40);
  });

  it('asks only about two requests per halving when the server is down for every batch', async () => {
    const { events } = await notes(64);
    for (const e of events) server.poisonIds.add(e.id);
    await expect(drainOutbox(db, server, undefined, true)).rejects.toThrow();
    // 1 + 2 per level down to single items (log2 64 = 6 levels): 13, never one per item.
    expect(batchCalls()).toBe(13);
    expect(await countWaiting(db)).toBe(64); // the record was created; no event lost
  });

  it('after two failed drains the engine bisects on its own', async () => {
    const { events } = await notes(10);
    server.poisonIds.add(events[0].id);
    let now = Date.now(); // the tablet's clock, as plausible as the server's
    const engine = new SyncEngine(db, server, {
      isOnline: () => true,
      hasSession: () => true,
      now: () => now,
    });
    for (let i = 0; i < 3; i++) {
      now += 10 * 60_000; // past any back-off
      await engine.syncNow();
    }
    engine.stop();
    expect(server.stored.events.size).toBe(9);
    expect(engine.getState().failures).toBe(3);
  });

  it('keeps every entry and says so when the server refuses the tablet clock', async () => {
    await notes(3);
    await recordEtco2((await db.resuscitations.toArray())[0].id, 30, 'mmHg', { db });
    server.clockLimitMs = 24 * 3_600_000;
    server.clockSkewMs = -30 * 24 * 3_600_000; // tablet 30 days ahead
    await expect(drainOutbox(db, server, 30 * 24 * 3_600_000)).rejects.toBeInstanceOf(
      ClockRefusedError,
    );
    const engine = new SyncEngine(db, server, { isOnline: () => true, hasSession: () => true });
    expect(await engine.syncNow()).toBeNull();
    engine.stop();
    expect(engine.getState().clockRefused).toMatch(/date and time/);
    expect(await db.acks.count()).toBe(0);
    expect(await countRefused(db)).toBe(0);
    // The record start waits too (its arrest would be in the future on the server's clock).
    expect(await countWaiting(db)).toBe(5);
  });

  it('sends not even the record start while the tablet clock is beyond what the server takes', async () => {
    await notes(2);
    server.clockSkewMs = 3 * 24 * 3_600_000; // tablet 3 days ahead: its arrest is "in the future"
    const engine = new SyncEngine(db, server, { isOnline: () => true, hasSession: () => true });
    expect(await engine.syncNow()).toBeNull();
    expect(engine.getState().clockRefused).toMatch(
      /72 h ahead of the server's: check the tablet's date and time/,
    );
    expect(server.calls).toEqual([]);
    expect(await db.outbox.count()).toBe(1);
    expect(await db.outbox.filter((op) => Boolean(op.failed)).count()).toBe(0);
    expect(await countWaiting(db)).toBe(3);
    // The time fixed, the same entries go: nothing was lost or refused meanwhile.
    server.clockSkewMs = 0;
    expect(await engine.syncNow(true)).toEqual({ sent: 2, refused: 0 });
    engine.stop();
    expect(engine.getState().clockRefused).toBeNull();
    expect(server.records.size).toBe(1);
    expect(server.stored.events.size).toBe(2);
  });

  it('holds a record start with the clock message when the tablet is 2 h ahead (the API would refuse its arrest as in the future)', async () => {
    await notes(2);
    server.clockSkewMs = 2 * 3_600_000; // tablet 2 h ahead: within the day the API takes
    const engine = new SyncEngine(db, server, { isOnline: () => true, hasSession: () => true });
    expect(await engine.syncNow()).toBeNull();
    engine.stop();
    expect(engine.getState().clockRefused).toMatch(
      /2 h ahead of the server's, so the code's start would be refused: check the tablet's date and time/,
    );
    expect(server.calls).toEqual([]);
    // Waiting, not refused: nothing is marked failed, everything is still to send.
    expect(await db.outbox.filter((op) => Boolean(op.failed)).count()).toBe(0);
    expect(await countRefused(db)).toBe(0);
    expect(await countWaiting(db)).toBe(3);
  });

  it('lets a lead discard refused entries with a reason: told to the server, kept here', async () => {
    const { rec, events } = await notes(3);
    server.refuseIds.add(events[1].id);
    await drainOutbox(db, server);
    expect(await countRefused(db)).toBe(1);
    expect(await discardRefused(db, server, 'Typed on the wrong code')).toBe(1);
    expect(server.discards).toEqual([
      {
        id: rec.id,
        body: {
          reason: 'Typed on the wrong code',
          siteId,
          items: [
            {
              id: events[1].id,
              kind: 'events',
              refusal: 'value: bad',
              content: JSON.stringify(events[1]),
            },
          ],
        },
      },
    ]);
    expect(await countRefused(db)).toBe(0);
    expect((await listSyncProblems(db)).items).toEqual([]);
    expect(await db.events.get(events[1].id)).toBeDefined();
    expect(await db.acks.get(events[1].id)).toMatchObject({
      state: 3,
      discardReason: 'Typed on the wrong code',
    });
  });

  it('keeps the entries refused when the server does not record the discard', async () => {
    const { events } = await notes(2);
    server.refuseIds.add(events[0].id);
    await drainOutbox(db, server);
    server.discard = () => Promise.reject(new TypeError('Failed to fetch'));
    await expect(discardRefused(db, server, 'Wrong code')).rejects.toThrow();
    expect(await countRefused(db)).toBe(1);
  });
});
