import type { Interval } from '@upstroke/contracts';
import { subtract } from './intervals.js';
import { isKind, type TimedEvent } from './normalize.js';

/** The states of a resuscitation over time, derived from its events (seconds from arrest). */
export interface Timeline {
  /** End of the record: the `end` event, else the last time anything was recorded. */
  endSec: number;
  /** Compressions from each `compressions-start` to the next stop; a `rosc` or `end` also stops them. */
  compressions: Interval[];
  /** Documented circulation: `rosc` to `rearrest` (or compressions restarting, or end). */
  rosc: Interval[];
  /** Pulse present (organised rhythm with a pulse): to pulse absent, re-arrest, compressions or a non-organised rhythm. */
  pulse: Interval[];
  /** Time without circulation: arrest to first ROSC (or end), minus pulse intervals. */
  noCirculation: Interval[];
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

function stepCirculation(e: TimedEvent, comp: Toggle, rosc: Toggle, pulse: Toggle): void {
  const t = e.tSec;
  if (isKind(e, 'compressions-start')) {
    rosc.close(t);
    pulse.close(t);
    comp.open(t);
  } else if (isKind(e, 'compressions-stop')) comp.close(t);
  else if (isKind(e, 'rosc')) {
    comp.close(t);
    rosc.open(t);
  } else if (isKind(e, 'rearrest')) {
    rosc.close(t);
    pulse.close(t);
  } else if (isKind(e, 'pulse')) {
    if (e.data.present) pulse.open(t);
    else pulse.close(t);
  } else if (isKind(e, 'rhythm') && e.data.rhythm !== 'organised') pulse.close(t);
  else if (isKind(e, 'end')) comp.close(t);
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
  const [comp, rosc, pulse, tube, advanced] = [0, 0, 0, 0, 0].map(() => new Toggle());
  for (const e of events) {
    if (e.tSec > endSec) break;
    stepCirculation(e, comp, rosc, pulse);
    stepAirway(e, tube, advanced);
  }
  for (const tg of [comp, rosc, pulse, tube, advanced]) tg.close(endSec);
  const firstRosc = rosc.out.length ? rosc.out[0].startSec : endSec;
  const window = firstRosc > 0 ? [{ startSec: 0, endSec: firstRosc }] : [];
  return {
    endSec,
    compressions: comp.out,
    rosc: rosc.out,
    pulse: pulse.out,
    noCirculation: subtract(window, pulse.out),
    trachealTube: tube.out,
    advancedAirway: advanced.out,
  };
}
