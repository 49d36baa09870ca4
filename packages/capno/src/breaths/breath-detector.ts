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
  /** The last `hist.length` samples before the current chunk, at `global index % length`. */
  private readonly hist: Float64Array;
  private chunk: ArrayLike<number> = [];
  private chunkStart = 0;
  private scale = 1;
  private readonly minUp: number;
  private readonly hiF: number;
  private readonly loF: number;
  private readonly minExN: number;
  private readonly minInN: number;
  private readonly maxRiseN: number;
  private readonly holdN: number;
  private readonly decay: number;
  private segT0 = 0;
  private n = 0;
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
    this.smoothN = Math.max(3, Math.round(this.o.smoothingSec * fs));
    this.hist = new Float64Array(Math.ceil(4 * fs) + this.smoothN);
    this.minExN = Math.round(this.o.minExhalationSec * fs);
    this.minInN = Math.round(this.o.minInspirationSec * fs);
    this.maxRiseN = Math.round(this.o.maxUpstrokeSec * fs);
    this.holdN = Math.round(this.o.amplitudeHoldSec * fs);
    this.decay = Math.pow(0.5, 1 / (this.o.amplitudeHalfLifeSec * fs));
    this.segT0 = t0Sec;
    this.minUp = this.o.minUpstrokeMmHg;
    this.hiF = this.o.highFraction;
    this.loF = this.o.lowFraction;
    // Threshold offsets above the baseline (amplitude 0); they change only when it does.
    this.hiDelta = this.minUp;
    this.loDelta = 0.5 * this.minUp;
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
    this.smoothSum = 0;
    this.state = IN;
    this.base = Infinity;
    this.sinceBreathN = 0;
    this.lowIdx = 0;
  }

  /** Feeds samples already in mmHg (or in any unit times `scale`); returns new breaths. */
  push(values: ArrayLike<number>, scale = 1): DetectedBreath[] {
    const before = this.out.length;
    const chunkStart = this.n;
    Object.assign(this, { chunk: values, chunkStart, scale });
    // The state lives in locals while the loop runs (it runs for every sample: fields cost
    // a load and a store each) and is stored back at the end, so chunks still join seamlessly.
    // Past samples are read from the chunk itself; only its tail is kept for the next one.
    const { smoothN, holdN, decay, minExN, minInN, maxRiseN, minUp, hiF, loF } = this;
    const invN = 1 / smoothN;
    let { n, smoothSum, sinceBreathN, state, base, amp } = this;
    let { hiDelta, loDelta, lowIdx, riseIdx, fallIdx, lastHighIdx, fallMin, breathBase } = this;
    for (let k = 0; k < values.length; k++) {
      const x = values[k] * scale;
      const i = n++;
      smoothSum += x - (k >= smoothN ? values[k - smoothN] * scale : this.earlier(i - smoothN));
      const xs = i < smoothN ? smoothSum / (i + 1) : smoothSum * invN;
      if (++sinceBreathN > holdN && amp > 0) {
        amp = amp < 1e-3 ? 0 : amp * decay; // no denormals in long gaps
        hiDelta = Math.max(minUp, hiF * amp);
        loDelta = Math.max(0.5 * minUp, loF * amp);
      }
      const hi = base + hiDelta;
      const lo = base + loDelta;
      if (state === IN) {
        if (xs < base) base = xs;
        if (xs <= lo) lowIdx = i;
        else if (xs <= hi) continue;
        else if (i - lowIdx > maxRiseN) {
          // Too slow for an upstroke: a drift of the baseline (e.g. rebreathing), so follow it.
          base = xs;
          lowIdx = i;
        } else {
          state = RISING;
          riseIdx = lastHighIdx = i;
          breathBase = base;
        }
      } else if (state === RISING) {
        if (xs < lo) state = IN;
        else if (i - riseIdx >= minExN) state = EX;
        if (xs >= hi) lastHighIdx = i;
      } else if (xs >= hi) {
        // On the plateau, or a short dip inside it (compression artefact): the same breath.
        state = EX;
        lastHighIdx = i;
      } else if (state === EX) {
        if (xs < lo) {
          state = FALLING;
          fallIdx = i;
          fallMin = xs;
        }
      } else {
        if (xs < fallMin) fallMin = xs;
        if (i - fallIdx < minInN) continue;
        const etco2 = this.emit(n, riseIdx, lastHighIdx, fallIdx, breathBase);
        amp = amp === 0 ? etco2 - breathBase : 0.6 * amp + 0.4 * (etco2 - breathBase);
        hiDelta = Math.max(minUp, hiF * amp);
        loDelta = Math.max(0.5 * minUp, loF * amp);
        sinceBreathN = 0;
        state = IN;
        base = fallMin;
        lowIdx = i;
      }
    }
    Object.assign(this, { n, smoothSum, sinceBreathN, state, base, amp, hiDelta, loDelta });
    Object.assign(this, { lowIdx, riseIdx, fallIdx, lastHighIdx, fallMin, breathBase });
    this.keepTail();
    return this.out.slice(before);
  }

  /** Sample `i` of the segment (0 before its start, as the moving average begins empty). */
  private earlier(i: number): number {
    if (i < 0) return 0;
    if (i >= this.chunkStart) return this.chunk[i - this.chunkStart] * this.scale;
    return this.hist[i % this.hist.length];
  }

  /** Keeps the chunk's last samples, which the next chunk may still need. */
  private keepTail(): void {
    const { hist, chunk, chunkStart, scale, n } = this;
    for (let i = Math.max(chunkStart, n - hist.length); i < n; i++)
      hist[i % hist.length] = chunk[i - chunkStart] * scale;
    this.chunk = [];
  }

  /** Records the breath that just ended; returns its EtCO2 (the mean of its plateau). */
  private emit(
    n: number,
    riseIdx: number,
    lastHighIdx: number,
    fallIdx: number,
    breathBase: number,
  ): number {
    const fs = this.sampleRateHz;
    const oldest = Math.max(riseIdx, n - this.hist.length);
    const end = Math.max(oldest, lastHighIdx - Math.round(this.o.plateauGuardSec * fs));
    const start = Math.max(oldest, end - Math.max(1, Math.round(this.o.plateauWindowSec * fs)));
    const { hist, chunk, chunkStart, scale } = this;
    let sum = 0;
    for (let k = start; k <= end; k++)
      sum += k >= chunkStart ? chunk[k - chunkStart] * scale : hist[k % hist.length];
    const etco2 = sum / (end - start + 1);
    this.out.push({
      tSec: this.segT0 + riseIdx / fs,
      etco2MmHg: etco2,
      baselineMmHg: Math.max(0, breathBase),
      durationSec: (fallIdx - riseIdx) / fs,
    });
    return etco2;
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
