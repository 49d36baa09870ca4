import type { TrendsFilter } from '@upstroke/contracts';

/** Query string of the shared trends filters (empty values left out). */
export function trendsSearch(filter: TrendsFilter, extra: Record<string, string | number> = {}) {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries({ ...filter, ...extra })) {
    if (v !== undefined && v !== '') params.set(k, String(v));
  }
  return params.toString();
}
