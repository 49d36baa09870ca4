import type { Interval } from '@upstroke/contracts';
import { isKind, type TimedEvent } from './normalize.js';
import { intervalsOf, patientStates, type PatientStateInterval } from './patient-state.js';

/** The states of a resuscitation over time, derived from its events (seconds from arrest). */
export interface Timeline {
  /** End of the record: the `end` event, else the last time anything was recorded. */
  endSec: number;
  /** Compressions from each `compressions-start` to the next stop; a `rosc` or `end` also stops them. */
  compressions: Interval[];
  /** The patient's state over the record (`patientStates`): pulseless, ROSC, ended. */
  states: PatientStateInterval[];
  /** Documented circulation (state `rosc`): ROSC or pulse present, to a re-arrest or the end. */
  rosc: Interval[];
  /** Pulseless time (state `pulseless`): from the arrest and from each re-arrest. */
  pulseless: Interval[];
  /** Tracheal tube in place: from its `airway` event to a later airway event with another device. */
  trachealTube: Interval[];
  /** Tracheal tube or supraglottic airway in place. */
  advancedAirway: Interval[];
}

class Toggle {
  readonly out: Interval[] = [];
  private start: number | null = null;
  get on() {
    return this.start !== null;
  }
  open(t: number) {
    if (this.start === null) this.start = t;
  }
  close(t: number) {
    if (this.start === null) return;
    if (t > this.start) this.out.push({ startSec: this.start, endSec: t });
    this.start = null;
  }
}

/** Compressions run from a start to a stop; a `rosc` or `end` entry also stops them. */
function stepCompressions(e: TimedEvent, comp: Toggle): void {
  if (isKind(e, 'compressions-start')) comp.open(e.tSec);
  else if (e.kind === 'compressions-stop' || e.kind === 'rosc' || e.kind === 'end')
    comp.close(e.tSec);
}

function stepAirway(e: TimedEvent, tube: Toggle, advanced: Toggle): void {
  if (!isKind(e, 'airway')) return;
  if (e.data.device === 'tracheal-tube') tube.open(e.tSec);
  else tube.close(e.tSec);
  if (e.data.device === 'bag-mask') advanced.close(e.tSec);
  else advanced.open(e.tSec);
}

/** Builds the timeline in one pass over time-sorted events. */
export function buildTimeline(events: readonly TimedEvent[], endSec: number): Timeline {
  const [comp, tube, advanced] = [0, 0, 0].map(() => new Toggle());
  for (const e of events) {
    if (e.tSec > endSec) break;
    stepCompressions(e, comp);
    stepAirway(e, tube, advanced);
  }
  for (const tg of [comp, tube, advanced]) tg.close(endSec);
  const states = patientStates(events, endSec);
  return {
    endSec,
    compressions: comp.out,
    states,
    rosc: intervalsOf(states, 'rosc'),
    pulseless: intervalsOf(states, 'pulseless'),
    trachealTube: tube.out,
    advancedAirway: advanced.out,
  };
}
