import type { LocalEtco2, LocalEvent, OfflineDb } from './db';
import { runStoreRead, type StoreRead } from './store-reads';

/** One tap: an event or a typed EtCO2 value, with the table it goes to. */
export type Tap = { table: 'events'; row: LocalEvent } | { table: 'etco2'; row: LocalEtco2 };

/** A tap for the writer worker. */
export type TapWrite = Tap & { seq: number };

/** What the page asks of the worker: a tap to write, or a read (see `StoreRead`). */
export type WorkerRequest = TapWrite | (StoreRead & { seq: number });

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
  /** A read's answer. */
  value?: unknown;
}

interface Pending {
  request: WorkerRequest;
  resolve: (answer: TapWritten) => void;
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
 * commit never waits for the screen's thread to finish drawing; the reads the Live screen
 * repeats after each tap run there too (`read`). Where no worker can run (tests, a worker that
 * failed to load), it works on this thread instead; what the worker had not answered is redone
 * here, and a row already there counts as written.
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
  async write(tap: Tap): Promise<number> {
    const answer = await this.ask({ ...tap, seq: ++this.seq });
    return answer.committedAt - performance.timeOrigin;
  }

  /** Runs a read in the worker (on this thread without one); resolves with its answer. */
  async read<T>(r: StoreRead): Promise<T> {
    return (await this.ask({ ...r, seq: ++this.seq })).value as T;
  }

  private ask(request: WorkerRequest): Promise<TapWritten> {
    const worker = this.ensureWorker();
    if (!worker) return this.direct(request);
    return new Promise((resolve, reject) => {
      this.pending.set(request.seq, { request, resolve, reject });
      worker.postMessage(request);
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

  private settle(answer: TapWritten) {
    const p = this.pending.get(answer.seq);
    if (!p) return;
    this.pending.delete(answer.seq);
    if (answer.ok) p.resolve(answer);
    else
      p.reject(
        Object.assign(new Error(answer.error ?? 'not stored'), {
          name: 'read' in p.request ? 'StoreReadError' : 'TapWriteError',
        }),
      );
  }

  /** The worker failed: from now on write here, starting with what it had not confirmed. */
  private fallBack() {
    this.worker?.terminate();
    this.worker = null;
    const waiting = [...this.pending.values()];
    this.pending.clear();
    for (const p of waiting) this.direct(p.request).then(p.resolve, p.reject);
  }

  private async direct(request: WorkerRequest): Promise<TapWritten> {
    const { seq } = request;
    if ('read' in request)
      return { seq, ok: true, committedAt: 0, value: await runStoreRead(this.db(), request) };
    const committedAt = await addTap(this.db(), request);
    return { seq, ok: true, committedAt: committedAt + performance.timeOrigin };
  }
}
