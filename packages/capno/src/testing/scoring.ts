import type { Breath } from '@upstroke/contracts';
import type { SynthBreath } from './synth-capnogram.js';

export interface BreathScore {
  truePositives: number;
  falsePositives: number;
  falseNegatives: number;
  sensitivity: number;
  ppv: number;
  /** |detected − true| EtCO2 (mmHg) of each matched breath. */
  etco2Errors: number[];
}

/**
 * Matches detected breaths to ground truth one-to-one, in time order: a detection counts
 * when it lies within `toleranceSec` of a true breath's arrival at the sensor.
 */
export function scoreBreaths(
  detected: readonly Breath[],
  truth: readonly SynthBreath[],
  toleranceSec = 0.75,
): BreathScore {
  let i = 0;
  let j = 0;
  let tp = 0;
  const errors: number[] = [];
  while (i < detected.length && j < truth.length) {
    const dt = detected[i].tSec - truth[j].tSec;
    if (Math.abs(dt) <= toleranceSec) {
      tp++;
      errors.push(Math.abs(detected[i].etco2MmHg - truth[j].etco2MmHg));
      i++;
      j++;
    } else if (dt < 0) i++;
    else j++;
  }
  const fp = detected.length - tp;
  const fn = truth.length - tp;
  return {
    truePositives: tp,
    falsePositives: fp,
    falseNegatives: fn,
    sensitivity: truth.length ? tp / truth.length : 1,
    ppv: detected.length ? tp / detected.length : 1,
    etco2Errors: errors,
  };
}
