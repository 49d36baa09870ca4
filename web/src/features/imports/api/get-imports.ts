import { queryOptions, useQuery } from '@tanstack/react-query';
import { monitorImportListSchema } from '@upstroke/contracts';
import { apiFetch } from '../../../lib/api-client';

export const importsQueryKey = (id: string) => ['resuscitations', id, 'imports'] as const;

export function getImports(id: string) {
  return apiFetch(`/resuscitations/${id}/imports`, { schema: monitorImportListSchema });
}

export const importsQuery = (id: string) =>
  queryOptions({ queryKey: importsQueryKey(id), queryFn: () => getImports(id) });

export function useImports(id: string) {
  return useQuery(importsQuery(id));
}
