import type { Readable } from 'node:stream';
import { IMPORT_MAX_ERRORS, type Co2Unit } from '@upstroke/contracts';
import type { DetectedBreath } from '@upstroke/capno';
import { type LineError, MonitorCsvReader } from './monitor-csv';
import { type AssembledChunk, WaveformAssembler } from './waveform-assembler';

export interface ParsedMonitorFile {
  errors: LineError[];
  rows: number;
  unit: Co2Unit | null;
  sampleRateHz: number;
  firstMs: number;
  lastMs: number;
  shockMarkersMs: number[];
  breaths: readonly DetectedBreath[];
}

/** Chunks are handed over in groups of this many (one INSERT each). */
const FLUSH_CHUNKS = 8;

/**
 * Reads a monitor CSV stream once: validates every line, assembles waveform chunks and
 * detects breaths as it goes. `onChunks` receives chunks while the file is still valid;
 * after the first error nothing more is handed over (the caller discards what it had).
 */
export async function parseMonitorFile(
  input: Readable,
  onChunks: (chunks: AssembledChunk[]) => Promise<void>,
): Promise<ParsedMonitorFile> {
  const reader = new MonitorCsvReader();
  let pending: AssembledChunk[] = [];
  let assembler: WaveformAssembler | null = null;
  const flush = async () => {
    const out = pending;
    pending = [];
    if (reader.errors.length === 0 && out.length > 0) await onChunks(out);
  };
  await reader.read(input, (row) => {
    assembler ??= new WaveformAssembler(reader.unit as Co2Unit, (c) => pending.push(c));
    const problem = assembler.push(row);
    if (problem) reader.errors.push(problem);
    return pending.length >= FLUSH_CHUNKS ? flush() : undefined;
  });
  const a = assembler as WaveformAssembler | null;
  if (a && reader.errors.length === 0) {
    const problem = a.end();
    if (problem) reader.errors.push(problem);
    await flush();
  }
  return {
    errors: reader.errors.slice(0, IMPORT_MAX_ERRORS),
    rows: reader.rows,
    unit: reader.unit,
    sampleRateHz: a?.sampleRateHz ?? 0,
    firstMs: a?.firstMs ?? NaN,
    lastMs: a?.lastMs ?? NaN,
    shockMarkersMs: a?.shockMarkersMs ?? [],
    breaths: a?.breaths ?? [],
  };
}
