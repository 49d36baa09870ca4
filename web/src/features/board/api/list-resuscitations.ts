import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { listSchema, resuscitationListItemSchema } from '@upstroke/contracts';
import { apiFetch } from '../../../lib/api-client';

export const listResuscitationsSchema = listSchema(resuscitationListItemSchema);

/** Rows per page on the Board. */
export const PAGE_SIZE = 20;

/** `query`: the API's search parameters (see `listResuscitationsQuerySchema`), without paging. */
export function listResuscitations(query: URLSearchParams, page: number) {
  const params = new URLSearchParams(query);
  params.set('limit', String(PAGE_SIZE));
  params.set('offset', String(page * PAGE_SIZE));
  return apiFetch(`/resuscitations?${params.toString()}`, { schema: listResuscitationsSchema });
}

export function useResuscitationSearch(query: URLSearchParams, page: number) {
  const key = query.toString();
  return useQuery({
    queryKey: ['resuscitations', 'search', key, page],
    queryFn: () => listResuscitations(query, page),
    placeholderData: keepPreviousData,
    // Offline the list simply is not there; the device's own records still show.
    retry: false,
  });
}
