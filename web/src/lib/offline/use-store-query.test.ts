import { renderHook, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createOfflineDb, type LocalEvent, type OfflineDb } from './db';
import { useStoreQuery } from './use-store-query';

let db: OfflineDb;
beforeEach(() => {
  db = createOfflineDb(`query-${crypto.randomUUID()}`);
});
afterEach(async () => {
  await db.delete();
});

const event = (n: number): LocalEvent => ({
  id: `e${n}`,
  resuscitationId: 'r1',
  at: new Date(Date.UTC(2026, 0, 1, 0, 0, n)).toISOString(),
  kind: 'note',
  data: { text: `n${n}` },
  deviceId: 'd',
});

describe('useStoreQuery', () => {
  it('answers, then answers again after a commit to a store it watches, and only then', async () => {
    let runs = 0;
    const count = () => {
      runs++;
      return db.events.count();
    };
    const { result } = renderHook(() => useStoreQuery(count, db.name, ['events'], -1));
    expect(result.current).toBe(-1); // the initial value until the first answer
    await waitFor(() => expect(result.current).toBe(0));

    await db.events.add(event(1));
    await waitFor(() => expect(result.current).toBe(1));
    const after = runs;
    // Another store of the same database, and the same store of another database: not watched.
    await db.acks.add({ id: 'e1', resuscitationId: 'r1', state: 1 });
    const other = createOfflineDb(`query-other-${crypto.randomUUID()}`);
    try {
      await other.events.add(event(2));
    } finally {
      await other.delete();
    }
    await db.events.add(event(3)); // a watched commit after them, to know they were seen
    await waitFor(() => expect(result.current).toBe(2));
    expect(runs).toBe(after + 1);
  });

  it('never runs twice at once: commits during a run bring one more run after it', async () => {
    let running = 0;
    let most = 0;
    const slowCount = async () => {
      most = Math.max(most, ++running);
      const n = await db.events.count();
      await new Promise((r) => setTimeout(r, 20));
      running--;
      return n;
    };
    const { result } = renderHook(() => useStoreQuery(slowCount, db.name, ['events'], -1));
    await db.events.bulkAdd([event(1)]);
    await db.events.add(event(2));
    await db.events.add(event(3));
    await waitFor(() => expect(result.current).toBe(3));
    expect(most).toBe(1);
  });
});
