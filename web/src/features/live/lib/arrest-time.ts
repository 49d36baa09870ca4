import { eventsInForce, supersededByMap } from '@upstroke/capno';
import type { EventData } from '@upstroke/contracts';
import type { LocalEvent } from '../../../lib/offline';

/** The furthest back the arrest can be set on Live (a longer gap is a debrief amendment). */
export const MAX_EARLIER_MIN = 60;

/** The arrest entry a change of the arrest time supersedes: the first one (the Start tap's). */
export function startArrest(events: readonly LocalEvent[]): LocalEvent | undefined {
  return events.find((e) => e.kind === 'arrest');
}

/**
 * The corrections that move the arrest time to `minutes` before the Start tap's arrest
 * entry, with the reason: an earlier change of the arrest time is withdrawn (a correction of
 * it), then the Start tap's arrest is superseded by one at the new time. With capno's one
 * correction rule exactly one arrest stands. Returns them and the new arrest time.
 */
export function arrestCorrection(
  events: readonly LocalEvent[],
  original: Pick<LocalEvent, 'id' | 'at'>,
  minutes: number,
  reason: string,
): { corrections: EventData<'correction'>[]; arrestAt: string } {
  const arrestAt = new Date(Date.parse(original.at) - minutes * 60_000).toISOString();
  const corrections: EventData<'correction'>[] = [];
  const previous = supersededByMap(events).get(original.id);
  if (previous)
    corrections.push({ supersedes: previous, reason: `Arrest time set again: ${reason}` });
  corrections.push({
    supersedes: original.id,
    reason,
    replacement: { kind: 'arrest', data: {}, at: arrestAt },
  });
  return { corrections, arrestAt };
}

/**
 * The arrest time the clocks count from. Once the arrest time has been changed ("arrest was
 * N min before", on this tablet or pushed from another), the arrest in force after the
 * corrections — also when a change was undone; else the record's own time.
 */
export function arrestAtInForce(events: readonly LocalEvent[], recordArrestAt: string): string {
  const changed = events.some(
    (e) =>
      e.kind === 'correction' &&
      (e.data as { replacement?: { kind?: string } }).replacement?.kind === 'arrest',
  );
  if (!changed) return recordArrestAt;
  return eventsInForce(events).find((e) => e.kind === 'arrest')?.at ?? recordArrestAt;
}
