import { SyncIndicator } from './sync-indicator';
import { UpdatePrompt } from './update-prompt';

/** What the Board feature puts in the top bar: the sync state and the app-update offer. */
export function StatusArea() {
  return (
    <>
      <SyncIndicator />
      <UpdatePrompt />
    </>
  );
}
