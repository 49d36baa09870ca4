import type { Finding, Interval } from '@upstroke/contracts';
import { intersect } from '../events/intervals.js';
import { isKind } from '../events/normalize.js';
import { co2, finding, fmt, type FindingContext } from './context.js';

/** Consecutive breaths with a raised inspired baseline before `rebreathing` is reported. */
export const REBREATHING_MIN_BREATHS = 3;

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
      const msg = `Inspired CO2 stayed above ${co2(c, c.t.rebreathingBaselineMmHg)} for ${j - i + 1} breaths (up to ${co2(c, top)}). This suggests rebreathing; consider checking the valve, circuit and sampling line.`;
      out.push(
        finding('rebreathing', b[i].tSec, b[j].tSec + (b[j].durationSec ?? 0), 'warning', msg),
      );
    }
    i = j;
  }
  return out;
}
