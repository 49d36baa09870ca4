import type { Finding } from '@upstroke/contracts';
import {
  airwayUnconfirmedFindings,
  rebreathingFindings,
  waveformAbsentFindings,
} from './airway-findings.js';
import type { FindingContext } from './context.js';
import { oneFindingPerEpisode } from './episodes.js';
import { lowFindings, prognosisFindings, riseFindings } from './etco2-findings.js';
import { ventilationFindings } from './ventilation-findings.js';
import { epinephrineFindings, pauseFindings, rhythmCheckFindings } from './process-findings.js';

export { CAUTION, type FindingContext } from './context.js';

/** Every finding rule, one finding per episode, in a stable order: by start time, then kind. */
export function allFindings(c: FindingContext): Finding[] {
  const out = [
    ...lowFindings(c),
    ...riseFindings(c),
    ...prognosisFindings(c),
    ...pauseFindings(c),
    ...rhythmCheckFindings(c),
    ...epinephrineFindings(c),
    ...ventilationFindings(c),
    ...waveformAbsentFindings(c),
    ...airwayUnconfirmedFindings(c),
    ...rebreathingFindings(c),
  ];
  return oneFindingPerEpisode(out);
}
