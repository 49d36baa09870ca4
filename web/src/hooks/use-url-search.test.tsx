import { act, renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter, useLocation } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { useUrlSearch } from './use-url-search';

const wrapper = ({ children }: { children: ReactNode }) => (
  <MemoryRouter initialEntries={['/trends?from=2026-01-01']}>{children}</MemoryRouter>
);

function setKey(key: string, value: string) {
  return (current: URLSearchParams) => {
    const next = new URLSearchParams(current);
    next.set(key, value);
    return next;
  };
}

describe('useUrlSearch', () => {
  it('keeps both of two changes made before the next render', () => {
    const { result } = renderHook(() => ({ url: useUrlSearch(), location: useLocation() }), {
      wrapper,
    });
    act(() => {
      const [, update] = result.current.url;
      update(setKey('unitId', 'u1'));
      update(setKey('to', '2026-04-01'));
    });
    const [params] = result.current.url;
    expect(params.get('from')).toBe('2026-01-01');
    expect(params.get('unitId')).toBe('u1');
    expect(params.get('to')).toBe('2026-04-01');
    expect(new URLSearchParams(result.current.location.search).get('unitId')).toBe('u1');
  });
});
