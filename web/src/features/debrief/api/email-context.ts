import { useQuery } from '@tanstack/react-query';
import { recordingContextSchema, resuscitationSchema } from '@upstroke/contracts';
import { apiFetch } from '../../../lib/api-client';

/**
 * What the e-mail form needs: the record's team as entered on Live (the same query as Live's),
 * whether it is signed, and its site's e-mail domains (the API refuses any other address).
 */
export function useEmailContext(id: string) {
  const record = useQuery({
    queryKey: ['resuscitations', id, 'summary'],
    queryFn: () => apiFetch(`/resuscitations/${id}`, { schema: resuscitationSchema }),
  });
  const context = useQuery({
    queryKey: ['context'],
    queryFn: () => apiFetch('/context', { schema: recordingContextSchema }),
    staleTime: 60_000,
  });
  const site = context.data?.sites.find((s) => s.id === record.data?.siteId);
  return {
    members: (record.data?.roster ?? []).filter((m) => m.email),
    signed: record.data?.status === 'signed',
    domains: site?.mailDomains ?? [],
    loading: record.isPending,
  };
}
