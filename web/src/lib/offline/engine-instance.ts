import { offlineDb } from './db';
import { SyncEngine } from './sync-engine';
import { apiTransport } from './transport';

/** The app's one sync engine, on the tablet's store and the real API. */
export const syncEngine = new SyncEngine(offlineDb, apiTransport);

let stop: (() => void) | null = null;

/** Starts background sync once (called from the app entry). */
export function startSync(): void {
  stop ??= syncEngine.start();
}
