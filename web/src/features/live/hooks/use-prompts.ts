import { LiveAnalyzer } from '@upstroke/capno';
import type { AnalysisEvent, Thresholds } from '@upstroke/contracts';
import { useMemo } from 'react';
import type { LocalEtco2, LocalEvent } from '../../../lib/offline';
import type { LiveState } from '../lib/live-state';

export interface Prompt {
  key: string;
  text: string;
  severity: 'info' | 'warning';
}

/** Findings the engine reports while they are still in progress, worded by the engine. */
const liveKinds = new Set(['etco2-low', 'pause-long', 'preshock-pause-long']);

/**
 * The prompt banner: the analysis engine (`LiveAnalyzer`) for low EtCO2 during compressions
 * and long pauses, and the site's timers for a rhythm check or an epinephrine dose that is due.
 * Recomputed once a second from the recorded data only.
 */
export function usePrompts(input: {
  arrestAt: string;
  events: LocalEvent[];
  etco2: LocalEtco2[];
  thresholds: Thresholds;
  state: LiveState;
  now: number;
}): Prompt[] {
  const { arrestAt, events, etco2, thresholds: t, state } = input;
  const second = Math.floor(input.now / 1000);
  const analyzer = useMemo(() => {
    const a = new LiveAnalyzer({ arrestAt, sampleRateHz: 50, unit: 'mmHg', profile: t });
    for (const e of events)
      a.pushEvent({ id: e.id, at: e.at, kind: e.kind, data: e.data } as AnalysisEvent);
    for (const v of etco2)
      a.pushEtco2({ at: v.at, value: v.value, unit: v.unit, source: v.source });
    return a;
  }, [arrestAt, events, etco2, t]);
  return useMemo(() => {
    if (state.ended) return [];
    const nowSec = (second * 1000 - Date.parse(arrestAt)) / 1000;
    const prompts: Prompt[] = analyzer
      .activeFindings(nowSec)
      .filter((f) => liveKinds.has(f.kind))
      .map((f) => ({ key: f.kind, text: f.message, severity: 'warning' }));
    const handsOff =
      !state.compressing && state.compressionsChangedAt !== null
        ? second - state.compressionsChangedAt / 1000
        : 0;
    if (handsOff > t.pauseMaxSec && !prompts.some((p) => p.key === 'pause-long'))
      prompts.push({
        key: 'hands-off',
        text: `Hands off for ${Math.round(handsOff)} s`,
        severity: 'warning',
      });
    const cycleFrom = (state.lastRhythmCheckAt ?? Date.parse(arrestAt)) / 1000;
    if (second - cycleFrom >= t.rhythmCheckIntervalSec)
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
  }, [analyzer, second, state, t, arrestAt]);
}
