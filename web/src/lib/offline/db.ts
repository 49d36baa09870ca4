import type {
  ResusEvent,
  AgeGroup,
  Co2Unit,
  Etco2Source,
  RecordingContext,
  RosterMember,
} from '@upstroke/contracts';
import Dexie, { type EntityTable } from 'dexie';

/**
 * 0 waiting for the server, 1 acknowledged, 2 refused by the server, 3 refused and then
 * discarded by a lead with a reason (all kept, never deleted).
 */
export type SyncFlag = 0 | 1 | 2 | 3;

/**
 * The server's answer for one event, value or chunk. Kept apart from the items so that the
 * sync never writes to the stores the taps write to (a tap never waits for a sync).
 */
export interface SyncAck {
  id: string;
  resuscitationId: string;
  state: 1 | 2 | 3;
  /** Why the server refused it (states 2, 3); the item stays on the tablet. */
  reason?: string;
  /** Why a lead discarded it (state 3); the server's audit log has the same. */
  discardReason?: string;
}

export interface LocalResuscitation {
  id: string;
  siteId: string;
  unitId?: string;
  arrestAt: string;
  location?: string;
  patientRef?: string;
  ageGroup?: AgeGroup;
  weightKg?: number;
  roster: RosterMember[];
  status: 'open' | 'closed';
  /** Started on this device (shown under "in progress on this device"). */
  local: 0 | 1;
  createdAt: number;
}

/** An event on the tablet: the contracts' discriminated union, with the device that wrote it. */
export type LocalEvent = ResusEvent & { deviceId: string };

export interface LocalEtco2 {
  id: string;
  resuscitationId: string;
  at: string;
  value: number;
  unit: Co2Unit;
  source: Etco2Source;
  deviceId: string;
}

/** Raw capnogram chunks written by the monitor link; drained like events. */
export interface LocalWaveformChunk {
  id: string;
  resuscitationId: string;
  startAt: string;
  sampleRateHz: number;
  unit: Co2Unit;
  seq: number;
  values: number[];
}

/** A record-level write (create, closing details, roster) waiting for the server, in order. */
export interface OutboxOp {
  seq?: number;
  op: 'create' | 'patch';
  resuscitationId: string;
  body: Record<string, unknown>;
  createdAt: number;
  /** Set when the server refused the operation for good (4xx): kept for review. */
  failed?: string;
}

export interface MetaRow {
  key: 'context' | 'clock';
  value: RecordingContext | { offsetMs: number; at: string };
}

/** An item with what the server said of it (0 while nothing has been heard). */
export type Tracked<T> = T & { synced: SyncFlag; rejected?: string };

export function withAcks<T extends { id: string }>(
  rows: T[],
  acks: ReadonlyMap<string, SyncAck>,
): Tracked<T>[] {
  return rows.map((r) => {
    const ack = acks.get(r.id);
    return ack ? { ...r, synced: ack.state, rejected: ack.reason } : { ...r, synced: 0 };
  });
}

export type OfflineDb = Dexie & {
  resuscitations: EntityTable<LocalResuscitation, 'id'>;
  events: EntityTable<LocalEvent, 'id'>;
  etco2: EntityTable<LocalEtco2, 'id'>;
  waveformChunks: EntityTable<LocalWaveformChunk, 'id'>;
  outbox: EntityTable<OutboxOp, 'seq'>;
  acks: EntityTable<SyncAck, 'id'>;
  meta: EntityTable<MetaRow, 'key'>;
};

export function createOfflineDb(name = 'upstroke'): OfflineDb {
  const db = new Dexie(name) as OfflineDb;
  db.version(1).stores({
    resuscitations: 'id, local, createdAt',
    events: 'id, synced, [resuscitationId+at]',
    etco2: 'id, synced, [resuscitationId+at]',
    waveformChunks: 'id, synced, [resuscitationId+startAt]',
    outbox: '++seq, resuscitationId',
    meta: 'key',
  });
  // Version 2: the server's answers move to their own store; the items are written by taps only.
  db.version(2)
    .stores({
      events: 'id, [resuscitationId+at]',
      etco2: 'id, [resuscitationId+at]',
      waveformChunks: 'id, [resuscitationId+startAt]',
      acks: 'id, resuscitationId, state',
    })
    .upgrade(async (tx) => {
      for (const name of ['events', 'etco2', 'waveformChunks']) {
        const acks: SyncAck[] = [];
        await tx
          .table(name)
          .toCollection()
          .modify(
            (row: {
              id: string;
              resuscitationId: string;
              synced?: SyncFlag;
              rejected?: string;
            }) => {
              if (row.synced === 1)
                acks.push({ id: row.id, resuscitationId: row.resuscitationId, state: 1 });
              if (row.synced === 2)
                acks.push({
                  id: row.id,
                  resuscitationId: row.resuscitationId,
                  state: 2,
                  reason: row.rejected,
                });
              delete row.synced;
              delete row.rejected;
            },
          );
        await tx.table('acks').bulkPut(acks);
      }
    });
  return db;
}

/** The tablet's store. Every tap lands here first; the outbox drains it to the API. */
export const offlineDb = createOfflineDb();
