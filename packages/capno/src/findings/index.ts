import type { Finding } from '@upstroke/contracts';
import {
  airwayUnconfirmedFindings,
  rebreathingFindings,
  ventilationFindings,
  waveformAbsentFindings,
} from './airway-findings.js';
import type { FindingContext } from './context.js';
import { lowFindings, prognosisFindings, riseFindings } from './etco2-findings.js';
import { epinephrineFindings, pauseFindings, rhythmCheckFindings } from './process-findings.js';

export { CAUTION, type FindingContext } from './context.js';

/** Every finding rule, in a stable order: by start time, then kind. */
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
  return out.sort((a, b) => a.startSec - b.startSec || a.kind.localeCompare(b.kind));
}
