import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter, Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { offlineDb } from '../../../lib/offline';
import { LivePage } from './live-page';

vi.mock('./etco2-trend', () => ({ Etco2Trend: () => null }));
vi.setConfig({ testTimeout: 30_000 });

const id = '3e5d7f9b-2c4e-4a6b-8d8f-0a1b2c3d4e5f';

async function seed(ageGroup?: 'adult' | 'child', weightKg?: number) {
  await offlineDb.resuscitations.put({
    id,
    siteId: '6f1c1f0e-8a51-4d5e-9d8e-2f1c8c3c0a11',
    arrestAt: new Date(Date.now() - 120_000).toISOString(),
    roster: [],
    status: 'open',
    local: 1,
    createdAt: Date.now(),
    ...(ageGroup ? { ageGroup } : {}),
    ...(weightKg ? { weightKg } : {}),
  });
}

function renderLive() {
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
  await offlineDb.outbox.clear();
});

describe('age group in the Drug and Shock dialogs', () => {
  it('an adult record switched to child in the Drug dialog asks for a weight and says so on the record', async () => {
    await seed();
    renderLive();
    await userEvent.click(await screen.findByRole('button', { name: 'Drug' }));
    const dialog = await screen.findByRole('dialog', { name: 'Drug given' });
    expect(within(dialog).getByRole('button', { name: 'Epinephrine 1 mg' })).toBeInTheDocument();
    await userEvent.click(within(dialog).getByRole('button', { name: 'Child' }));
    // A child with no weight is asked for one; no adult dose is offered directly.
    expect(await within(dialog).findByLabelText('Weight (kg)')).toBeInTheDocument();
    expect(within(dialog).queryByRole('button', { name: 'Epinephrine 1 mg' })).toBeNull();
    await waitFor(async () =>
      expect((await offlineDb.resuscitations.get(id))?.ageGroup).toBe('child'),
    );
    const notes = (await offlineDb.events.toArray()).filter((e) => e.kind === 'note');
    expect(notes.map((n) => n.data)).toEqual([
      { text: 'Age group corrected on Live: Adult → Child' },
    ]);
    const patch = (await offlineDb.outbox.toArray()).find((o) => o.op === 'patch');
    expect(patch?.body).toEqual({ ageGroup: 'child' });
  });

  it('a 20 kg child switched to adult in the Shock dialog gets the adult energies, recorded', async () => {
    await seed('child', 20);
    renderLive();
    await userEvent.click(await screen.findByRole('button', { name: 'Shock' }));
    const dialog = await screen.findByRole('dialog');
    // AHA 2020 paediatric guideline, Part 4: first shock 2 J/kg → 40 J for 20 kg (from memory).
    expect(within(dialog).getByRole('button', { name: /^40 J/ })).toBeInTheDocument();
    expect(within(dialog).getByRole('button', { name: 'Child' })).toHaveAttribute(
      'aria-pressed',
      'true',
    );
    await userEvent.click(within(dialog).getByRole('button', { name: 'Adult' }));
    await waitFor(async () =>
      expect((await offlineDb.resuscitations.get(id))?.ageGroup).toBe('adult'),
    );
    await waitFor(() => expect(within(dialog).queryByRole('button', { name: /^40 J/ })).toBeNull());
    expect(within(dialog).getByRole('button', { name: 'Adult' })).toHaveAttribute(
      'aria-pressed',
      'true',
    );
    const notes = (await offlineDb.events.toArray()).filter((e) => e.kind === 'note');
    expect(notes.map((n) => n.data)).toEqual([
      { text: 'Age group corrected on Live: Child → Adult' },
    ]);
  });
});
