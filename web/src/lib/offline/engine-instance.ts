import { offlineDb } from './db';
import { tapWriter } from './record';
import { SyncEngine } from './sync-engine';
import { apiTransport } from './transport';

/**
 * The app's one sync engine, on the tablet's store and the real API; its reads run in the
 * tap writer's worker, beside the taps they would otherwise hold back.
 */
export const syncEngine = new SyncEngine(offlineDb, apiTransport, {
  read: (r) => tapWriter.read(r),
});

let stop: (() => void) | null = null;

/** Starts background sync once (called from the app entry). */
export function startSync(): void {
  stop ??= syncEngine.start();
}
