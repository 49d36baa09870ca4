import { listSchema, protocolProfileSchema } from '@upstroke/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

export const profilesKey = (siteId: string) => ['admin', 'profiles', siteId] as const;

export function listProfiles(siteId: string) {
  return apiFetch(`/protocol-profiles?siteId=${siteId}`, {
    schema: listSchema(protocolProfileSchema),
  });
}

export const profilesQuery = (siteId: string) =>
  queryOptions({ queryKey: profilesKey(siteId), queryFn: () => listProfiles(siteId) });

export function useProfiles(siteId: string | undefined) {
  return useQuery({ ...profilesQuery(siteId ?? ''), enabled: Boolean(siteId) });
}
