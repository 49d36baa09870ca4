import { type TrendsFilter, trendsFilterSchema } from '@upstroke/contracts';
import { useUrlSearch } from '../../../hooks/use-url-search';

const keys = Object.keys(trendsFilterSchema.shape) as (keyof TrendsFilter)[];

/** The filter the URL holds; a key that does not parse (a hand-edited link) is dropped alone. */
export function trendsFilterFrom(params: URLSearchParams): TrendsFilter {
  const filter: Record<string, string> = {};
  for (const key of keys) {
    const value = params.get(key);
    if (!value) continue;
    const one = trendsFilterSchema.shape[key].safeParse(value);
    if (one.success && one.data !== undefined) filter[key] = value;
  }
  return filter as TrendsFilter;
}

/** The params with the filter patched in; other keys (the baseline) are kept. */
export function filtersInto(current: URLSearchParams, patch: Partial<TrendsFilter>) {
  const next: TrendsFilter = { ...trendsFilterFrom(current), ...patch };
  const out = new URLSearchParams(current);
  for (const key of keys) {
    if (next[key]) out.set(key, String(next[key]));
    else out.delete(key);
  }
  return out;
}

/** Trends filters kept in the URL, so a reload, a bookmark or a shared link keeps them. */
/** Changes are patches over the latest filter, so quick successive changes all hold. */
export function useTrendsFilter(): [TrendsFilter, (patch: Partial<TrendsFilter>) => void] {
  const [params, update] = useUrlSearch();
  const set = (patch: Partial<TrendsFilter>) => update((current) => filtersInto(current, patch));
  return [trendsFilterFrom(params), set];
}
