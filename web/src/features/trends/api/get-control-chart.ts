import {
  controlChartResponseSchema,
  type SpcMeasure,
  type TrendsFilter,
} from '@upstroke/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { trendsSearch } from './trends-search';

/** First and last month (inclusive) of the committee's baseline; both optional. */
export interface BaselineMonths {
  baselineFrom?: string;
  baselineTo?: string;
}

export function getControlChart(filter: TrendsFilter, measure: SpcMeasure, b: BaselineMonths) {
  const extra = { measure, ...b } as Record<string, string>;
  return apiFetch(`/trends/control-chart?${trendsSearch(filter, extra)}`, {
    schema: controlChartResponseSchema,
  });
}

export const controlChartQuery = (filter: TrendsFilter, measure: SpcMeasure, b: BaselineMonths) =>
  queryOptions({
    queryKey: ['trends', 'control-chart', filter, measure, b],
    queryFn: () => getControlChart(filter, measure, b),
  });

export function useControlChart(filter: TrendsFilter, measure: SpcMeasure, b: BaselineMonths) {
  return useQuery({ ...controlChartQuery(filter, measure, b), placeholderData: keepPreviousData });
}
