import type { RecordingContext } from '@upstroke/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

/** The caller's sites and units (for the filters), from the recording context. */
export function getSites() {
  return apiFetch('/context') as Promise<RecordingContext>;
}

export const sitesQuery = () =>
  queryOptions({ queryKey: ['trends', 'sites'], queryFn: getSites, staleTime: 5 * 60_000 });

export function useTrendSites() {
  return useQuery(sitesQuery());
}
