import { eventLabel } from '@upstroke/contracts';
import type { OfflineDb } from './db';
import { failedOps } from './outbox';
import { writeSignal } from './write-signal';

/** A record-level write (start, details, team) the server refused for good. */
export interface RefusedOp {
  seq: number;
  op: 'create' | 'patch';
  resuscitationId: string;
  reason: string;
  createdAt: number;
}

/** An event, value or waveform chunk the server refused; it stays on this tablet. */
export interface RefusedItem {
  id: string;
  resuscitationId: string;
  what: 'event' | 'EtCO2 value' | 'waveform chunk';
  at: string;
  label: string;
  reason: string;
}

export interface SyncProblems {
  ops: RefusedOp[];
  items: RefusedItem[];
  /** Items still held back because their record's creation was refused. */
  heldBack: number;
}

/** Everything the server did not accept, for the person to see and send again. */
export async function listSyncProblems(db: OfflineDb): Promise<SyncProblems> {
  const refusedOps = await failedOps(db).toArray();
  const ops: RefusedOp[] = refusedOps.map((o) => ({
    seq: o.seq as number,
    op: o.op,
    resuscitationId: o.resuscitationId,
    reason: o.failed as string,
    createdAt: o.createdAt,
  }));
  const refused = await db.acks.where('state').equals(2).toArray();
  const ids = refused.map((a) => a.id);
  const [events, values, chunks] = await Promise.all([
    db.events.bulkGet(ids),
    db.etco2.bulkGet(ids),
    db.waveformChunks.bulkGet(ids),
  ]);
  const items = refused.map((ack, i): RefusedItem => {
    const base = { id: ack.id, resuscitationId: ack.resuscitationId, reason: ack.reason ?? '' };
    const e = events[i];
    if (e) return { ...base, what: 'event', at: e.at, label: eventLabel(e.kind, e.data) };
    const v = values[i];
    if (v) return { ...base, what: 'EtCO2 value', at: v.at, label: `EtCO2 ${v.value} ${v.unit}` };
    const c = chunks[i];
    return {
      ...base,
      what: 'waveform chunk',
      at: c?.startAt ?? '',
      label: c ? `Capnogram, ${c.values.length} samples` : 'Capnogram',
    };
  });
  items.sort((a, b) => a.at.localeCompare(b.at));
  const blocked = new Set(ops.map((o) => o.resuscitationId));
  let heldBack = 0;
  if (blocked.size) {
    const answered = new Set(await db.acks.toCollection().primaryKeys());
    for (const table of [db.events, db.etco2] as const)
      heldBack += await (table as typeof db.events)
        .filter((r) => blocked.has(r.resuscitationId) && !answered.has(r.id))
        .count();
  }
  return { ops, items, heldBack };
}

/**
 * Sends everything refused again (after, say, an administrator gave access to the site or
 * the profile changed): refused operations and items go back in the queue as they are.
 * Nothing is deleted or changed. Only one record's when `recordId` is given. Returns how many
 * were put back.
 */
export async function retrySyncProblems(db: OfflineDb, recordId?: string): Promise<number> {
  const mine = (r: { resuscitationId: string }) => !recordId || r.resuscitationId === recordId;
  const count = await db.transaction('rw', db.outbox, db.acks, async () => {
    const ops = (await failedOps(db).toArray()).filter(mine);
    for (const o of ops) await db.outbox.update(o.seq as number, { failed: undefined });
    const refused = (await db.acks.where('state').equals(2).toArray())
      .filter(mine)
      .map((a) => a.id);
    await db.acks.bulkDelete(refused);
    return ops.length + refused.length;
  });
  if (count) writeSignal.emit();
  return count;
}
