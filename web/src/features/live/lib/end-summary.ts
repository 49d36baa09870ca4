import { intervalsOf, type PatientStateInterval, sustainedRosc } from '@upstroke/capno';
import { endReasonLabels, labelOf, type PatchResuscitation } from '@upstroke/contracts';
import type { LiveState } from './live-state';

/** What the read-only summary of an ended code says (times in ms). */
export interface EndSummary {
  endedAtMs: number;
  durationSec: number;
  reason: string;
  roscPeriods: { fromMs: number; toMs: number }[];
  shocks: number;
  epinephrineDoses: number;
}

/** The states up to `untilSec` (the open last one closed there). */
function statesUntil(states: readonly PatientStateInterval[], untilSec: number) {
  return states
    .filter((s) => s.startSec < untilSec)
    .map((s) => ({ ...s, endSec: Math.min(s.endSec, untilSec) }));
}

/** The summary of an ended code from its live state, or null while it runs. */
export function endSummary(state: LiveState, arrestAt: string): EndSummary | null {
  const end = state.inForce.find((e) => e.kind === 'end');
  if (!end) return null;
  const zero = Date.parse(arrestAt);
  const endedAtMs = Date.parse(end.at);
  const reason = String((end.data as { reason?: string }).reason);
  const rosc = intervalsOf(statesUntil(state.states, (endedAtMs - zero) / 1000), 'rosc');
  return {
    endedAtMs,
    durationSec: (endedAtMs - zero) / 1000,
    reason: labelOf(endReasonLabels, reason),
    roscPeriods: rosc.map((r) => ({
      fromMs: zero + r.startSec * 1000,
      toMs: zero + r.endSec * 1000,
    })),
    shocks: state.shocks,
    epinephrineDoses: state.inForce.filter(
      (e) => e.kind === 'drug' && (e.data as { drug?: string }).drug === 'epinephrine',
    ).length,
  };
}

type EndReason = NonNullable<PatchResuscitation['endReason']>;

/**
 * The record's closing candidate from the End choice, for the lead to confirm in the
 * debrief. The outcome "sustained ROSC" is never taken from the tap: capno decides it from
 * the states (Utstein in-hospital, Nolan et al. 2019: ROSC maintained ≥ 20 min); a code
 * ending in a shorter ROSC leaves the outcome for the lead.
 */
export function closingCandidate(
  reason: EndReason,
  state: LiveState,
  arrestAt: string,
  endedAtMs: number,
): PatchResuscitation {
  const states = statesUntil(state.states, (endedAtMs - Date.parse(arrestAt)) / 1000);
  const outcome: PatchResuscitation['outcome'] =
    reason === 'terminated'
      ? 'died'
      : reason === 'transferred'
        ? 'transferred'
        : sustainedRosc(states) === true
          ? 'rosc-sustained'
          : null;
  return { status: 'closed', endReason: reason, outcome };
}
