export {
  analyseStored,
  composeDebrief,
  debriefEtco2Entries,
  debriefEvents,
  debriefEventsInForce,
  type DebriefHeader,
  type StoredAnalysis,
} from './compose.js';
export { profileInForce } from './profile-in-force.js';
export {
  joinWaveform,
  type StoredEtco2,
  type StoredEvent,
  type StoredProfile,
  type StoredRecord,
  type StoredWaveformChunk,
  waveformSource,
} from './stored-record.js';
export { buildSummaryRow } from './summary-row.js';
export {
  buildTimelineModel,
  markerCode,
  MAX_SPAN_SEC,
  MIN_SPAN_SEC,
  spanEndSec,
  ticksFor,
} from './timeline-model.js';
export { waveformTrace } from './waveform-trace.js';
