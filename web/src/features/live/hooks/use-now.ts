import { useEffect, useState } from 'react';

/**
 * The current time, re-rendering on each whole `intervalMs` of the clock: by default once a
 * second, on the second, so every clock on the Live screen steps together and a timer that
 * shows whole seconds never draws the same figure twice.
 */
export function useNow(intervalMs = 1000): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const untilNext = (t: number) => intervalMs - (t % intervalMs);
    let id = setTimeout(function tick() {
      const t = Date.now();
      setNow(t);
      id = setTimeout(tick, untilNext(t));
    }, untilNext(Date.now()));
    return () => clearTimeout(id);
  }, [intervalMs]);
  return now;
}
