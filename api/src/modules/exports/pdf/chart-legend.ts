import { colors, type Layout } from './layout';

type Key =
  | { kind: 'band'; color: string; label: string }
  | { kind: 'line'; color: string; label: string; dashed?: boolean; width?: number }
  | { kind: 'dot'; color: string; label: string };

/** What each band, line and dot of the chart means, named beside its own swatch. */
export function chartKeys(lowLabel: string): Key[] {
  return [
    { kind: 'band', color: colors.band, label: 'Compressions on' },
    { kind: 'band', color: colors.low, label: lowLabel },
    { kind: 'band', color: colors.rosc, label: 'ROSC (patient state)' },
    { kind: 'band', color: colors.gap, label: 'Data gap: no capnogram stored (never a finding)' },
    { kind: 'line', color: colors.etco2, label: 'Per-breath EtCO2', width: 1 },
    { kind: 'line', color: colors.wave, label: 'Capnogram', width: 0.6 },
    { kind: 'dot', color: colors.etco2, label: 'Entered value' },
    {
      kind: 'line',
      color: colors.rise,
      label: 'EtCO2 rise (dashed: confounder before)',
      width: 1.2,
    },
    { kind: 'line', color: colors.lowEdge, label: 'Low EtCO2 threshold', dashed: true, width: 0.8 },
  ];
}

/** The chart's legend: swatches with their names, flowing over as many rows as needed. */
export function drawChartLegend(l: Layout, lowLabel: string): void {
  const doc = l.doc;
  const size = 7.5;
  let x = l.left;
  let y = doc.y + 2;
  doc.fontSize(size);
  for (const k of chartKeys(lowLabel)) {
    const w = 16 + doc.widthOfString(k.label) + 12;
    if (x + w > l.right) {
      x = l.left;
      y += 12;
    }
    swatch(doc, k, x, y);
    l.text(k.label, x + 16, y, { size, color: colors.muted, width: w - 16, lineBreak: false });
    x += w;
  }
  doc.y = y + 12;
}

function swatch(doc: PDFKit.PDFDocument, k: Key, x: number, y: number): void {
  if (k.kind === 'band') {
    doc.rect(x, y, 12, 8).fill(k.color);
    doc.lineWidth(0.3).strokeColor(colors.rule).rect(x, y, 12, 8).stroke();
  } else if (k.kind === 'dot') doc.circle(x + 6, y + 4, 1.8).fill(k.color);
  else {
    doc.lineWidth(k.width ?? 1).strokeColor(k.color);
    if (k.dashed) doc.dash(3, { space: 2 });
    doc
      .moveTo(x, y + 4)
      .lineTo(x + 12, y + 4)
      .stroke()
      .undash();
  }
}
