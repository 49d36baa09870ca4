import {
  type Debrief,
  etco2Number,
  etco2ToMmHg,
  eventMarkerLegend,
  formatEtco2,
  type TimelineMarker,
} from '@upstroke/contracts';
import { drawChartLegend } from './chart-legend';
import { colors, type Layout } from './layout';

/** The same legend as the screen's, from the contracts' one table of marker codes. */
const codes = `Codes: ${eventMarkerLegend.map((m) => `${m.code} ${m.meaning}`).join(' · ')}`;

/**
 * The record on one vector chart: EtCO2, capnogram, compressions, flagged intervals, data
 * gaps and events — all placed by the debrief's timeline model (capno), as on the screen.
 */
export function drawTimeline(l: Layout, d: Debrief): void {
  const doc = l.doc;
  const tl = d.timeline;
  const duration = tl.span.endSec;
  const unit = d.record.etco2Unit;
  // Drawn in mmHg; the axis is ruled every 10 mmHg or every 1 kPa and labelled in the site's unit.
  const step = etco2ToMmHg(unit === 'kPa' ? 1 : 10, unit);
  const maxV = Math.max(40, ...d.etco2Series.map((p) => p.mmHg), ...(d.waveformTrace?.mmHg ?? [0]));
  const yMax = Math.min(100, Math.ceil(maxV / step) * step);
  const lane = 46;
  const plotH = 150;
  l.ensure(lane + plotH + 40);
  const x0 = l.left + 26;
  const w = l.width - 26;
  const top = doc.y + lane;
  const X = (t: number) => x0 + (Math.max(0, Math.min(duration, t)) / duration) * w;
  const Y = (v: number) => top + plotH - (Math.max(0, Math.min(yMax, v)) / yMax) * plotH;

  const band = (x: { startSec: number; endSec: number }, color: string) =>
    doc.rect(X(x.startSec), top, Math.max(1, X(x.endSec) - X(x.startSec)), plotH).fill(color);
  const shade = { compressions: colors.band, 'etco2-low': colors.low, rosc: colors.rosc };
  for (const x of tl.shaded) band(x, shade[x.kind]);
  for (const g of tl.gaps) band(g, colors.gap);

  doc.lineWidth(0.4).strokeColor(colors.rule);
  for (let v = 0; v <= yMax + 1e-9; v += step) {
    doc
      .moveTo(x0, Y(v))
      .lineTo(x0 + w, Y(v))
      .stroke();
    l.text(etco2Number(v, unit, 0), l.left, Y(v) - 4, {
      size: 7,
      color: colors.muted,
      width: 22,
      align: 'right',
    });
  }
  for (const t of tl.ticks) {
    doc
      .moveTo(X(t.tSec), top + plotH)
      .lineTo(X(t.tSec), top + plotH + 3)
      .stroke();
    l.text(t.label, X(t.tSec) - 10, top + plotH + 5, {
      size: 7,
      color: colors.muted,
      width: 20,
      align: 'center',
    });
  }
  l.text('min from arrest', x0 + w - 80, top + plotH + 14, {
    size: 7,
    color: colors.muted,
    width: 80,
    align: 'right',
  });
  l.text(unit, l.left, top - 10, { size: 7, color: colors.muted });

  const low = d.profile.thresholds.lowEtco2MmHg;
  doc.lineWidth(0.8).strokeColor(colors.lowEdge).dash(3, { space: 2 });
  doc
    .moveTo(x0, Y(low))
    .lineTo(x0 + w, Y(low))
    .stroke()
    .undash();

  drawTrace(l, d, X, Y);
  drawRises(l, d, X, top, plotH);
  drawMarkers(
    l,
    tl.markers.filter((m) => m.code),
    X,
    top - lane + 4,
  );
  doc.y = top + plotH + 26;
  drawChartLegend(l, `EtCO2 below ${formatEtco2(low, unit)}`);
  l.text(codes, l.left, doc.y + 2, { size: 7.5, color: colors.muted, width: l.width });
}

