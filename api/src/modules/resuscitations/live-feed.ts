import { Injectable } from '@nestjs/common';
import type { LiveFeedEntries } from '@upstroke/contracts';

type Listener = (entries: LiveFeedEntries) => void;
type Row = Record<string, unknown>;

/**
 * Who is watching which record, in this process: the sync hands it what it has just stored
 * and it tells every tablet subscribed to that record (the WebSocket side is the gateway).
 */
@Injectable()
export class LiveFeed {
  private readonly listeners = new Map<string, Set<Listener>>();

  subscribe(resuscitationId: string, listener: Listener): () => void {
    const set = this.listeners.get(resuscitationId) ?? new Set<Listener>();
    set.add(listener);
    this.listeners.set(resuscitationId, set);
    return () => {
      set.delete(listener);
      if (set.size === 0) this.listeners.delete(resuscitationId);
    };
  }

  /** Stored event or EtCO2 rows (as the sync writes them) to the record's watchers. */
  publish(resuscitationId: string, table: string, rows: readonly Row[]): void {
    const set = this.listeners.get(resuscitationId);
    if (!set || rows.length === 0) return;
    const message: LiveFeedEntries = {
      type: 'entries',
      resuscitationId,
      events: table === 'resuscitationEvents' ? rows.map(eventOf) : [],
      etco2: table === 'etco2Samples' ? rows.map(valueOf) : [],
    };
    if (message.events.length + message.etco2.length === 0) return;
    for (const listener of set) listener(message);
  }
}

const str = (v: unknown) => String(v);
const deviceOf = (r: Row) => (typeof r.deviceId === 'string' ? r.deviceId : null);

function eventOf(r: Row): LiveFeedEntries['events'][number] {
  const data = typeof r.data === 'string' ? (JSON.parse(r.data) as Row) : (r.data as Row);
  return { id: str(r.id), at: str(r.at), kind: r.kind as never, data, deviceId: deviceOf(r) };
}

function valueOf(r: Row): LiveFeedEntries['etco2'][number] {
  return {
    id: str(r.id),
    at: str(r.at),
    value: Number(r.value),
    unit: r.unit as never,
    source: r.source as never,
    deviceId: deviceOf(r),
  };
}
