import {
  type ControlChartResponse,
  formatSpcValue,
  type SpcMeasure,
  spcMeasureLabels,
} from '@upstroke/contracts';
import { colors, type Layout } from './layout';

const PLOT_H = 96;
const AXIS_W = 44;

interface Frame {
  x0: number;
  y0: number;
  w: number;
  slot: number;
  y: (v: number) => number;
}

/** Value range of everything drawn (values, centre, limits), padded a little. */
function rangeOf(c: ControlChartResponse): [number, number] {
  const vs = [c.centre, ...c.points.flatMap((p) => [p.value, p.lower, p.upper])].filter(
    (v): v is number => v !== null && Number.isFinite(v),
  );
  if (vs.length === 0) return [0, 1];
  const lo = Math.min(...vs);
  const hi = Math.max(...vs);
  const pad = hi === lo ? Math.max(Math.abs(hi) * 0.1, 0.05) : (hi - lo) * 0.08;
  // A share stays on 0 to 100 %.
  if (c.kind === 'p') return [Math.max(0, lo - pad), Math.min(1, Math.max(hi + pad, lo + 0.05))];
  return [lo - pad, hi + pad];
}

function frameOf(l: Layout, c: ControlChartResponse, top: number): Frame {
  const [lo, hi] = rangeOf(c);
  const x0 = l.left + AXIS_W;
  const w = l.right - x0;
  return {
    x0,
    y0: top,
    w,
    slot: w / Math.max(1, c.points.length),
    y: (v) => top + PLOT_H - ((v - lo) / (hi - lo)) * PLOT_H,
  };
}

/** Axis box, three value ticks and the month under each slot. */
function drawAxes(l: Layout, c: ControlChartResponse, f: Frame): void {
  const doc = l.doc;
  doc.rect(f.x0, f.y0, f.w, PLOT_H).lineWidth(0.5).strokeColor(colors.rule).stroke();
  const [lo, hi] = rangeOf(c);
  for (const v of [lo, (lo + hi) / 2, hi]) {
    l.text(formatSpcValue(c.measure, v), l.left, f.y(v) - 4, {
      size: 6.5,
      color: colors.muted,
      width: AXIS_W - 4,
      align: 'right',
      lineBreak: false,
    });
  }
  c.points.forEach((p, i) => {
    l.text(p.month, f.x0 + i * f.slot, f.y0 + PLOT_H + 3, {
      size: 6,
      color: colors.muted,
      width: f.slot,
      align: 'center',
      lineBreak: false,
    });
  });
}

/** Centre line solid; limits dashed, one step per month (a p-chart's limits follow n). */
function drawLines(l: Layout, c: ControlChartResponse, f: Frame): void {
  const doc = l.doc;
  if (c.centre !== null) {
    const y = f.y(c.centre);
    doc
      .moveTo(f.x0, y)
      .lineTo(f.x0 + f.w, y)
      .lineWidth(0.9)
      .strokeColor(colors.info)
      .stroke();
  }
  doc.save().dash(2.5, { space: 2 });
  c.points.forEach((p, i) => {
    for (const v of [p.lower, p.upper]) {
      if (v === null) continue;
      const x = f.x0 + i * f.slot;
      doc.moveTo(x, f.y(v)).lineTo(x + f.slot, f.y(v));
    }
  });
  doc.lineWidth(0.7).strokeColor(colors.muted).stroke().undash().restore();
}

/** The monthly values joined (a month without records breaks the line), signals in red. */
function drawPoints(l: Layout, c: ControlChartResponse, f: Frame): void {
  const doc = l.doc;
  const at = (i: number, v: number) => [f.x0 + (i + 0.5) * f.slot, f.y(v)] as const;
  let pen = false;
  c.points.forEach((p, i) => {
    if (p.value === null) return void (pen = false);
    const [x, y] = at(i, p.value);
    if (pen) doc.lineTo(x, y);
    else doc.moveTo(x, y);
    pen = true;
  });
  doc.lineWidth(1).strokeColor(colors.ink).stroke();
  c.points.forEach((p, i) => {
    if (p.value === null) return;
    const [x, y] = at(i, p.value);
    doc
      .circle(x, y, p.signal ? 3.2 : 2)
      .fillColor(p.signal ? colors.critical : colors.ink)
      .fill();
  });
}

/** One line of figures for the report month, as the Trends API gives them. */
export function monthFigures(c: ControlChartResponse, month: string): string {
  const p = c.points.find((q) => q.month === month);
  const v = (x: number | null) => formatSpcValue(c.measure, x);
  const value = !p || p.value === null ? 'no records' : v(p.value);
  const count = p && p.x !== null ? ` (${p.x} of ${p.n})` : ` (n ${p?.n ?? 0})`;
  const limits = p && p.lower !== null ? `; limits ${v(p.lower)} to ${v(p.upper)}` : '';
  return `${month}: ${value}${count}; centre ${v(c.centre)}${limits}`;
}

const kindName = (c: ControlChartResponse) =>
  c.kind === 'p' ? 'p-chart' : 'individuals (XmR) chart';

/** A control chart drawn in vectors, its title, its figures for the month and baseline. */
export function drawControlChart(l: Layout, c: ControlChartResponse, month: string): void {
  l.ensure(PLOT_H + 62);
  const label: string = spcMeasureLabels[c.measure as SpcMeasure];
  l.text(`${label} — ${kindName(c)}`, l.left, l.y, { size: 9.5, weight: 700, color: colors.ink });
  const base = c.baseline ? `baseline ${c.baseline.from} to ${c.baseline.to}` : 'no baseline';
  l.text(`${monthFigures(c, month)} · ${base}`, l.left, l.y + 1, {
    size: 7.5,
    color: colors.muted,
  });
  const f = frameOf(l, c, l.y + 4);
  drawAxes(l, c, f);
  drawLines(l, c, f);
  drawPoints(l, c, f);
  l.doc.y = f.y0 + PLOT_H + 16;
}
