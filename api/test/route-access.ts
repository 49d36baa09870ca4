import type { Role } from '@upstroke/contracts';

const clinical: Role[] = ['recorder', 'lead'];
const readers: Role[] = ['recorder', 'lead', 'quality'];
const everyone: Role[] = ['recorder', 'lead', 'quality', 'admin'];
const admin: Role[] = ['admin'];

/**
 * Who may call each route (OpenAPI path syntax). 'public' needs no token. The role matrix
 * test checks every route of the running API against this table.
 */
export const routeAccess: Record<string, Role[] | 'public'> = {
  'POST /api/auth/login': 'public',
  'GET /api/auth/me': everyone,
  'POST /api/auth/logout': everyone,
  'GET /api/health': 'public',
  'POST /api/resuscitations': clinical,
  'GET /api/resuscitations': readers,
  'GET /api/resuscitations/{id}': readers,
  'GET /api/resuscitations/{id}/entries': readers,
  'PATCH /api/resuscitations/{id}': clinical,
  'POST /api/resuscitations/{id}/events/batch': clinical,
  'POST /api/resuscitations/{id}/etco2/batch': clinical,
  'POST /api/resuscitations/{id}/waveform/batch': clinical,
  'POST /api/resuscitations/{id}/discards': ['lead'],
  'GET /api/resuscitations/{id}/debrief': readers,
  'POST /api/resuscitations/{id}/sign': ['lead'],
  'POST /api/resuscitations/{id}/amendments': ['lead'],
  'GET /api/resuscitations/{id}/report.pdf': ['lead', 'quality'],
  'GET /api/resuscitations/{id}/fhir': ['lead', 'quality'],
  'POST /api/resuscitations/{id}/email': ['lead'],
  'GET /api/mail/outbox': ['admin'],
  'GET /api/context': everyone,
  'POST /api/auth/set-password': 'public',
  'GET /api/users': admin,
  'POST /api/users': admin,
  'PATCH /api/users/{id}': admin,
  'POST /api/users/{id}/reset-password': admin,
  'GET /api/sites': admin,
  'POST /api/sites': admin,
  'GET /api/sites/{id}': admin,
  'PATCH /api/sites/{id}': admin,
  'POST /api/sites/{id}/units': admin,
  'PATCH /api/sites/{id}/units/{unitId}': admin,
  'GET /api/protocol-profiles': admin,
  'POST /api/protocol-profiles': admin,
  'GET /api/protocol-profiles/{id}': admin,
  'GET /api/audit': admin,
  'GET /api/audit/export.csv': admin,
  'GET /api/audit/vocabulary': admin,
  'GET /api/admin/mail': admin,
  'GET /api/admin/mail/{id}': admin,
  'GET /api/resuscitations/{id}/imports': readers,
  'POST /api/resuscitations/{id}/imports': clinical,
  'PATCH /api/resuscitations/{id}/imports/{importId}': ['lead'],
  'GET /api/trends': ['quality', 'admin', 'lead'],
  'GET /api/trends/records': ['quality', 'admin', 'lead'],
  'GET /api/trends/utstein': ['quality', 'admin', 'lead'],
  'GET /api/trends/export.csv': ['quality', 'admin', 'lead'],
  'GET /api/trends/utstein.csv': ['quality', 'admin', 'lead'],
  'GET /api/trends/control-chart': ['quality', 'admin', 'lead'],
  'GET /api/trends/funnel': ['quality', 'admin', 'lead'],
  'GET /api/trends/monthly-report.pdf': ['quality', 'admin'],
  'GET /api/reviews': ['quality', 'admin', 'lead'],
  'GET /api/reviews/{resuscitationId}': ['quality', 'admin', 'lead'],
  'POST /api/reviews/{resuscitationId}': ['quality'],
};
