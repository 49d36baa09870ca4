import { adultEvidenceApplies } from '../age-rules.js';
import type { Etco2Point, Finding, Interval } from '@upstroke/contracts';
import { intersect, mergeClose } from '../events/intervals.js';
import { MAX_HOLD_SEC } from '../etco2/segments.js';
import { median } from '../time.js';
import { CAUTION, co2, finding, fmt, overlaps, type FindingContext } from './context.js';

function minIn(points: readonly Etco2Point[], iv: Interval): number {
  let m = Infinity;
  for (const p of points) if (p.tSec >= iv.startSec && p.tSec < iv.endSec) m = Math.min(m, p.mmHg);
  return m;
}

/**
 * `etco2-low`: EtCO2 below `lowEtco2MmHg` during compressions for at least
 * `lowEtco2MinSec` (each value holds until the next, ≤ 60 s). Warning.
 */
export function lowFindings(c: FindingContext): Finding[] {
  const low = mergeClose(c.segments.filter((s) => s.mmHg < c.t.lowEtco2MmHg));
  const out: Finding[] = [];
  for (const iv of intersect(intersect(low, c.tl.compressions), c.tl.pulseless)) {
    const dur = iv.endSec - iv.startSec;
    if (dur < c.t.lowEtco2MinSec) continue;
    const lowest = minIn(c.points, { startSec: iv.startSec - MAX_HOLD_SEC, endSec: iv.endSec });
    const msg = `EtCO2 stayed below ${co2(c, c.t.lowEtco2MmHg)} for ${fmt(dur)} s during compressions (lowest ${co2(c, lowest)}). This suggests compressions may be producing little blood flow; consider checking depth, rate and recoil, and changing the compressor.`;
    out.push(finding('etco2-low', iv.startSec, iv.endSec, 'warning', msg));
  }
  return out;
}

/** Median of each value and its neighbours: one stray breath neither makes nor breaks a rise. */
function smooth3(points: readonly Etco2Point[]): Float64Array {
  const n = points.length;
  const s = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const a = points[Math.max(0, i - 1)].mmHg;
    const b = points[i].mmHg;
    const d = points[Math.min(n - 1, i + 1)].mmHg;
    s[i] = Math.max(Math.min(a, b), Math.min(Math.max(a, b), d));
  }
  return s;
}

function confounderAt(c: FindingContext, t: number): Finding['confounder'] {
  const w = c.t.confounderWindowSec;
  const recent = c.events.filter((e) => e.tSec <= t && e.tSec >= t - w);
  if (recent.some((e) => e.kind === 'drug' && e.data.drug === 'sodium-bicarbonate'))
    return 'sodium-bicarbonate';
  if (recent.some((e) => e.kind === 'ventilation')) return 'ventilation';
  return null;
}

function riseFinding(c: FindingContext, s: number, e: number, base: number, peak: number) {
  const conf = confounderAt(c, s);
  let msg = `EtCO2 rose ${co2(c, peak - base)} above the preceding ${fmt(c.t.riseBaselineSec)} s (from about ${co2(c, base)} to ${co2(c, peak)}) and stayed up for ${fmt(e - s)} s. An abrupt sustained rise suggests return of spontaneous circulation; consider a pulse check at the next pause.`;
  if (conf === 'sodium-bicarbonate')
    msg +=
      ' Sodium bicarbonate was given shortly before; it raises EtCO2 for minutes and can mimic this rise.';
  if (conf === 'ventilation')
    msg += ' Ventilation changed shortly before; a slower ventilation rate also raises EtCO2.';
  return finding('etco2-rise', s, e, 'info', msg, conf);
}

/**
 * `etco2-rise`: a value (median of 3 neighbours) at least `riseMmHg` above the mean of the
 * values in the preceding `riseBaselineSec`, staying that high for ≥ `riseSustainSec`;
 * rises starting during documented ROSC are ignored. Confounder: sodium bicarbonate or a
 * ventilation change within `confounderWindowSec` before. One pass: the baseline window
 * slides with a running sum.
 */
export function riseFindings(c: FindingContext): Finding[] {
  const pts = c.points;
  const s = smooth3(pts);
  const out: Finding[] = [];
  let lo = 0;
  let added = 0;
  let sum = 0;
  for (let i = 0; i < pts.length; i++) {
    const t = pts[i].tSec;
    for (; added < i; added++) sum += s[added];
    for (; lo < i && pts[lo].tSec < t - c.t.riseBaselineSec; lo++) sum -= s[lo];
    if (i - lo < 2 || overlaps(c.tl.rosc, t, t + 1e-9)) continue;
    const base = sum / (i - lo);
    if (s[i] < base + c.t.riseMmHg) continue;
    let j = i;
    let peak = s[i];
    while (j + 1 < pts.length && s[j + 1] >= base + c.t.riseMmHg) peak = Math.max(peak, s[++j]);
    const next = j + 1 < pts.length ? pts[j + 1].tSec : c.tl.endSec;
    const end = Math.max(pts[j].tSec, Math.min(next, pts[j].tSec + MAX_HOLD_SEC));
    if (end - t >= c.t.riseSustainSec) out.push(riseFinding(c, t, end, base, peak));
    i = j;
  }
  return out;
}

/**
 * `etco2-prognosis-caution`: median EtCO2 over the last 60 s still below
 * `prognosisEtco2MmHg` once `prognosisAfterSec` of CPR (from the first compressions) have
 * passed with an advanced airway in place and no ROSC. Paiva 2018: ROSC very unlikely —
 * one input among several, never a reason on its own. Info. Adult records only: that
 * evidence is adult, and no EtCO2 cut-off is validated for children (AHA 2020 paediatric).
 */
export function prognosisFindings(c: FindingContext): Finding[] {
  if (!adultEvidenceApplies(c.ageGroup)) return [];
  const cpr0 = c.tl.compressions[0]?.startSec;
  const airway = c.tl.advancedAirway[0]?.startSec;
  if (cpr0 === undefined || airway === undefined) return [];
  const at = Math.max(cpr0 + c.t.prognosisAfterSec, airway);
  if (at > c.tl.endSec || overlaps(c.tl.rosc, 0, at)) return [];
  const all = c.allPoints;
  const recent = all.filter((p) => p.tSec <= at && p.tSec >= at - 60).map((p) => p.mmHg);
  const m = median(recent);
  if (m === null || m >= c.t.prognosisEtco2MmHg) return [];
  const rise = all.find((p) => p.tSec > at && p.mmHg >= c.t.prognosisEtco2MmHg);
  const msg = `After ${fmt((at - cpr0) / 60)} min of CPR with an advanced airway, EtCO2 is still below ${co2(c, c.t.prognosisEtco2MmHg)} (median ${co2(c, m)} over the last minute). Published studies associate this with a low chance of ROSC; it is one input among several.`;
  const caution = `${CAUTION} Never use EtCO2 alone to decide to stop resuscitation.`;
  return [
    finding('etco2-prognosis-caution', at, rise?.tSec ?? c.tl.endSec, 'info', msg, null, caution),
  ];
}
