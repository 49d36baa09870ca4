import { type TrendsFilter, utsteinSummarySchema } from '@upstroke/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { trendsSearch } from './trends-search';

export function getUtstein(filter: TrendsFilter) {
  return apiFetch(`/trends/utstein?${trendsSearch(filter)}`, { schema: utsteinSummarySchema });
}

export const utsteinQuery = (filter: TrendsFilter) =>
  queryOptions({ queryKey: ['trends', 'utstein', filter], queryFn: () => getUtstein(filter) });

export function useUtstein(filter: TrendsFilter) {
  return useQuery(utsteinQuery(filter));
}
