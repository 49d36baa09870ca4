import type { Table } from 'dexie';
import { useLiveQuery } from 'dexie-react-hooks';
import { useMemo } from 'react';

/** What the reader needs of a row: events and typed EtCO2 values both fit. */
export interface RecordRow {
  id: string;
  resuscitationId: string;
  at: string;
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
): () => Promise<T[]> {
  const index = () => table.where('[resuscitationId+at]');
  const all = () => index().between([resuscitationId, ''], [resuscitationId, '\uffff']);
  let held: T[] = [];
  return () =>
    table.db.transaction('r', table, async () => {
      if (held.length === 0) return (held = await all().toArray());
      const lastAt = held[held.length - 1].at;
      const [count, tail] = await Promise.all([
        all().count(),
        index()
          .between([resuscitationId, lastAt], [resuscitationId, '\uffff'], true, true)
          .toArray(),
      ]);
      // The rows held at `lastAt` are read again with the tail, in the store's own order.
      let kept = held.length;
      while (kept > 0 && held[kept - 1].at === lastAt) kept--;
      if (kept + tail.length !== count) return (held = await all().toArray());
      if (kept + tail.length === held.length) return held; // nothing new: the same array
      return (held = held.slice(0, kept).concat(tail));
    });
}

/** A record's rows of an append-only store, kept current by Dexie's live query. */
export function useRecordRows<T extends RecordRow, I>(
  table: Table<T, string, I>,
  resuscitationId: string,
): T[] {
  const read = useMemo(() => appendOnlyReader(table, resuscitationId), [table, resuscitationId]);
  return useLiveQuery(read, [read], []);
}
