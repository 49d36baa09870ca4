import type { LocalEtco2, LocalEvent, OfflineDb } from './db';

/** One tap: an event or a typed EtCO2 value, with the table it goes to. */
export type Tap = { table: 'events'; row: LocalEvent } | { table: 'etco2'; row: LocalEtco2 };

/** A tap for the writer worker. */
export type TapWrite = Tap & { seq: number };

/** Adds the tap's row to its table (either thread). */
export function addRow(db: OfflineDb, tap: Tap): Promise<string> {
  return tap.table === 'events' ? db.events.add(tap.row) : db.etco2.add(tap.row);
}

/** The worker's answer; `committedAt` is an absolute time (timeOrigin + performance.now()). */
export interface TapWritten {
  seq: number;
  ok: boolean;
  committedAt: number;
  error?: string;
}

interface Pending {
  write: TapWrite;
  resolve: (committedAt: number) => void;
  reject: (error: Error) => void;
}

function isDuplicate(error: unknown): boolean {
  return error instanceof Error && error.name === 'ConstraintError';
}

/**
 * Adds a tap on this thread; resolves with the commit time. A row already there (the same
 * id, written before a worker failed) counts as written.
 */
export async function addTap(db: OfflineDb, tap: Tap): Promise<number> {
  try {
    await addRow(db, tap);
  } catch (error) {
    if (!isDuplicate(error)) throw error;
  }
  return performance.now();
}

/**
 * Writes taps (events and typed EtCO2 values) to IndexedDB through a dedicated worker, so a
 * commit never waits for the screen's thread to finish drawing. Where no worker can run
 * (tests, a worker that failed to load), it writes on this thread instead; writes the worker
 * had not confirmed are redone here, and a row already there counts as written.
 */
export class TapWriter {
  /** undefined: not started yet; null: no worker, write on this thread. */
  private worker: Worker | null | undefined;
  private seq = 0;
  private readonly pending = new Map<number, Pending>();

  constructor(
    private readonly db: () => OfflineDb,
    private readonly spawn: () => Worker | null,
  ) {}

  /** Starts the worker ahead of the first tap (opening the database takes a moment). */
  warm(): void {
    this.ensureWorker();
  }

  /** Resolves once IndexedDB has committed the row, with the commit time on this page's clock. */
  write(tap: Tap): Promise<number> {
    const worker = this.ensureWorker();
    if (!worker) return this.direct(tap);
    const write: TapWrite = { ...tap, seq: ++this.seq };
    return new Promise((resolve, reject) => {
      this.pending.set(write.seq, { write, resolve, reject });
      worker.postMessage(write);
    });
  }

  private ensureWorker(): Worker | null {
    if (this.worker !== undefined) return this.worker;
    try {
      this.worker = this.spawn();
    } catch {
      this.worker = null;
    }
    if (this.worker) {
      this.worker.onmessage = (m: MessageEvent<TapWritten>) => this.settle(m.data);
      this.worker.onerror = () => this.fallBack();
    }
    return this.worker;
  }

  private settle({ seq, ok, committedAt, error }: TapWritten) {
    const p = this.pending.get(seq);
    if (!p) return;
    this.pending.delete(seq);
    if (ok) p.resolve(committedAt - performance.timeOrigin);
    else p.reject(Object.assign(new Error(error ?? 'not stored'), { name: 'TapWriteError' }));
  }

  /** The worker failed: from now on write here, starting with what it had not confirmed. */
  private fallBack() {
    this.worker?.terminate();
    this.worker = null;
    const waiting = [...this.pending.values()];
    this.pending.clear();
    for (const p of waiting) this.direct(p.write).then(p.resolve, p.reject);
  }

  private direct(tap: Tap): Promise<number> {
    return addTap(this.db(), tap);
  }
}
