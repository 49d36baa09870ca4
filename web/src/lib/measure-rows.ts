import {
  clockFromArrest,
  type Etco2DisplayUnit,
  etco2MeasureRows,
  formatPercent,
  type Measures,
  type measureDefinitions,
} from '@upstroke/contracts';

export type MeasureKey = keyof typeof measureDefinitions;
const pct = (f: number | null) => formatPercent(f);
const dur = (s: number | null) => (s === null ? '—' : clockFromArrest(s));

/** One measure as the Debrief and the committee's review show it. */
export interface MeasureRow {
  key: MeasureKey;
  title: string;
  value: string;
}

/**
 * The record's measures in words, from the debrief the API composed (never recomputed):
 * the Debrief's cards and the review dialog's table read the same rows.
 */
export function measureRows(m: Measures, unit: Etco2DisplayUnit): MeasureRow[] {
  const pre = m.pauses
    .filter((p) => p.context === 'pre-shock')
    .map((p) => p.preShockSec ?? p.durationSec);
  return [
    { key: 'duration', title: 'Duration', value: dur(m.durationSec) },
    {
      key: 'compressionFraction',
      title: 'Compression fraction',
      value: pct(m.compressionFraction),
    },
    {
      key: 'longestPause',
      title: 'Longest pause',
      value: m.longestPauseSec === null ? '—' : `${Math.round(m.longestPauseSec)} s`,
    },
    {
      key: 'preShockPauses',
      title: 'Pre-shock pauses',
      value: pre.length ? pre.map((s) => `${Math.round(s)} s`).join(', ') : 'none',
    },
    { key: 'firstShock', title: 'Time to first shock', value: dur(m.timeToFirstShockSec) },
    {
      key: 'firstEpinephrine',
      title: 'Time to first epinephrine',
      value: dur(m.timeToFirstEpinephrineSec),
    },
    {
      key: 'epinephrineIntervals',
      title: 'Epinephrine intervals',
      value: m.epinephrineIntervalsSec.length ? m.epinephrineIntervalsSec.map(dur).join(', ') : '—',
    },
    {
      key: 'ventilationRate',
      title: 'Ventilation rate',
      value: m.ventilationRatePerMin === null ? '—' : `${Math.round(m.ventilationRatePerMin)} /min`,
    },
    ...etco2MeasureRows(m.etco2, unit),
  ];
}
