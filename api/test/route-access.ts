import type { Role } from '@upstroke/contracts';

const clinical: Role[] = ['recorder', 'lead'];
const readers: Role[] = ['recorder', 'lead', 'quality'];
const everyone: Role[] = ['recorder', 'lead', 'quality', 'admin'];

/**
 * Who may call each route (OpenAPI path syntax). 'public' needs no token. The role matrix
 * test checks every route of the running API against this table.
 */
export const routeAccess: Record<string, Role[] | 'public'> = {
  'POST /api/auth/login': 'public',
  'GET /api/auth/me': everyone,
  'GET /api/health': 'public',
  'POST /api/resuscitations': clinical,
  'GET /api/resuscitations': readers,
  'GET /api/resuscitations/{id}': readers,
  'PATCH /api/resuscitations/{id}': clinical,
  'POST /api/resuscitations/{id}/events/batch': clinical,
  'POST /api/resuscitations/{id}/etco2/batch': clinical,
  'POST /api/resuscitations/{id}/waveform/batch': clinical,
  'GET /api/resuscitations/{id}/debrief': readers,
  'POST /api/resuscitations/{id}/sign': ['lead'],
  'POST /api/resuscitations/{id}/amendments': ['lead'],
};
