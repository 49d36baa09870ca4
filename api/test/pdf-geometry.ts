import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import zlib from 'node:zlib';

/** One word as pdftotext places it (points, from the top left of its page). */
export interface PlacedWord {
  text: string;
  /** 1-based page number: rows on different pages may share a y. */
  page: number;
  xMin: number;
  yMin: number;
  xMax: number;
  yMax: number;
}

const decode = (s: string) =>
  s
    .replace(/&amp;/g, '&')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"');

/** Every word of the PDF with its box (poppler's `pdftotext -bbox`). */
export function placedWords(file: string): PlacedWord[] {
  const html = execFileSync('pdftotext', ['-bbox', file, '-'], { encoding: 'utf8' });
  const re =
    /<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g;
  return html
    .split(/<page /)
    .slice(1)
    .flatMap((pageHtml, index) =>
      [...pageHtml.matchAll(re)].map((m) => ({
        page: index + 1,
        xMin: Number(m[1]),
        yMin: Number(m[2]),
        xMax: Number(m[3]),
        yMax: Number(m[4]),
        text: decode(m[5]),
      })),
    );
}

/**
 * Horizontal segments drawn as `x y m x2 y l S` in the page streams (pdfkit draws a
 * strike-through so, in top-left coordinates under its page transform).
 */
export function horizontalStrokes(file: string): { x1: number; x2: number; y: number }[] {
  const pdf = fs.readFileSync(file);
  const out: { x1: number; x2: number; y: number }[] = [];
  const re = /stream\r?\n/g;
  const text = pdf.toString('latin1');
  for (let m = re.exec(text); m; m = re.exec(text)) {
    const start = m.index + m[0].length;
    const end = text.indexOf('endstream', start);
    let body: string;
    try {
      body = zlib.inflateSync(pdf.subarray(start, end)).toString('latin1');
    } catch {
      continue; // not a deflated stream (or not a content stream)
    }
    const line = /(-?[\d.]+) (-?[\d.]+) m\s+(-?[\d.]+) (-?[\d.]+) l\s+S/g;
    for (const s of body.matchAll(line)) {
      const [x1, y1, x2, y2] = s.slice(1, 5).map(Number);
      if (Math.abs(y1 - y2) < 0.01) out.push({ x1: Math.min(x1, x2), x2: Math.max(x1, x2), y: y1 });
    }
  }
  return out;
}

/** True when a horizontal stroke runs through the middle of the word's box. */
export function isStruck(word: PlacedWord, strokes: ReturnType<typeof horizontalStrokes>) {
  return strokes.some(
    (s) => s.y > word.yMin && s.y < word.yMax && s.x1 <= word.xMin + 0.5 && s.x2 >= word.xMax - 0.5,
  );
}
