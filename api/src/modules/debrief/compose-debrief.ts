import { analyze, etco2Series, resolveThresholds, valuesBesideWaveform } from '@upstroke/capno';
import {
  type Debrief,
  type ProfileInput,
  thresholdDefaults,
  thresholdsSchema,
  type Waveform,
} from '@upstroke/contracts';
import type {
  Etco2Row,
  EventRow,
  WaveformChunkRow,
} from '../resuscitations/clinical-data.repository';
import {
  analysisEtco2,
  analysisEvents,
  assembleWaveform,
  debriefEvents,
  waveformTrace,
} from './analysis-input';
import type { AmendmentRow, ProfileRow } from './debrief.repository';

export interface DebriefParts {
  record: Debrief['record'];
  profile: ProfileRow | undefined;
  events: EventRow[];
  etco2: Etco2Row[];
  chunks: WaveformChunkRow[];
  amendments: AmendmentRow[];
}

/** Thresholds stored in a profile, merged over the defaults and checked. */
export function profileOf(row: ProfileRow | undefined): Debrief['profile'] {
  if (!row)
    return { id: null, version: null, name: 'Guideline defaults', thresholds: thresholdDefaults };
  const merged = resolveThresholds(row.thresholds as ProfileInput);
  const ok = thresholdsSchema.safeParse(merged);
  return {
    id: row.id,
    version: row.version,
    name: row.name,
    thresholds: ok.success ? ok.data : thresholdDefaults,
  };
}

/**
 * The debrief from stored rows: capno's `analyze()` (never re-implemented here) with the
 * record's protocol profile, plus what the screen and the exports draw. Pure.
 */
export function composeDebrief(p: DebriefParts): { debrief: Debrief; waveform?: Waveform } {
  const arrestAt = p.record.arrestAt;
  const arrest = new Date(arrestAt);
  const profile = profileOf(p.profile);
  const waveform = assembleWaveform(p.chunks);
  // Per-breath values read off the same capnogram are not counted twice (capno's rule).
  const values = valuesBesideWaveform(analysisEtco2(p.etco2), waveform);
  const output = analyze({
    arrestAt,
    profile: profile.thresholds,
    events: analysisEvents(p.events),
    etco2: values,
    waveform,
  });
  const debrief: Debrief = {
    ...output,
    record: p.record,
    profile,
    // Entered and imported values with their source, then per-breath values (capno's merge).
    etco2Series: etco2Series(arrestAt, values, output.breaths),
    waveformTrace: waveformTrace(arrest, waveform, p.chunks[0]?.source ?? 'stream'),
    events: debriefEvents(arrest, p.events),
    amendments: p.amendments.map((a) => ({ ...a, createdAt: a.createdAt.toISOString() })),
    computedBy: 'server',
  };
  return { debrief, waveform };
}
