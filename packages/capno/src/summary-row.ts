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
import { valuesBesideWaveform } from './etco2/series.js';

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
  /** Where the chunk came from (`stream`, `import`); absent means one source. */
  source?: string;
  values: ArrayLike<number>;
}

/**
 * Joins stored waveform chunks into the one capnogram the analysis reads — the single rule
 * for the debrief and the audit summary, so both see the same signal. One source is used,
 * the one with most samples (a monitor import and a live stream of the same minutes would
 * overlap), at its first chunk's rate and unit. A gap between chunks is filled with zero CO2
 * (no signal reached the server: the analysis may report an absent waveform there), and a
 * sample that overlaps one already placed is dropped.
 */
export function joinWaveform(chunks: readonly StoredWaveformChunk[]): Waveform | undefined {
  const bySource = new Map<string, number>();
  for (const c of chunks)
    bySource.set(c.source ?? '', (bySource.get(c.source ?? '') ?? 0) + c.values.length);
  const source = [...bySource.entries()].sort((a, b) => b[1] - a[1])[0]?.[0];
  if (source === undefined) return undefined;
  const ofSource = chunks.filter((c) => (c.source ?? '') === source);
  const first = ofSource.reduce((a, c) => (Date.parse(c.startAt) < Date.parse(a.startAt) ? c : a));
  const use = ofSource
    .filter((c) => c.sampleRateHz === first.sampleRateHz && c.unit === first.unit)
    .sort((a, b) => Date.parse(a.startAt) - Date.parse(b.startAt));
  const rate = first.sampleRateHz;
  const t0 = Date.parse(first.startAt);
  const values: number[] = [];
  for (const c of use) {
    const offset = Math.round(((Date.parse(c.startAt) - t0) / 1000) * rate);
    while (values.length < offset) values.push(0);
    for (let i = values.length - offset; i < c.values.length; i++) values.push(c.values[i]);
  }
  return { startAt: first.startAt, sampleRateHz: rate, unit: first.unit, values };
}

const storedDataSchema = analysisInputSchema.pick({ events: true, etco2: true });

/** The analysis input of a stored record; throws a message naming the bad event or value. */
export function storedRecordInput(record: StoredRecord): AnalysisInput {
  const parsed = storedDataSchema.safeParse({ events: record.events, etco2: record.etco2 });
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new Error(`record ${record.id}: ${issue.path.join('.')}: ${issue.message}`);
  }
  const waveform = record.waveform?.length ? joinWaveform(record.waveform) : undefined;
  return {
    arrestAt: record.arrestAt,
    profile: record.profile?.thresholds,
    events: parsed.data.events,
    etco2: valuesBesideWaveform(parsed.data.etco2 ?? [], waveform),
    waveform,
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
