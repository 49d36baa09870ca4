import { authStore } from '../../../lib/auth-store';
import { ApiRequestError } from '../../../lib/api-client';
import { type AuditFilters, auditSearch } from './list-audit';

/** Downloads the filtered audit trail as CSV (a file, so not through apiFetch's JSON path). */
export async function exportAudit(filters: AuditFilters): Promise<void> {
  const token = authStore.get()?.accessToken;
  const res = await fetch(`/api/audit/export.csv?${auditSearch(filters)}`, {
    headers: token ? { Authorization: `Bearer ${token}` } : {},
  });
  if (!res.ok) throw new ApiRequestError(res.status, null);
  const url = URL.createObjectURL(await res.blob());
  const link = document.createElement('a');
  link.href = url;
  link.download = `upstroke-audit-${new Date().toISOString().slice(0, 10)}.csv`;
  link.click();
  URL.revokeObjectURL(url);
}
