import { type Finding, type Interval, labelOf, pauseContextLabels } from '@upstroke/contracts';
import { epinephrineTimes } from '../events/normalize.js';
import { classifyPause } from '../events/measures.js';
import {
  compressionsRunningAtEnd,
  finding,
  fmt,
  overlaps,
  pulselessThrough,
  type FindingContext,
} from './context.js';

/** In live use, compressions stopped and not restarted while still pulseless: a pause in progress. */
function ongoingPause(c: FindingContext) {
  const last = c.tl.compressions[c.tl.compressions.length - 1];
  if (!c.live || !last || last.endSec >= c.tl.endSec) return [];
  if (!pulselessThrough(c.tl, last.endSec, c.tl.endSec)) return [];
  return [classifyPause(c.events, last.endSec, c.tl.endSec)];
}

/**
 * `pause-long`: a pause longer than `pauseMaxSec` (warning; critical at twice the limit).
 * `preshock-pause-long`: compressions stopping → shock longer than `preshockPauseMaxSec`
 * (warning; critical from 20 s — Cheskes 2011: ≥ 20 s, odds ratio 0.47 for survival).
 */
export function pauseFindings(c: FindingContext): Finding[] {
  const out: Finding[] = [];
  for (const p of [...c.pauses, ...ongoingPause(c)]) {
    if (p.endSec < c.from) continue;
    if (p.durationSec > c.t.pauseMaxSec) {
      const sev = p.durationSec >= 2 * c.t.pauseMaxSec ? 'critical' : 'warning';
      const msg = `Compressions paused for ${fmt(p.durationSec)} s (${labelOf(pauseContextLabels, p.context).toLowerCase()}), longer than the ${fmt(c.t.pauseMaxSec)} s target. Long pauses suggest room to shorten interruptions; consider planning tasks before stopping.`;
      out.push(finding('pause-long', p.startSec, p.endSec, sev, msg));
    }
    const pre = p.preShockSec;
    if (pre !== undefined && pre > c.t.preshockPauseMaxSec) {
      const sev = pre >= 20 ? 'critical' : 'warning';
      const msg = `The pre-shock pause lasted ${fmt(pre)} s, longer than ${fmt(c.t.preshockPauseMaxSec)} s. Shorter pre-shock pauses are associated with better outcomes; consider charging the defibrillator during compressions.`;
      out.push(finding('preshock-pause-long', p.startSec, p.startSec + pre, sev, msg));
    }
  }
  return out;
}

/**
 * When the next rhythm check is due from, inside one pulseless interval: the first
 * compressions in it and each rhythm check recorded in it.
 */
function checkReferences(c: FindingContext, p: Interval): number[] {
  const refs: number[] = [];
  const cpr = c.tl.compressions.find((x) => x.endSec > p.startSec && x.startSec < p.endSec);
  if (cpr) refs.push(Math.max(cpr.startSec, p.startSec));
  for (const e of c.events)
    if (e.kind === 'rhythm' && e.tSec >= p.startSec && e.tSec < p.endSec) refs.push(e.tSec);
  return refs.sort((a, b) => a - b);
}

/**
 * `rhythm-check-late`: more than `rhythmCheckIntervalSec` + tolerance from one rhythm check
 * (or the first compressions) to the next, judged in each pulseless interval (the arrest
 * and each re-arrest), never across ROSC. ROSC found at the end of an interval counts as a
 * check; an overdue check at the end of the record counts only while compressions are
 * still running. The finding spans from when the check was due to when it happened (or
 * the end). Warning.
 */
export function rhythmCheckFindings(c: FindingContext): Finding[] {
  const out: Finding[] = [];
  const limit = c.t.rhythmCheckIntervalSec + c.t.rhythmCheckToleranceSec;
  for (const p of c.tl.pulseless) {
    const refs = checkReferences(c, p);
    const byRosc = overlaps(c.tl.rosc, p.endSec, p.endSec + 1e-9);
    if (refs.length && byRosc) refs.push(p.endSec);
    for (let k = 0; k < refs.length; k++) {
      const a = refs[k];
      const open = k + 1 >= refs.length;
      if (open && (byRosc || !compressionsRunningAtEnd(c.tl) || p.endSec < c.tl.endSec)) continue;
      const b = open ? p.endSec : refs[k + 1];
      if (b < c.from || b - a <= limit) continue;
      const msg = open
        ? `No rhythm check recorded for ${fmt(b - a)} s (due every ${fmt(c.t.rhythmCheckIntervalSec)} s); consider whether a rhythm check is due.`
        : `The rhythm check came ${fmt(b - a)} s after the previous one, later than the ${fmt(c.t.rhythmCheckIntervalSec)} s cycle plus ${fmt(c.t.rhythmCheckToleranceSec)} s tolerance.`;
      out.push(finding('rhythm-check-late', a + c.t.rhythmCheckIntervalSec, b, 'warning', msg));
    }
  }
  return out;
}

/**
 * `epinephrine-interval`: an interval between doses shorter than `epinephrineMinSec` or
 * longer than `epinephrineMaxSec` (both in one pulseless interval: never across ROSC), or no further
 * dose within `epinephrineMaxSec` while compressions continue at the end. Warning.
 */
export function epinephrineFindings(c: FindingContext): Finding[] {
  const out: Finding[] = [];
  const ts = epinephrineTimes(c.events);
  const { epinephrineMinSec: min, epinephrineMaxSec: max } = c.t;
  const range = `${fmt(min / 60)}–${fmt(max / 60)} min`;
  for (let k = 1; k < ts.length; k++) {
    const [a, b] = [ts[k - 1], ts[k]];
    if (b < c.from || (b - a >= min && b - a <= max) || !pulselessThrough(c.tl, a, b)) continue;
    const side = b - a < min ? 'shorter' : 'longer';
    const msg = `Epinephrine doses ${fmt(b - a)} s apart, ${side} than the ${range} interval of the protocol; consider reviewing the timing of doses.`;
    out.push(finding('epinephrine-interval', a, b, 'warning', msg));
  }
  const last = ts[ts.length - 1];
  const end = c.tl.endSec;
  if (last !== undefined && end - last > max && compressionsRunningAtEnd(c.tl)) {
    if (pulselessThrough(c.tl, last, end)) {
      const msg = `No further epinephrine recorded ${fmt(end - last)} s after the last dose (protocol interval ${range}); consider whether a dose is due.`;
      out.push(finding('epinephrine-interval', last + max, end, 'warning', msg));
    }
  }
  return out;
}
