import { BreathDetector, type DetectedBreath, mmHgFactor } from '@upstroke/capno';
import type { Co2Unit } from '@upstroke/contracts';
import { isShockMarker } from './csv-fields';
import type { CsvRow, LineError } from './monitor-csv';

/** A contiguous run of samples at one rate, on the file's clock. */
export interface AssembledChunk {
  startMs: number;
  sampleRateHz: number;
  values: Float32Array;
}

/** 30 s at 100 Hz: chunks small enough to stream, large enough to keep rows few. */
export const CHUNK_SAMPLES = 3000;
const RATE_PROBE_ROWS = 64;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[s.length >> 1];
}

/**
 * Turns validated rows into waveform chunks and per-breath EtCO2. The rate comes from the
 * median spacing of the first rows; a row more than half a sample away from where the rate
 * puts it (a gap, a clock step) starts a new chunk and restarts the breath detector, so no
 * sample is ever placed at a time the file did not give.
 */
export class WaveformAssembler {
  readonly shockMarkersMs: number[] = [];
  firstMs = NaN;
  lastMs = NaN;
  sampleRateHz = 0;
  private readonly scale: number;
  private detector: BreathDetector | null = null;
  private probe: CsvRow[] = [];
  private chunk: Float32Array = new Float32Array(CHUNK_SAMPLES);
  private n = 0;
  private failed = false;
  private readonly one = new Float64Array(1);
  private chunkStartMs = 0;

  constructor(
    unit: Co2Unit,
    private readonly emit: (chunk: AssembledChunk) => void,
  ) {
    this.scale = mmHgFactor(unit);
  }

  get breaths(): readonly DetectedBreath[] {
    return this.detector?.breaths ?? [];
  }

  /** Returns a problem to report when the rate cannot be a capnogram. */
  push(row: CsvRow): LineError | null {
    if (Number.isNaN(this.firstMs)) this.firstMs = row.tMs;
    this.lastMs = row.tMs;
    if (isShockMarker(row.event)) this.shockMarkersMs.push(row.tMs);
    if (this.failed) return null;
    if (this.detector) return (this.place(row), null);
    this.probe.push(row);
    return this.probe.length >= RATE_PROBE_ROWS ? this.startFromProbe() : null;
  }

  /** Flushes what is left; returns a problem when there were too few rows to know the rate. */
  end(): LineError | null {
    if (this.failed) return null;
    if (!this.detector) {
      if (this.probe.length < 2)
        return {
          line: this.probe[0]?.line ?? 2,
          message: 'file: at least 2 data rows are needed to know the sampling rate',
        };
      const problem = this.startFromProbe();
      if (problem) return problem;
    }
    this.close();
    return null;
  }

  private startFromProbe(): LineError | null {
    const gaps = this.probe.slice(1).map((r, i) => r.tMs - this.probe[i].tMs);
    const fs = Math.round((1000 / median(gaps)) * 100) / 100;
    if (!(fs >= 10 && fs <= 200)) {
      const line = this.probe[1].line;
      this.failed = true;
      this.probe = [];
      return {
        line,
        message: `time: rows are ${median(gaps)} ms apart (${fs} Hz); a capnogram needs 10–200 samples per second`,
      };
    }
    this.sampleRateHz = fs;
    this.detector = new BreathDetector(fs, 0);
    const rows = this.probe;
    this.probe = [];
    for (const r of rows) this.place(r);
    return null;
  }

  private place(row: CsvRow): void {
    const d = this.detector as BreathDetector;
    const periodMs = 1000 / this.sampleRateHz;
    const expected = this.chunkStartMs + this.n * periodMs;
    const contiguous = this.n > 0 && Math.abs(row.tMs - expected) <= periodMs / 2;
    if (!contiguous || this.n === CHUNK_SAMPLES) {
      if (this.n > 0) this.close();
      if (!contiguous) d.restart((row.tMs - this.firstMs) / 1000);
      this.chunkStartMs = row.tMs;
    }
    this.chunk[this.n++] = row.co2;
    this.one[0] = row.co2;
    d.push(this.one, this.scale);
  }

  private close(): void {
    if (this.n === 0) return;
    this.emit({
      startMs: this.chunkStartMs,
      sampleRateHz: this.sampleRateHz,
      values: this.chunk.slice(0, this.n),
    });
    this.n = 0;
  }
}
