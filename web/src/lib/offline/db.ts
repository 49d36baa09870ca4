import type {
  AgeGroup,
  Co2Unit,
  Etco2Source,
  EventKind,
  RecordingContext,
  RosterMember,
} from '@upstroke/contracts';
import Dexie, { type EntityTable } from 'dexie';

/** 0 waiting for the server, 1 acknowledged, 2 refused by the server (kept, never deleted). */
export type SyncFlag = 0 | 1 | 2;

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

export interface LocalEvent {
  id: string;
  resuscitationId: string;
  at: string;
  kind: EventKind;
  data: Record<string, unknown>;
  deviceId: string;
  synced: SyncFlag;
  rejected?: string;
}

export interface LocalEtco2 {
  id: string;
  resuscitationId: string;
  at: string;
  value: number;
  unit: Co2Unit;
  source: Etco2Source;
  deviceId: string;
  synced: SyncFlag;
  rejected?: string;
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
  synced: SyncFlag;
  rejected?: string;
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

export type OfflineDb = Dexie & {
  resuscitations: EntityTable<LocalResuscitation, 'id'>;
  events: EntityTable<LocalEvent, 'id'>;
  etco2: EntityTable<LocalEtco2, 'id'>;
  waveformChunks: EntityTable<LocalWaveformChunk, 'id'>;
  outbox: EntityTable<OutboxOp, 'seq'>;
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
  return db;
}

/** The tablet's store. Every tap lands here first; the outbox drains it to the API. */
export const offlineDb = createOfflineDb();
