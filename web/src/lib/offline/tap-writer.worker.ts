/// <reference lib="webworker" />
/**
 * Commits taps to IndexedDB off the screen's thread, so a tap is stored in a few milliseconds
 * even while the Live screen redraws, and runs the reads the screen repeats after each tap
 * (`StoreRead`). Dexie broadcasts each commit, so the screen's live queries see the new row as
 * if it had been written there.
 */
import { createOfflineDb } from './db';
import { runStoreRead } from './store-reads';
import { addRow, type TapWritten, type WorkerRequest } from './tap-writer';

const db = createOfflineDb();
// Open now, so the first tap does not wait for the database to open.
void db.open();
const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (message: MessageEvent<WorkerRequest>) => {
  const request = message.data;
  const { seq } = request;
  const work: Promise<unknown> =
    'read' in request ? runStoreRead(db, request) : addRow(db, request);
  work.then(
    (value) =>
      reply({
        seq,
        ok: true,
        committedAt: performance.timeOrigin + performance.now(),
        ...('read' in request ? { value } : {}),
      }),
    (error: unknown) =>
      reply({
        seq,
        ok: false,
        committedAt: performance.timeOrigin + performance.now(),
        error: error instanceof Error ? `${error.name}: ${error.message}` : String(error),
      }),
  );
};

function reply(result: TapWritten) {
  scope.postMessage(result);
}
