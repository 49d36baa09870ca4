import { siteSchema } from '@upstroke/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';
import { sitesKey } from './list-sites';

/** `POST /sites/:id/units` without a unit id, `PATCH /sites/:id/units/:unitId` with one. */
export function saveUnit(input: { siteId: string; unitId?: string; name: string }) {
  const path = `/sites/${input.siteId}/units${input.unitId ? `/${input.unitId}` : ''}`;
  return apiFetch(path, {
    method: input.unitId ? 'PATCH' : 'POST',
    body: { name: input.name },
    schema: siteSchema,
  });
}

export function useSaveUnit() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: saveUnit,
    onSuccess: () => client.invalidateQueries({ queryKey: sitesKey }),
  });
}
