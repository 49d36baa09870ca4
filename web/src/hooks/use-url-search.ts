import { useEffect, useRef } from 'react';
import { useSearchParams } from 'react-router-dom';

/**
 * The URL's search params with changes that build on each other. React Router applies a
 * navigation inside a transition, so a change made before the previous one is committed (a
 * unit picked, then a date typed at once) would start from the old URL and undo it. The last
 * written params are used until a committed render shows them (cleared in an effect: a
 * transition may render without committing, and the screen's handlers stay the old ones).
 */
export function useUrlSearch(): [
  URLSearchParams,
  (change: (current: URLSearchParams) => URLSearchParams) => void,
] {
  const [params, setParams] = useSearchParams();
  const pending = useRef<URLSearchParams | null>(null);
  const shown = params.toString();
  useEffect(() => {
    if (pending.current?.toString() === shown) pending.current = null;
  }, [shown]);
  const update = (change: (current: URLSearchParams) => URLSearchParams) => {
    const next = change(pending.current ?? params);
    pending.current = next;
    setParams(next, { replace: true });
  };
  return [params, update];
}
