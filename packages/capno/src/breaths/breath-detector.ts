import type { Breath } from '@upstroke/contracts';
import { detectorDefaults, type DetectorOptions } from './options.js';

const IN = 0; // inspiration / baseline
const RISING = 1; // above the upper threshold, not yet long enough to be a breath
const EX = 2; // exhalation plateau
const FALLING = 3; // below the lower threshold, not yet long enough to end the breath

/** A detected breath; `tSec` is the upstroke's crossing of the upper threshold. */
export type DetectedBreath = Required<Breath>;

/**
 * Streaming capnogram → breath state machine (one pass, O(1) per sample, fixed memory).
 * Batch analysis feeds a whole waveform through it; the live screen feeds each batch as it
 * arrives; chunk boundaries never change the result.
 *
 * Per sample: a moving average `xs`; the inspired baseline `base` is the minimum of `xs`
 * since inspiration began; thresholds are base + max(minUpstroke, f × amplitude), where
 * the amplitude adapts to recent breaths (EtCO2 − baseline) and decays when none come.
 */
export class BreathDetector {
  readonly sampleRateHz: number;
  private readonly o: DetectorOptions;
  private readonly smoothN: number;
  private readonly smoothBuf: Float64Array;
  private readonly hist: Float64Array;
  private readonly minExN: number;
  private readonly minInN: number;
  private readonly maxRiseN: number;
  private readonly holdN: number;
  private readonly decay: number;
  private segT0 = 0;
  private n = 0;
  private histPos = 0;
  private smoothPos = 0;
  private smoothSum = 0;
  private hiDelta = 0;
  private loDelta = 0;
  private state = IN;
  private base = Infinity;
  private amp = 0;
  private sinceBreathN = 0;
  private lowIdx = 0;
  private riseIdx = 0;
  private fallIdx = 0;
  private lastHighIdx = 0;
  private fallMin = Infinity;
  private breathBase = 0;
  private readonly out: DetectedBreath[] = [];

  constructor(sampleRateHz: number, t0Sec = 0, options: Partial<DetectorOptions> = {}) {
    this.sampleRateHz = sampleRateHz;
    this.o = { ...detectorDefaults, ...options };
    const fs = sampleRateHz;
    this.smoothN = Math.max(1, Math.round(this.o.smoothingSec * fs));
    this.smoothBuf = new Float64Array(this.smoothN);
    this.hist = new Float64Array(Math.ceil(4 * fs) + this.smoothN);
    this.minExN = Math.round(this.o.minExhalationSec * fs);
    this.minInN = Math.round(this.o.minInspirationSec * fs);
    this.maxRiseN = Math.round(this.o.maxUpstrokeSec * fs);
    this.holdN = Math.round(this.o.amplitudeHoldSec * fs);
    this.decay = Math.pow(0.5, 1 / (this.o.amplitudeHalfLifeSec * fs));
    this.segT0 = t0Sec;
    this.updateDeltas();
  }

  /** Threshold offsets above the baseline; they change only when the amplitude does. */
  private updateDeltas(): void {
    const o = this.o;
    this.hiDelta = Math.max(o.minUpstrokeMmHg, o.highFraction * this.amp);
    this.loDelta = Math.max(0.5 * o.minUpstrokeMmHg, o.lowFraction * this.amp);
  }

  /** Breaths completed so far (the array grows; callers must not mutate it). */
  get breaths(): readonly DetectedBreath[] {
    return this.out;
  }

  /** Time (s) of the next sample expected, for gap detection by streaming callers. */
  get nextSampleSec(): number {
    return this.segT0 + this.n / this.sampleRateHz;
  }

  /** Starts a new contiguous segment (after a gap): the breath in progress is dropped. */
  restart(t0Sec: number): void {
    this.segT0 = t0Sec;
    this.n = 0;
    this.histPos = 0;
    this.smoothPos = 0;
    this.smoothSum = 0;
    this.smoothBuf.fill(0);
    this.state = IN;
    this.base = Infinity;
    this.sinceBreathN = 0;
    this.lowIdx = 0;
  }

  /** Feeds samples already in mmHg (or in any unit times `scale`); returns new breaths. */
  push(values: ArrayLike<number>, scale = 1): DetectedBreath[] {
    const before = this.out.length;
    for (let k = 0; k < values.length; k++) this.step(values[k] * scale);
    return this.out.slice(before);
  }

