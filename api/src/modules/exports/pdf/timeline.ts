import { type Debrief, type DebriefEvent, eventMarkerCodes } from '@upstroke/contracts';
import { colors, type Layout } from './layout';

const legend =
  'CA arrest · S shock · D drug (E = epinephrine) · A airway · V ventilation · R rhythm · P pulse · ROSC · RA re-arrest · IV access · ticks: notes';

function code(e: DebriefEvent): string {
  if (e.kind === 'drug' && e.data.drug === 'epinephrine') return 'E';
  return eventMarkerCodes[e.kind] ?? '';
}

function tickStep(durationSec: number): number {
  const min = durationSec / 60;
  return [1, 2, 5, 10, 15, 30, 60].find((s) => min / s <= 12) ?? 120;
}

/** The record on one vector chart: EtCO2, capnogram, compressions, flagged intervals, events. */
export function drawTimeline(l: Layout, d: Debrief): void {
  const doc = l.doc;
  const lastEvent = Math.max(0, ...d.events.map((e) => e.tSec));
  const duration = Math.max(60, d.measures.durationSec, lastEvent);
  const maxV = Math.max(40, ...d.etco2Series.map((p) => p.mmHg), ...(d.waveformTrace?.mmHg ?? [0]));
  const yMax = Math.min(100, Math.ceil(maxV / 10) * 10);
  const lane = 46;
  const plotH = 150;
  l.ensure(lane + plotH + 40);
  const x0 = l.left + 26;
  const w = l.width - 26;
  const top = doc.y + lane;
  const X = (t: number) => x0 + (Math.max(0, Math.min(duration, t)) / duration) * w;
  const Y = (v: number) => top + plotH - (Math.max(0, Math.min(yMax, v)) / yMax) * plotH;

  for (const c of d.measures.compressionIntervals ?? [])
    doc.rect(X(c.startSec), top, X(c.endSec) - X(c.startSec), plotH).fill(colors.band);
  for (const f of d.findings.filter((x) => x.kind === 'etco2-low'))
    doc.rect(X(f.startSec), top, Math.max(1, X(f.endSec) - X(f.startSec)), plotH).fill(colors.low);

  doc.lineWidth(0.4).strokeColor(colors.rule);
  for (let v = 0; v <= yMax; v += 10) {
    doc
      .moveTo(x0, Y(v))
      .lineTo(x0 + w, Y(v))
      .stroke();
    l.text(String(v), l.left, Y(v) - 4, {
      size: 7,
      color: colors.muted,
      width: 22,
      align: 'right',
    });
  }
  const step = tickStep(duration) * 60;
  for (let t = 0; t <= duration; t += step) {
    doc
      .moveTo(X(t), top + plotH)
      .lineTo(X(t), top + plotH + 3)
      .stroke();
    l.text(`${Math.round(t / 60)}`, X(t) - 10, top + plotH + 5, {
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
  l.text('mmHg', l.left, top - 10, { size: 7, color: colors.muted });

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
    d.events.filter((e) => !e.supersededBy && code(e)),
    X,
    top - lane + 4,
  );
  doc.y = top + plotH + 26;
  l.text(
    `Green: compressions on. Red: EtCO2 below ${low} mmHg (dashed line) for the profile's minimum time. Blue: EtCO2 rise (dashed when a confounder came before it). Dots: entered values; line: per-breath EtCO2; grey: capnogram.`,
    l.left,
    doc.y,
    { size: 7.5, color: colors.muted, width: l.width },
  );
  l.text(legend, l.left, doc.y + 2, { size: 7.5, color: colors.muted, width: l.width });
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
    doc.lineWidth(0.3).strokeColor(colors.wave).moveTo(X(tr.tSec[0]), Y(tr.mmHg[0]));
    for (let i = every; i < tr.tSec.length; i += every) doc.lineTo(X(tr.tSec[i]), Y(tr.mmHg[i]));
    doc.stroke();
  }
  const breaths = d.etco2Series.filter((p) => p.source === 'waveform' || p.source === 'stream');
  if (breaths.length > 1) {
    doc.lineWidth(1).strokeColor(colors.etco2).moveTo(X(breaths[0].tSec), Y(breaths[0].mmHg));
    for (const p of breaths.slice(1)) doc.lineTo(X(p.tSec), Y(p.mmHg));
    doc.stroke();
  }
  for (const p of d.etco2Series.filter((q) => q.source === 'manual' || q.source === 'import'))
    doc.circle(X(p.tSec), Y(p.mmHg), 1.8).fill(colors.etco2);
}

function drawRises(l: Layout, d: Debrief, X: (t: number) => number, top: number, h: number): void {
  const doc = l.doc;
  for (const f of d.findings.filter((x) => x.kind === 'etco2-rise')) {
    doc.lineWidth(1.2).strokeColor(colors.rise);
    if (f.confounder) doc.dash(3, { space: 2 });
    doc
      .moveTo(X(f.startSec), top + h)
      .lineTo(X(f.startSec), top)
      .stroke()
      .undash();
    l.text(f.confounder ? 'rise?' : 'rise', X(f.startSec) + 2, top + 2, {
      size: 7,
      color: colors.rise,
    });
  }
}

/** Event codes in up to three rows so that close events do not overprint each other. */
function drawMarkers(
  l: Layout,
  events: DebriefEvent[],
  X: (t: number) => number,
  laneTop: number,
): void {
  const doc = l.doc;
  const rowEnds = [-Infinity, -Infinity, -Infinity];
  doc.fontSize(6.5);
  for (const e of events) {
    const label = code(e);
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
