export {
  type FunnelLimits,
  funnelLimits,
  type FunnelPoint,
  funnelPlot,
  type FunnelUnit,
  type FunnelZone,
  Z_95,
  Z_998,
} from './funnel.js';
export { pChart, type ProportionCount, SIGMA_LIMIT } from './p-chart.js';
export { beyondLimits, RUN_LENGTH, runOfEight, runRules } from './run-rules.js';
export type {
  Baseline,
  ChartOptions,
  ControlChart,
  ControlPoint,
  RuleId,
  Signal,
} from './types.js';
export { movingRanges, xmrChart, XMR_LIMIT_FACTOR } from './xmr-chart.js';
