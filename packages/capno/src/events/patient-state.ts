import type { Interval, PatientState, PatientStateInterval } from '@upstroke/contracts';
import { type CorrectableEvent, eventsInForce } from './corrections.js';

/*
 * The patient's state during a record (PRODUCT.md "Patient state"):
 * - `pulseless` from the arrest, and again from a re-arrest;
 * - `rosc` from ROSC or "pulse present" (documented circulation);
 * - `ended` from the `end` event on (final).
 * Every CPR measure and finding counts pulseless time only (Meaney 2013: compression
 * fraction is the share of pulseless time with compressions). Intervals are in seconds
 * from the arrest, with `endSec` > `startSec`.
 */
export type { PatientState, PatientStateInterval };

/** What the state rules read of an event (a `TimedEvent` fits; `data` is read defensively). */
export interface StateEvent {
  tSec: number;
  kind: string;
  data?: unknown;
}

const NO_PULSE_RHYTHMS = new Set(['vf', 'pvt', 'pea', 'asystole']);

function field(data: unknown, key: string): unknown {
  return data !== null && typeof data === 'object' ? (data as Record<string, unknown>)[key] : null;
}

/**
 * The state an event leads to from `current`, or null when it changes nothing.
 * Beyond the explicit taps, three entries imply a re-arrest during ROSC: "pulse absent",
 * a rhythm without a pulse (VF, pVT, PEA, asystole) and compressions starting again —
 * nobody compresses a chest with a pulse, so restarted compressions mean pulseless time.
 */
export function nextState(current: PatientState, e: StateEvent): PatientState | null {
  if (current === 'ended') return null;
  switch (e.kind) {
    case 'end':
      return 'ended';
    case 'rosc':
      return 'rosc';
    case 'rearrest':
    case 'compressions-start':
      return 'pulseless';
    case 'pulse':
      return field(e.data, 'present') === true ? 'rosc' : 'pulseless';
    case 'rhythm':
      return NO_PULSE_RHYTHMS.has(String(field(e.data, 'rhythm'))) ? 'pulseless' : null;
    default:
      return null;
  }
}

/**
 * The state intervals from the arrest (time 0, or an earlier `arrest` entry) to `untilSec`,
 * from time-sorted events in force (corrections applied). Adjacent stretches of one state
 * are merged; entries after `untilSec` are ignored. The last interval is open-ended in
 * use: it runs to `untilSec` (for Live, "now"; for analysis, the end of the record, so an
 * `end` entry there gives no `ended` interval of zero length).
 */
export function patientStates(
  events: readonly StateEvent[],
  untilSec: number,
): PatientStateInterval[] {
  const arrest = events.find((e) => e.kind === 'arrest');
  const start = Math.min(0, arrest?.tSec ?? 0);
  const out: PatientStateInterval[] = [];
  let state: PatientState = 'pulseless';
  let since = start;
  for (const e of events) {
    if (e.tSec > untilSec) break;
    const next = nextState(state, e);
    if (next === null || next === state) continue;
    const t = Math.max(start, e.tSec);
    if (t > since) out.push({ state, startSec: since, endSec: t });
    state = next;
    since = Math.max(since, t);
  }
  if (untilSec > since) out.push({ state, startSec: since, endSec: untilSec });
  return out;
}

/** The state at time `t` (the state that began at or before `t`); pulseless before the first interval. */
export function stateAt(intervals: readonly PatientStateInterval[], t: number): PatientState {
  let state: PatientState = 'pulseless';
  for (const iv of intervals) {
    if (iv.startSec > t) break;
    state = iv.state;
  }
  return state;
}

/** The intervals of one state, as plain intervals (e.g. the ROSC bands of a timeline). */
export function intervalsOf(
  intervals: readonly PatientStateInterval[],
  state: PatientState,
): Interval[] {
  return intervals
    .filter((iv) => iv.state === state)
    .map((iv) => ({ startSec: iv.startSec, endSec: iv.endSec }));
}

/**
 * For screens holding stored entries (Live, the Board): the state intervals of a record
 * from its raw entries — corrections applied by the one rule (`eventsInForce`), times
 * taken from `arrestAt` — up to `untilSec` seconds after the arrest (e.g. now).
 * `stateAt(result, now)` then gives the state Live should follow.
 */
export function patientStatesOf(
  arrestAt: string,
  entries: readonly CorrectableEvent[],
  untilSec: number,
): PatientStateInterval[] {
  const zero = Date.parse(arrestAt);
  const timed = eventsInForce(entries).map((e) => ({
    tSec: (Date.parse(e.at) - zero) / 1000,
    kind: e.kind,
    data: e.data,
  }));
  return patientStates(timed, untilSec);
}

/** Utstein sustained ROSC (Nolan 2019, in-hospital): ROSC maintained for ≥ 20 min. */
export const SUSTAINED_ROSC_SEC = 20 * 60;

/**
 * Sustained ROSC from the states alone, never from a tap: true once a ROSC period lasts
 * `SUSTAINED_ROSC_SEC`; null when the record ends in a shorter ROSC that may have gone on
 * (the record cannot tell); false otherwise (no ROSC, or every ROSC ended in re-arrest).
 */
export function sustainedRosc(intervals: readonly PatientStateInterval[]): boolean | null {
  if (intervals.some((iv) => iv.state === 'rosc' && iv.endSec - iv.startSec >= SUSTAINED_ROSC_SEC))
    return true;
  const last = intervals.filter((iv) => iv.state !== 'ended').pop();
  return last?.state === 'rosc' ? null : false;
}
