import { SyncIndicator } from './sync-indicator';
import { SyncProblems } from './sync-problems';
import { UpdatePrompt } from './update-prompt';

/** What the Board feature puts in the top bar: the sync state, what the server refused, and the app-update offer. */
export function StatusArea() {
  return (
    <>
      <SyncIndicator />
      <SyncProblems />
      <UpdatePrompt />
    </>
  );
}
