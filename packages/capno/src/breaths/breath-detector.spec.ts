import { describe, expect, it } from 'vitest';
import { synthCapnogram, type SynthOptions } from '../testing/synth-capnogram.js';
import { scoreBreaths } from '../testing/scoring.js';
import { BreathDetector, detectBreaths } from './breath-detector.js';

function run(o: Partial<SynthOptions>) {
  const s = synthCapnogram(o);
  const breaths = detectBreaths(s.values, s.sampleRateHz);
  return { s, breaths, score: scoreBreaths(breaths, s.truth.breaths) };
}

const clean = (seed: number, extra: Partial<SynthOptions> = {}) =>
  run({
    seed,
    durationSec: 600,
    levels: [
      [0, 12],
      [300, 35],
      [600, 20],
    ],
    ...extra,
  });

describe('breath detection on synthetic capnograms with known truth', () => {
  // Accuracy anchors: Aramendi 2017 sensitivity > 99 %, PPV > 97 %; Leturiondo 2017 clean
  // 99.8 / 99.1 % (REFERENCE.md "Published capnogram algorithms", checked).
  it.each([10, 25, 50, 100, 200])('clean signal at %i Hz: sensitivity and PPV ≥ 99 %', (fs) => {
    const { score, s } = clean(fs, { sampleRateHz: fs, ventilationRatePerMin: 12 });
    expect(s.truth.breaths.length).toBeGreaterThan(100);
    expect(score.sensitivity).toBeGreaterThanOrEqual(0.99);
    expect(score.ppv).toBeGreaterThanOrEqual(0.99);
  });

  it('clean signal: EtCO2 within 1 mmHg of the true end-of-plateau value', () => {
    for (const seed of [1, 2, 3]) {
      const { score } = clean(seed, { sidestreamDelaySec: 1.5 });
      expect(Math.max(...score.etco2Errors)).toBeLessThanOrEqual(1);
    }
  });

  it.each([
    [10, 1.5, 2],
    [10, 2, 3],
    [30, 1.7, 2.5],
    [6, 1.8, 2],
  ])(
    'compressions (%i/min ventilation, %f Hz, ±%f mmHg) with noise and delay: sensitivity and PPV ≥ 97 %',
    (rate, hz, amp) => {
      // Gutiérrez 2018: with artefact suppression ~97.7 / 96.5 % on distorted capnograms (checked).
      const { score } = run({
        seed: Math.round(rate * hz * amp),
        durationSec: 900,
        ventilationRatePerMin: rate,
        inspirationSec: rate > 20 ? 0.7 : 1,
        levels: [
          [0, 8],
          [400, 15],
          [900, 30],
        ],
        compressions: [[0, 900]],
        compressionRateHz: hz,
        artefactMmHg: amp,
        noiseMmHg: 0.4,
        sidestreamDelaySec: 3,
      });
      expect(score.sensitivity).toBeGreaterThanOrEqual(0.97);
      expect(score.ppv).toBeGreaterThanOrEqual(0.97);
    },
  );

  it('reports the inspired baseline, raised when the circuit rebreathes', () => {
    const { breaths } = run({ seed: 4, baselineMmHg: 5, levels: [[0, 30]] });
    expect(breaths.length).toBeGreaterThan(10);
    for (const b of breaths.slice(1)) expect(Math.abs(b.baselineMmHg - 5)).toBeLessThan(0.5);
  });

  it('finds no breath once the tube is dislodged (flat zero)', () => {
    const { breaths, s } = run({
      seed: 5,
      durationSec: 300,
      modifiers: [{ kind: 'dislodged', atSec: 120 }],
      compressions: [[0, 300]],
      artefactMmHg: 2,
      noiseMmHg: 0.3,
    });
    expect(s.truth.breaths.every((b) => b.tSec < 121)).toBe(true);
    expect(breaths.filter((b) => b.tSec > 121)).toEqual([]);
    expect(breaths.length).toBeGreaterThan(15);
  });

  it('follows a sudden fall in EtCO2 (adaptive threshold decays)', () => {
    const { score } = run({
      seed: 6,
      durationSec: 300,
      levels: [
        [0, 45],
        [150, 45],
        [152, 7],
      ],
    });
    expect(score.sensitivity).toBeGreaterThanOrEqual(0.95);
  });

  it('gives the same breaths whatever the chunking of the stream', () => {
    const s = synthCapnogram({
      seed: 7,
      durationSec: 300,
      compressions: [[0, 300]],
      artefactMmHg: 2,
      noiseMmHg: 0.3,
    });
    const whole = detectBreaths(s.values, 50);
    const d = new BreathDetector(50);
    let k = 0;
    for (const size of [1, 7, 50, 333, 13]) {
      for (let r = 0; r < 40 && k < s.values.length; r++, k += size)
        d.push(s.values.subarray(k, k + size));
    }
    d.push(s.values.subarray(k));
    expect(d.breaths).toEqual(whole);
  });
});
