import { useEffect, useSyncExternalStore } from 'react';

let open = 0;
const listeners = new Set<() => void>();
const notify = () => listeners.forEach((l) => l());

/** Marks the Live screen as open (an app update must never interrupt a running code). */
export function useMarkLiveOpen(): void {
  useEffect(() => {
    open += 1;
    notify();
    return () => {
      open -= 1;
      notify();
    };
  }, []);
}

export function useIsLiveOpen(): boolean {
  return useSyncExternalStore(
    (l) => {
      listeners.add(l);
      return () => listeners.delete(l);
    },
    () => open > 0,
  );
}
