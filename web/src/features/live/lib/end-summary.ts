import { endReasonLabels, type PatchResuscitation } from '@upstroke/contracts';
import type { LocalEvent } from '../../../lib/offline';
import { phaseSpans, roscPeriods, SUSTAINED_ROSC_SEC } from './patient-phase';

/** What the read-only summary of an ended code says (times in ms). */
export interface EndSummary {
  endedAtMs: number;
  durationSec: number;
  reason: string;
  roscPeriods: { fromMs: number; toMs: number }[];
  shocks: number;
  epinephrineDoses: number;
}

/** The summary of a code from its events in force (sorted), or null while it runs. */
export function endSummary(inForce: readonly LocalEvent[], arrestAtMs: number): EndSummary | null {
  const end = inForce.find((e) => e.kind === 'end');
  if (!end) return null;
  const endedAtMs = Date.parse(end.at);
  const reason = String((end.data as { reason?: string }).reason);
  return {
    endedAtMs,
    durationSec: (endedAtMs - arrestAtMs) / 1000,
    reason: endReasonLabels[reason] ?? reason,
    roscPeriods: roscPeriods(phaseSpans(inForce), endedAtMs),
    shocks: inForce.filter((e) => e.kind === 'shock').length,
    epinephrineDoses: inForce.filter(
      (e) => e.kind === 'drug' && (e.data as { drug?: string }).drug === 'epinephrine',
    ).length,
  };
}

type EndReason = NonNullable<PatchResuscitation['endReason']>;

/**
 * The record's closing candidate from the End choice, for the lead to confirm in the
 * debrief. The outcome "sustained ROSC" is never taken from the tap: it is pre-filled only
 * when the recorded ROSC had lasted the Utstein 20 min at the end (Nolan et al. 2019);
 * otherwise a code ending in ROSC leaves the outcome for the lead.
 */
export function closingCandidate(
  reason: EndReason,
  inForce: readonly LocalEvent[],
  endedAtMs: number,
): PatchResuscitation {
  const periods = roscPeriods(phaseSpans(inForce), endedAtMs);
  const last = periods.at(-1);
  const sustained =
    last !== undefined &&
    last.toMs === endedAtMs &&
    (last.toMs - last.fromMs) / 1000 >= SUSTAINED_ROSC_SEC;
  const outcome: PatchResuscitation['outcome'] =
    reason === 'terminated'
      ? 'died'
      : reason === 'transferred'
        ? 'transferred'
        : sustained
          ? 'rosc-sustained'
          : null;
  return { status: 'closed', endReason: reason, outcome };
}
