import { listSchema, siteSchema } from '@upstroke/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

export const sitesKey = ['admin', 'sites'] as const;

export function listSites() {
  return apiFetch('/sites', { schema: listSchema(siteSchema) });
}

export const sitesQuery = () => queryOptions({ queryKey: sitesKey, queryFn: listSites });

export function useSites() {
  return useQuery(sitesQuery());
}
