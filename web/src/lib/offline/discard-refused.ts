import { type DiscardRefused, discardContent } from '@upstroke/contracts';
import Dexie from 'dexie';
import type { OfflineDb, SyncAck } from './db';
import { failedOps } from './outbox';
import type { SyncTransport } from './transport';
import { writeSignal } from './write-signal';

type Item = DiscardRefused['items'][number];

/** Most items in one discard request (the API's limit). */
const PART = 5000;

/** The record's entries of each kind, with their kind and content for the audit log. */
async function entriesOf(db: OfflineDb, recordId: string) {
  const range = [
    [recordId, Dexie.minKey],
    [recordId, Dexie.maxKey],
  ] as const;
  const [events, values, chunks] = await Promise.all([
    db.events
      .where('[resuscitationId+at]')
      .between(...range)
      .toArray(),
    db.etco2
      .where('[resuscitationId+at]')
      .between(...range)
      .toArray(),
    db.waveformChunks
      .where('[resuscitationId+startAt]')
      .between(...range)
      .toArray(),
  ]);
  return [
    ...events.map((row) => ({ id: row.id, kind: 'events' as const, row })),
    ...values.map((row) => ({ id: row.id, kind: 'etco2' as const, row })),
    ...chunks.map((row) => ({ id: row.id, kind: 'waveform' as const, row })),
  ];
}

/** What a lead discards for one record, as the audit log will keep it, and the local changes. */
async function planFor(db: OfflineDb, recordId: string) {
  const failed = (await failedOps(db).toArray()).filter((o) => o.resuscitationId === recordId);
  const startRefused = failed.some((o) => o.op === 'create');
  // A refused start takes the record's later writes with it: they can never be accepted.
  const ops = startRefused
    ? await db.outbox.where('resuscitationId').equals(recordId).sortBy('seq')
    : failed;
  const acks = new Map(
    (await db.acks.where('resuscitationId').equals(recordId).toArray()).map((a) => [a.id, a]),
  );
  // Refused entries, and (behind a refused start) every entry still waiting for it.
  const entries = (await entriesOf(db, recordId)).filter((e) => {
    const ack = acks.get(e.id);
    return ack ? ack.state === 2 : startRefused;
  });
  const items: Item[] = [
    ...ops.map((o) => ({
      id: recordId,
      kind: 'record' as const,
      refusal: (o.failed ?? '').slice(0, 500),
      content: discardContent({ op: o.op, ...o.body }),
    })),
    ...entries.map((e) => ({
      id: e.id,
      kind: e.kind,
      refusal: (acks.get(e.id)?.reason ?? '').slice(0, 500),
      content: discardContent(e.row),
    })),
  ];
  return { ops, items, entryCount: entries.length };
}

/**
 * A lead gives up on what the server refused for one record (or every record), with a
 * reason. The server's audit log records who, why, the server's reasons and each entry's
 * content first; only then does the tablet take them out of its outbox: the entries stay in
 * its store marked discarded (state 3), refused record writes leave the queue. A refused
 * start takes the record's waiting entries and writes with it. Returns how many entries and
 * writes were discarded.
 */
export async function discardRefused(
  db: OfflineDb,
  transport: Pick<SyncTransport, 'discard'>,
  reason: string,
  recordId?: string,
): Promise<number> {
  const refused = await db.acks.where('state').equals(2).toArray();
  const ops = await failedOps(db).toArray();
  const records = recordId
    ? [recordId]
    : [...new Set([...refused, ...ops].map((x) => x.resuscitationId))];
  let total = 0;
  for (const id of records) total += await discardRecord(db, transport, reason, id);
  if (total) writeSignal.emit();
  return total;
}

async function discardRecord(
  db: OfflineDb,
  transport: Pick<SyncTransport, 'discard'>,
  reason: string,
  recordId: string,
): Promise<number> {
  const plan = await planFor(db, recordId);
  if (plan.items.length === 0) return 0;
  const siteId = (await db.resuscitations.get(recordId))?.siteId;
  for (let i = 0; i < plan.items.length; i += PART) {
    const items = plan.items.slice(i, i + PART);
    await transport.discard(recordId, { reason, ...(siteId ? { siteId } : {}), items });
    const acks: SyncAck[] = items
      .filter((it) => it.kind !== 'record')
      .map((it) => ({
        id: it.id,
        resuscitationId: recordId,
        state: 3,
        reason: it.refusal || 'Held back: the record start was not accepted',
        discardReason: reason,
      }));
    const seqs = i === 0 ? plan.ops.map((o) => o.seq as number) : [];
    await db.transaction('rw', db.acks, db.outbox, async () => {
      await db.acks.bulkPut(acks);
      await db.outbox.bulkDelete(seqs);
    });
  }
  return plan.items.length;
}
