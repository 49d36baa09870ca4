import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { EmailDialog } from './email-dialog';

const id = '5a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d';
const record = {
  id,
  siteId: '6f1c1f0e-8a51-4d5e-9d8e-2f1c8c3c0a11',
  unitId: null,
  arrestAt: '2026-03-04T10:00:00.000Z',
  location: null,
  patientRef: null,
  ageGroup: null,
  weightKg: null,
  status: 'closed',
  witnessed: null,
  monitored: null,
  firstRhythm: null,
  outcome: null,
  endReason: null,
  notesWentWell: null,
  notesToChange: null,
  createdBy: null,
  createdAt: '2026-03-04T10:00:00.000Z',
  signedAt: null,
  signedBy: null,
};

function serve(roster: object[]) {
  const sent: { recipients: string[] }[] = [];
  const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
    if (url.endsWith('/email')) {
      sent.push(JSON.parse(String(init?.body)) as { recipients: string[] });
      return new Response(JSON.stringify({ status: 'sent' }), { status: 200 });
    }
    return new Response(JSON.stringify({ ...record, roster }), { status: 200 });
  });
  vi.stubGlobal('fetch', fetchMock);
  return sent;
}

function renderDialog() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <EmailDialog id={id} onClose={() => undefined} />
    </QueryClientProvider>,
  );
}

describe('E-mail the debrief', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('offers the team members with an address, ticked, and adds other addresses once', async () => {
    const sent = serve([
      { name: 'A. Lead', role: 'lead', email: 'lead@kestrel.test' },
      { name: 'B. Airway', role: 'airway', email: 'airway@kestrel.test' },
      { name: 'C. Compressions', role: 'compressor' },
    ]);
    const user = userEvent.setup();
    renderDialog();
    const lead = await screen.findByRole('checkbox', {
      name: 'A. Lead (Lead) · lead@kestrel.test',
    });
    const airway = screen.getByRole('checkbox', {
      name: 'B. Airway (Airway) · airway@kestrel.test',
    });
    expect(lead).toBeChecked();
    expect(airway).toBeChecked();
    expect(screen.queryByText(/C\. Compressions/)).toBeNull(); // no address: not offered

    await user.click(airway);
    await user.type(
      screen.getByRole('textbox', { name: 'Other recipients' }),
      'quality@kestrel.test, LEAD@kestrel.test',
    );
    await user.click(screen.getByRole('button', { name: 'Send' }));
    expect(await screen.findByRole('status')).toHaveTextContent('Sent with the PDF attached.');
    expect(sent).toEqual([{ recipients: ['lead@kestrel.test', 'quality@kestrel.test'] }]);
  });

  it('says how to offer the team when nobody has an address, and asks for a recipient', async () => {
    const sent = serve([]);
    const user = userEvent.setup();
    renderDialog();
    expect(await screen.findByText(/No team member has an e-mail address yet/)).toBeVisible();
    await user.click(screen.getByRole('button', { name: 'Send' }));
    expect(await screen.findByText('Add at least one recipient')).toBeVisible();
    expect(sent).toEqual([]);
  });
});
