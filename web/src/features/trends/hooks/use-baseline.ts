import { monthSchema } from '@upstroke/contracts';
import { useUrlSearch } from '../../../hooks/use-url-search';
import type { BaselineMonths } from '../api/get-control-chart';

const keys = ['baselineFrom', 'baselineTo'] as const;

/** The baseline the URL holds; a month that does not parse (a hand-edited link) is dropped. */
export function baselineFrom(params: URLSearchParams): BaselineMonths {
  const out: BaselineMonths = {};
  for (const key of keys) {
    const value = params.get(key);
    if (value && monthSchema.safeParse(value).success) out[key] = value;
  }
  return out;
}

/** The same params with the baseline set (empty months removed), the rest kept. */
export function withBaseline(current: URLSearchParams, b: BaselineMonths): URLSearchParams {
  const out = new URLSearchParams(current);
  for (const key of keys) {
    const value = b[key];
    if (value) out.set(key, value);
    else out.delete(key);
  }
  return out;
}

/**
 * The committee's baseline period kept in the URL beside the filters, so a reload or a
 * shared link judges the same months against the same centre line.
 */
export function useBaseline(): [BaselineMonths, (b: BaselineMonths) => void] {
  const [params, update] = useUrlSearch();
  return [baselineFrom(params), (b) => update((current) => withBaseline(current, b))];
}
