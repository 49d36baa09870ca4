import type { Co2Unit } from '@upstroke/contracts';

export interface ChunkOut {
  startAt: string;
  sampleRateHz: number;
  unit: Co2Unit;
  seq: number;
  values: number[];
}

/**
 * Groups incoming samples into chunks for the offline store: a chunk closes after
 * `chunkSec`, at a discontinuity (gap, reconnect) or a change of rate or unit, so each
 * chunk's samples sit exactly at startAt + i / rate.
 */
export class ChunkAccumulator {
  private startMs = 0;
  private values: number[] = [];
  private rate = 0;
  private unit: Co2Unit = 'mmHg';
  private seq = 0;

  constructor(
    private readonly emit: (chunk: ChunkOut) => void,
    private readonly chunkSec = 5,
  ) {}

  push(t0Ms: number, values: number[], rate: number, unit: Co2Unit): void {
    const period = 1000 / rate;
    const expected = this.startMs + this.values.length * period;
    const joins =
      this.values.length > 0 &&
      rate === this.rate &&
      unit === this.unit &&
      Math.abs(t0Ms - expected) < period / 2;
    if (!joins) {
      this.flush();
      this.startMs = t0Ms;
      this.rate = rate;
      this.unit = unit;
    }
    for (const v of values) this.values.push(v);
    if (this.values.length >= this.chunkSec * rate) this.flush();
  }

  flush(): void {
    if (this.values.length === 0) return;
    this.emit({
      startAt: new Date(this.startMs).toISOString(),
      sampleRateHz: this.rate,
      unit: this.unit,
      seq: this.seq++,
      values: this.values,
    });
    this.startMs += (this.values.length * 1000) / this.rate;
    this.values = [];
  }
}

/** The last `seconds` of samples for the scrolling capnogram (fixed memory). */
export class DisplayRing {
  readonly data: Float32Array;
  /** Total samples ever written; the newest is at (written − 1) % length. */
  written = 0;

  constructor(
    readonly sampleRateHz: number,
    seconds = 10,
  ) {
    this.data = new Float32Array(Math.round(sampleRateHz * seconds));
  }

  push(values: ArrayLike<number>): void {
    for (let i = 0; i < values.length; i++)
      this.data[this.written++ % this.data.length] = values[i];
  }
}
