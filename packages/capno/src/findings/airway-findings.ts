import type { Breath, Finding, Interval } from '@upstroke/contracts';
import { intersect } from '../events/intervals.js';
import { isKind } from '../events/normalize.js';
import { finding, fmt, type FindingContext } from './context.js';

/** Rolling ventilation rate: breaths in the last 60 s, once they span at least 30 s (common practice). */
export const RATE_WINDOW_SEC = 60;
export const RATE_MIN_SPAN_SEC = 30;
/** Consecutive breaths with a raised inspired baseline before `rebreathing` is reported. */
export const REBREATHING_MIN_BREATHS = 3;

/**
 * Rolling rate (breaths/min) at each breath: (n − 1) × 60 / span of the n breaths in the
 * preceding 60 s; null while they span < 30 s. Two pointers: one pass.
 */
export function rollingRates(breaths: readonly Breath[]): (number | null)[] {
  const out: (number | null)[] = [];
  let lo = 0;
  for (let i = 0; i < breaths.length; i++) {
    const t = breaths[i].tSec;
    while (t - breaths[lo].tSec > RATE_WINDOW_SEC) lo++;
    const span = t - breaths[lo].tSec;
    out.push(span >= RATE_MIN_SPAN_SEC ? ((i - lo) * 60) / span : null);
  }
  return out;
}

/** `ventilation-fast`: rolling rate, or a recorded ventilation rate, above the profile's rate + tolerance. Warning. */
export function ventilationFindings(c: FindingContext): Finding[] {
  const limit = c.t.ventilationMaxPerMin + c.t.ventilationTolerancePerMin;
  const out: Finding[] = [];
  const rates = rollingRates(c.breaths);
  const msg = (r: number) =>
    `Ventilation rate about ${fmt(r)}/min, above the ${fmt(c.t.ventilationMaxPerMin)}/min of the protocol. Fast ventilation suggests hyperventilation, which lowers EtCO2 and can impede venous return; consider slowing ventilation.`;
  for (let i = 0; i < rates.length; i++) {
    const r = rates[i];
    if (r === null || r <= limit) continue;
    let j = i;
    let peak = r;
    while (j + 1 < rates.length && (rates[j + 1] ?? 0) > limit)
      peak = Math.max(peak, rates[++j] ?? 0);
    const start = Math.max(0, c.breaths[i].tSec - RATE_WINDOW_SEC, c.breaths[0].tSec);
    out.push(finding('ventilation-fast', start, c.breaths[j].tSec, 'warning', msg(peak)));
    i = j;
  }
  const vents = c.events.filter((e) => isKind(e, 'ventilation'));
  vents.forEach((e, k) => {
    const r = isKind(e, 'ventilation') ? e.data.ratePerMin : undefined;
    if (r === undefined || r <= limit) return;
    const end = k + 1 < vents.length ? vents[k + 1].tSec : c.tl.endSec;
    out.push(finding('ventilation-fast', e.tSec, Math.max(e.tSec, end), 'warning', msg(r)));
  });
  return out;
}

/**
 * `waveform-absent`: with a tracheal tube in place and a waveform being recorded, no breath
 * for at least `waveformAbsentSec`. Critical: a dislodged tube shows exactly this.
 */
export function waveformAbsentFindings(c: FindingContext): Finding[] {
  const watch = intersect([...c.waveformCoverage], c.tl.trachealTube);
  const out: Finding[] = [];
  const ends = c.breaths.map((b) => b.tSec + (b.durationSec ?? 0));
  let j = 0;
  for (const w of watch) {
    let from = w.startSec;
    while (j < c.breaths.length && ends[j] <= from) j++;
    const gaps: Interval[] = [];
    for (; j < c.breaths.length && c.breaths[j].tSec < w.endSec; j++) {
      gaps.push({ startSec: from, endSec: c.breaths[j].tSec });
      from = Math.max(from, ends[j]);
    }
    gaps.push({ startSec: from, endSec: w.endSec });
    for (const g of gaps) {
      if (g.endSec - g.startSec < c.t.waveformAbsentSec) continue;
      const msg = `No exhaled CO2 waveform for ${fmt(g.endSec - g.startSec)} s with a tracheal tube in place. This suggests a displaced or blocked tube or a circuit problem; consider checking the tube, the circuit and the sampling line.`;
      out.push(finding('waveform-absent', g.startSec, g.endSec, 'critical', msg));
    }
  }
  return out;
}

/**
 * `airway-unconfirmed`: a tracheal tube recorded without waveform-capnography confirmation,
 * and none recorded later; spans the time the tube stayed in place. Warning.
 */
export function airwayUnconfirmedFindings(c: FindingContext): Finding[] {
  const tubes = c.events.filter((e) => isKind(e, 'airway') && e.data.device === 'tracheal-tube');
  const confirmed = (e: (typeof tubes)[number]) =>
    isKind(e, 'airway') && e.data.confirmation === 'waveform-capnography';
  return tubes
    .filter((e, k) => !tubes.slice(k).some(confirmed))
    .map((e) => {
      const msg = `A tracheal tube was recorded at ${fmt(e.tSec)} s without waveform capnography confirmation. A sustained waveform is the recommended confirmation; consider confirming it and recording the confirmation.`;
      const inPlace = c.tl.trachealTube.find((x) => x.startSec <= e.tSec && x.endSec >= e.tSec);
      return finding('airway-unconfirmed', e.tSec, inPlace?.endSec ?? e.tSec, 'warning', msg);
    });
}

/** `rebreathing`: ≥ 3 consecutive breaths whose inspired baseline exceeds `rebreathingBaselineMmHg`. Warning. */
export function rebreathingFindings(c: FindingContext): Finding[] {
  const out: Finding[] = [];
  const b = c.breaths;
  for (let i = 0; i < b.length; i++) {
    if (b[i].baselineMmHg <= c.t.rebreathingBaselineMmHg) continue;
    let j = i;
    while (j + 1 < b.length && b[j + 1].baselineMmHg > c.t.rebreathingBaselineMmHg) j++;
    if (j - i + 1 >= REBREATHING_MIN_BREATHS) {
      const top = Math.max(...b.slice(i, j + 1).map((x) => x.baselineMmHg));
      const msg = `Inspired CO2 stayed above ${fmt(c.t.rebreathingBaselineMmHg)} mmHg for ${j - i + 1} breaths (up to ${fmt(top)} mmHg). This suggests rebreathing; consider checking the valve, circuit and sampling line.`;
      out.push(
        finding('rebreathing', b[i].tSec, b[j].tSec + (b[j].durationSec ?? 0), 'warning', msg),
      );
    }
    i = j;
  }
  return out;
}
