/** Synthetic capnograms with ground truth (tests, benchmark, the API's monitor simulator). */
export {
  synthCapnogram,
  synthDefaults,
  type SynthBreath,
  type SynthCapnogram,
  type SynthOptions,
} from './testing/synth-capnogram.js';
export { bicarbonateFactor, type SynthModifier } from './testing/synth-levels.js';
export { mulberry32 } from './testing/prng.js';
export { synthScenario, synthScenarioNames, type SynthScenarioName } from './testing/scenarios.js';
