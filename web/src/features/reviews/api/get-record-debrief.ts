import { queryOptions, useQuery } from '@tanstack/react-query';
import { debriefSchema } from '@upstroke/contracts';
import { apiFetch } from '../../../lib/api-client';

/** The record's debrief as the API composes it (the same as the Debrief screen's): read only. */
export const recordDebriefQuery = (id: string) =>
  queryOptions({
    queryKey: ['debrief', id],
    queryFn: () => apiFetch(`/resuscitations/${id}/debrief`, { schema: debriefSchema }),
  });

export function useRecordDebrief(id: string) {
  return useQuery(recordDebriefQuery(id));
}
