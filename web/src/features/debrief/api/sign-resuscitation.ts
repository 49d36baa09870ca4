import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  type Amendment,
  amendmentSchema,
  type CreateAmendment,
  type PatchResuscitation,
  type Resuscitation,
  resuscitationSchema,
} from '@upstroke/contracts';
import { apiFetch } from '../../../lib/api-client';

export function signResuscitation(id: string): Promise<Resuscitation> {
  return apiFetch(`/resuscitations/${id}/sign`, { method: 'POST', schema: resuscitationSchema });
}

export function createAmendment(id: string, body: CreateAmendment): Promise<Amendment> {
  return apiFetch(`/resuscitations/${id}/amendments`, {
    method: 'POST',
    body,
    schema: amendmentSchema,
  });
}

export function updateClosing(id: string, body: PatchResuscitation): Promise<Resuscitation> {
  return apiFetch(`/resuscitations/${id}`, {
    method: 'PATCH',
    body,
    schema: resuscitationSchema,
  });
}

/** Mutations that change the record refresh its debrief when they succeed. */
function useRecordMutation<T, R>(id: string, fn: (id: string, body: T) => Promise<R>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: T) => fn(id, body),
    onSuccess: () => client.invalidateQueries({ queryKey: ['debrief', id] }),
  });
}

export const useSign = (id: string) =>
  useRecordMutation<void, Resuscitation>(id, signResuscitation);
export const useAmend = (id: string) => useRecordMutation(id, createAmendment);
export const useUpdateClosing = (id: string) => useRecordMutation(id, updateClosing);
