/**
 * @upstroke/capno — the EtCO2 and CPR analysis engine (PRODUCT.md "The computation").
 * Pure, deterministic TypeScript: no I/O, runs in the browser and in Node.
 */
export {
  alignClocks,
  alignDefaults,
  type AlignOptions,
  type ClockAlignment,
} from './align/align-clocks.js';
export { analyze, analyzeCore, ventilationRate, type CoreInput } from './analyze.js';
export { BreathDetector, detectBreaths, type DetectedBreath } from './breaths/breath-detector.js';
export { detectorDefaults, type DetectorOptions } from './breaths/options.js';
export { etco2Series, etco2Trend, TREND_WINDOW_SEC, valuesBesideWaveform } from './etco2/series.js';
export { etco2Measures, MAX_HOLD_SEC, stepSegments } from './etco2/segments.js';
export {
  type CorrectableEvent,
  eventsInForce,
  supersededByMap,
  supersededIds,
} from './events/corrections.js';
export { normalizeEvents, type TimedEvent } from './events/normalize.js';
export {
  intervalsOf,
  nextState,
  type PatientState,
  type PatientStateInterval,
  patientStates,
  patientStatesOf,
  type StateEvent,
  stateAt,
  SUSTAINED_ROSC_SEC,
  sustainedRosc,
} from './events/patient-state.js';
export { buildTimeline, type Timeline } from './events/timeline.js';
export { CAUTION } from './findings/index.js';
export { LiveAnalyzer, type LiveOptions } from './live/live-analyzer.js';
export { adultEvidenceApplies, ageGroupRulesNote, thresholdsForAgeGroup } from './age-rules.js';
export { resolveThresholds } from './profile.js';
export { summarize } from './summary.js';
export * from './debrief/index.js';
export { arrayToMmHg, DEFAULT_BAROMETRIC_MMHG, MMHG_PER_KPA, mmHgFactor, toMmHg } from './units.js';
export * from './synth.js';
export * from './spc/index.js';
