import { Injectable } from '@nestjs/common';
import type { Etco2Sample, LiveFeedEntries, ResusEvent } from '@upstroke/contracts';

type Listener = (entries: LiveFeedEntries) => void;

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

  /** Events just stored, to the record's other tablets (`device`: the sender's, if unnamed). */
  publishEvents(
    resuscitationId: string,
    events: readonly ResusEvent[],
    device: string | null,
  ): void {
    this.send(resuscitationId, {
      type: 'entries',
      resuscitationId,
      events: events.map((e) => ({
        id: e.id,
        at: e.at,
        kind: e.kind,
        data: e.data,
        deviceId: e.deviceId ?? device,
      })),
      etco2: [],
    });
  }

  /** EtCO2 values just stored, to the record's other tablets. */
  publishEtco2(
    resuscitationId: string,
    values: readonly Etco2Sample[],
    device: string | null,
  ): void {
    this.send(resuscitationId, {
      type: 'entries',
      resuscitationId,
      events: [],
      etco2: values.map((v) => ({
        id: v.id,
        at: v.at,
        value: v.value,
        unit: v.unit,
        source: v.source,
        deviceId: v.deviceId ?? device,
      })),
    });
  }

  private send(resuscitationId: string, message: LiveFeedEntries): void {
    const set = this.listeners.get(resuscitationId);
    if (!set || message.events.length + message.etco2.length === 0) return;
    for (const listener of set) listener(message);
  }
}
