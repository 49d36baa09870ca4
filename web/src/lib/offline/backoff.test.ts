import { describe, expect, it } from 'vitest';
import { backoffDelay } from './backoff';

describe('backoffDelay', () => {
  it('doubles the step after each failure, within [step/2, step]', () => {
    const low = [1, 2, 3, 4].map((n) => backoffDelay(n, { baseMs: 1000, random: () => 0 }));
    const high = [1, 2, 3, 4].map((n) => backoffDelay(n, { baseMs: 1000, random: () => 1 }));
    expect(low).toEqual([500, 1000, 2000, 4000]);
    expect(high).toEqual([1000, 2000, 4000, 8000]);
  });

  it('never exceeds the ceiling, however many failures', () => {
    expect(backoffDelay(50, { baseMs: 1000, maxMs: 30_000, random: () => 1 })).toBe(30_000);
    expect(backoffDelay(50, { baseMs: 1000, maxMs: 30_000, random: () => 0 })).toBe(15_000);
  });

  it('spreads tablets that failed together (jitter)', () => {
    const seen = new Set(Array.from({ length: 50 }, () => backoffDelay(5)));
    expect(seen.size).toBeGreaterThan(10);
    for (const d of seen) expect(d).toBeGreaterThanOrEqual(8000);
  });

  it('waits nothing before the first try', () => {
    expect(backoffDelay(0)).toBe(0);
  });
});
