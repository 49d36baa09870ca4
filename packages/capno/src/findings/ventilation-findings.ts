import type { Breath, Finding, Interval } from '@upstroke/contracts';
import { isKind } from '../events/normalize.js';
import { medianInPlace } from '../time.js';
import { finding, fmt, type FindingContext } from './context.js';

/** Rolling ventilation rate: breaths in the last 60 s, once they span at least 30 s (common practice). */
export const RATE_WINDOW_SEC = 60;
export const RATE_MIN_SPAN_SEC = 30;

/**
 * Intervals between consecutive breaths: entry k is the one ending at breath k (entry 0 is
 * NaN), NaN where it is `maxIntervalSec` or longer or spans a data gap (`breaks`).
 */
export function breathIntervals(
  breaths: readonly Breath[],
  maxIntervalSec = Infinity,
  breaks: readonly Interval[] = [],
): Float64Array {
  const out = new Float64Array(breaths.length);
  out[0] = NaN;
  for (let k = 1; k < breaths.length; k++) {
    const [a, b] = [breaths[k - 1].tSec, breaths[k].tSec];
    out[k] = b - a < maxIntervalSec && !crossesAny(breaks, a, b) ? b - a : NaN;
  }
  return out;
}

function crossesAny(breaks: readonly Interval[], a: number, b: number): boolean {
  for (const g of breaks) if (g.startSec < b && g.endSec > a) return true;
  return false;
}

/**
 * Rolling rate (breaths/min) at each breath: 60 ÷ the median interval between consecutive
 * breaths in the preceding 60 s; null while those breaths span < 30 s. A steady rhythm of
 * one breath every 5 s reads 12/min exactly, and one long or short interval (a missed or
 * extra breath) does not move it. Intervals longer than `maxIntervalSec` (no ventilation)
 * or spanning a data gap (`breaks`: no signal, so no breath could be seen) are left out.
 */
export function rollingRates(
  breaths: readonly Breath[],
  maxIntervalSec = Infinity,
  breaks: readonly Interval[] = [],
): (number | null)[] {
  const out: (number | null)[] = [];
  const intervals = breathIntervals(breaths, maxIntervalSec, breaks);
  const window = new Float64Array(breaths.length);
  let lo = 0;
  for (let i = 0; i < breaths.length; i++) {
    const t = breaths[i].tSec;
    while (t - breaths[lo].tSec > RATE_WINDOW_SEC) lo++;
    let n = 0;
    for (let k = lo + 1; k <= i; k++) if (!Number.isNaN(intervals[k])) window[n++] = intervals[k];
    const m = medianInPlace(window, n);
    out.push(t - breaths[lo].tSec >= RATE_MIN_SPAN_SEC && m ? 60 / m : null);
  }
  return out;
}

/** Above the limit as monitors show a rate: to the whole breath per minute (common practice). */
const above = (rate: number | null, limit: number) => rate !== null && Math.round(rate) > limit;

/**
 * `ventilation-fast`: the rolling rate, or a recorded ventilation rate, above the profile's
 * rate + tolerance. One finding per continuous episode: runs of breaths above the limit whose
 * windows overlap are one episode, reported once with its peak rate. Warning.
 */
export function ventilationFindings(c: FindingContext): Finding[] {
  const limit = c.t.ventilationMaxPerMin + c.t.ventilationTolerancePerMin;
  const msg = (r: number) =>
    `Ventilation rate about ${fmt(r)}/min, above the ${fmt(c.t.ventilationMaxPerMin)}/min of the protocol. Fast ventilation suggests hyperventilation, which lowers EtCO2 and can impede venous return; consider slowing ventilation.`;
  const episodes: (Interval & { peak: number })[] = [];
  const rates = rollingRates(c.breaths, c.t.waveformAbsentSec, c.dataGaps);
  for (let i = 0; i < rates.length; i++) {
    if (!above(rates[i], limit)) continue;
    let j = i;
    let peak = rates[i] as number;
    while (j + 1 < rates.length && above(rates[j + 1], limit))
      peak = Math.max(peak, rates[++j] as number);
    const start = Math.max(0, c.breaths[i].tSec - RATE_WINDOW_SEC, c.breaths[0].tSec);
    episodes.push({ startSec: start, endSec: c.breaths[j].tSec, peak });
    i = j;
  }
  const vents = c.events.filter((e) => isKind(e, 'ventilation'));
  vents.forEach((e, k) => {
    const r = isKind(e, 'ventilation') ? e.data.ratePerMin : undefined;
    if (r === undefined || r <= limit) return;
    const end = k + 1 < vents.length ? vents[k + 1].tSec : c.tl.endSec;
    episodes.push({ startSec: e.tSec, endSec: Math.max(e.tSec, end), peak: r });
  });
  return mergeOverlapping(episodes).map((x) =>
    finding('ventilation-fast', x.startSec, x.endSec, 'warning', msg(x.peak)),
  );
}

/** Overlapping or touching episodes become one, keeping the highest peak. */
function mergeOverlapping<T extends Interval & { peak: number }>(xs: T[]): T[] {
  const out: T[] = [];
  for (const x of [...xs].sort((a, b) => a.startSec - b.startSec)) {
    const last = out[out.length - 1];
    if (last && x.startSec <= last.endSec) {
      last.endSec = Math.max(last.endSec, x.endSec);
      last.peak = Math.max(last.peak, x.peak);
    } else out.push({ ...x });
  }
  return out;
}
