import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { thresholdDefaults } from '@upstroke/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ProfileForm } from './profile-form';

const siteId = '6f1c1f0e-8a51-4d5e-9d8e-2f1c8c3c0a11';

function renderForm(onSaved: (p: { version: number }) => void = () => undefined) {
  const client = new QueryClient({ defaultOptions: { mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <ProfileForm siteId={siteId} basis={null} onSaved={onSaved} />
    </QueryClientProvider>,
  );
}

// A form of some forty fields: role queries walk the whole tree, slow on a loaded machine.
describe('ProfileForm', { timeout: 60_000 }, () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows each guideline default with its source beside the field', () => {
    renderForm();
    const low = screen.getByRole('spinbutton', { name: 'Low EtCO2' });
    expect(low).toHaveValue(thresholdDefaults.lowEtco2MmHg);
    // AHA 2020 adult ALS; Sandroni 2018 (REFERENCE.md, summary): default 10 mmHg, which is
    // 1.3 kPa (1 kPa = 7.50062 mmHg, definition of the mmHg) for a site working in kPa.
    expect(
      screen.getByText(/Default 10 mmHg \(1\.3 kPa\) — AHA 2020 adult guideline .*Part 3/),
    ).toBeInTheDocument();
  });

  it('refuses an impossible threshold with a message naming the field, range and unit', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderForm();
    const pause = screen.getByRole('spinbutton', { name: 'Longest acceptable pause' });
    await userEvent.clear(pause);
    await userEvent.type(pause, '900');
    await userEvent.click(screen.getByRole('button', { name: 'Save as new version' }));
    expect(
      await screen.findByText('Longest acceptable pause must be between 2 s and 120 s'),
    ).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('sends the whole profile as a new version', async () => {
    const fetchMock = vi.fn(async (_url: string, init: RequestInit) => {
      const body = JSON.parse(String(init.body)) as { thresholds: object; name: string };
      const saved = {
        id: siteId,
        siteId,
        version: 2,
        createdAt: '2026-03-04T10:00:00Z',
        createdBy: null,
        ...body,
      };
      return new Response(JSON.stringify(saved), { status: 201 });
    });
    vi.stubGlobal('fetch', fetchMock);
    const onSaved = vi.fn();
    renderForm(onSaved);
    const low = screen.getByRole('spinbutton', { name: 'Low EtCO2' });
    await userEvent.clear(low);
    await userEvent.type(low, '12');
    await userEvent.click(screen.getByRole('button', { name: 'Save as new version' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(1));
    const [url, init] = fetchMock.mock.calls[0];
    expect(url).toBe('/api/protocol-profiles');
    expect(JSON.parse(String(init.body))).toMatchObject({
      siteId,
      thresholds: { ...thresholdDefaults, lowEtco2MmHg: 12 },
    });
    // The panel shows the confirmation (the form remounts on the new version).
    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(onSaved.mock.calls[0][0]).toMatchObject({ version: 2 });
  });

  it('marks a changed value and asks for a confirmation and a reason beyond 2× the default', async () => {
    const fetchMock = vi.fn(async (_url: string, init: RequestInit) => {
      const body = JSON.parse(String(init.body)) as object;
      const saved = { id: siteId, version: 3, createdAt: '2026-03-04T10:00:00Z', createdBy: null };
      return new Response(JSON.stringify({ ...body, ...saved }), { status: 201 });
    });
    vi.stubGlobal('fetch', fetchMock);
    renderForm();
    // AHA paediatric drug table (Kleinman 2010, Table 1): epinephrine 0.01 mg/kg IV/IO.
    const epi = screen.getByRole('spinbutton', { name: 'Epinephrine dose' });
    expect(screen.queryByText(/Differs from the guideline default/)).not.toBeInTheDocument();
    await userEvent.clear(epi);
    await userEvent.type(epi, '0.015');
    expect(screen.getByText('Differs from the guideline default (0.01 mg/kg)')).toBeInTheDocument();
    expect(screen.queryByRole('checkbox')).not.toBeInTheDocument();
    await userEvent.clear(epi);
    await userEvent.type(epi, '0.03');
    const confirm = screen.getByRole('checkbox', { name: /I confirm 0.03 mg\/kg/ });
    await userEvent.click(screen.getByRole('button', { name: 'Save as new version' }));
    expect(await screen.findByText('Tick the box to confirm this value')).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();
    await userEvent.click(confirm);
    await userEvent.type(
      screen.getByRole('textbox', { name: 'Local source or reason for Epinephrine dose' }),
      'Pharmacy protocol PX-12',
    );
    await userEvent.click(screen.getByRole('button', { name: 'Save as new version' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(1));
    expect(JSON.parse(String(fetchMock.mock.calls[0][1].body))).toMatchObject({
      thresholds: { paediatricEpinephrineMgPerKg: 0.03 },
      confirmations: {
        paediatricEpinephrineMgPerKg: { confirmed: true, reason: 'Pharmacy protocol PX-12' },
      },
    });
  });

  it('never shows "from memory" as a source', () => {
    renderForm();
    expect(screen.queryByText(/memory/i)).not.toBeInTheDocument();
  });
});
