import type { Table } from 'dexie';
import { useMemo } from 'react';
import { offlineDb, type OfflineDb } from './db';
import { tapWriter } from './record';
import { readRows, type RecordRow, type RowsRead } from './store-reads';
import { useStoreQuery } from './use-store-query';

export type { RecordRow } from './store-reads';

/** Reads one record's rows: all of them (`since` null), or those at or after `since`. */
export type RowSource<T extends RecordRow> = (since: string | null) => Promise<RowsRead<T>>;

/** Reads on this thread, from any database (tests use their own). */
export function directRows<T extends RecordRow>(
  db: OfflineDb,
  table: 'events' | 'etco2',
  resuscitationId: string,
): RowSource<T> {
  return (since) => readRows<T>(db, table, resuscitationId, since);
}

/** Reads in the tap writer's worker (the app's own store), off the screen's thread. */
function workerRows<T extends RecordRow>(
  table: 'events' | 'etco2',
  resuscitationId: string,
): RowSource<T> {
  return (since) => tapWriter.read<RowsRead<T>>({ read: 'rows', table, resuscitationId, since });
}

/**
 * Reads one record's rows of an append-only store (events, typed EtCO2) in time order, and on
 * each later call only the rows at or after the latest time it already holds: a commit of a
 * tap reads one row, not the whole record. Rows are never changed or deleted, so the count
 * over the record says whether a row arrived earlier than that time (another tablet's entry,
 * pushed late; a value typed for an earlier moment): then the whole record is read again.
 */
export function appendOnlyReader<T extends RecordRow, I>(
  table: Table<T, string, I>,
  resuscitationId: string,
  source: RowSource<T> = directRows<T>(table.db as OfflineDb, tableName(table), resuscitationId),
): () => Promise<T[]> {
  let held: T[] = [];
  return async () => {
    if (held.length === 0) return (held = (await source(null)).rows);
    const lastAt = held[held.length - 1].at;
    const { count, rows: tail } = await source(lastAt);
    // The rows held at `lastAt` are read again with the tail, in the store's own order.
    let kept = held.length;
    while (kept > 0 && held[kept - 1].at === lastAt) kept--;
    if (kept + tail.length !== count) return (held = (await source(null)).rows);
    if (kept + tail.length === held.length) return held; // nothing new: the same array
    return (held = held.slice(0, kept).concat(tail));
  };
}

function tableName(table: Table): 'events' | 'etco2' {
  if (table.name !== 'events' && table.name !== 'etco2')
    throw new Error(`not an append-only store: ${table.name}`);
  return table.name;
}

/**
 * A record's rows of an append-only store, read again after each commit to the store. The
 * app's own store is read in the tap writer's worker, so a read never holds a tap's write
 * back while this thread draws.
 */
export function useRecordRows<T extends RecordRow, I>(
  table: Table<T, string, I>,
  resuscitationId: string,
): T[] {
  const name = tableName(table);
  // One reader per record: it holds the rows read so far.
  const read = useMemo(
    () =>
      appendOnlyReader(
        table,
        resuscitationId,
        table.db === offlineDb ? workerRows<T>(name, resuscitationId) : undefined,
      ),
    [table, name, resuscitationId],
  );
  return useStoreQuery(read, table.db.name, [name], []);
}
