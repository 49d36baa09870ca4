import { Transform } from 'node:stream';

export class EncodingError extends Error {
  constructor(
    readonly line: number,
    message: string,
  ) {
    super(message);
  }
}

/**
 * Bytes → text, only while they are valid UTF-8 (and not UTF-16: no NULs). The preamble —
 * the BOM and the blank and `#` lines before the header — is handed to `onPreamble` and not
 * passed on: the CSV parser then starts at the header, and `preambleLines` says by how many
 * lines its line numbers must be shifted. (Starting csv-parse on a one-field comment line
 * makes it build an error object for every later row: 20× slower.)
 */
export function utf8Text(onPreamble: (line: number, text: string) => void) {
  const decoder = new TextDecoder('utf-8', { fatal: true });
  const state = { lines: 1, preambleLines: 0, inPreamble: true, pending: '' };
  const fail = (chunk: Buffer, what: string) => {
    const text = new TextDecoder('utf-8').decode(chunk);
    const found = [text.indexOf('\uFFFD'), text.indexOf('\0')].filter((i) => i >= 0);
    const before = text.slice(0, found.length > 0 ? Math.min(...found) : 0);
    return new EncodingError(state.lines + (before.match(/\n/g)?.length ?? 0), what);
  };
  /** Consumes preamble lines from the front of `text`; returns what is left to pass on. */
  const preamble = (text: string, final: boolean): string => {
    let rest = state.pending + text;
    state.pending = '';
    while (state.inPreamble) {
      const nl = rest.indexOf('\n');
      const line = (nl < 0 ? rest : rest.slice(0, nl)).replace(/^\uFEFF/, '').replace(/\r$/, '');
      const trimmed = line.trim();
      if (trimmed !== '' && !trimmed.startsWith('#')) {
        state.inPreamble = false;
        return rest.replace(/^\uFEFF/, '');
      }
      if (nl < 0 && !final) {
        state.pending = rest; // the line is not complete yet
        return '';
      }
      state.preambleLines++;
      if (trimmed) onPreamble(state.preambleLines, trimmed);
      rest = nl < 0 ? '' : rest.slice(nl + 1);
      if (nl < 0) return '';
    }
    return rest;
  };
  const stream = new Transform({
    transform(chunk: Buffer, _enc, done) {
      if (chunk.includes(0))
        return done(fail(chunk, 'encoding: NUL bytes (UTF-16?); save the file as UTF-8'));
      let text: string;
      try {
        text = decoder.decode(chunk, { stream: true });
      } catch {
        return done(fail(chunk, 'encoding: not valid UTF-8 text; save the file as UTF-8'));
      }
      for (let i = text.indexOf('\n'); i >= 0; i = text.indexOf('\n', i + 1)) state.lines++;
      done(null, state.inPreamble ? preamble(text, false) : text);
    },
    flush(done) {
      try {
        const tail = decoder.decode();
        done(null, state.inPreamble ? preamble(tail, true) : tail);
      } catch {
        done(new EncodingError(state.lines, 'encoding: the file ends inside a UTF-8 character'));
      }
    },
  });
  return { stream, preambleLines: () => state.preambleLines };
}
