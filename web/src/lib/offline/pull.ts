import type { RecordEntries } from '@upstroke/contracts';
import type { LocalEtco2, LocalEvent, OfflineDb, SyncAck } from './db';

/** What the server holds for a record, as far as Live needs it. */
export type RemoteEntries = Pick<RecordEntries, 'events' | 'etco2'>;

/**
 * Brings what other tablets recorded for this record into this tablet's store, so its
 * timers, prompts and log count every tablet's taps. They are stored as already on the
 * server (an acknowledgement with each), so the outbox never sends them back. Entries
 * already here (in `known`, or found in the store) are left alone. Returns how many were added.
 */
export async function mergeRemoteEntries(
  db: OfflineDb,
  resuscitationId: string,
  remote: RemoteEntries,
  known: ReadonlySet<string> = new Set(),
): Promise<number> {
  // What the screen already holds needs no look-up: usually nothing is left to read.
  const newEvents = remote.events.filter((e) => !known.has(e.id));
  const newValues = remote.etco2.filter((v) => !known.has(v.id));
  if (newEvents.length + newValues.length === 0) return 0;
  const [haveEvents, haveValues] = await Promise.all([
    db.events.bulkGet(newEvents.map((e) => e.id)),
    db.etco2.bulkGet(newValues.map((v) => v.id)),
  ]);
  const events = newEvents
    .filter((_, i) => haveEvents[i] === undefined)
    .map((e) => fromServer(e, resuscitationId));
  const values: LocalEtco2[] = newValues
    .filter((_, i) => haveValues[i] === undefined)
    .map((v) => ({
      id: v.id,
      resuscitationId,
      at: v.at,
      value: v.value,
      unit: v.unit,
      source: v.source,
      deviceId: v.deviceId ?? 'server',
    }));
  if (events.length + values.length === 0) return 0;
  const acks: SyncAck[] = [...events, ...values].map((r) => ({
    id: r.id,
    resuscitationId,
    state: 1,
  }));
  // Items and their acknowledgements together: the outbox never sees one without the other.
  // bulkPut: a tap that landed meanwhile with the same id is the same entry.
  await db.transaction('rw', db.events, db.etco2, db.acks, async () => {
    await db.events.bulkPut(events);
    await db.etco2.bulkPut(values);
    await db.acks.bulkPut(acks);
  });
  return events.length + values.length;
}

/**
 * An event as the server answers it, in this tablet's store. The server checked its data
 * against its kind's contract when it stored it; it is not re-checked here, because a tablet
 * running an older app would then drop another tablet's entry (a drug given, a shock).
 */
function fromServer(e: RemoteEntries['events'][number], resuscitationId: string): LocalEvent {
  const { id, at, kind, data } = e;
  return { id, resuscitationId, at, kind, data, deviceId: e.deviceId ?? 'server' } as LocalEvent;
}
