import { useSyncExternalStore } from 'react';

type Mode = 'light' | 'dark';
const key = 'upstroke.colorMode';
const listeners = new Set<() => void>();

function read(): Mode {
  return localStorage.getItem(key) === 'dark' ? 'dark' : 'light';
}

/** Light or dark (for dim rooms), remembered on this device. */
export function useColorMode() {
  const mode = useSyncExternalStore((l) => {
    listeners.add(l);
    return () => listeners.delete(l);
  }, read);
  const toggle = () => {
    localStorage.setItem(key, mode === 'dark' ? 'light' : 'dark');
    listeners.forEach((l) => l());
  };
  return { mode, toggle };
}
