import { type CreateSite, siteSchema, type UpdateSite } from '@upstroke/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

/** `POST /sites` without an id, `PATCH /sites/:id` with one. */
export function saveSite(input: { id?: string; body: CreateSite | UpdateSite }) {
  return input.id
    ? apiFetch(`/sites/${input.id}`, { method: 'PATCH', body: input.body, schema: siteSchema })
    : apiFetch('/sites', { method: 'POST', body: input.body, schema: siteSchema });
}

export function useSaveSite() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: saveSite,
    onSuccess: () => client.invalidateQueries({ queryKey: ['admin'] }),
  });
}
