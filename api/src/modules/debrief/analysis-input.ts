import type {
  AnalysisEtco2,
  AnalysisInput,
  DebriefEvent,
  Waveform,
  WaveformTrace,
} from '@upstroke/contracts';
import { arrayToMmHg, joinWaveform, supersededByMap } from '@upstroke/capno';
import type {
  Etco2Row,
  EventRow,
  WaveformChunkRow,
} from '../resuscitations/clinical-data.repository';

/** Stored events in the shape the analysis reads (corrections are applied by capno). */
export function analysisEvents(rows: readonly EventRow[]): AnalysisInput['events'] {
  return rows.map(
    (e) => ({ id: e.id, at: e.at.toISOString(), kind: e.kind, data: e.data }) as never,
  );
}

export function analysisEtco2(rows: readonly Etco2Row[]): AnalysisEtco2[] {
  return rows.map((s) => ({
    at: s.at.toISOString(),
    value: s.value,
    unit: s.unit,
    source: s.source,
  }));
}

/** Every stored event for display, with the correction that superseded it (if any). */
export function debriefEvents(arrestAt: Date, rows: readonly EventRow[]): DebriefEvent[] {
  const supersededBy = supersededByMap(rows);
  return rows.map((e) => ({
    id: e.id,
    at: e.at.toISOString(),
    tSec: (e.at.getTime() - arrestAt.getTime()) / 1000,
    kind: e.kind,
    data: e.data,
    recordedBy: e.recordedBy,
    amendment: e.amendment,
    amendmentId: (e as EventRow & { amendmentId?: string | null }).amendmentId ?? null,
    supersededBy: supersededBy.get(e.id) ?? null,
  }));
}

function samplesOf(chunk: WaveformChunkRow): Float32Array {
  const b = chunk.samples;
  // Copy into an aligned buffer: a Buffer slice may start at an odd offset.
  const copy = new Uint8Array(b.byteLength);
  copy.set(b);
  return new Float32Array(copy.buffer, 0, chunk.sampleCount);
}

/** The stored chunks as one capnogram for `analyze()`, by capno's one joining rule. */
export function assembleWaveform(chunks: readonly WaveformChunkRow[]): Waveform | undefined {
  return joinWaveform(
    chunks.map((c) => ({
      startAt: c.startAt.toISOString(),
      sampleRateHz: c.sampleRateHz,
      unit: c.unit,
      source: c.source,
      values: samplesOf(c),
    })),
  );
}

/** A capnogram reduced to at most `buckets` min/max pairs, in mmHg, for drawing. */
export function waveformTrace(
  arrestAt: Date,
  w: Waveform | undefined,
  source: string,
  buckets = 3000,
): WaveformTrace | null {
  if (!w || w.values.length === 0) return null;
  const mmHg = arrayToMmHg(w.values, w.unit, w.barometricMmHg);
  const t0 = (Date.parse(w.startAt) - arrestAt.getTime()) / 1000;
  const per = Math.max(1, Math.ceil(mmHg.length / buckets));
  const out: WaveformTrace = { tSec: [], mmHg: [], source };
  for (let i = 0; i < mmHg.length; i += per) {
    let lo = i;
    let hi = i;
    const end = Math.min(mmHg.length, i + per);
    for (let k = i; k < end; k++) {
      if (mmHg[k] < mmHg[lo]) lo = k;
      if (mmHg[k] > mmHg[hi]) hi = k;
    }
    for (const k of lo <= hi ? [lo, hi] : [hi, lo]) {
      out.tSec.push(Math.round((t0 + k / w.sampleRateHz) * 100) / 100);
      out.mmHg.push(Math.round(mmHg[k] * 10) / 10);
    }
  }
  return out;
}
