import type { AnalysisEvent, AnalysisInput, EventData, EventKind } from '@upstroke/contracts';

/** Arrest time of the test records (invented). */
export const ARREST_AT = '2026-03-04T10:00:00.000Z';

/** ISO time `tSec` seconds after ARREST_AT. */
export const at = (tSec: number) => new Date(Date.parse(ARREST_AT) + tSec * 1000).toISOString();

let counter = 0;

/** One event `tSec` seconds after the arrest (ids are unique per test run). */
export function ev<K extends EventKind>(
  kind: K,
  tSec: number,
  data: EventData<K>,
  id = `ev-${++counter}`,
): AnalysisEvent {
  return { id, at: at(tSec), kind, data } as AnalysisEvent;
}

/** A record with the given events (sorted by time) and optional extras. */
export function record(events: AnalysisEvent[], extra: Partial<AnalysisInput> = {}): AnalysisInput {
  const sorted = [...events].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  return { arrestAt: ARREST_AT, events: sorted, ...extra };
}

/** Compressions from `from` to `to` with pauses [start, end] taken out. */
export function compressionEvents(from: number, to: number, pauses: [number, number][] = []) {
  const out: AnalysisEvent[] = [ev('compressions-start', from, {})];
  for (const [s, e] of pauses)
    out.push(ev('compressions-stop', s, {}), ev('compressions-start', e, {}));
  out.push(ev('compressions-stop', to, {}));
  return out;
}
