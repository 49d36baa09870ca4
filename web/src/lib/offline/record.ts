import {
  type Co2Unit,
  type Etco2Source,
  type EventData,
  type EventKind,
  eventOfKind,
  type PatchResuscitation,
} from '@upstroke/contracts';
import { deviceId } from '../device';
import {
  type LocalEtco2,
  type LocalEvent,
  type LocalResuscitation,
  type LocalWaveformChunk,
  offlineDb,
  type OfflineDb,
} from './db';
import { addTap, type Tap, TapWriter } from './tap-writer';
import { writeSignal } from './write-signal';

/** The page's tap writer: a worker in the browser, this thread where workers are missing. */
export const tapWriter = new TapWriter(
  () => offlineDb,
  () =>
    typeof Worker === 'undefined'
      ? null
      : new Worker(new URL('./tap-writer.worker.ts', import.meta.url), {
          type: 'module',
          name: 'upstroke-tap-writer',
        }),
);

/** Through the worker for the app's own store; straight in for another (tests). */
function commitTap(tap: Tap, db: OfflineDb | undefined): Promise<number> {
  return !db || db === offlineDb ? tapWriter.write(tap) : addTap(db, tap);
}

export interface NewResuscitation {
  siteId: string;
  unitId?: string;
  arrestAt?: string;
}

/** Starts a record on this device: stored locally, then created on the server by the outbox. */
export async function startResuscitation(
  input: NewResuscitation,
  db: OfflineDb = offlineDb,
): Promise<LocalResuscitation> {
  const record: LocalResuscitation = {
    id: crypto.randomUUID(),
    siteId: input.siteId,
    unitId: input.unitId,
    arrestAt: input.arrestAt ?? new Date().toISOString(),
    roster: [],
    status: 'open',
    local: 1,
    createdAt: Date.now(),
  };
  const { id, siteId, unitId, arrestAt } = record;
  await db.transaction('rw', db.resuscitations, db.outbox, async () => {
    await db.resuscitations.add(record);
    const body = unitId ? { id, siteId, unitId, arrestAt } : { id, siteId, arrestAt };
    await db.outbox.add({ op: 'create', resuscitationId: id, body, createdAt: Date.now() });
  });
  writeSignal.emit();
  return record;
}

/** Closing details or the roster, changed locally at once and queued for the server. */
export async function updateResuscitation(
  id: string,
  patch: PatchResuscitation,
  db: OfflineDb = offlineDb,
): Promise<void> {
  await db.transaction('rw', db.resuscitations, db.outbox, async () => {
    const local = Object.fromEntries(
      Object.entries(patch).map(([k, v]) => [k, v === null ? undefined : v]),
    );
    await db.resuscitations.update(id, (r) => {
      Object.assign(r, local);
    });
    await db.outbox.add({ op: 'patch', resuscitationId: id, body: patch, createdAt: Date.now() });
  });
  writeSignal.emit();
}

/** One tap: an event with a client id and the device clock, committed to IndexedDB. */
export async function recordEvent<K extends EventKind>(
  resuscitationId: string,
  kind: K,
  data: EventData<K>,
  options: { at?: string; db?: OfflineDb } = {},
): Promise<LocalEvent> {
  const tappedAt = performance.now();
  const event: LocalEvent = eventOfKind(
    {
      id: crypto.randomUUID(),
      resuscitationId,
      at: options.at ?? new Date().toISOString(),
      deviceId: deviceId(),
    },
    kind,
    data,
  );
  // Resolves once IndexedDB has committed the write (in the worker, off this thread).
  const committedAt = await commitTap({ table: 'events', row: event }, options.db);
  // User Timing entry: tap-to-commit, read by bench/live.bench.ts and the browser's profiler.
  performance.measure('upstroke:tap-commit', { start: tappedAt, end: committedAt });
  writeSignal.emit();
  return event;
}

export async function recordEtco2(
  resuscitationId: string,
  value: number,
  unit: Co2Unit,
  options: { at?: string; source?: Etco2Source; db?: OfflineDb } = {},
): Promise<LocalEtco2> {
  const sample: LocalEtco2 = {
    id: crypto.randomUUID(),
    resuscitationId,
    at: options.at ?? new Date().toISOString(),
    value,
    unit,
    source: options.source ?? 'manual',
    deviceId: deviceId(),
  };
  await commitTap({ table: 'etco2', row: sample }, options.db);
  writeSignal.emit();
  return sample;
}

/** For the monitor link: a chunk of raw capnogram, stored and drained like events. */
export async function queueWaveformChunk(
  chunk: Omit<LocalWaveformChunk, 'id'> & { id?: string },
  db: OfflineDb = offlineDb,
): Promise<LocalWaveformChunk> {
  const row: LocalWaveformChunk = { ...chunk, id: chunk.id ?? crypto.randomUUID() };
  await db.waveformChunks.put(row);
  writeSignal.emit();
  return row;
}
