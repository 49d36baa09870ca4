import {
  listSchema,
  type TrendsFilter,
  trendsRecordSchema,
  type TrendsRecordsQuery,
} from '@upstroke/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { trendsSearch } from './trends-search';

export type RecordsPaging = Pick<TrendsRecordsQuery, 'sort' | 'order' | 'limit' | 'offset'>;

export function getTrendRecords(filter: TrendsFilter, paging: RecordsPaging) {
  return apiFetch(`/trends/records?${trendsSearch(filter, paging)}`, {
    schema: listSchema(trendsRecordSchema),
  });
}

export const trendRecordsQuery = (filter: TrendsFilter, paging: RecordsPaging) =>
  queryOptions({
    queryKey: ['trends', 'records', filter, paging],
    queryFn: () => getTrendRecords(filter, paging),
  });

export function useTrendRecords(filter: TrendsFilter, paging: RecordsPaging) {
  return useQuery({ ...trendRecordsQuery(filter, paging), placeholderData: keepPreviousData });
}
