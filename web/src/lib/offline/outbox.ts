import type { OfflineDb, SyncAck } from './db';
import { arrestTimeProblem } from '@upstroke/contracts';
import { clockRefusal, deliver, type Delivery, messageOf } from './send-batch';
import { type Row, type Unsent, unsentItems } from './store-reads';
import { type BatchKind, isPermanent, type SyncTransport } from './transport';

export const BATCH_SIZE = 500;

/** The item as the API takes it: the record id is in the path. */
function wire(row: Row): object {
  const { resuscitationId: _id, ...rest } = row;
  return rest;
}

export interface DrainResult {
  sent: number;
  refused: number;
}

/**
 * A record start the server would refuse as an arrest in the future because this tablet's
 * clock is ahead (by more than the hour the API allows, less than the day beyond which the
 * engine holds everything): the start waits, with the clock message, instead of being
 * refused for good as if the time had been typed wrong.
 */
function checkStartClock(body: Record<string, unknown>, clockOffsetMs?: number): void {
  if (!clockOffsetMs || typeof body.arrestAt !== 'string') return;
  const serverNow = Date.now() - clockOffsetMs;
  if (arrestTimeProblem(body.arrestAt, serverNow) === null) return;
  if (arrestTimeProblem(body.arrestAt, Date.now()) !== null) return; // wrong whatever the clock
  throw clockRefusal(clockOffsetMs, ", so the code's start would be refused");
}

/**
 * Record-level operations in the order they were made. A transient failure stops the drain
 * (so a patch never overtakes its create); a permanent refusal is kept with its reason.
 * Returns the records whose create has not reached the server: their items must wait.
 */
async function sendOps(
  db: OfflineDb,
  transport: SyncTransport,
  clockOffsetMs?: number,
): Promise<Set<string>> {
  const blocked = new Set<string>();
  for (const op of await db.outbox.orderBy('seq').toArray()) {
    if (op.failed || blocked.has(op.resuscitationId)) {
      blocked.add(op.resuscitationId);
      continue;
    }
    try {
      if (op.op === 'create') {
        checkStartClock(op.body, clockOffsetMs);
        await transport.create(op.body);
      } else await transport.patch(op.resuscitationId, op.body);
      await db.outbox.delete(op.seq as number);
    } catch (error) {
      if (!isPermanent(error)) throw error;
      await db.outbox.update(op.seq as number, { failed: messageOf(error) });
      blocked.add(op.resuscitationId);
    }
  }
  return blocked;
}

function byRecordOf(rows: Row[]): Map<string, Row[]> {
  const byRecord = new Map<string, Row[]>();
  for (const r of rows) {
    const list = byRecord.get(r.resuscitationId);
    if (list) list.push(r);
    else byRecord.set(r.resuscitationId, [r]);
  }
  return byRecord;
}

interface SendOptions {
  clockOffsetMs?: number;
  /** Split batches that fail with 5xx (set after repeated failed drains). */
  bisect?: boolean;
}

/**
 * Sends the waiting items of one kind in batches. Items the server answered are stored in
 * `acks`; a 5xx leaves items waiting: when a whole batch failed, the drain stops there;
 * when only some (a poison item found by bisection), the others go on and the 5xx is
 * returned, to be thrown once everything else was sent (so the engine backs off).
 */
async function sendItems(
  db: OfflineDb,
  transport: SyncTransport,
  kind: BatchKind,
  waiting: Row[],
  blocked: Set<string>,
  o: SendOptions,
): Promise<DrainResult & { serverError: unknown }> {
  const result = { sent: 0, refused: 0, serverError: null as unknown };
  for (const [recordId, rows] of byRecordOf(waiting)) {
    if (blocked.has(recordId)) continue;
    for (let i = 0; i < rows.length; i += BATCH_SIZE) {
      const chunk = rows.slice(i, i + BATCH_SIZE);
      const d: Delivery<Row> = {
        send: (part) => transport.batch(recordId, kind, part.map(wire), o.clockOffsetMs),
        verdicts: new Map(),
        serverError: null,
      };
      const unsent = await deliver(chunk, o.bisect ?? false, d);
      const answers = [...d.verdicts].map(([id, reason]): SyncAck => {
        const ack = { id, resuscitationId: recordId };
        return reason === null ? { ...ack, state: 1 } : { ...ack, state: 2, reason };
      });
      await db.acks.bulkPut(answers);
      result.sent += answers.filter((a) => a.state === 1).length;
      result.refused += answers.filter((a) => a.state === 2).length;
      if (unsent.length === chunk.length) throw d.serverError;
      if (unsent.length) result.serverError = d.serverError;
    }
  }
  return result;
}

/**
 * Sends everything waiting: creates and patches first, then events, EtCO2 values, waveform.
 * `readUnsent` reads the waiting items (the app passes the tap writer's worker; see `StoreRead`).
 */
export async function drainOutbox(
  db: OfflineDb,
  transport: SyncTransport,
  clockOffsetMs?: number,
  bisect = false,
  readUnsent: () => Promise<Unsent> = () => unsentItems(db),
): Promise<DrainResult> {
  const blocked = await sendOps(db, transport, clockOffsetMs);
  const total: DrainResult = { sent: 0, refused: 0 };
  let serverError: unknown = null;
  const waiting = await readUnsent();
  for (const kind of ['events', 'etco2', 'waveform'] as const) {
    const r = await sendItems(db, transport, kind, waiting[kind], blocked, {
      clockOffsetMs,
      bisect,
    });
    total.sent += r.sent;
    total.refused += r.refused;
    serverError ??= r.serverError;
  }
  if (serverError) throw serverError;
  return total;
}

// Read by the sync badge through the tap writer's worker; defined beside the other such reads.
export { countWaiting } from './store-reads';

/** Record writes the server refused for good (kept, with the reason, until sent again). */
export function failedOps(db: OfflineDb) {
  return db.outbox.filter((o) => Boolean(o.failed));
}

/** How many items and record writes the server refused (kept on the tablet with the reason). */
export async function countRefused(db: OfflineDb): Promise<number> {
  return (await db.acks.where('state').equals(2).count()) + (await failedOps(db).count());
}
