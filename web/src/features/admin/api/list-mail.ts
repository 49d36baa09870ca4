import { mailOverviewSchema, mailSinkMessageDetailSchema } from '@upstroke/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client';

export function listMail(page: { limit: number; offset: number }) {
  return apiFetch(`/admin/mail?limit=${page.limit}&offset=${page.offset}`, {
    schema: mailOverviewSchema,
  });
}

export const mailQuery = (page: { limit: number; offset: number }) =>
  queryOptions({ queryKey: ['admin', 'mail', page], queryFn: () => listMail(page) });

export function useMail(page: { limit: number; offset: number }) {
  return useQuery(mailQuery(page));
}

export function useMailMessage(id: number | null) {
  return useQuery({
    queryKey: ['admin', 'mail-message', id],
    queryFn: () => apiFetch(`/admin/mail/${id}`, { schema: mailSinkMessageDetailSchema }),
    enabled: id !== null,
  });
}
