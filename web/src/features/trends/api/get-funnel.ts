import { funnelResponseSchema, type SpcProportion, type TrendsFilter } from '@upstroke/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { trendsSearch } from './trends-search';

export type FunnelBy = 'unit' | 'site';

export function getFunnel(filter: TrendsFilter, measure: SpcProportion, by: FunnelBy) {
  return apiFetch(`/trends/funnel?${trendsSearch(filter, { measure, by })}`, {
    schema: funnelResponseSchema,
  });
}

export const funnelQuery = (filter: TrendsFilter, measure: SpcProportion, by: FunnelBy) =>
  queryOptions({
    queryKey: ['trends', 'funnel', filter, measure, by],
    queryFn: () => getFunnel(filter, measure, by),
  });

export function useFunnel(filter: TrendsFilter, measure: SpcProportion, by: FunnelBy) {
  return useQuery({ ...funnelQuery(filter, measure, by), placeholderData: keepPreviousData });
}
