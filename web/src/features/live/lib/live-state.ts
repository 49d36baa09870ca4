import {
  eventsInForce,
  type PatientState,
  type PatientStateInterval,
  patientStates,
} from '@upstroke/capno';
import type { LocalEvent } from '../../../lib/offline';

/** What the Live screen shows, derived from the tapped events (corrections applied). */
export interface LiveState {
  /** Where the patient is (capno's patient-state model): everything on Live follows it. */
  phase: PatientState;
  /** When the current state began (ms): the ROSC clock, or a re-arrest's new cycle. */
  phaseSince: number;
  /** The states of the code so far (seconds from the arrest; the last one open-ended). */
  states: PatientStateInterval[];
  compressing: boolean;
  /** When compressions last started or stopped (ms), or null before the first tap. */
  compressionsChangedAt: number | null;
  lastEpinephrineAt: number | null;
  lastRhythmCheckAt: number | null;
  shocks: number;
  ended: boolean;
  /** How the code ended (the End choice in force), or null. */
  endReason: string | null;
  /** The events in force, oldest first (what Undo and the summary read). */
  inForce: LocalEvent[];
}

export function liveState(events: LocalEvent[], arrestAt: string): LiveState {
  // Capno's correction rule and patient-state model, as the debrief applies them.
  const live = eventsInForce(events);
  const zero = Date.parse(arrestAt);
  const timed = live.map((e) => ({
    tSec: (Date.parse(e.at) - zero) / 1000,
    kind: e.kind,
    data: e.data,
  }));
  const states = patientStates(timed, Infinity);
  const current = states.at(-1) ?? { state: 'pulseless' as const, startSec: 0 };
  const state: LiveState = {
    phase: current.state,
    phaseSince: zero + current.startSec * 1000,
    states,
    compressing: false,
    compressionsChangedAt: null,
    lastEpinephrineAt: null,
    lastRhythmCheckAt: null,
    shocks: 0,
    ended: current.state === 'ended',
    endReason: null,
    inForce: live,
  };
  for (const e of live) {
    const t = Date.parse(e.at);
    if (e.kind === 'compressions-start' || e.kind === 'compressions-stop') {
      state.compressing = e.kind === 'compressions-start';
      state.compressionsChangedAt = t;
    } else if (e.kind === 'drug' && (e.data as { drug: string }).drug === 'epinephrine') {
      state.lastEpinephrineAt = t;
    } else if (e.kind === 'rhythm') state.lastRhythmCheckAt = t;
    else if (e.kind === 'shock') state.shocks += 1;
    else if (e.kind === 'end') state.endReason = String((e.data as { reason?: string }).reason);
  }
  return state;
}

/**
 * When the current cardiac cycle began (ms): the last rhythm check, or the start of the
 * current pulseless period (arrest or re-arrest), whichever is later.
 */
export function cycleStart(state: LiveState, arrestAtMs: number): number {
  return Math.max(state.lastRhythmCheckAt ?? arrestAtMs, state.phaseSince, arrestAtMs);
}
