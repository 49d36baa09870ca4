import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { IMPORT_MAX_ERRORS, type Co2Unit } from '@upstroke/contracts';
import { CsvError, parse } from 'csv-parse';
import { type Columns, readCo2, readDirective, readHeader, readTime, readUnit } from './csv-fields';
import { EncodingError, utf8Text } from './utf8-text';

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
  private lineShift = () => 0;

  /**
   * Options chosen for speed: csv-parse's `info`, `comment` and `skip_empty_lines` cost up
   * to 10× on a 720,000-row file, so line numbers are counted here (one record per line,
   * plus newlines inside quoted fields) and blank and `#` lines are skipped here.
   */
  async read(input: Readable, onRow: (row: CsvRow) => void | Promise<void>): Promise<void> {
    const parser = parse({ relax_column_count: true });
    const text = utf8Text((line, comment) => this.comment(comment, line));
    this.lineShift = () => text.preambleLines();
    let failure: unknown = null;
    const feeding = pipeline(input, text.stream, parser).catch((e: unknown) => {
      failure ??= e;
    });
    await new Promise<void>((resolve) => {
      let line = 0;
      parser.on('data', (fields: string[]) => {
        if (this.stoppedEarly || failure) return;
        line++;
        const row = this.line(fields, line + text.preambleLines());
        for (const f of fields) if (f.includes('\n')) line += f.split('\n').length - 1;
        const pending = row ? onRow(row) : undefined;
        if (pending) {
          parser.pause();
          pending.then(
            () => parser.resume(),
            (e: unknown) => {
              failure = e;
              parser.destroy();
              resolve();
            },
          );
        }
        if (this.fatal || this.errors.length >= IMPORT_MAX_ERRORS) {
          this.stoppedEarly = true;
          input.destroy();
          resolve();
        }
      });
      parser.on('end', () => resolve());
      parser.on('close', () => resolve());
    });
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
      this.fail((err?.lines ?? 0) + this.lineShift(), `csv: ${text.slice(0, 160)}`);
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
    if (fields.length === 1 && fields[0].trim() === '') return null;
    if (fields[0]?.trimStart().startsWith('#')) return null; // a comment after the header
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
    if (!d) return null;
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
