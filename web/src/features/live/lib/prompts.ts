import type { Thresholds } from '@upstroke/contracts';
import { cycleStart, type LiveState } from './live-state';

export interface Prompt {
  key: string;
  text: string;
  severity: 'info' | 'warning' | 'success';
}

/** Said once during ROSC instead of the arrest prompts: calm, and names the next action. */
export const roscPrompt: Prompt = {
  key: 'rosc',
  text: 'ROSC recorded — arrest prompts paused. If the pulse is lost, tap Re-arrest.',
  severity: 'success',
};

/**
 * The prompts for one second of the code. While the patient is pulseless: the engine's
 * findings in progress (`engine`), hands-off time past the site's pause limit, a rhythm check
 * or an epinephrine dose that is due by the site's intervals. During ROSC none of these (the
 * patient has a pulse); after the end nothing.
 */
export function livePrompts(input: {
  state: LiveState;
  /** Whole seconds, epoch. */
  second: number;
  arrestAtMs: number;
  thresholds: Thresholds;
  engine: Prompt[];
}): Prompt[] {
  const { state, second, thresholds: t } = input;
  if (state.phase === 'ended') return [];
  if (state.phase === 'rosc') return [roscPrompt];
  const prompts = [...input.engine];
  const stoppedAt = state.compressionsChangedAt;
  if (!state.compressing && stoppedAt !== null) {
    const handsOff = second - Math.max(stoppedAt, state.phaseSince) / 1000;
    if (handsOff > t.pauseMaxSec && !prompts.some((p) => p.key === 'pause-long'))
      prompts.push({
        key: 'hands-off',
        text: `Hands off for ${Math.round(handsOff)} s`,
        severity: 'warning',
      });
  }
  if (second - cycleStart(state, input.arrestAtMs) / 1000 >= t.rhythmCheckIntervalSec)
    prompts.push({ key: 'rhythm-due', text: 'Rhythm check due', severity: 'info' });
  if (
    state.lastEpinephrineAt !== null &&
    second - state.lastEpinephrineAt / 1000 >= t.epinephrineMinSec
  )
    prompts.push({
      key: 'epinephrine-due',
      text:
        'Epinephrine interval reached (site: every ' +
        `${Math.round(t.epinephrineMinSec / 60)}–${Math.round(t.epinephrineMaxSec / 60)} min)`,
      severity: 'info',
    });
  return prompts;
}
