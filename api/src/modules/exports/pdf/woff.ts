import zlib from 'node:zlib';

/**
 * WOFF 1.0 → plain SFNT (TrueType/OpenType), per the W3C WOFF File Format 1.0: each table
 * is zlib-compressed when compLength < origLength. pdfkit reads .woff itself but inflates
 * it in JavaScript on every document (most of a report's render time); converting once
 * per process and handing pdfkit the SFNT makes each report cheap.
 */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.readUInt32BE(0) !== 0x774f4646) throw new Error('not a WOFF file');
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables = [];
  for (let i = 0; i < numTables; i++) {
    const e = 44 + i * 20;
    const offset = woff.readUInt32BE(e + 4);
    const compLength = woff.readUInt32BE(e + 8);
    const origLength = woff.readUInt32BE(e + 12);
    const raw = woff.subarray(offset, offset + compLength);
    tables.push({
      tag: woff.readUInt32BE(e),
      checksum: woff.readUInt32BE(e + 16),
      data: compLength < origLength ? zlib.inflateSync(raw) : raw,
    });
  }
  const pow2 = 2 ** Math.floor(Math.log2(numTables));
  const headerSize = 12 + numTables * 16;
  const padded = (n: number) => (n + 3) & ~3;
  const out = Buffer.alloc(headerSize + tables.reduce((n, t) => n + padded(t.data.length), 0));
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(pow2 * 16, 6);
  out.writeUInt16BE(Math.log2(pow2), 8);
  out.writeUInt16BE(numTables * 16 - pow2 * 16, 10);
  let offset = headerSize;
  tables.forEach((t, i) => {
    const r = 12 + i * 16;
    out.writeUInt32BE(t.tag, r);
    out.writeUInt32BE(t.checksum, r + 4);
    out.writeUInt32BE(offset, r + 8);
    out.writeUInt32BE(t.data.length, r + 12);
    t.data.copy(out, offset);
    offset += padded(t.data.length);
  });
  return out;
}
