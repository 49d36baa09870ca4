import type { Table } from 'dexie';
import type { LocalEtco2, LocalEvent, LocalWaveformChunk, OfflineDb } from './db';

/** What a row of an append-only store (events, typed EtCO2) holds for the readers. */
export interface RecordRow {
  id: string;
  resuscitationId: string;
  at: string;
}

/**
 * The reads the Live screen repeats after every tap. They run in the tap writer's worker when
 * there is one (see `TapWriter.read`): IndexedDB starts a write only once the reads begun
 * before it on the same store have ended, and a read on the screen's thread ends only when
 * that thread, busy drawing the last tap, gets to its result; in the worker it ends at once.
 */
export type StoreRead =
  | {
      read: 'rows';
      table: 'events' | 'etco2';
      resuscitationId: string;
      /** null: every row of the record; else only the rows at or after this time. */
      since: string | null;
    }
  | { read: 'waiting' }
  | { read: 'unsent' };

/** Rows of one record in time order, and how many the record has in all. */
export interface RowsRead<T extends RecordRow = RecordRow> {
  count: number;
  rows: T[];
}

/** One record's rows (all, or from `since` on) with the record's count, in one transaction. */
export function readRows<T extends RecordRow>(
  db: OfflineDb,
  table: 'events' | 'etco2',
  resuscitationId: string,
  since: string | null,
): Promise<RowsRead<T>> {
  const store = db.table<T, string>(table);
  const index = () => store.where('[resuscitationId+at]');
  const all = () => index().between([resuscitationId, ''], [resuscitationId, '\uffff']);
  return db.transaction('r', store, async () => {
    if (since === null) {
      const rows = await all().toArray();
      return { count: rows.length, rows };
    }
    const [count, rows] = await Promise.all([
      all().count(),
      index().between([resuscitationId, since], [resuscitationId, '\uffff'], true, true).toArray(),
    ]);
    return { count, rows };
  });
}

/** The stores `countWaiting` reads: a commit to one of them changes the count. */
export const WAITING_STORES = ['outbox', 'events', 'etco2', 'waveformChunks', 'acks'];

/**
 * How many writes wait for the server (records, events, values, chunks): items are never
 * deleted and each has at most one answer, so what waits is the items less the answers.
 */
export function countWaiting(db: OfflineDb): Promise<number> {
  // One read transaction for the five counts: fewer transactions for a tap's write to queue behind.
  return db.transaction('r', WAITING_STORES, async () => {
    const [ops, events, etco2, chunks, answered] = await Promise.all([
      db.outbox.filter((o) => !o.failed).count(),
      db.events.count(),
      db.etco2.count(),
      db.waveformChunks.count(),
      db.acks.count(),
    ]);
    return ops + events + etco2 + chunks - answered;
  });
}

/** An item the sync engine sends: an event, a typed value or a chunk of capnogram. */
export type Row = LocalEvent | LocalEtco2 | LocalWaveformChunk;

/** The items the server has not answered for, by kind (as the sync batches name them). */
export type Unsent = Record<'events' | 'etco2' | 'waveform', Row[]>;

/**
 * Every item the server has not answered for, read in one transaction (the drain's read: one
 * short read rather than one per table and step).
 */
export function unsentItems(db: OfflineDb): Promise<Unsent> {
  return db.transaction('r', [db.acks, db.events, db.etco2, db.waveformChunks], async () => {
    const acked = new Set(await db.acks.toCollection().primaryKeys());
    const unanswered = async <T extends Row, I>(table: Table<T, string, I>): Promise<T[]> => {
      const keys = (await table.toCollection().primaryKeys()).filter((k) => !acked.has(k));
      if (keys.length === 0) return [];
      return (await table.bulkGet(keys)).filter((r): r is T => r !== undefined);
    };
    const [events, etco2, waveform] = await Promise.all([
      unanswered(db.events),
      unanswered(db.etco2),
      unanswered(db.waveformChunks),
    ]);
    return { events, etco2, waveform };
  });
}

/** Runs a read on a database (the worker's or this thread's). */
export function runStoreRead(db: OfflineDb, r: StoreRead): Promise<unknown> {
  if (r.read === 'rows') return readRows(db, r.table, r.resuscitationId, r.since);
  if (r.read === 'unsent') return unsentItems(db);
  return countWaiting(db);
}
