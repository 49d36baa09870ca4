import type { LocalEvent } from '../../../lib/offline';

/** What the Live screen shows, derived from the tapped events (corrections applied). */
export interface LiveState {
  compressing: boolean;
  /** When compressions last started or stopped (ms), or null before the first tap. */
  compressionsChangedAt: number | null;
  lastEpinephrineAt: number | null;
  lastRhythmCheckAt: number | null;
  shocks: number;
  ended: boolean;
  /** The newest event that a correction could still supersede (what Undo acts on). */
  undoable: LocalEvent | null;
}

/** Events still in force: corrections hide the events they supersede. */
export function effectiveEvents(events: LocalEvent[]): LocalEvent[] {
  const superseded = new Set(
    events
      .filter((e) => e.kind === 'correction')
      .map((e) => (e.data as { supersedes: string }).supersedes),
  );
  return events
    .filter((e) => e.kind !== 'correction' && !superseded.has(e.id))
    .sort((a, b) => a.at.localeCompare(b.at));
}

export function liveState(events: LocalEvent[]): LiveState {
  const live = effectiveEvents(events);
  const state: LiveState = {
    compressing: false,
    compressionsChangedAt: null,
    lastEpinephrineAt: null,
    lastRhythmCheckAt: null,
    shocks: 0,
    ended: false,
    undoable: live.at(-1) ?? null,
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
    else if (e.kind === 'end') state.ended = true;
  }
  return state;
}
