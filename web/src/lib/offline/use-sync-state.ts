import { useLiveQuery } from 'dexie-react-hooks';
import { useSyncExternalStore } from 'react';
import { offlineDb } from './db';
import { countRefused } from './outbox';
import { syncEngine } from './engine-instance';
import { tapWriter } from './record';
import { WAITING_STORES } from './store-reads';
import { useStoreQuery } from './use-store-query';

// Counted in the tap writer's worker: this count is read again after every tap, and a read on
// this thread would hold the next tap's write back while the screen draws.
const readWaiting = () => tapWriter.read<number>({ read: 'waiting' });

export interface SyncState {
  status: 'saved' | 'waiting' | 'offline';
  waiting: number;
  /** Items and record writes the server refused (kept here; see `listSyncProblems`). */
  refused: number;
  syncing: boolean;
  lastError: string | null;
  clockOffsetMs: number | null;
  /** The server refused this tablet's clock: its entries wait until the time is fixed. */
  clockRefused: string | null;
}

/** "All saved", "N waiting" or "Offline", live from IndexedDB and the sync engine. */
export function useSyncState(): SyncState {
  const engine = useSyncExternalStore(syncEngine.subscribe, syncEngine.getState);
  const waiting = useStoreQuery(readWaiting, offlineDb.name, WAITING_STORES, 0);
  const refused = useLiveQuery(() => countRefused(offlineDb), [], 0);
  const status = !engine.online ? 'offline' : waiting > 0 ? 'waiting' : 'saved';
  return {
    status,
    waiting,
    refused,
    syncing: engine.syncing,
    lastError: engine.lastError,
    clockOffsetMs: engine.clockOffsetMs,
    clockRefused: engine.clockRefused,
  };
}
