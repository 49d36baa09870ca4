/**
 * Just enough MIME to show a sink message's text to an admin: headers, multipart bodies,
 * quoted-printable and base64. Character sets other than UTF-8 are read as UTF-8.
 */
interface Part {
  headers: Map<string, string>;
  body: string;
}

function splitPart(raw: string): Part {
  const match = /\r?\n\r?\n/.exec(raw);
  const head = match ? raw.slice(0, match.index) : raw;
  const body = match ? raw.slice(match.index + match[0].length) : '';
  const headers = new Map<string, string>();
  // Folded header lines continue with whitespace.
  for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon > 0)
      headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function decodeQuotedPrintable(text: string): string {
  const softBreaks = text.replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < softBreaks.length; i += 1) {
    const hex = softBreaks.slice(i + 1, i + 3);
    if (softBreaks[i] === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(softBreaks[i], 'utf8'));
    }
  }
  return Buffer.from(bytes).toString('utf8');
}

function decodeBody(part: Part): string {
  const encoding = (part.headers.get('content-transfer-encoding') ?? '7bit').toLowerCase();
  if (encoding === 'base64')
    return Buffer.from(part.body.replace(/\s+/g, ''), 'base64').toString('utf8');
  if (encoding === 'quoted-printable') return decodeQuotedPrintable(part.body);
  return part.body;
}

function textOf(part: Part, depth: number): string | null {
  const type = (part.headers.get('content-type') ?? 'text/plain').toLowerCase();
  if (type.startsWith('multipart/') && depth < 5) {
    const boundary = /boundary="?([^";]+)"?/i.exec(part.headers.get('content-type') ?? '')?.[1];
    if (!boundary) return null;
    const pieces = part.body.split(`--${boundary}`).slice(1);
    for (const piece of pieces) {
      if (piece.startsWith('--')) break;
      const found = textOf(splitPart(piece.replace(/^\r?\n/, '')), depth + 1);
      if (found !== null) return found;
    }
    return null;
  }
  return type.startsWith('text/plain') ? decodeBody(part).trim() : null;
}

/** The plain-text body of a raw RFC 5322 message, or '' when it has none. */
export function plainTextOf(raw: string): string {
  return (textOf(splitPart(raw), 0) ?? '').replace(/\r\n/g, '\n');
}
