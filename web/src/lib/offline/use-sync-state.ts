import { useLiveQuery } from 'dexie-react-hooks';
import { useSyncExternalStore } from 'react';
import { offlineDb } from './db';
import { countRefused, countWaiting } from './outbox';
import { syncEngine } from './engine-instance';

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
  const waiting = useLiveQuery(() => countWaiting(offlineDb), [], 0);
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