function drawTrace(
  l: Layout,
  d: Debrief,
  X: (t: number) => number,
  Y: (v: number) => number,
): void {
  const doc = l.doc;
  const tr = d.waveformTrace;
  if (tr && tr.tSec.length > 1) {
    // At most ~1,500 points: enough for the page width, small in the file.
    const every = Math.max(1, Math.ceil(tr.tSec.length / 1500));
    const pts: { tSec: number; mmHg: number }[] = [];
    for (let i = 0; i < tr.tSec.length; i += every)
      pts.push({ tSec: tr.tSec[i], mmHg: tr.mmHg[i] });
    doc.lineWidth(0.3).strokeColor(colors.wave);
    polyline(l, pts, d.timeline.gaps, X, Y);
  }
  const breaths = d.etco2Series.filter((p) => p.source === 'waveform' || p.source === 'stream');
  if (breaths.length > 1) {
    doc.lineWidth(1).strokeColor(colors.etco2);
    polyline(l, breaths, d.timeline.gaps, X, Y);
  }
  for (const p of d.etco2Series.filter((q) => q.source === 'manual' || q.source === 'import'))
    doc.circle(X(p.tSec), Y(p.mmHg), 1.8).fill(colors.etco2);
}

/** A line through the points that lifts the pen over each data gap (no data is not drawn). */
function polyline(
  l: Layout,
  pts: readonly { tSec: number; mmHg: number }[],
  gaps: readonly { startSec: number; endSec: number }[],
  X: (t: number) => number,
  Y: (v: number) => number,
): void {
  const doc = l.doc;
  pts.forEach((p, i) => {
    const prev = pts[i - 1];
    const gap = prev && gaps.some((g) => g.startSec >= prev.tSec && g.startSec < p.tSec);
    if (!prev || gap) doc.moveTo(X(p.tSec), Y(p.mmHg));
    else doc.lineTo(X(p.tSec), Y(p.mmHg));
  });
  doc.stroke();
}

function drawRises(l: Layout, d: Debrief, X: (t: number) => number, top: number, h: number): void {
  const doc = l.doc;
  for (const f of d.timeline.rises) {
    doc.lineWidth(1.2).strokeColor(colors.rise);
    if (f.confounder) doc.dash(3, { space: 2 });
    doc
      .moveTo(X(f.tSec), top + h)
      .lineTo(X(f.tSec), top)
      .stroke()
      .undash();
    l.text(f.confounder ? 'rise?' : 'rise', X(f.tSec) + 2, top + 2, {
      size: 7,
      color: colors.rise,
    });
  }
}

/** Event codes in up to three rows so that close events do not overprint each other. */
function drawMarkers(
  l: Layout,
  events: TimelineMarker[],
  X: (t: number) => number,
  laneTop: number,
): void {
  const doc = l.doc;
  const rowEnds = [-Infinity, -Infinity, -Infinity];
  doc.fontSize(6.5);
  for (const e of events) {
    const label = e.code;
    if (e.kind === 'note') {
      // Notes are many and wordy: a tick on the lane; their text is in the event table.
      doc
        .lineWidth(0.4)
        .strokeColor(colors.wave)
        .moveTo(X(e.tSec), laneTop + 36)
        .lineTo(X(e.tSec), laneTop + 42)
        .stroke();
      continue;
    }
    const x = X(e.tSec);
    const wBox = label.length * 3.6 + 5;
    let row = rowEnds.findIndex((end) => x - wBox / 2 > end + 1);
    if (row < 0) row = rowEnds.indexOf(Math.min(...rowEnds));
    rowEnds[row] = x + wBox / 2;
    const y = laneTop + row * 12;
    const fill = e.kind === 'shock' ? '#f3e0b5' : e.kind === 'rosc' ? '#cfe8d3' : '#e6e9ee';
    doc.roundedRect(x - wBox / 2, y, wBox, 10, 2).fill(fill);
    doc
      .lineWidth(0.3)
      .strokeColor(colors.muted)
      .moveTo(x, y + 10)
      .lineTo(x, laneTop + 40)
      .stroke();
    l.text(label, x - wBox / 2, y + 2, {
      size: 6.5,
      color: colors.ink,
      width: wBox,
      align: 'center',
      weight: e.amendment ? 700 : 400,
    });
  }
}
