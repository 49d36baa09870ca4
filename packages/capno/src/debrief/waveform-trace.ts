import type { Waveform, WaveformTrace } from '@upstroke/contracts';
import { arrayToMmHg } from '../units.js';

/**
 * A capnogram reduced to at most `buckets` min/max pairs, in mmHg, for drawing (shared out
 * over its runs by their length). Points stay in time order; a drawing breaks the line at
 * the timeline's gaps, where there is no data.
 */
export function waveformTrace(
  arrestAt: string,
  runs: readonly Waveform[],
  source: string,
  buckets = 3000,
): WaveformTrace | null {
  const total = runs.reduce((n, w) => n + w.values.length, 0);
  if (total === 0) return null;
  const per = Math.max(1, Math.ceil(total / buckets));
  const out: WaveformTrace = { tSec: [], mmHg: [], source };
  for (const w of runs) {
    const mmHg = arrayToMmHg(w.values, w.unit, w.barometricMmHg);
    const t0 = (Date.parse(w.startAt) - Date.parse(arrestAt)) / 1000;
    for (let i = 0; i < mmHg.length; i += per) {
      let lo = i;
      let hi = i;
      const end = Math.min(mmHg.length, i + per);
      for (let k = i; k < end; k++) {
        if (mmHg[k] < mmHg[lo]) lo = k;
        if (mmHg[k] > mmHg[hi]) hi = k;
      }
      for (const k of lo <= hi ? [lo, hi] : [hi, lo]) {
        out.tSec.push(Math.round((t0 + k / w.sampleRateHz) * 100) / 100);
        out.mmHg.push(Math.round(mmHg[k] * 10) / 10);
      }
    }
  }
  return out;
}
