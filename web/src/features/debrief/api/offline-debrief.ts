import { analyze, etco2Series, resolveThresholds, supersededByMap } from '@upstroke/capno';
import type { Debrief, RecordingContext } from '@upstroke/contracts';
import type { LocalEtco2, LocalEvent, LocalResuscitation, Tracked } from '../../../lib/offline';

export interface LocalRecord {
  record: LocalResuscitation;
  events: Tracked<LocalEvent>[];
  etco2: Tracked<LocalEtco2>[];
  context: RecordingContext | null;
}

/**
 * The debrief of a record made on this tablet, from its own store, when the API cannot be
 * reached: the same capno analysis as the server, with the site's thresholds as last synced
 * (guideline defaults if never). The capnogram stays on the server's side of this view.
 */
export function debriefFromLocal({ record, events, etco2, context }: LocalRecord): Debrief {
  const site = context?.sites.find((s) => s.id === record.siteId);
  const thresholds = resolveThresholds(site?.profile?.thresholds);
  const byTime = <T extends { at: string }>(xs: T[]) =>
    [...xs].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  const evs = byTime(events.filter((e) => !e.rejected));
  const values = byTime(etco2.filter((v) => !v.rejected)).map((v) => ({
    at: v.at,
    value: v.value,
    unit: v.unit,
    source: v.source,
  }));
  const output = analyze({
    arrestAt: record.arrestAt,
    profile: thresholds,
    events: evs.map((e) => ({ id: e.id, at: e.at, kind: e.kind, data: e.data })) as never,
    etco2: values,
  });
  const t0 = Date.parse(record.arrestAt);
  const supersededBy = supersededByMap(evs);
  return {
    ...output,
    record: {
      id: record.id,
      siteId: record.siteId,
      unitId: record.unitId ?? null,
      arrestAt: record.arrestAt,
      location: record.location ?? null,
      patientRef: record.patientRef ?? null,
      ageGroup: record.ageGroup ?? null,
      weightKg: record.weightKg ?? null,
      status: record.status,
      witnessed: null,
      monitored: null,
      firstRhythm: null,
      outcome: null,
      endReason: null,
      notesWentWell: null,
      notesToChange: null,
      createdBy: null,
      createdAt: new Date(record.createdAt).toISOString(),
      signedAt: null,
      signedBy: null,
      siteName: site?.name ?? '',
      unitName: site?.units.find((u) => u.id === record.unitId)?.name ?? null,
      paperSize: 'A4',
      etco2Unit: site?.etco2Unit ?? 'mmHg',
      createdByName: null,
      signedByName: null,
    },
    profile: {
      id: site?.profile?.id ?? null,
      version: site?.profile?.version ?? null,
      name: site?.profile ? 'Site profile (as last synced)' : 'Guideline defaults',
      thresholds,
    },
    etco2Series: etco2Series(record.arrestAt, values, output.breaths),
    waveformTrace: null,
    events: evs.map((e) => ({
      id: e.id,
      at: e.at,
      tSec: (Date.parse(e.at) - t0) / 1000,
      kind: e.kind,
      data: e.data,
      recordedBy: null,
      amendment: false,
      amendmentId: null,
      supersededBy: supersededBy.get(e.id) ?? null,
    })),
    amendments: [],
    computedBy: 'device',
  };
}
