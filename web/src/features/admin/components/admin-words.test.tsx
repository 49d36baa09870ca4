import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { MailPanel } from './mail-panel';
import { UsersPanel } from './users-panel';

const siteId = '6f1c1f0e-8a51-4d5e-9d8e-2f1c8c3c0a11';
const user = (n: number, role: string) => ({
  id: `5a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4${n}`,
  email: `person${n}@kestrel.test`,
  name: `Person ${n}`,
  role,
  siteIds: [siteId],
  active: true,
  passwordSet: true,
  createdAt: '2026-03-04T10:00:00.000Z',
});

function serve(answers: Record<string, unknown>) {
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string) => {
      const path = Object.keys(answers).find((p) => url.includes(p));
      return new Response(JSON.stringify(path ? answers[path] : {}), { status: 200 });
    }),
  );
}

function renderIn(node: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(<QueryClientProvider client={client}>{node}</QueryClientProvider>);
}

describe('Admin words', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('names each role in words in the users list, never its code', async () => {
    serve({
      '/users': { items: [user(1, 'quality'), user(2, 'admin')], total: 2 },
      '/sites': { items: [], total: 0 },
    });
    renderIn(<UsersPanel />);
    expect(await screen.findByRole('gridcell', { name: 'Quality committee' })).toBeVisible();
    expect(screen.getByRole('gridcell', { name: 'Administrator' })).toBeVisible();
    expect(screen.queryByRole('gridcell', { name: 'quality' })).toBeNull();
  });

  it('names the delivery queue states in words', async () => {
    serve({ '/admin/mail': { sink: { items: [], total: 0 }, outbox: { queued: 2, failed: 1 } } });
    renderIn(<MailPanel />);
    expect(await screen.findByText('Waiting to send: 2')).toBeVisible();
    expect(screen.getByText('Not sent: 1')).toBeVisible();
    expect(screen.queryByText(/queued|failed/)).toBeNull();
  });
});
