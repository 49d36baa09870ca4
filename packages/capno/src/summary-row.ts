import {
  analysisInputSchema,
  type AgeGroup,
  type AnalysisInput,
  type Co2Unit,
  type ProfileInput,
  type RecordSummaryRow,
  type Rhythm,
  type Waveform,
} from '@upstroke/contracts';
import { analyze } from './analyze.js';
import { summarize } from './summary.js';

/** A record as stored: the resuscitation row, its clinical data and its protocol profile. */
export interface StoredRecord {
  id: string;
  siteId: string;
  unitId: string | null;
  arrestAt: string;
  ageGroup?: AgeGroup | null;
  witnessed?: boolean | null;
  monitored?: boolean | null;
  firstRhythm?: Rhythm | null;
  outcome?: RecordSummaryRow['outcome'];
  events: readonly { id: string; at: string; kind: string; data: unknown }[];
  etco2: readonly { at: string; value: number; unit: Co2Unit; source: string }[];
  waveform?: readonly StoredWaveformChunk[];
  profile?: { version: number; thresholds: ProfileInput } | null;
}

export interface StoredWaveformChunk {
  startAt: string;
  sampleRateHz: number;
  unit: Co2Unit;
  values: ArrayLike<number>;
}

const storedDataSchema = analysisInputSchema.pick({ events: true, etco2: true });

/**
 * Joins stored waveform chunks into the one capnogram the analysis reads. Chunks in another
 * sample rate or unit than the first are left out; a gap between chunks becomes zero CO2
 * (no signal reached the server, which the analysis may report as an absent waveform).
 */
export function joinWaveform(chunks: readonly StoredWaveformChunk[]): Waveform | undefined {
  const sorted = [...chunks].sort((a, b) => Date.parse(a.startAt) - Date.parse(b.startAt));
  const first = sorted[0];
  if (!first) return undefined;
  const t0 = Date.parse(first.startAt);
  const values: number[] = [];
  for (const c of sorted) {
    if (c.sampleRateHz !== first.sampleRateHz || c.unit !== first.unit) continue;
    const offset = Math.round(((Date.parse(c.startAt) - t0) / 1000) * first.sampleRateHz);
    while (values.length < offset) values.push(0);
    // Overlap (a chunk starting before the previous one ended): the newer samples win.
    values.length = Math.min(values.length, offset);
    for (let i = 0; i < c.values.length; i++) values.push(c.values[i]);
  }
  return { startAt: first.startAt, sampleRateHz: first.sampleRateHz, unit: first.unit, values };
}

/** The analysis input of a stored record; throws a message naming the bad event or value. */
export function storedRecordInput(record: StoredRecord): AnalysisInput {
  const parsed = storedDataSchema.safeParse({ events: record.events, etco2: record.etco2 });
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new Error(`record ${record.id}: ${issue.path.join('.')}: ${issue.message}`);
  }
  return {
    arrestAt: record.arrestAt,
    profile: record.profile?.thresholds,
    events: parsed.data.events,
    etco2: parsed.data.etco2 ?? [],
    waveform: record.waveform?.length ? joinWaveform(record.waveform) : undefined,
  };
}

/**
 * The `record_summaries` row of a record: the same `analyze` + `summarize` as the debrief,
 * with the closing details the team entered taking precedence over what events imply.
 * Pure: the API (on sign and amend) and the demo generators both write rows through it.
 */
export function buildSummaryRow(record: StoredRecord): RecordSummaryRow {
  const input = storedRecordInput(record);
  const output = analyze(input);
  const s = summarize(input, output, {
    witnessed: record.witnessed ?? undefined,
    monitored: record.monitored ?? undefined,
    firstRhythm: record.firstRhythm ?? undefined,
    sustainedRosc: record.outcome === 'rosc-sustained' ? true : undefined,
  });
  return {
    resuscitationId: record.id,
    siteId: record.siteId,
    unitId: record.unitId,
    arrestAt: new Date(record.arrestAt).toISOString(),
    ageGroup: record.ageGroup ?? null,
    firstRhythm: s.firstRhythm,
    shockable: s.shockableFirstRhythm,
    witnessed: s.witnessed,
    monitored: s.monitored,
    outcome: record.outcome ?? null,
    endReason: s.endReason,
    anyRosc: s.anyRosc,
    sustainedRosc: s.sustainedRosc,
    compressionFraction: s.compressionFraction,
    longestPauseSec: s.longestPauseSec,
    preshockLongCount: s.preshockPausesOverThreshold,
    timeToFirstCompressionSec: s.timeToCprSec,
    timeToFirstShockSec: s.timeToFirstShockSec,
    timeToFirstEpinephrineSec: s.timeToFirstEpinephrineSec,
    etco2Documented: s.etco2Documented,
    medianEtco2: s.medianEtco2MmHg,
    fractionGe10: s.fractionEtco2AtOrAbove10,
    fractionGe20: s.fractionEtco2AtOrAbove20,
    findingCounts: s.findingCounts,
    durationSec: s.durationSec,
    profileVersion: record.profile?.version ?? null,
  };
}
