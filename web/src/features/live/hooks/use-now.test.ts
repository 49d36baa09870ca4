import { act, renderHook } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { useNow } from './use-now';

describe('useNow', () => {
  beforeEach(() => {
    vi.useFakeTimers();
    vi.setSystemTime(new Date('2026-03-04T10:00:00.400Z'));
  });
  afterEach(() => vi.useRealTimers());

  it('ticks once a second, on the second', () => {
    const { result } = renderHook(() => useNow());
    const first = result.current;
    act(() => {
      vi.advanceTimersByTime(599);
    });
    expect(result.current).toBe(first); // not yet: 10:00:00.999
    act(() => {
      vi.advanceTimersByTime(1);
    });
    expect(new Date(result.current).toISOString()).toBe('2026-03-04T10:00:01.000Z');
    act(() => {
      vi.advanceTimersByTime(3000);
    });
    expect(new Date(result.current).toISOString()).toBe('2026-03-04T10:00:04.000Z');
    act(() => {
      vi.advanceTimersByTime(999);
    });
    expect(new Date(result.current).toISOString()).toBe('2026-03-04T10:00:04.000Z');
  });
});
