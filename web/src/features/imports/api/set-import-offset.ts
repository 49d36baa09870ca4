import { useMutation, useQueryClient } from '@tanstack/react-query';
import { monitorImportSchema } from '@upstroke/contracts';
import { apiFetch } from '../../../lib/api-client';

export function setImportOffset(id: string, importId: string, offsetSec: number) {
  return apiFetch(`/resuscitations/${id}/imports/${importId}`, {
    method: 'PATCH',
    body: { offsetSec },
    schema: monitorImportSchema,
  });
}

/** Saves the lead's offset; the imports and the record's analysis are read again. */
export function useSetImportOffset(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (v: { importId: string; offsetSec: number }) =>
      setImportOffset(id, v.importId, v.offsetSec),
    onSuccess: async () => {
      await client.invalidateQueries({ queryKey: ['resuscitations', id] });
      await client.invalidateQueries({ queryKey: ['debrief', id] });
    },
  });
}
