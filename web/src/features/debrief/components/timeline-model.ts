import {
  type Debrief,
  type Etco2DisplayUnit,
  etco2InUnit,
  eventMarkerLegend,
  formatEtco2,
} from '@upstroke/contracts';

/** Symbols for events without a shared code, that only the screen's fonts draw. */
const screenSymbols: Record<string, string> = {
  'compressions-start': '▶',
  'compressions-stop': '■',
  correction: '✎',
};

/** The screen's legend: the shared codes (as on the PDF) and the screen's own symbols. */
export const screenLegend: readonly { code: string; meaning: string }[] = [
  ...eventMarkerLegend,
  { code: screenSymbols['compressions-start'], meaning: 'Compressions on' },
  { code: screenSymbols['compressions-stop'], meaning: 'Compressions off' },
];

/** Tick spacings (s) for a zoomed view: round times only (10 s … 2 h). */
const TICK_STEPS_SEC = [10, 15, 30, 60, 120, 300, 600, 900, 1800, 3600, 7200];

/**
 * Ticks for any view, at round times from the arrest (multiples of the step), never at the
 * view's own edges (which zooming and panning leave at odd times such as 1:59).
 */
export function roundTicks(minSec: number, maxSec: number, maxTicks = 10): number[] {
  const span = Math.max(1, maxSec - minSec);
  const step = TICK_STEPS_SEC.find((s) => span / s <= maxTicks) ?? 14400;
  const out: number[] = [];
  for (let t = Math.ceil(minSec / step) * step; t <= maxSec; t += step) out.push(t);
  return out;
}

export interface Marker {
  id: string;
  tSec: number;
  kind: string;
  code: string;
  label: string;
  amendment: boolean;
}

export interface Band {
  startSec: number;
  endSec: number;
}

export interface Rise {
  tSec: number;
  confounded: boolean;
  label: string;
}

export interface TimelineModel {
  durationSec: number;
  /** Ticks of the whole-code view, seconds (capno's round minutes). */
  ticks: number[];
  /** The site's unit: every EtCO2 value below (points, low line, axis) is in it. */
  unit: Etco2DisplayUnit;
  /** The low-EtCO2 threshold in `unit`, for the dashed line. */
  lowLine: number;
  /** The same threshold written for people ("10 mmHg", "1.3 kPa"). */
  lowText: string;
  /** Top of the axis (in `unit`): the largest breath or entered value, at least 40 mmHg. */
  yMax: number;
  manual: { x: number; y: number }[];
  imported: { x: number; y: number }[];
  /** Per-breath EtCO2 and the capnogram; `y: null` breaks the line at a data gap. */
  breaths: { x: number; y: number | null }[];
  wave: { x: number; y: number | null }[];
  markers: Marker[];
  compressions: Band[];
  low: Band[];
  /** The patient's ROSC periods (capno's patient state). */
  rosc: Band[];
  gaps: Band[];
  rises: Rise[];
}

const band = ({ startSec, endSec }: Band): Band => ({ startSec, endSec });

type Point = { x: number; y: number | null };

/** A line never bridges a data gap: a null point at the start of each gap between two points. */
export function breakAtGaps(points: Point[], gaps: readonly Band[]): Point[] {
  if (gaps.length === 0) return points;
  const out: Point[] = [];
  let g = 0;
  for (const p of points) {
    const prev = out[out.length - 1];
    while (g < gaps.length && gaps[g].startSec < p.x) {
      if (prev && gaps[g].startSec >= prev.x) out.push({ x: gaps[g].startSec, y: null });
      g++;
    }
    out.push(p);
  }
  return out;
}

/**
 * What the chart draws, from the debrief: the span, ticks, markers, shaded intervals and
 * gaps come from capno's timeline model (the PDF draws the same one); the screen adds its
 * series, symbols and labels. Pure: tested without a canvas.
 */
export function timelineModel(d: Debrief): TimelineModel {
  const unit = d.record.etco2Unit;
  const inUnit = (mmHg: number) => Math.round(etco2InUnit(mmHg, unit) * 100) / 100;
  const pt = (p: { tSec: number; mmHg: number }) => ({ x: p.tSec, y: inUnit(p.mmHg) });
  const topMmHg = Math.max(40, ...d.etco2Series.map((p) => p.mmHg)) + 8;
  const tl = d.timeline;
  const ticks = tl.ticks;
  return {
    durationSec: tl.span.endSec,
    ticks: ticks.map((t) => t.tSec),
    unit,
    lowLine: inUnit(d.profile.thresholds.lowEtco2MmHg),
    lowText: formatEtco2(d.profile.thresholds.lowEtco2MmHg, unit),
    yMax: inUnit(Math.min(100, topMmHg)),
    manual: d.etco2Series.filter((p) => p.source === 'manual').map(pt),
    imported: d.etco2Series.filter((p) => p.source === 'import').map(pt),
    breaths: breakAtGaps(
      d.etco2Series.filter((p) => p.source === 'waveform' || p.source === 'stream').map(pt),
      tl.gaps,
    ),
    wave: d.waveformTrace
      ? breakAtGaps(
          d.waveformTrace.tSec.map((x, i) => ({ x, y: inUnit(d.waveformTrace?.mmHg[i] ?? 0) })),
          tl.gaps,
        )
      : [],
    markers: tl.markers.map((m) => ({
      id: m.id,
      tSec: m.tSec,
      kind: m.kind,
      code: m.code || screenSymbols[m.kind] || '•',
      label: m.label,
      amendment: m.amendment,
    })),
    compressions: tl.shaded.filter((x) => x.kind === 'compressions').map(band),
    low: tl.shaded.filter((x) => x.kind === 'etco2-low').map(band),
    rosc: tl.shaded.filter((x) => x.kind === 'rosc').map(band),
    gaps: tl.gaps.map(band),
    rises: tl.rises.map((r) => ({
      tSec: r.tSec,
      confounded: r.confounder !== null,
      label: r.confounder ? `Rise (after ${r.confounder.replace('-', ' ')})` : 'Rise',
    })),
  };
}

/** The view around a finding: its interval with a margin either side. */
export function viewAround(startSec: number, endSec: number, durationSec: number): Band {
  const margin = Math.max(30, (endSec - startSec) * 0.5);
  return {
    startSec: Math.max(0, Math.floor(startSec - margin)),
    endSec: Math.min(durationSec, Math.ceil(endSec + margin)),
  };
}
