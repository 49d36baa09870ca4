import { statusSlot } from './app/status-slot';
import { StatusArea } from './features/board/components/status-area';
import { startSync } from './lib/offline';

/**
 * The tablet's store (IndexedDB) and its sync, and the top bar's sync state. Loaded beside
 * the first screen, so Sign in never waits for them; the signed-in frame waits for them.
 */
export function startBackground(): void {
  // The top bar shows the sync state everywhere, and the outbox drains in the background.
  statusSlot.set(StatusArea);
  startSync();
}
