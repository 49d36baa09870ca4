import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import { thresholdDefaults } from '@upstroke/contracts';
import { MemoryRouter, Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { type LocalEtco2, offlineDb } from '../../../lib/offline';
import { LivePage } from './live-page';

// The trend chart needs a real canvas (jsdom has none); it is not what this test checks.
vi.mock('./etco2-trend-chart', () => ({ Etco2TrendChart: () => null }));
vi.setConfig({ testTimeout: 30_000 });

const id = '2d4c6e8a-1b3d-4f5a-8c7e-9a0b1c2d3e4f';
const siteId = '6f1c1f0e-8a51-4d5e-9d8e-2f1c8c3c0a11';
const secAgo = (s: number) => new Date(Date.now() - s * 1000).toISOString();

async function seedKpaSite() {
  await offlineDb.meta.put({
    key: 'context',
    value: {
      serverTime: new Date().toISOString(),
      sites: [
        {
          id: siteId,
          name: 'Kestrel Bay Regional Hospital',
          etco2Unit: 'kPa',
          units: [],
          profile: { id: siteId, version: 1, thresholds: thresholdDefaults },
        },
      ],
    },
  });
  await offlineDb.resuscitations.put({
    id,
    siteId,
    arrestAt: secAgo(180),
    roster: [],
    status: 'open',
    local: 1,
    createdAt: Date.now(),
  });
  await offlineDb.events.put({
    id: '0a0b0c0d-0000-4000-8000-000000000001',
    resuscitationId: id,
    at: secAgo(170),
    kind: 'compressions-start',
    data: {},
    deviceId: 'd',
  });
  // Typed 0.7 kPa every 10 s for the last minute (invented), and one per-breath value from
  // the monitor link, which arrives in mmHg.
  const values: LocalEtco2[] = [60, 50, 40, 30, 20, 10, 0].map((s, i) => ({
    id: `1a1b1c1d-0000-4000-8000-00000000000${i}`,
    resuscitationId: id,
    at: secAgo(s + 1),
    value: 0.7,
    unit: 'kPa',
    source: 'manual',
    deviceId: 'd',
  }));
  values.push({ ...values[0], id: '1a1b1c1d-0000-4000-8000-000000000009', at: secAgo(90) });
  values[7] = { ...values[7], value: 15, unit: 'mmHg', source: 'stream' };
  await offlineDb.etco2.bulkPut(values);
}

beforeEach(() => {
  vi.stubGlobal(
    'fetch',
    vi.fn(async () => new Response('{}', { status: 503 })),
  );
});
afterEach(async () => {
  vi.unstubAllGlobals();
  await Promise.all([offlineDb.resuscitations.clear(), offlineDb.events.clear()]);
  await Promise.all([offlineDb.etco2.clear(), offlineDb.meta.clear()]);
});

describe('Live on a kPa site', () => {
  it('words the low-EtCO2 prompt and the log in kPa', async () => {
    await seedKpaSite();
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <MemoryRouter initialEntries={[`/live/${id}`]}>
          <Routes>
            <Route path="/live/:id" element={<LivePage monitor={() => null} />} />
          </Routes>
        </MemoryRouter>
      </QueryClientProvider>,
    );
    // The low threshold is 10 mmHg (AHA 2020 adult ALS; Sandroni 2018 — summary), which is
    // 1.3 kPa (1 kPa = 7.50062 mmHg, definition of the mmHg, REFERENCE.md checked).
    const prompts = await screen.findByRole('status', { name: 'Prompts' });
    expect(
      await within(prompts).findByText(/EtCO2 stayed below 1\.3 kPa .*\(lowest 0\.7 kPa\)/),
    ).toBeInTheDocument();
    expect(prompts).not.toHaveTextContent(/mmHg/);
    const log = screen.getByRole('list', { name: 'Recorded events' });
    expect(within(log).getAllByText(/EtCO2 0\.7 kPa$/).length).toBe(7);
    // 15 mmHg from the monitor link = 2.0 kPa.
    expect(within(log).getByText(/EtCO2 2\.0 kPa$/)).toBeInTheDocument();
    expect(log).not.toHaveTextContent(/mmHg/);
  });
});
