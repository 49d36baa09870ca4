import type { RecordingContext } from '@upstroke/contracts';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createOfflineDb, type OfflineDb } from './db';
import { FakeServer } from './fake-server';
import { recordEvent, startResuscitation } from './record';
import { runStoreRead, type StoreRead } from './store-reads';
import { CLOCK_MAX_AGE_MS, SyncEngine } from './sync-engine';

const siteId = '0b7e6a50-3b1e-4c55-9a51-6a0b7d2d1a01';
const site = {
  id: siteId,
  name: 'Kestrel Bay Regional Hospital',
  units: [],
} as unknown as RecordingContext['sites'][number];

let db: OfflineDb;
let server: FakeServer;
let clock: number;
let engine: SyncEngine;

beforeEach(() => {
  db = createOfflineDb(`test-${crypto.randomUUID()}`);
  server = new FakeServer();
  clock = Date.parse('2026-12-03T05:00:00Z');
  engine = new SyncEngine(db, server, {
    isOnline: () => true,
    hasSession: () => true,
    now: () => clock,
  });
});
afterEach(async () => {
  engine.stop();
  await db.delete();
});

async function tapNote(id: string, text: string) {
  await recordEvent(id, 'note', { text }, { db });
}

describe('the sync engine measures the clock once a minute, not on every drain', () => {
  it('reuses a measure younger than CLOCK_MAX_AGE_MS and measures again after it', async () => {
    const asked = vi.spyOn(server, 'context');
    const rec = await startResuscitation({ siteId }, db);
    await tapNote(rec.id, 'a');
    expect(await engine.syncNow()).toEqual({ sent: 1, refused: 0 });
    clock += 1_000;
    await tapNote(rec.id, 'b');
    expect(await engine.syncNow()).toEqual({ sent: 1, refused: 0 });
    clock += CLOCK_MAX_AGE_MS - 2_000;
    await tapNote(rec.id, 'c');
    expect(await engine.syncNow()).toEqual({ sent: 1, refused: 0 });
    expect(asked).toHaveBeenCalledTimes(1);
    clock += 1_001; // the first measure is now a minute old
    expect(await engine.syncNow()).toEqual({ sent: 0, refused: 0 });
    expect(asked).toHaveBeenCalledTimes(2);
    // Every batch still carried an offset (the reused one).
    expect(server.calls.filter((c) => c.kind === 'events').map((c) => c.offset)).toHaveLength(3);
    expect(server.stored.events.size).toBe(3);
  });

  it('measures again on the drain after a failed one', async () => {
    const asked = vi.spyOn(server, 'context');
    const rec = await startResuscitation({ siteId }, db);
    await tapNote(rec.id, 'a');
    server.failures = ['before'];
    expect(await engine.syncNow(true)).toBeNull();
    expect(await engine.syncNow(true)).toEqual({ sent: 1, refused: 0 });
    expect(asked).toHaveBeenCalledTimes(2);
  });

  it('stores the cached sites only when they changed (screens reading them redraw on a write)', async () => {
    const sites = [site];
    vi.spyOn(server, 'context').mockImplementation(async () => ({
      serverTime: new Date(clock).toISOString(),
      sites,
    }));
    expect(await engine.syncNow()).toEqual({ sent: 0, refused: 0 });
    const first = await db.meta.get('context');
    clock += CLOCK_MAX_AGE_MS + 1;
    expect(await engine.syncNow()).toEqual({ sent: 0, refused: 0 });
    // Same sites: the row is the first one, time stamp included; the clock row is new.
    expect(await db.meta.get('context')).toEqual(first);
    expect((await db.meta.get('clock'))?.value).toMatchObject({
      at: new Date(clock).toISOString(),
    });
    sites.push({ ...site, id: '0b7e6a50-3b1e-4c55-9a51-6a0b7d2d1a02', name: 'Harbour Annex' });
    clock += CLOCK_MAX_AGE_MS + 1;
    expect(await engine.syncNow()).toEqual({ sent: 0, refused: 0 });
    const now = await db.meta.get('context');
    expect(now?.value).toMatchObject({ serverTime: new Date(clock).toISOString() });
    expect(now && 'sites' in now.value ? now.value.sites : []).toHaveLength(2);
  });
});

describe("the sync engine's reads", () => {
  it('go through the read it is given (the app: the tap writer worker), and it sends what they name', async () => {
    const asked: string[] = [];
    const reading = new SyncEngine(db, server, {
      isOnline: () => true,
      hasSession: () => true,
      now: () => clock,
      read: <T>(r: StoreRead) => {
        asked.push(r.read);
        return runStoreRead(db, r) as Promise<T>;
      },
    });
    const rec = await startResuscitation({ siteId }, db);
    await tapNote(rec.id, 'a');
    await tapNote(rec.id, 'b');
    expect(await reading.syncNow()).toEqual({ sent: 2, refused: 0 });
    expect(asked).toEqual(['waiting', 'unsent']);
    expect(server.stored.events.size).toBe(2);
    // Nothing waits: the count alone is read, nothing is sent.
    expect(await reading.syncNow()).toEqual({ sent: 0, refused: 0 });
    expect(asked).toEqual(['waiting', 'unsent', 'waiting']);
    reading.stop();
  });
});
