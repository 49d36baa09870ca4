import { gaussian, mulberry32 } from './prng.js';
import { etco2LevelAt, type SynthModifier } from './synth-levels.js';

/**
 * Seeded synthetic capnogram with known ground truth, for tests, the benchmark and the
 * API's monitor simulator. Physiology is simplified on purpose; the shapes follow
 * REFERENCE.md (sensor τ ≈ 100 ms, sidestream delay 0.6–5 s, compression oscillations).
 */
export interface SynthOptions {
  seed: number;
  durationSec: number;
  sampleRateHz: number;
  /** EtCO2 level schedule [tSec, mmHg], linear between points, held after the last one. */
  levels: [number, number][];
  ventilationRatePerMin: number;
  /** Random jitter of each ventilation cycle, as a fraction of its length. */
  rateJitter: number;
  inspirationSec: number;
  /** Inspired CO2 (phase I); above ~2 mmHg suggests rebreathing. */
  baselineMmHg: number;
  /** Intervals [startSec, endSec] with chest compressions. */
  compressions: [number, number][];
  compressionRateHz: number;
  /** Peak amplitude of the compression oscillation on the plateau (mmHg). */
  artefactMmHg: number;
  noiseMmHg: number;
  sidestreamDelaySec: number;
  sensorTauSec: number;
  modifiers: SynthModifier[];
}

export interface SynthBreath {
  /** When the exhalation reaches the sensor (after the sidestream delay). */
  tSec: number;
  etco2MmHg: number;
  baselineMmHg: number;
}

export interface SynthCapnogram {
  sampleRateHz: number;
  unit: 'mmHg';
  values: Float64Array;
  truth: { breaths: SynthBreath[]; delaySec: number };
}

export const synthDefaults: SynthOptions = {
  seed: 1,
  durationSec: 120,
  sampleRateHz: 50,
  levels: [[0, 25]],
  ventilationRatePerMin: 10,
  rateJitter: 0.05,
  inspirationSec: 1,
  baselineMmHg: 0,
  compressions: [],
  compressionRateHz: 1.8,
  artefactMmHg: 0,
  noiseMmHg: 0,
  sidestreamDelaySec: 0,
  sensorTauSec: 0.1,
  modifiers: [],
};

interface Cycle {
  start: number;
  expStart: number;
  end: number;
  level: number;
}

/** Ventilation cycles in gas time (before the sidestream delay). */
function cycles(o: SynthOptions, rnd: () => number): Cycle[] {
  const out: Cycle[] = [];
  const period = 60 / o.ventilationRatePerMin;
  let t = 0.3 * period * rnd();
  while (t < o.durationSec + period) {
    const len = period * (1 + o.rateJitter * (2 * rnd() - 1));
    const expStart = t + Math.min(o.inspirationSec, 0.45 * len);
    const end = t + len;
    out.push({ start: t, expStart, end, level: etco2LevelAt(o.levels, o.modifiers, end) });
    t = end;
  }
  return out;
}

/** Ideal gas CO2 at gas time `t` inside cycle `c` (square wave with a sloped phase III). */
function gasCo2(c: Cycle, t: number, baseline: number): number {
  if (t < c.expStart) return baseline;
  const frac = (t - c.expStart) / (c.end - c.expStart);
  return baseline + (c.level - baseline) * (0.92 + 0.08 * frac);
}

function inCompressions(o: SynthOptions, t: number): boolean {
  for (const [a, b] of o.compressions) if (t >= a && t < b) return true;
  return false;
}

/** Generates a capnogram; same options (seed included) → same samples. */
export function synthCapnogram(options: Partial<SynthOptions> = {}): SynthCapnogram {
  const o: SynthOptions = { ...synthDefaults, ...options };
  const rnd = mulberry32(o.seed);
  const normal = gaussian(rnd);
  const cs = cycles(o, rnd);
  const fs = o.sampleRateHz;
  const n = Math.round(o.durationSec * fs);
  const values = new Float64Array(n);
  const alpha = 1 - Math.exp(-1 / (fs * o.sensorTauSec));
  const phase = rnd() * 2 * Math.PI;
  const dislodgedAt = o.modifiers.find((m) => m.kind === 'dislodged')?.atSec ?? Infinity;
  let y = o.baselineMmHg;
  let ci = 0;
  for (let i = 0; i < n; i++) {
    const t = i / fs;
    const g = t - o.sidestreamDelaySec;
    while (ci < cs.length - 1 && g >= cs[ci].end) ci++;
    const target = g < 0 ? o.baselineMmHg : gasCo2(cs[ci], g, o.baselineMmHg);
    y += (target - y) * alpha;
    let v = g >= dislodgedAt ? 0 : y;
    if (v > 0 && inCompressions(o, t)) {
      const scale = Math.min(1, 0.3 + v / 20);
      v += o.artefactMmHg * scale * Math.sin(2 * Math.PI * o.compressionRateHz * t + phase);
    }
    values[i] = Math.max(0, v + o.noiseMmHg * normal());
  }
  return { sampleRateHz: fs, unit: 'mmHg', values, truth: truthOf(o, cs, dislodgedAt) };
}

function truthOf(o: SynthOptions, cs: Cycle[], dislodgedAt: number) {
  const breaths: SynthBreath[] = [];
  for (const c of cs) {
    const t = c.expStart + o.sidestreamDelaySec;
    if (c.end > dislodgedAt || c.end + o.sidestreamDelaySec > o.durationSec - 0.5) continue;
    if (c.level - o.baselineMmHg < 1) continue; // nothing to see at the sensor
    breaths.push({ tSec: t, etco2MmHg: c.level, baselineMmHg: o.baselineMmHg });
  }
  return { breaths, delaySec: o.sidestreamDelaySec };
}
