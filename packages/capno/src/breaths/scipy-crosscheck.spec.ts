import { describe, expect, it } from 'vitest';
import { findScipyPython, scipyBreaths } from '../testing/node/scipy.js';
import { synthCapnogram } from '../testing/synth-capnogram.js';
import { detectBreaths } from './breath-detector.js';

/**
 * Cross-check against an independent implementation (scripts/scipy_breaths.py, built on
 * scipy.signal.find_peaks). Without a python that has SciPy this suite fails on purpose.
 */
describe('agreement with scipy.signal.find_peaks on clean signals', () => {
  const python = findScipyPython();

  it('has a python with SciPy available', () => {
    expect(python, 'neither python3 nor /usr/bin/python3 can import scipy').not.toBeNull();
  });

  it.each([
    [1, 25, 10],
    [2, 50, 12],
    [3, 100, 20],
    [4, 200, 8],
  ])(
    'seed %i at %i Hz, %i/min: same breath count; EtCO2 within 0.5 mmHg, time within 0.15 s',
    (seed, fs, rate) => {
      const s = synthCapnogram({
        seed,
        sampleRateHz: fs,
        durationSec: 300,
        ventilationRatePerMin: rate,
        levels: [
          [0, 10],
          [150, 40],
          [300, 25],
        ],
        noiseMmHg: 0.1,
        sidestreamDelaySec: 2,
      });
      const ours = detectBreaths(s.values, fs);
      const theirs = scipyBreaths(python as string, s.values, fs).breaths;
      expect(ours.length).toBeGreaterThan(30);
      expect(theirs.length).toBe(ours.length);
      ours.forEach((b, i) => {
        // Tolerances: both estimate the same end-of-plateau window, but the window edges can
        // differ by a sample or two (different threshold crossings): 0.5 mmHg, 0.15 s.
        expect(Math.abs(b.etco2MmHg - theirs[i].etco2MmHg)).toBeLessThanOrEqual(0.5);
        expect(Math.abs(b.tSec - theirs[i].tSec)).toBeLessThanOrEqual(0.15);
      });
    },
  );
});
