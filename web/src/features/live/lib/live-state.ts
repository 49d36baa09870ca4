import { eventsInForce } from '@upstroke/capno';
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

export function liveState(events: LocalEvent[]): LiveState {
  // Capno's correction rule, as the debrief applies it.
  const live = eventsInForce(events);
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
