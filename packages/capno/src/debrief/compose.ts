import {
  type Amendment,
  analysisEtco2Schema,
  analysisEventSchema,
  type AnalysisInput,
  type AnalysisOutput,
  type Debrief,
  type DebriefEtco2Entry,
  type DebriefEvent,
  type DebriefProfile,
  type DebriefRecord,
  co2UnitSchema,
  type Etco2DisplayUnit,
  etco2SourceSchema,
  eventKindSchema,
  type Waveform,
} from '@upstroke/contracts';
import { analyze } from '../analyze.js';
import { etco2Series, valuesBesideWaveform } from '../etco2/series.js';
import { eventsInForce, supersededByMap, supersededIds } from '../events/corrections.js';
import { profileInForce } from './profile-in-force.js';
import { runSpan } from '../waveform/runs.js';
import { joinWaveform, type StoredRecord, waveformSource } from './stored-record.js';
import { buildTimelineModel } from './timeline-model.js';
import { waveformTrace } from './waveform-trace.js';

/** What the debrief shows beside the analysis: the record's header and its amendments. */
export interface DebriefHeader {
  record: DebriefRecord;
  amendments?: readonly Amendment[];
  computedBy: Debrief['computedBy'];
}

/** A stored record analysed: the checked input, capno's output and the profile in force. */
export interface StoredAnalysis {
  input: AnalysisInput;
  output: AnalysisOutput;
  profile: DebriefProfile;
  /** The capnogram's runs (`joinWaveform`), empty without one. */
  waveform: Waveform[];
}

const isObject = (x: unknown): x is Record<string, unknown> =>
  x !== null && typeof x === 'object' && !Array.isArray(x);

/**
 * The analysis of a stored record — the one path for the debrief, the exports and the
 * committee's row. Events and values are checked one by one against the analysis schema;
 * one that fails (stored before a schema change) is left out of the analysis, never
 * guessed at, and still listed with the record's events.
 */
export function analyseStored(
  stored: StoredRecord,
  displayUnit?: Etco2DisplayUnit,
): StoredAnalysis {
  const profile = profileInForce(stored.profile);
  const events: AnalysisInput['events'] = [];
  for (const e of stored.events) {
    const r = analysisEventSchema.safeParse({ id: e.id, at: e.at, kind: e.kind, data: e.data });
    if (r.success) events.push(r.data);
  }
  const etco2: NonNullable<AnalysisInput['etco2']> = [];
  // A value taken back by a correction (Live's Undo) stays stored, and is not analysed.
  const undone = supersededIds(stored.events);
  for (const v of stored.etco2) {
    if (v.id !== undefined && undone.has(v.id)) continue;
    const r = analysisEtco2Schema.safeParse(v);
    if (r.success) etco2.push(r.data);
  }
  const waveform = joinWaveform(stored.waveform ?? []);
  const input: AnalysisInput = {
    arrestAt: stored.arrestAt,
    profile: profile.thresholds,
    events,
    // Per-breath values read off the same capnogram are not counted twice (capno's rule).
    etco2: valuesBesideWaveform(etco2, waveform),
    waveform: waveform.length ? waveform : undefined,
    // Child and infant records are analysed with the profile's paediatric rules.
    ageGroup: stored.ageGroup ?? undefined,
    weightKg: stored.weightKg && stored.weightKg <= 400 ? stored.weightKg : undefined,
    // Finding messages in the site's unit (values stay mmHg).
    ...(displayUnit ? { displayUnit } : {}),
  };
  return { input, output: analyze(input), profile, waveform };
}

/** Every stored event for display, with the correction in force that superseded it. */
export function debriefEvents(stored: StoredRecord): DebriefEvent[] {
  const supersededBy = supersededByMap(stored.events);
  const t0 = Date.parse(stored.arrestAt);
  return stored.events.flatMap((e) => {
    const kind = eventKindSchema.safeParse(e.kind);
    if (!kind.success) return [];
    return [
      {
        id: e.id,
        at: e.at,
        tSec: (Date.parse(e.at) - t0) / 1000,
        kind: kind.data,
        data: isObject(e.data) ? e.data : {},
        recordedBy: e.recordedBy ?? null,
        amendment: e.amendment ?? false,
        amendmentId: e.amendmentId ?? null,
        supersededBy: supersededBy.get(e.id) ?? null,
      },
    ];
  });
}

/**
 * Every typed EtCO2 value, and any value a correction took back, with that correction: the
 * chart record lists them (struck through once undone). Values read off a capnogram or a
 * monitor file are in the chart series, not listed one by one.
 */
export function debriefEtco2Entries(stored: StoredRecord): DebriefEtco2Entry[] {
  const supersededBy = supersededByMap(stored.events);
  const t0 = Date.parse(stored.arrestAt);
  const entries = stored.etco2.flatMap((v, i): DebriefEtco2Entry[] => {
    const by = v.id === undefined ? null : (supersededBy.get(v.id) ?? null);
    const unit = co2UnitSchema.safeParse(v.unit);
    const source = etco2SourceSchema.safeParse(v.source);
    if (!unit.success || !source.success || (source.data !== 'manual' && by === null)) return [];
    const tSec = (Date.parse(v.at) - t0) / 1000;
    if (!Number.isFinite(tSec) || !Number.isFinite(v.value)) return [];
    const id = v.id ?? `etco2-${i}`;
    return [
      {
        id,
        at: v.at,
        tSec,
        value: v.value,
        unit: unit.data,
        source: source.data,
        supersededBy: by,
      },
    ];
  });
  return entries.sort((a, b) => a.tSec - b.tSec);
}

/**
 * The events as finally recorded (capno's one correction rule), on the debrief's clock: a
 * replacement takes its own time. What the event tables, the PDF and FHIR list.
 */
export function debriefEventsInForce(d: Pick<Debrief, 'events' | 'record'>): DebriefEvent[] {
  const t0 = Date.parse(d.record.arrestAt);
  return eventsInForce(d.events).map((e) => ({ ...e, tSec: (Date.parse(e.at) - t0) / 1000 }));
}

/**
 * The debrief of a stored record: everything the screen, the PDF, FHIR, the e-mail and the
 * committee's row draw from. Pure; the server and the tablet both call it.
 */
export function composeDebrief(
  stored: StoredRecord,
  header: DebriefHeader,
): { debrief: Debrief; waveform: Waveform[] } {
  const { input, output, profile, waveform } = analyseStored(stored, header.record.etco2Unit);
  const events = debriefEvents(stored);
  const series = etco2Series(stored.arrestAt, input.etco2 ?? [], output.breaths);
  const record = { ...header.record };
  const inForce = debriefEventsInForce({ events, record });
  const debrief: Debrief = {
    ...output,
    record,
    profile,
    etco2Series: series,
    waveformTrace: waveformTrace(stored.arrestAt, waveform, waveformSource(stored.waveform ?? [])),
    events,
    etco2Entries: debriefEtco2Entries(stored),
    amendments: [...(header.amendments ?? [])],
    timeline: buildTimelineModel({
      inForce,
      output,
      etco2Series: series,
      waveformCoverage: waveform.map((w) => runSpan(stored.arrestAt, w)),
    }),
    computedBy: header.computedBy,
  };
  return { debrief, waveform };
}
