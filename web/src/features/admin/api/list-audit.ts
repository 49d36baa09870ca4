import { auditEntrySchema, listSchema } from '@upstroke/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiFetch } from '../../../lib/api-client';

export interface AuditFilters {
  userId?: string;
  action?: string;
  entity?: string;
  resuscitationId?: string;
  from?: string;
  to?: string;
}

/** Query string of the filters that are set (empty ones are left out). */
export function auditSearch(filters: AuditFilters, page?: { limit: number; offset: number }) {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries({ ...filters, ...page })) {
    if (v !== undefined && v !== '') params.set(k, String(v));
  }
  return params.toString();
}

export function listAudit(filters: AuditFilters, page: { limit: number; offset: number }) {
  return apiFetch(`/audit?${auditSearch(filters, page)}`, {
    schema: listSchema(auditEntrySchema),
  });
}

export const auditQuery = (filters: AuditFilters, page: { limit: number; offset: number }) =>
  queryOptions({
    queryKey: ['admin', 'audit', filters, page],
    queryFn: () => listAudit(filters, page),
    placeholderData: keepPreviousData,
  });

export function useAudit(filters: AuditFilters, page: { limit: number; offset: number }) {
  return useQuery(auditQuery(filters, page));
}

const vocabularySchema = z.object({ actions: z.array(z.string()), entities: z.array(z.string()) });

export function useAuditVocabulary() {
  return useQuery({
    queryKey: ['admin', 'audit-vocabulary'],
    queryFn: () => apiFetch('/audit/vocabulary', { schema: vocabularySchema }),
  });
}
