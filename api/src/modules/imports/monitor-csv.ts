import { Transform, type Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { IMPORT_MAX_ERRORS, type Co2Unit } from '@upstroke/contracts';
import { CsvError, parse } from 'csv-parse';
import { type Columns, readCo2, readDirective, readHeader, readTime, readUnit } from './csv-fields';

export interface CsvRow {
  line: number;
  tMs: number;
  /** In the file's unit. */
  co2: number;
  event: string | null;
}

export interface LineError {
  line: number;
  message: string;
}

interface ParsedRecord {
  record: string[];
  info: { lines: number };
}

class EncodingError extends Error {
  constructor(
    readonly line: number,
    message: string,
  ) {
    super(message);
  }
}

/** Passes bytes on as text only while they are valid UTF-8 (and not UTF-16: no NULs). */
function utf8Guard(): Transform {
  const decoder = new TextDecoder('utf-8', { fatal: true });
  let lines = 1;
  const fail = (chunk: Buffer, what: string) => {
    const text = new TextDecoder('utf-8').decode(chunk);
    const found = [text.indexOf('\uFFFD'), text.indexOf('\0')].filter((i) => i >= 0);
    const before = text.slice(0, found.length > 0 ? Math.min(...found) : 0);
    return new EncodingError(lines + (before.match(/\n/g)?.length ?? 0), what);
  };
  return new Transform({
    readableObjectMode: false,
    transform(chunk: Buffer, _enc, done) {
      if (chunk.includes(0))
        return done(fail(chunk, 'encoding: NUL bytes (UTF-16?); save the file as UTF-8'));
      try {
        const text = decoder.decode(chunk, { stream: true });
        for (let i = text.indexOf('\n'); i >= 0; i = text.indexOf('\n', i + 1)) lines++;
        done(null, text);
      } catch {
        done(fail(chunk, 'encoding: not valid UTF-8 text; save the file as UTF-8'));
      }
    },
    flush(done) {
      try {
        done(null, decoder.decode());
      } catch {
        done(new EncodingError(lines, 'encoding: the file ends inside a UTF-8 character'));
      }
    },
  });
}

/**
 * Reads a monitor CSV (CONTRACT.md "Monitor file import") as a stream, one row at a time,
 * checking each line. Errors are collected (at most IMPORT_MAX_ERRORS, then reading stops);
 * rows are handed to `onRow` in order, with time strictly increasing.
 */
export class MonitorCsvReader {
  readonly errors: LineError[] = [];
  unit: Co2Unit | null = null;
  rows = 0;
  private startMs: number | null = null;
  private columns: Columns | null = null;
  private lastMs = -Infinity;
  private fatal = false;
  private stoppedEarly = false;

  async read(input: Readable, onRow: (row: CsvRow) => void | Promise<void>): Promise<void> {
    const parser = parse({
      relax_column_count: true,
      skip_empty_lines: true,
      bom: true,
      info: true,
    });
    let failure: unknown = null;
    const feeding = pipeline(input, utf8Guard(), parser).catch((e: unknown) => {
      failure ??= e;
    });
    try {
      for await (const rec of parser as AsyncIterable<ParsedRecord>) {
        const row = this.line(rec.record, rec.info.lines);
        if (row) await onRow(row);
        if (this.fatal || this.errors.length >= IMPORT_MAX_ERRORS) {
          this.stoppedEarly = true;
          break;
        }
      }
    } catch (e) {
      // A stream error (encoding, CSV syntax) surfaces here and in the pipeline: keep one.
      failure = e;
    } finally {
      input.destroy();
      parser.destroy();
    }
    await feeding;
    if (failure) this.streamError(failure);
    if (!this.fatal && this.errors.length === 0) this.finish();
    this.errors.sort((a, b) => a.line - b.line);
    this.errors.splice(IMPORT_MAX_ERRORS);
  }

  private streamError(e: unknown): void {
    const err = e as { code?: unknown; lines?: number; message?: string } | null;
    const code = typeof err?.code === 'string' ? err.code : '';
    if (e instanceof EncodingError) this.fail(e.line, e.message);
    else if (e instanceof CsvError || code.startsWith('CSV_')) {
      const text = String(err?.message ?? 'unreadable').replace(/^Invalid\s+/i, '');
      this.fail(err?.lines ?? 0, `csv: ${text.slice(0, 160)}`);
    } else if (!this.stoppedEarly) throw e; // else: the abort of our own early stop
  }

  private fail(line: number, message: string): void {
    this.errors.push({ line, message });
    this.fatal = true;
  }

  private finish(): void {
    if (!this.columns) this.fail(1, 'header: no header row (expected time,co2[,unit][,event])');
    else if (this.rows === 0) this.fail(2, 'file: no data rows after the header');
    else if (!this.unit) this.fail(1, 'unit: give a "unit" column or a "# unit=mmHg|kPa|%" line');
  }

  private line(fields: string[], line: number): CsvRow | null {
    if (fields[0]?.trimStart().startsWith('#')) return this.comment(fields.join(','), line);
    if (!this.columns) {
      const cols = readHeader(fields);
      if (typeof cols === 'string') this.fail(line, cols);
      else this.columns = cols;
      return null;
    }
    return this.dataRow(fields, line);
  }

  private comment(text: string, line: number): null {
    const d = readDirective(text);
    if (!d || this.columns) return null; // directives count only before the header
    if (d.key === 'start') {
      const ms = readTime(d.value, null);
      if (typeof ms === 'string') this.errors.push({ line, message: `start: ${ms}` });
      else this.startMs = ms;
    } else if (d.key === 'unit') {
      const unit = readUnit(d.value);
      if (unit.startsWith('unit:')) this.fail(line, unit);
      else this.unit = unit as Co2Unit;
    }
    return null;
  }

  private dataRow(fields: string[], line: number): CsvRow | null {
    const c = this.columns as Columns;
    const problems: string[] = [];
    if (c.unit !== null) this.rowUnit(fields[c.unit] ?? '', problems);
    else if (!this.unit)
      return (this.fail(1, 'unit: give a "unit" column or a "# unit=mmHg|kPa|%" line'), null);
    const t = readTime(fields[c.time] ?? '', this.startMs);
    if (typeof t === 'string') problems.push(t);
    else if (t <= this.lastMs)
      problems.push(
        `time: ${t < this.lastMs ? 'goes backwards' : 'repeats'} (${fields[c.time].trim()} is not after the line before)`,
      );
    const co2 = this.unit ? readCo2(fields[c.co2] ?? '', this.unit) : 'co2: unit unknown';
    if (typeof co2 === 'string') problems.push(co2);
    if (problems.length > 0) {
      this.errors.push({ line, message: problems.join('; ') });
      return null;
    }
    this.lastMs = t as number;
    this.rows++;
    const ev = c.event !== null ? (fields[c.event] ?? '').trim() : '';
    return { line, tMs: t as number, co2: co2 as number, event: ev ? ev.slice(0, 200) : null };
  }

  private rowUnit(text: string, problems: string[]): void {
    const u = readUnit(text);
    if (u.startsWith('unit:')) problems.push(u);
    else if (this.unit && u !== this.unit)
      problems.push(`unit: ${u} differs from ${this.unit} above`);
    else this.unit = u as Co2Unit;
  }
}
