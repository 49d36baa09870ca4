import type { TrendsFilter } from '@upstroke/contracts';
import { ApiRequestError } from '../../../lib/api-client';
import { authStore } from '../../../lib/auth-store';
import { trendsSearch } from './trends-search';

/** Downloads `export.csv` or `utstein.csv` for the filters (a file, not JSON). */
export async function downloadCsv(kind: 'export' | 'utstein', filter: TrendsFilter) {
  const token = authStore.get()?.accessToken;
  const res = await fetch(`/api/trends/${kind}.csv?${trendsSearch(filter)}`, {
    headers: token ? { Authorization: `Bearer ${token}` } : {},
  });
  if (!res.ok) throw new ApiRequestError(res.status, null);
  const url = URL.createObjectURL(await res.blob());
  const link = document.createElement('a');
  link.href = url;
  link.download = `upstroke-${kind === 'export' ? 'records' : 'utstein'}-${new Date().toISOString().slice(0, 10)}.csv`;
  link.click();
  URL.revokeObjectURL(url);
}