  private step(x: number): void {
    // Ring positions advance by wrapping, not modulo: this loop runs for every sample.
    const i = this.n++;
    this.hist[this.histPos] = x;
    if (++this.histPos === this.hist.length) this.histPos = 0;
    const sb = this.smoothBuf;
    this.smoothSum += x - sb[this.smoothPos];
    sb[this.smoothPos] = x;
    if (++this.smoothPos === this.smoothN) this.smoothPos = 0;
    const xs = this.smoothSum / (i < this.smoothN ? i + 1 : this.smoothN);
    if (++this.sinceBreathN > this.holdN && this.amp > 0) {
      this.amp = this.amp < 1e-3 ? 0 : this.amp * this.decay; // no denormals in long gaps
      this.updateDeltas();
    }
    const hi = this.base + this.hiDelta;
    const lo = this.base + this.loDelta;
    switch (this.state) {
      case IN:
        return this.stepIn(i, xs, hi, lo);
      case RISING:
        if (xs < lo) this.state = IN;
        else if (i - this.riseIdx >= this.minExN) this.state = EX;
        if (xs >= hi) this.lastHighIdx = i;
        return;
      case EX:
        if (xs >= hi) this.lastHighIdx = i;
        else if (xs < lo) this.beginFall(i, xs);
        return;
      default:
        return this.stepFalling(i, xs, hi);
    }
  }

  private stepIn(i: number, xs: number, hi: number, lo: number): void {
    if (xs < this.base) this.base = xs;
    if (xs <= lo) {
      this.lowIdx = i;
      return;
    }
    if (xs <= hi) return;
    if (i - this.lowIdx > this.maxRiseN) {
      // Too slow for an upstroke: a drift of the baseline (e.g. rebreathing), so follow it.
      this.base = xs;
      this.lowIdx = i;
      return;
    }
    this.state = RISING;
    this.riseIdx = i;
    this.lastHighIdx = i;
    this.breathBase = this.base;
  }

  private beginFall(i: number, xs: number): void {
    this.state = FALLING;
    this.fallIdx = i;
    this.fallMin = xs;
  }

  private stepFalling(i: number, xs: number, hi: number): void {
    if (xs >= hi) {
      this.state = EX; // a short dip inside the plateau (compression artefact): same breath
      this.lastHighIdx = i;
      return;
    }
    if (xs < this.fallMin) this.fallMin = xs;
    if (i - this.fallIdx < this.minInN) return;
    this.emit();
    this.state = IN;
    this.base = this.fallMin;
    this.lowIdx = i;
  }

  private emit(): void {
    const fs = this.sampleRateHz;
    const hist = this.hist;
    const len = hist.length;
    const oldest = Math.max(this.riseIdx, this.n - len);
    const end = Math.max(oldest, this.lastHighIdx - Math.round(this.o.plateauGuardSec * fs));
    const start = Math.max(oldest, end - Math.max(1, Math.round(this.o.plateauWindowSec * fs)));
    let sum = 0;
    // Sample index k sits (n − k) places behind the write position of the ring.
    for (let k = start; k <= end; k++) sum += hist[(this.histPos - (this.n - k) + 2 * len) % len];
    const etco2 = sum / (end - start + 1);
    const amplitude = etco2 - this.breathBase;
    this.amp = this.amp === 0 ? amplitude : 0.6 * this.amp + 0.4 * amplitude;
    this.updateDeltas();
    this.sinceBreathN = 0;
    this.out.push({
      tSec: this.segT0 + this.riseIdx / fs,
      etco2MmHg: etco2,
      baselineMmHg: Math.max(0, this.breathBase),
      durationSec: (this.fallIdx - this.riseIdx) / fs,
    });
  }
}

/**
 * Detects breaths in a whole capnogram (values in mmHg, or any unit times `scale`).
 * Same state machine as the live screen, so both give identical breaths.
 */
export function detectBreaths(
  values: ArrayLike<number>,
  sampleRateHz: number,
  t0Sec = 0,
  options: Partial<DetectorOptions> = {},
  scale = 1,
): DetectedBreath[] {
  const d = new BreathDetector(sampleRateHz, t0Sec, options);
  d.push(values, scale);
  return [...d.breaths];
}
