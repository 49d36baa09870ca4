import { SyncIndicator } from './sync-indicator';
import { SyncProblems } from './sync-problems';

/** What the Board feature puts in the top bar: the sync state and what the server refused. */
export function StatusArea() {
  return (
    <>
      <SyncIndicator />
      <SyncProblems />
    </>
  );
}
