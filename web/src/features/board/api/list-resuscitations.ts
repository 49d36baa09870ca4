import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema, resuscitationSchema } from '@upstroke/contracts';
import { apiFetch } from '../../../lib/api-client';

export const listResuscitationsSchema = listSchema(resuscitationSchema);

export function listRecentResuscitations() {
  return apiFetch('/resuscitations?limit=20', { schema: listResuscitationsSchema });
}

export const recentResuscitationsQuery = queryOptions({
  queryKey: ['resuscitations', 'recent'],
  queryFn: listRecentResuscitations,
  // Offline the list simply is not there; the device's own records still show.
  retry: false,
});

export function useRecentResuscitations() {
  return useQuery(recentResuscitationsQuery);
}
