import { formatPercent, type SpcMeasure, type SpcProportion } from '@upstroke/contracts';

/** Words for each control-chart measure, as the committee reads them. */
export const spcMeasureLabels: Record<SpcMeasure, string> = {
  anyRosc: 'Any ROSC (share of records)',
  compressionFractionMet: 'Compression fraction at or above target (share of records)',
  etco2Documented: 'EtCO2 documented (share of records)',
  compressionFraction: 'Median compression fraction',
  timeToFirstShockSec: 'Median time to first shock, shockable (s)',
  timeToFirstEpinephrineSec: 'Median time to first epinephrine, non-shockable (s)',
};

export const funnelMeasures: SpcProportion[] = [
  'anyRosc',
  'compressionFractionMet',
  'etco2Documented',
];

const isSeconds = (m: SpcMeasure) =>
  m === 'timeToFirstShockSec' || m === 'timeToFirstEpinephrineSec';

/** The unit on the chart's value axis. */
export const axisUnit = (m: SpcMeasure) => (isSeconds(m) ? 's' : '%');

/** A value as charted: percent for shares and compression fraction, seconds for times. */
export const chartValue = (m: SpcMeasure, v: number | null) =>
  v === null ? null : isSeconds(m) ? Math.round(v) : Math.round(v * 1000) / 10;

/** A value in words for tables and the screen reader. */
export const formatSpcValue = (m: SpcMeasure, v: number | null) =>
  v === null ? '—' : isSeconds(m) ? `${Math.round(v)} s` : formatPercent(v, 1);
