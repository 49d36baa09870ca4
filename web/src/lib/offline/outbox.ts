import type { LocalEtco2, LocalEvent, LocalWaveformChunk, OfflineDb } from './db';
import { type BatchKind, isPermanent, type SyncTransport } from './transport';

type Row = LocalEvent | LocalEtco2 | LocalWaveformChunk;

export const BATCH_SIZE = 500;

export interface DrainResult {
  sent: number;
  refused: number;
}

function tableOf(db: OfflineDb, kind: BatchKind) {
  if (kind === 'events') return db.events;
  if (kind === 'etco2') return db.etco2;
  return db.waveformChunks;
}

/** The item as the API takes it: local bookkeeping fields stay on the tablet. */
function wire(row: Row): object {
  const { synced: _s, rejected: _r, resuscitationId: _id, ...rest } = row;
  return rest;
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/**
 * Record-level operations in the order they were made. A transient failure stops the drain
 * (so a patch never overtakes its create); a permanent refusal is kept with its reason.
 * Returns the records whose create has not reached the server: their items must wait.
 */
async function sendOps(db: OfflineDb, transport: SyncTransport): Promise<Set<string>> {
  const blocked = new Set<string>();
  for (const op of await db.outbox.orderBy('seq').toArray()) {
    if (op.failed || blocked.has(op.resuscitationId)) {
      blocked.add(op.resuscitationId);
      continue;
    }
    try {
      if (op.op === 'create') await transport.create(op.body);
      else await transport.patch(op.resuscitationId, op.body);
      await db.outbox.delete(op.seq as number);
    } catch (error) {
      if (!isPermanent(error)) throw error;
      await db.outbox.update(op.seq as number, { failed: messageOf(error) });
      blocked.add(op.resuscitationId);
    }
  }
  return blocked;
}

async function sendItems(
  db: OfflineDb,
  transport: SyncTransport,
  kind: BatchKind,
  blocked: Set<string>,
  clockOffsetMs: number | undefined,
): Promise<DrainResult> {
  const table = tableOf(db, kind);
  const waiting = (await table.where('synced').equals(0).toArray()) as Row[];
  const result: DrainResult = { sent: 0, refused: 0 };
  const byRecord = new Map<string, Row[]>();
  for (const r of waiting) {
    const list = byRecord.get(r.resuscitationId);
    if (list) list.push(r);
    else byRecord.set(r.resuscitationId, [r]);
  }
  for (const [recordId, rows] of byRecord) {
    if (blocked.has(recordId)) continue;
    for (let i = 0; i < rows.length; i += BATCH_SIZE) {
      const chunk = rows.slice(i, i + BATCH_SIZE);
      let refused: Map<string, string>;
      try {
        const res = await transport.batch(recordId, kind, chunk.map(wire), clockOffsetMs);
        refused = new Map(res.rejected.map((r) => [r.id, r.reason]));
      } catch (error) {
        if (!isPermanent(error)) throw error;
        refused = new Map(chunk.map((r) => [r.id, messageOf(error)]));
      }
      const acked = chunk.map((r): Row => {
        const reason = refused.get(r.id);
        return reason ? { ...r, synced: 2, rejected: reason } : { ...r, synced: 1 };
      });
      await (table as typeof db.events).bulkPut(acked as LocalEvent[]);
      result.sent += chunk.length - refused.size;
      result.refused += refused.size;
    }
  }
  return result;
}

/** Sends everything waiting: creates and patches first, then events, EtCO2 values, waveform. */
export async function drainOutbox(
  db: OfflineDb,
  transport: SyncTransport,
  clockOffsetMs?: number,
): Promise<DrainResult> {
  const blocked = await sendOps(db, transport);
  const total: DrainResult = { sent: 0, refused: 0 };
  for (const kind of ['events', 'etco2', 'waveform'] as const) {
    const r = await sendItems(db, transport, kind, blocked, clockOffsetMs);
    total.sent += r.sent;
    total.refused += r.refused;
  }
  return total;
}

/** How many writes wait for the server (records, events, values, chunks). */
export async function countWaiting(db: OfflineDb): Promise<number> {
  const [ops, events, etco2, chunks] = await Promise.all([
    db.outbox.filter((o) => !o.failed).count(),
    db.events.where('synced').equals(0).count(),
    db.etco2.where('synced').equals(0).count(),
    db.waveformChunks.where('synced').equals(0).count(),
  ]);
  return ops + events + etco2 + chunks;
}
