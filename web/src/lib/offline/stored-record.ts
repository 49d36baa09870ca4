import type { StoredRecord } from '@upstroke/capno';
import type { RecordingContext } from '@upstroke/contracts';
import type { LocalEtco2, LocalEvent, LocalResuscitation, LocalWaveformChunk, Tracked } from './db';

/** A record as this tablet holds it: its rows in the offline store and the synced context. */
export interface LocalRecord {
  record: LocalResuscitation;
  events: Tracked<LocalEvent>[];
  etco2: Tracked<LocalEtco2>[];
  waveformChunks?: LocalWaveformChunk[];
  context: RecordingContext | null;
}

const byTime = <T extends { at: string }>(xs: readonly T[]): T[] =>
  [...xs].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));

/**
 * The one mapping from the tablet's rows to the `StoredRecord` capno composes the debrief
 * from: what the server refused is left out (it is not part of the record), values are put
 * in time order, chunks are the live stream's (as the server stores them), and the profile
 * is the site's as last synced (guideline defaults if never).
 */
export function storedFromLocal({
  record,
  events,
  etco2,
  waveformChunks = [],
  context,
}: LocalRecord): StoredRecord {
  const site = context?.sites.find((s) => s.id === record.siteId);
  const profile = site?.profile;
  return {
    id: record.id,
    siteId: record.siteId,
    unitId: record.unitId ?? null,
    arrestAt: record.arrestAt,
    ageGroup: record.ageGroup ?? null,
    weightKg: record.weightKg ?? null,
    events: byTime(events.filter((e) => !e.rejected)).map((e) => ({
      id: e.id,
      at: e.at,
      kind: e.kind,
      data: e.data,
      recordedBy: null,
    })),
    etco2: byTime(etco2.filter((v) => !v.rejected)).map((v) => ({
      id: v.id,
      at: v.at,
      value: v.value,
      unit: v.unit,
      source: v.source,
    })),
    waveform: waveformChunks.map((c) => ({
      startAt: c.startAt,
      sampleRateHz: c.sampleRateHz,
      unit: c.unit,
      source: 'stream',
      values: c.values,
    })),
    profile: profile ? { ...profile, name: 'Site profile (as last synced)' } : null,
  };
}
