import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { UtsteinTable } from './utstein-table';

const summary = {
  from: '2026-01-01',
  to: '2026-04-01',
  total: 12,
  lines: [
    { key: 'total', label: 'Treated arrests', count: 12, denominator: 12, percent: 100 },
    { key: 'anyRosc', label: 'Any ROSC', count: 11, denominator: 12, percent: 91.7 },
  ],
  medians: [
    { key: 'compressionFraction', label: 'Compression fraction', value: 0.9017857, n: 12 },
    { key: 'timeToShock', label: 'Time to first shock, shockable (s)', value: 95, n: 4 },
  ],
};

describe('Utstein-style summary', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('writes every share in percent and the period as calendar days, never raw', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response(JSON.stringify(summary), { status: 200 })),
    );
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <UtsteinTable filter={{ from: '2026-01-01', to: '2026-04-01' }} />
      </QueryClientProvider>,
    );
    const shares = await screen.findByRole('table', { name: 'Utstein-style summary' });
    expect(within(shares).getByRole('row', { name: /Any ROSC/ })).toHaveTextContent(
      'Any ROSC1191.7 %',
    );
    const medians = screen.getByRole('table', { name: 'Medians' });
    // 0.9017857 is a share: 90 %, never "0.90"; 95 s is 1:35.
    expect(within(medians).getByRole('row', { name: /compression fraction/ })).toHaveTextContent(
      '90 %',
    );
    expect(within(medians).getByRole('row', { name: /first shock/ })).toHaveTextContent('1:35');
    expect(medians).not.toHaveTextContent(/0\.9/);
    // The end date is exclusive in the API; the reader sees the last day included (en-GB).
    expect(screen.getByText(/Period: 1 Jan 2026 to 31 Mar 2026\./)).toBeVisible();
  });
});
