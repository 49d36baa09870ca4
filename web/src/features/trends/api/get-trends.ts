import { type TrendsFilter, trendsResponseSchema } from '@upstroke/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { trendsSearch } from './trends-search';

export function getTrends(filter: TrendsFilter) {
  return apiFetch(`/trends?${trendsSearch(filter)}`, { schema: trendsResponseSchema });
}

export const trendsQuery = (filter: TrendsFilter) =>
  queryOptions({ queryKey: ['trends', 'series', filter], queryFn: () => getTrends(filter) });

export function useTrends(filter: TrendsFilter) {
  return useQuery({ ...trendsQuery(filter), placeholderData: keepPreviousData });
}
