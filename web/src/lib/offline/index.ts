/** The offline store and its sync: every write lands in IndexedDB first, then the outbox. */
export {
  offlineDb,
  type SyncAck,
  type Tracked,
  withAcks,
  type LocalEtco2,
  type LocalEvent,
  type LocalResuscitation,
  type LocalWaveformChunk,
} from './db';
export {
  queueWaveformChunk,
  recordEtco2,
  recordEvent,
  startResuscitation,
  tapWriter,
  updateResuscitation,
} from './record';
export { startSync, syncEngine } from './engine-instance';
export { type LocalRecord, storedFromLocal } from './stored-record';
export { useSyncState, type SyncState } from './use-sync-state';
export { useRemoteEntries } from './use-remote-entries';
export { appendOnlyReader, useRecordRows } from './record-rows';
export { apiTransport, wireSchemas } from './transport';
export { discardRefused } from './discard-refused';
export {
  listSyncProblems,
  retrySyncProblems,
  type RefusedItem,
  type RefusedOp,
  type SyncProblems,
} from './sync-problems';
