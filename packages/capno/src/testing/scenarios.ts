import type { SynthOptions } from './synth-capnogram.js';

/** The monitor simulator's scenarios (CONTRACT.md "Monitor link"). */
export const synthScenarioNames = ['poor-cpr', 'improving-cpr', 'rosc', 'dislodged-tube'] as const;
export type SynthScenarioName = (typeof synthScenarioNames)[number];

/**
 * Options for a named 10-minute scenario with continuous compressions, an advanced airway
 * and 10 breaths/min, noise and a 2 s sidestream delay. Invented data, not a patient.
 */
export function synthScenario(name: SynthScenarioName, seed = 1): Partial<SynthOptions> {
  const common: Partial<SynthOptions> = {
    seed,
    durationSec: 600,
    sampleRateHz: 50,
    compressions: [[0, 600]],
    artefactMmHg: 2,
    noiseMmHg: 0.3,
    sidestreamDelaySec: 2,
  };
  switch (name) {
    case 'poor-cpr':
      return {
        ...common,
        levels: [
          [0, 8],
          [300, 7],
          [600, 8],
        ],
      };
    case 'improving-cpr':
      return {
        ...common,
        levels: [
          [0, 8],
          [240, 12],
          [420, 22],
          [600, 24],
        ],
      };
    case 'rosc':
      return {
        ...common,
        levels: [[0, 18]],
        modifiers: [{ kind: 'rosc', atSec: 360, riseMmHg: 20 }],
      };
    case 'dislodged-tube':
      return { ...common, levels: [[0, 20]], modifiers: [{ kind: 'dislodged', atSec: 300 }] };
  }
}
