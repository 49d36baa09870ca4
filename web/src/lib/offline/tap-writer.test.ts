import Dexie from 'dexie';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createOfflineDb, type LocalEvent, type OfflineDb } from './db';
import { countRefused, countWaiting } from './outbox';
import { TapWriter, type TapWritten, type WorkerRequest } from './tap-writer';

let db: OfflineDb;
beforeEach(() => {
  db = createOfflineDb(`tap-${crypto.randomUUID()}`);
});
afterEach(async () => {
  await db.delete();
});

const event = (n: number): LocalEvent => ({
  id: crypto.randomUUID(),
  resuscitationId: 'r1',
  at: new Date(Date.UTC(2026, 0, 1, 0, 0, n)).toISOString(),
  kind: 'note',
  data: { text: `n${n}` },
  deviceId: 'd',
});

/** A stand-in for the worker: holds what it is sent; the test answers or fails it. */
class HeldWorker {
  sent: WorkerRequest[] = [];
  terminated = false;
  onmessage: ((m: MessageEvent<TapWritten>) => void) | null = null;
  onerror: ((e: Event) => void) | null = null;
  postMessage(w: WorkerRequest) {
    this.sent.push(w);
  }
  terminate() {
    this.terminated = true;
  }
  answer(w: WorkerRequest, value?: unknown) {
    const committedAt = performance.timeOrigin + performance.now();
    this.onmessage?.({
      data: { seq: w.seq, ok: true, committedAt, value },
    } as MessageEvent<TapWritten>);
  }
}

describe('tap writer', () => {
  it('writes on this thread when no worker can run', async () => {
    const writer = new TapWriter(
      () => db,
      () => null,
    );
    const e = event(1);
    const committedAt = await writer.write({ table: 'events', row: e });
    expect(committedAt).toBeLessThanOrEqual(performance.now());
    expect(await db.events.get(e.id)).toEqual(e);
  });

  it("resolves with the worker's commit time on this page's clock", async () => {
    const worker = new HeldWorker();
    const writer = new TapWriter(
      () => db,
      () => worker as unknown as Worker,
    );
    const pending = writer.write({ table: 'events', row: event(1) });
    expect(worker.sent).toHaveLength(1);
    const before = performance.now();
    worker.answer(worker.sent[0]);
    const committedAt = await pending;
    expect(committedAt).toBeGreaterThanOrEqual(before);
    expect(committedAt).toBeLessThanOrEqual(performance.now());
  });

  it('redoes on this thread what a failed worker had not confirmed, without doubling what it had stored', async () => {
    const worker = new HeldWorker();
    const writer = new TapWriter(
      () => db,
      () => worker as unknown as Worker,
    );
    const [a, b] = [event(1), event(2)];
    const pa = writer.write({ table: 'events', row: a });
    const pb = writer.write({ table: 'events', row: b });
    // The worker stored `a` but died before saying so; `b` never reached IndexedDB.
    await db.events.add(a);
    worker.onerror?.(new Event('error'));
    await expect(Promise.all([pa, pb])).resolves.toHaveLength(2);
    expect(worker.terminated).toBe(true);
    expect((await db.events.toArray()).map((r) => r.id).sort()).toEqual([a.id, b.id].sort());
    // Later taps go straight in.
    const c = event(3);
    await writer.write({ table: 'events', row: c });
    expect(worker.sent).toHaveLength(2);
    expect(await db.events.count()).toBe(3);
  });

  it("passes on the worker's refusal instead of pretending the tap was stored", async () => {
    const worker = new HeldWorker();
    const writer = new TapWriter(
      () => db,
      () => worker as unknown as Worker,
    );
    const pending = writer.write({ table: 'events', row: event(1) });
    const { seq } = worker.sent[0];
    worker.onmessage?.({
      data: { seq, ok: false, committedAt: 0, error: 'QuotaExceededError: full' },
    } as MessageEvent<TapWritten>);
    await expect(pending).rejects.toThrow('QuotaExceededError: full');
  });
});

describe("the Live screen's reads", () => {
  it('go to the worker and resolve with its answer; a failed worker has them redone here', async () => {
    const worker = new HeldWorker();
    const writer = new TapWriter(
      () => db,
      () => worker as unknown as Worker,
    );
    const [a, b] = [event(1), event(2)];
    await db.events.bulkAdd([a, b]);
    const rows = writer.read({ read: 'rows', table: 'events', resuscitationId: 'r1', since: null });
    expect(worker.sent).toEqual([expect.objectContaining({ read: 'rows', since: null })]);
    worker.answer(worker.sent[0], { count: 9, rows: [] }); // the worker's answer, whatever it is
    await expect(rows).resolves.toEqual({ count: 9, rows: [] });

    const waiting = writer.read<number>({ read: 'waiting' });
    expect(worker.sent[1]).toMatchObject({ read: 'waiting' });
    worker.onerror?.(new Event('error'));
    await expect(waiting).resolves.toBe(2); // counted here: two events, no answer yet
    const tail = await writer.read({
      read: 'rows',
      table: 'events',
      resuscitationId: 'r1',
      since: b.at,
    });
    expect(tail).toEqual({ count: 2, rows: [b] });
    expect(worker.sent).toHaveLength(2);
  });

  it('name a failed read as a read, not as a tap that was not stored', async () => {
    const worker = new HeldWorker();
    const writer = new TapWriter(
      () => db,
      () => worker as unknown as Worker,
    );
    const pending = writer.read({ read: 'waiting' });
    worker.onmessage?.({
      data: { seq: worker.sent[0].seq, ok: false, committedAt: 0, error: 'UnknownError: gone' },
    } as MessageEvent<TapWritten>);
    await expect(pending).rejects.toMatchObject({
      name: 'StoreReadError',
      message: 'UnknownError: gone',
    });
  });
});

describe('offline store upgrade', () => {
  it("moves version 1's sync flags into the answers store without losing an item", async () => {
    const name = `upgrade-${crypto.randomUUID()}`;
    const v1 = new Dexie(name);
    v1.version(1).stores({
      resuscitations: 'id, local, createdAt',
      events: 'id, synced, [resuscitationId+at]',
      etco2: 'id, synced, [resuscitationId+at]',
      waveformChunks: 'id, synced, [resuscitationId+startAt]',
      outbox: '++seq, resuscitationId',
      meta: 'key',
    });
    const [sent, waiting] = [event(1), event(2)];
    await v1.table('events').bulkAdd([
      { ...sent, synced: 1 },
      { ...waiting, synced: 0 },
    ]);
    await v1.table('etco2').add({
      id: 'v1',
      resuscitationId: 'r1',
      at: sent.at,
      value: 400,
      unit: 'mmHg',
      source: 'manual',
      deviceId: 'd',
      synced: 2,
      rejected: 'value: above 150 mmHg',
    });
    v1.close();

    const v2 = createOfflineDb(name);
    try {
      expect(await v2.events.get(sent.id)).toEqual(sent);
      expect(await v2.events.get(waiting.id)).toEqual(waiting);
      expect(await v2.acks.toArray()).toEqual(
        expect.arrayContaining([
          { id: sent.id, resuscitationId: 'r1', state: 1 },
          { id: 'v1', resuscitationId: 'r1', state: 2, reason: 'value: above 150 mmHg' },
        ]),
      );
      expect(await countWaiting(v2)).toBe(1);
      expect(await countRefused(v2)).toBe(1);
    } finally {
      await v2.delete();
    }
  });
});
