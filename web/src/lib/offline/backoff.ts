export interface BackoffOptions {
  baseMs?: number;
  maxMs?: number;
  random?: () => number;
}

/**
 * Delay before retry number `failures` (1 = after the first failure): exponential with "equal
 * jitter" — half the step is fixed, half random — so tablets that lost the network together
 * do not all retry in the same instant, yet none retries sooner than half its step.
 */
export function backoffDelay(failures: number, options: BackoffOptions = {}): number {
  const { baseMs = 1000, maxMs = 30_000, random = Math.random } = options;
  if (failures <= 0) return 0;
  const step = Math.min(maxMs, baseMs * 2 ** Math.min(failures - 1, 30));
  return Math.round(step / 2 + (step / 2) * random());
}
