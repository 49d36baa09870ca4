import {
  clockFromArrest,
  type Debrief,
  etco2MeasureRows,
  formatPercent,
} from '@upstroke/contracts';

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
    ...etco2MeasureRows(m.etco2, d.record.etco2Unit).map((r): [string, string] => [
      r.key === 'etco2Median' ? 'EtCO2 median (CPR)' : r.title,
      r.value,
    ]),
    ['Time to first compression', dur(m.timeToFirstCompressionSec)],
  ];
}
