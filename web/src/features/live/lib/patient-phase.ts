/**
 * The patient's state through a code, from the events in force: pulseless from the arrest,
 * ROSC on "ROSC" or "Pulse present", pulseless again on "Re-arrest", ended on "End".
 *
 * Live's own small reading of the events, kept to this file so that it can give way to the
 * analysis engine's patient-state model (one model for the screen and the debrief).
 */
export type PatientPhase = 'pulseless' | 'rosc' | 'ended';

export interface PhaseSpan {
  phase: PatientPhase;
  /** When it began (ms); null for the first pulseless span (it begins at the arrest time). */
  since: number | null;
}

interface PhaseEvent {
  kind: string;
  at: string;
  data: unknown;
}

function next(phase: PatientPhase, e: PhaseEvent): PatientPhase {
  if (phase === 'ended') return phase;
  if (e.kind === 'end') return 'ended';
  const pulse = e.kind === 'pulse' && (e.data as { present?: boolean }).present === true;
  if (phase === 'pulseless' && (e.kind === 'rosc' || pulse)) return 'rosc';
  if (phase === 'rosc' && e.kind === 'rearrest') return 'pulseless';
  return phase;
}

/** Every span of the code in order, from events in force sorted by time. */
export function phaseSpans(events: readonly PhaseEvent[]): PhaseSpan[] {
  const spans: PhaseSpan[] = [{ phase: 'pulseless', since: null }];
  for (const e of events) {
    const current = spans[spans.length - 1];
    const phase = next(current.phase, e);
    if (phase !== current.phase) spans.push({ phase, since: Date.parse(e.at) });
  }
  return spans;
}

/** The patient's state now: the last span. */
export function patientPhase(events: readonly PhaseEvent[]): PhaseSpan {
  const spans = phaseSpans(events);
  return spans[spans.length - 1];
}

/** Utstein in-hospital: ROSC is sustained when it lasts ≥ 20 min (Nolan et al. 2019). */
export const SUSTAINED_ROSC_SEC = 20 * 60;

/** The ROSC periods of a code (ms); an open one runs to `untilMs`. */
export function roscPeriods(
  spans: readonly PhaseSpan[],
  untilMs: number,
): { fromMs: number; toMs: number }[] {
  const out: { fromMs: number; toMs: number }[] = [];
  spans.forEach((s, i) => {
    if (s.phase !== 'rosc' || s.since === null) return;
    out.push({ fromMs: s.since, toMs: spans[i + 1]?.since ?? untilMs });
  });
  return out;
}
