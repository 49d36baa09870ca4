import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createOfflineDb, type OfflineDb } from './db';
import { FakeServer } from './fake-server';
import { countWaiting, drainOutbox } from './outbox';
import { mergeRemoteEntries, type RemoteEntries } from './pull';
import { recordEvent, startResuscitation } from './record';

const siteId = '0b7e6a50-3b1e-4c55-9a51-6a0b7d2d1a01';
let db: OfflineDb;
beforeEach(() => {
  db = createOfflineDb(`pull-${crypto.randomUUID()}`);
});
afterEach(async () => {
  await db.delete();
});

describe("other tablets' entries", () => {
  it('adds what another tablet recorded, once, and never sends it back', async () => {
    const rec = await startResuscitation({ siteId }, db);
    const mine = await recordEvent(rec.id, 'rosc', {}, { db });
    const server = new FakeServer();
    await drainOutbox(db, server);
    const theirs = {
      id: crypto.randomUUID(),
      at: '2026-01-01T00:01:00.000Z',
      kind: 'drug' as const,
      data: { drug: 'epinephrine', doseMg: 1 },
      deviceId: 'tablet-b',
    };
    const value = {
      id: crypto.randomUUID(),
      at: '2026-01-01T00:01:05.000Z',
      value: 14,
      unit: 'mmHg' as const,
      source: 'manual' as const,
      deviceId: 'tablet-b',
    };
    const remote: RemoteEntries = {
      events: [{ ...mine, deviceId: mine.deviceId }, theirs],
      etco2: [value],
    };

    // Ids the screen already holds are skipped without a look-up.
    expect(
      await mergeRemoteEntries(db, rec.id, remote, new Set([mine.id, theirs.id, value.id])),
    ).toBe(0);
    expect(await db.events.get(theirs.id)).toBeUndefined();
    expect(await mergeRemoteEntries(db, rec.id, remote, new Set([mine.id]))).toBe(2);
    expect(await db.events.get(theirs.id)).toMatchObject({
      resuscitationId: rec.id,
      kind: 'drug',
      deviceId: 'tablet-b',
    });
    expect(await db.etco2.get(value.id)).toMatchObject({ value: 14, resuscitationId: rec.id });
    // Already on the server: nothing waits and the next drain sends nothing.
    expect(await countWaiting(db)).toBe(0);
    const calls = server.calls.length;
    await drainOutbox(db, server);
    expect(server.calls.length).toBe(calls);
    // A second pull of the same answer changes nothing.
    expect(await mergeRemoteEntries(db, rec.id, remote)).toBe(0);
    expect(await db.events.count()).toBe(2);
  });

  it("leaves this tablet's own waiting entries waiting", async () => {
    const rec = await startResuscitation({ siteId }, db);
    await recordEvent(rec.id, 'rosc', {}, { db });
    expect(await mergeRemoteEntries(db, rec.id, { events: [], etco2: [] })).toBe(0);
    expect(await countWaiting(db)).toBe(2); // the create and the tap
  });
});
