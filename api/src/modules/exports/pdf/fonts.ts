import fs from 'node:fs';
import path from 'node:path';
import { woffToSfnt } from './woff';

/**
 * Roboto from @fontsource/roboto, embedded in every PDF (no system fonts). The package
 * ships one .woff per script subset (pdfkit cannot read .woff2), so text is written in
 * runs, each in the subset whose `unicode-range` (from the package's CSS) covers it.
 * pdfkit embeds only the glyphs used.
 */
const subsets = [
  'latin',
  'latin-ext',
  'math',
  'symbols',
  'greek',
  'cyrillic',
  'cyrillic-ext',
  'vietnamese',
];
export type Weight = 400 | 700;

/** Characters that no Roboto subset carries, written as plain equivalents. */
export const pdfSubstitutions: Record<string, string> = { '→': '->', '✓': 'yes', '⚠': '!' };

const dir = path.dirname(require.resolve('@fontsource/roboto/files/roboto-latin-400-normal.woff'));
const fileCache = new Map<string, Buffer>();

export function fontFile(subset: string, weight: Weight): Buffer {
  const file = path.join(dir, `roboto-${subset}-${weight}-normal.woff`);
  let buf = fileCache.get(file);
  if (!buf) {
    buf = woffToSfnt(fs.readFileSync(file));
    fileCache.set(file, buf);
  }
  return buf;
}

/** Code-point ranges of each subset, read from the package's own @font-face rules. */
function readRanges(): Map<string, [number, number][]> {
  const css = fs.readFileSync(path.join(dir, '..', '400.css'), 'utf8');
  const out = new Map<string, [number, number][]>();
  for (const m of css.matchAll(
    /roboto-([a-z-]+)-400-normal\.woff\)[^}]*?unicode-range:\s*([^;]+);/g,
  )) {
    const ranges = m[2].split(',').map((r): [number, number] => {
      const [a, b] = r.trim().replace(/^U\+/i, '').split('-');
      return [parseInt(a, 16), parseInt(b ?? a, 16)];
    });
    out.set(m[1], ranges);
  }
  return out;
}
let rangeCache: Map<string, [number, number][]> | undefined;

export function fontName(subset: string, weight: Weight): string {
  return `Roboto-${subset}-${weight}`;
}

/** Registers every subset in both weights (registration costs nothing until used). */
export function registerFonts(doc: PDFKit.PDFDocument): void {
  for (const s of subsets)
    for (const w of [400, 700] as Weight[]) doc.registerFont(fontName(s, w), fontFile(s, w));
}

const plainLatin =
  /^[\u0020-\u007e\u00a0-\u00ff\u2013\u2014\u2018\u2019\u201c\u201d\u2022\u2026]*$/;
const subsetOfCache = new Map<number, string>();

function subsetOf(cp: number): string {
  let s = subsetOfCache.get(cp);
  if (s === undefined) {
    rangeCache ??= readRanges();
    const ranges = rangeCache;
    s = subsets.find((n) => (ranges.get(n) ?? []).some(([a, b]) => cp >= a && cp <= b)) ?? 'latin';
    subsetOfCache.set(cp, s);
  }
  return s;
}

/** Splits text into runs of one subset each; unknown characters are substituted. */
export function fontRuns(text: string): { subset: string; text: string }[] {
  const clean = text.replace(/[→✓⚠]/g, (c) => pdfSubstitutions[c] ?? '?');
  if (plainLatin.test(clean)) return [{ subset: 'latin', text: clean }];
  const runs: { subset: string; text: string }[] = [];
  for (const ch of clean) {
    const cp = ch.codePointAt(0) as number;
    // Spaces and basic punctuation stay in the run they are in.
    const subset = cp === 0x20 && runs.length > 0 ? runs[runs.length - 1].subset : subsetOf(cp);
    const last = runs[runs.length - 1];
    if (last && last.subset === subset) last.text += ch;
    else runs.push({ subset, text: ch });
  }
  return runs;
}

export interface TextOptions extends PDFKit.Mixins.TextOptions {
  weight?: Weight;
  size?: number;
  color?: string;
}

/** Writes text in Roboto, switching subsets inside the line where needed. */
export function write(
  doc: PDFKit.PDFDocument,
  text: string,
  x: number | undefined,
  y: number | undefined,
  opts: TextOptions = {},
): void {
  const { weight = 400, size, color, ...rest } = opts;
  if (size) doc.fontSize(size);
  if (color) doc.fillColor(color);
  const runs = fontRuns(text);
  runs.forEach((r, i) => {
    doc.font(fontName(r.subset, weight));
    const more = i < runs.length - 1;
    if (i === 0 && x !== undefined)
      doc.text(r.text, x, y, { ...rest, continued: more || rest.continued });
    else doc.text(r.text, { ...rest, continued: more || rest.continued });
  });
}

/** Height the text would take at the current size in the given weight (latin metrics). */
export function heightOf(
  doc: PDFKit.PDFDocument,
  text: string,
  width: number,
  weight: Weight = 400,
): number {
  doc.font(fontName('latin', weight));
  return doc.heightOfString(
    text.replace(/[→✓⚠]/g, (c) => pdfSubstitutions[c] ?? '?'),
    { width },
  );
}
