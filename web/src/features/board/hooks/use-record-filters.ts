import { useUrlSearch } from '../../../hooks/use-url-search';
import { nextDay, zonedDayStart } from '../../../lib/zoned-day';

/** The Board's filters as the URL keeps them (so a reload or a shared link keeps them too). */
export interface RecordFilters {
  q: string;
  /** Calendar days in the site's time zone, `YYYY-MM-DD`. */
  from: string;
  to: string;
  unitId: string;
  status: '' | 'open' | 'closed' | 'signed';
  signed: '' | 'signed' | 'unsigned';
  mine: boolean;
}

const keys = ['q', 'from', 'to', 'unitId', 'status', 'signed'] as const;

export function filtersFrom(params: URLSearchParams): RecordFilters {
  const get = (k: string) => params.get(k) ?? '';
  const status = get('status');
  const signed = get('signed');
  return {
    q: get('q'),
    from: get('from'),
    to: get('to'),
    unitId: get('unitId'),
    status: status === 'open' || status === 'closed' || status === 'signed' ? status : '',
    signed: signed === 'signed' || signed === 'unsigned' ? signed : '',
    mine: get('mine') === 'true',
  };
}

/** The API's query for these filters: days become instants in the site's time zone. */
export function apiQuery(f: RecordFilters, timeZone: string): URLSearchParams {
  const out = new URLSearchParams();
  if (f.q.trim()) out.set('q', f.q.trim());
  const from = f.from ? zonedDayStart(f.from, timeZone) : null;
  const to = f.to ? zonedDayStart(nextDay(f.to), timeZone) : null;
  if (from) out.set('from', from.toISOString());
  if (to) out.set('to', to.toISOString());
  if (f.unitId) out.set('unitId', f.unitId);
  if (f.status) out.set('status', f.status);
  if (f.signed) out.set('signed', f.signed);
  if (f.mine) out.set('mine', 'true');
  return out;
}

export function isFiltered(f: RecordFilters): boolean {
  return keys.some((k) => f[k] !== '') || f.mine;
}

/** Filters and page in the URL; changing a filter goes back to the first page. */
export function useRecordFilters() {
  const [params, update] = useUrlSearch();
  const write = (change: (f: RecordFilters) => RecordFilters, nextPage: number) =>
    update((current) => {
      const f = change(filtersFrom(current));
      const out = new URLSearchParams();
      for (const k of keys) if (f[k]) out.set(k, f[k]);
      if (f.mine) out.set('mine', 'true');
      if (nextPage > 0) out.set('page', String(nextPage));
      return out;
    });
  return {
    filters: filtersFrom(params),
    page: Math.max(0, Number(params.get('page') ?? 0) || 0),
    setFilters: (patch: Partial<RecordFilters>) => write((f) => ({ ...f, ...patch }), 0),
    setPage: (p: number) => write((f) => f, p),
    clear: () => write(() => filtersFrom(new URLSearchParams()), 0),
  };
}
