import { LiveAnalyzer } from '@upstroke/capno';
import type { AnalysisEvent, Etco2DisplayUnit, Thresholds } from '@upstroke/contracts';
import { useMemo } from 'react';
import type { LocalEtco2, LocalEvent } from '../../../lib/offline';
import type { LiveState } from '../lib/live-state';
import { livePrompts, type Prompt } from '../lib/prompts';

export type { Prompt } from '../lib/prompts';

/** Findings the engine reports while they are still in progress, worded by the engine. */
const liveKinds = new Set(['etco2-low', 'pause-long', 'preshock-pause-long']);

/**
 * The prompt banner: the analysis engine (`LiveAnalyzer`) for low EtCO2 during compressions
 * and long pauses, and the site's timers for a rhythm check or an epinephrine dose that is
 * due, all following the patient's state. Recomputed once a second from the recorded data.
 */
export function usePrompts(input: {
  arrestAt: string;
  events: LocalEvent[];
  etco2: LocalEtco2[];
  thresholds: Thresholds;
  /** The site's unit: the engine's prompts write EtCO2 in it. */
  unit: Etco2DisplayUnit;
  state: LiveState;
  now: number;
}): Prompt[] {
  const { arrestAt, events, etco2, thresholds: t, state, unit } = input;
  const second = Math.floor(input.now / 1000);
  const analyzer = useMemo(() => {
    const a = new LiveAnalyzer({
      arrestAt,
      sampleRateHz: 50,
      unit: 'mmHg',
      profile: t,
      displayUnit: unit,
    });
    for (const e of events)
      a.pushEvent({ id: e.id, at: e.at, kind: e.kind, data: e.data } as AnalysisEvent);
    for (const v of etco2)
      a.pushEtco2({ at: v.at, value: v.value, unit: v.unit, source: v.source });
    return a;
  }, [arrestAt, events, etco2, t, unit]);
  return useMemo(() => {
    const arrestAtMs = Date.parse(arrestAt);
    const engine: Prompt[] =
      state.phase === 'pulseless'
        ? analyzer
            .activeFindings((second * 1000 - arrestAtMs) / 1000)
            .filter((f) => liveKinds.has(f.kind))
            .map((f) => ({ key: f.kind, text: f.message, severity: 'warning' }))
        : [];
    return livePrompts({ state, second, arrestAtMs, thresholds: t, engine });
  }, [analyzer, second, state, t, arrestAt]);
}
