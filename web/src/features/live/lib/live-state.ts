import { eventsInForce } from '@upstroke/capno';
import type { LocalEvent } from '../../../lib/offline';
import { patientPhase, type PatientPhase } from './patient-phase';

/** What the Live screen shows, derived from the tapped events (corrections applied). */
export interface LiveState {
  /** Where the patient is: prompts, timers, sounds and buttons follow it. */
  phase: PatientPhase;
  /** When the current phase began (ms): the ROSC clock, or a re-arrest's new cycle. */
  phaseSince: number | null;
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

export function liveState(events: LocalEvent[]): LiveState {
  // Capno's correction rule, as the debrief applies it.
  const live = eventsInForce(events);
  const phase = patientPhase(live);
  const state: LiveState = {
    phase: phase.phase,
    phaseSince: phase.since,
    compressing: false,
    compressionsChangedAt: null,
    lastEpinephrineAt: null,
    lastRhythmCheckAt: null,
    shocks: 0,
    ended: phase.phase === 'ended',
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
  const from = state.phaseSince ?? arrestAtMs;
  return Math.max(state.lastRhythmCheckAt ?? arrestAtMs, from, arrestAtMs);
}
