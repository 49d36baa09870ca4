import { Dexie, type ObservabilitySet } from 'dexie';
import { useEffect, useState } from 'react';

/**
 * Runs `query` and runs it again after each commit to one of `stores` of database `dbName`, on
 * any thread or tab (Dexie announces every commit, the worker's included). Unlike Dexie's
 * `useLiveQuery`, the query may read anywhere (in a worker): what it watches is named here,
 * not traced from its reads. Commits during a run bring one more run after it, never two runs
 * at once. Until the first answer (and after `query` changes) the value is `initial`; a failed
 * read is thrown to the nearest error boundary, as `useLiveQuery` does.
 */
export function useStoreQuery<T>(
  query: () => Promise<T>,
  dbName: string,
  stores: readonly string[],
  initial: T,
): T {
  const [answer, setAnswer] = useState<{ of: () => Promise<T>; value: T } | null>(null);
  const [failure, setFailure] = useState<unknown>(null);
  const watched = stores.join('\n');
  useEffect(() => {
    const prefixes = watched.split('\n').map((s) => `idb://${dbName}/${s}/`);
    let alive = true;
    let running = false;
    let again = false;
    const run = async () => {
      if (running) {
        again = true;
        return;
      }
      running = true;
      try {
        do {
          again = false;
          const value = await query();
          if (alive) setAnswer({ of: query, value });
        } while (again && alive);
      } catch (error) {
        if (alive) setFailure(error);
      } finally {
        running = false;
      }
    };
    const onCommit = (parts: ObservabilitySet) => {
      if ('all' in parts || Object.keys(parts).some((k) => prefixes.some((p) => k.startsWith(p))))
        void run();
    };
    Dexie.on.storagemutated.subscribe(onCommit);
    void run();
    return () => {
      alive = false;
      Dexie.on.storagemutated.unsubscribe(onCommit);
    };
  }, [query, dbName, watched]);
  if (failure) throw failure;
  return answer && answer.of === query ? answer.value : initial;
}
