import type { ApiError, TrendsFilter } from '@upstroke/contracts';
import { ApiRequestError } from '../../../lib/api-client';
import { authStore } from '../../../lib/auth-store';
import { trendsSearch } from './trends-search';

/**
 * Downloads the monthly committee report (PDF) for a month with the page's site, unit,
 * rhythm and outcome filters; the month stands in for the date range.
 */
export async function downloadMonthlyReport(month: string, filter: TrendsFilter) {
  const { from: _from, to: _to, ...rest } = filter;
  const token = authStore.get()?.accessToken;
  const res = await fetch(`/api/trends/monthly-report.pdf?${trendsSearch(rest, { month })}`, {
    headers: token ? { Authorization: `Bearer ${token}` } : {},
  });
  if (!res.ok) {
    const body = (await res.json().catch(() => null)) as ApiError | null;
    throw new ApiRequestError(res.status, body);
  }
  const url = URL.createObjectURL(await res.blob());
  const link = document.createElement('a');
  link.href = url;
  link.download = `upstroke-committee-report-${month}.pdf`;
  link.click();
  URL.revokeObjectURL(url);
}
