import PDFDocument from 'pdfkit';
import { registerFonts } from './fonts';
import { colors, type Layout } from './layout';

/** A PDF document with Roboto registered, and the promise of its bytes once it ends. */
export function createPdf(
  paper: 'A4' | 'Letter',
  info: PDFKit.DocumentInfo,
): { doc: PDFKit.PDFDocument; done: Promise<Buffer> } {
  const doc = new PDFDocument({
    size: paper === 'Letter' ? 'LETTER' : 'A4',
    margins: { top: 48, bottom: 24, left: 48, right: 48 },
    bufferPages: true,
    compress: true,
    info,
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  registerFonts(doc);
  return { doc, done };
}

/** A rule, the given line and "Page i of n" at the foot of every buffered page. */
export function drawFooter(l: Layout, line: string): void {
  const doc = l.doc;
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const y = doc.page.height - 40;
    doc
      .moveTo(l.left, y - 6)
      .lineTo(l.right, y - 6)
      .lineWidth(0.4)
      .strokeColor(colors.rule)
      .stroke();
    l.text(line, l.left, y, {
      size: 7,
      color: colors.muted,
      width: l.width - 80,
      lineBreak: false,
    });
    l.text(`Page ${i + 1} of ${range.count}`, l.right - 80, y, {
      size: 7,
      color: colors.muted,
      width: 80,
      align: 'right',
      lineBreak: false,
    });
  }
}
