import type {
  AnalysisEtco2,
  AnalysisInput,
  DebriefEvent,
  Waveform,
  WaveformTrace,
} from '@upstroke/contracts';
import { arrayToMmHg } from '@upstroke/capno';
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
  const supersededBy = new Map<string, string>();
  for (const e of rows) {
    if (e.kind === 'correction') supersededBy.set(String(e.data.supersedes), e.id);
  }
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

/**
 * The stored chunks as one capnogram for `analyze()`. One source is used (the one with most
 * samples: a monitor import and a live stream of the same minutes would overlap), at the
 * first chunk's rate and unit. A gap between chunks is filled with 0 mmHg — the record
 * holds no CO2 signal there — and overlapping samples are dropped.
 */
export function assembleWaveform(chunks: readonly WaveformChunkRow[]): Waveform | undefined {
  if (chunks.length === 0) return undefined;
  const bySource = new Map<string, number>();
  for (const c of chunks) bySource.set(c.source, (bySource.get(c.source) ?? 0) + c.sampleCount);
  const source = [...bySource.entries()].sort((a, b) => b[1] - a[1])[0][0];
  const first = chunks.find((c) => c.source === source) as WaveformChunkRow;
  const use = chunks
    .filter(
      (c) => c.source === source && c.sampleRateHz === first.sampleRateHz && c.unit === first.unit,
    )
    .sort((a, b) => a.startAt.getTime() - b.startAt.getTime());
  const rate = first.sampleRateHz;
  const t0 = use[0].startAt.getTime();
  const last = use[use.length - 1];
  const total = Math.round(((last.startAt.getTime() - t0) / 1000) * rate) + last.sampleCount;
  const values = new Float64Array(total);
  let filled = 0;
  for (const c of use) {
    const offset = Math.round(((c.startAt.getTime() - t0) / 1000) * rate);
    const s = samplesOf(c);
    const from = Math.max(0, filled - offset);
    for (let i = from; i < s.length; i++) values[offset + i] = s[i];
    filled = Math.max(filled, offset + s.length);
  }
  return {
    startAt: use[0].startAt.toISOString(),
    sampleRateHz: rate,
    unit: first.unit,
    values: Array.from(values.subarray(0, filled)),
  };
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
