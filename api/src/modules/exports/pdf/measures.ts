import { clockFromArrest, type Debrief, formatPercent } from '@upstroke/contracts';

const pct = (f: number | null) => formatPercent(f);
const dur = (s: number | null) => (s === null ? '—' : clockFromArrest(s));

/** A short list as is; a long one as count, median and range. */
export function listOrSummary(values: number[], fmt: (v: number) => string): string {
  if (values.length === 0) return 'none';
  if (values.length <= 4) return values.map(fmt).join(', ');
  const s = [...values].sort((a, b) => a - b);
  const mid = s[Math.floor(s.length / 2)];
  return `${values.length}; median ${fmt(mid)} (${fmt(s[0])} to ${fmt(s[s.length - 1])})`;
}

/** The measures as label/value pairs (same words as the Debrief screen's cards). */
export function measureRows(d: Debrief): [string, string][] {
  const m = d.measures;
  const pre = m.pauses
    .filter((p) => p.context === 'pre-shock')
    .map((p) => p.preShockSec ?? p.durationSec);
  const epi = m.epinephrineIntervalsSec;
  return [
    ['Duration', dur(m.durationSec)],
    ['Compression fraction', pct(m.compressionFraction)],
    ['Longest pause', m.longestPauseSec === null ? '—' : `${Math.round(m.longestPauseSec)} s`],
    ['Pre-shock pauses', listOrSummary(pre, (v) => `${Math.round(v)} s`)],
    ['Time to first shock', dur(m.timeToFirstShockSec)],
    ['Time to first epinephrine', dur(m.timeToFirstEpinephrineSec)],
    ['Epinephrine intervals', listOrSummary(epi, dur)],
    [
      'Ventilation rate',
      m.ventilationRatePerMin === null ? '—' : `${Math.round(m.ventilationRatePerMin)} /min`,
    ],
    [
      'EtCO2 median (CPR)',
      m.etco2.medianMmHg === null ? '—' : `${Math.round(m.etco2.medianMmHg)} mmHg`,
    ],
    ['CPR time EtCO2 ≥ 10 mmHg', pct(m.etco2.fractionAtOrAbove10)],
    ['CPR time EtCO2 ≥ 20 mmHg', pct(m.etco2.fractionAtOrAbove20)],
    ['Time to first compression', dur(m.timeToFirstCompressionSec)],
  ];
}
