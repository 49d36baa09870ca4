import type { Interval, Measures, Pause, PauseContext } from '@upstroke/contracts';
import { intersect, totalLength } from './intervals.js';
import { epinephrineTimes, firstOf, type TimedEvent } from './normalize.js';
import { sustainedRosc } from './patient-state.js';
import type { Timeline } from './timeline.js';

/** A pause starting this soon after a shock is a post-shock pause (common practice). */
export const POST_SHOCK_WINDOW_SEC = 10;

/** First index with tSec ≥ t (or > t when `after`), by bisection over time-sorted events. */
function lowerBound(events: readonly TimedEvent[], t: number, lo = 0, after = false): number {
  let hi = events.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    const v = events[mid].tSec;
    if (v < t || (after && v === t)) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

const overlaps = (xs: readonly Interval[], s: number, e: number) =>
  xs.some((x) => x.startSec < e && x.endSec > s);

/**
 * Classifies a pause by what happened in it: a shock → `pre-shock` (with its pre- and
 * post-shock parts); starting within 10 s after a shock → `post-shock`; a rhythm or pulse
 * check → `rhythm-check`; an airway step → `airway`; otherwise `unexplained`.
 */
export function classifyPause(events: readonly TimedEvent[], s: number, e: number): Pause {
  const from = lowerBound(events, s - POST_SHOCK_WINDOW_SEC);
  const near = events.slice(from, lowerBound(events, e, from, true));
  const inside = near.filter((x) => x.tSec >= s);
  const shocks = inside.filter((x) => x.kind === 'shock');
  const base = { startSec: s, endSec: e, durationSec: e - s };
  if (shocks.length > 0) {
    const preShockSec = shocks[0].tSec - s;
    const postShockSec = e - shocks[shocks.length - 1].tSec;
    return { ...base, context: 'pre-shock', preShockSec, postShockSec };
  }
  const recentShock = near.some(
    (x) => x.kind === 'shock' && x.tSec < s && s - x.tSec <= POST_SHOCK_WINDOW_SEC,
  );
  let context: PauseContext = 'unexplained';
  if (recentShock) context = 'post-shock';
  else if (inside.some((x) => x.kind === 'rhythm' || x.kind === 'pulse')) context = 'rhythm-check';
  else if (inside.some((x) => x.kind === 'airway')) context = 'airway';
  return { ...base, context };
}

/**
 * Pauses: each gap between one compression interval and the next that lies wholly in
 * pulseless time. A gap with ROSC in it (ROSC or a pulse documented) is not a pause: the
 * hands-off time around it still counts against the compression fraction.
 */
export function pausesOf(events: readonly TimedEvent[], tl: Timeline, from = -Infinity): Pause[] {
  const out: Pause[] = [];
  for (let k = 1; k < tl.compressions.length; k++) {
    const s = tl.compressions[k - 1].endSec;
    const e = tl.compressions[k].startSec;
    if (e < from || overlaps(tl.rosc, s, e)) continue;
    out.push(classifyPause(events, s, e));
  }
  return out;
}

const diffs = (ts: readonly number[]) => ts.slice(1).map((t, i) => t - ts[i]);

/**
 * Event-derived CPR measures; EtCO2 and ventilation parts are filled in by the caller.
 * `pausesFrom` (live refresh) leaves out pauses that ended before it.
 */
export function eventMeasures(
  events: readonly TimedEvent[],
  tl: Timeline,
  pausesFrom = -Infinity,
): Omit<Measures, 'etco2' | 'ventilationRatePerMin'> {
  const pauses = pausesOf(events, tl, pausesFrom);
  // Meaney 2013 (CPR-quality consensus): the share of pulseless time with compressions,
  // over every pulseless segment (the arrest and each re-arrest).
  const compressionSec = totalLength(intersect(tl.compressions, tl.pulseless));
  const timeWithoutCirculationSec = totalLength(tl.pulseless);
  const rhythmTimes = events.filter((e) => e.kind === 'rhythm').map((e) => e.tSec);
  const epinephrine = epinephrineTimes(events);
  return {
    durationSec: tl.endSec,
    compressionFraction:
      timeWithoutCirculationSec > 0 ? compressionSec / timeWithoutCirculationSec : null,
    pauses,
    longestPauseSec: pauses.length ? Math.max(...pauses.map((p) => p.durationSec)) : null,
    timeToFirstCompressionSec: firstOf(events, 'compressions-start')?.tSec ?? null,
    timeToFirstShockSec: firstOf(events, 'shock')?.tSec ?? null,
    timeToFirstEpinephrineSec: epinephrine[0] ?? null,
    epinephrineIntervalsSec: diffs(epinephrine),
    compressionSec,
    timeWithoutCirculationSec,
    compressionIntervals: tl.compressions,
    rhythmCheckIntervalsSec: diffs(rhythmTimes),
    roscPeriods: tl.rosc,
    patientStates: tl.states,
    sustainedRosc: sustainedRosc(tl.states),
  };
}
