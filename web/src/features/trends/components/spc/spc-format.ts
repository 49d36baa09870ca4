import { formatSpcValue, type SpcMeasure, type SpcProportion } from '@upstroke/contracts';

/** A value in words for tables and the screen reader (shared with the monthly report PDF). */
export { formatSpcValue };

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
