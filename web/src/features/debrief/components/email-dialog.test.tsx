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

const context = (mailDomains: string[]) => ({
  serverTime: '2026-03-04T12:00:00.000Z',
  sites: [
    {
      id: record.siteId,
      name: 'Kestrel Bay Regional Hospital',
      etco2Unit: 'mmHg',
      units: [],
      mailDomains,
      profile: null,
    },
  ],
});

function serve(roster: object[], opts: { domains?: string[]; status?: string } = {}) {
  const sent: { recipients: string[] }[] = [];
  const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
    if (url.endsWith('/email')) {
      sent.push(JSON.parse(String(init?.body)) as { recipients: string[] });
      return new Response(JSON.stringify({ status: 'sent' }), { status: 200 });
    }
    if (url.endsWith('/context'))
      return new Response(JSON.stringify(context(opts.domains ?? [])), { status: 200 });
    const status = opts.status ?? 'closed';
    return new Response(JSON.stringify({ ...record, status, roster }), { status: 200 });
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

  it('says where the team is entered when nobody has an address, and asks for a recipient', async () => {
    const sent = serve([]);
    const user = userEvent.setup();
    renderDialog();
    const none = await screen.findByText(/No team member of this record has an e-mail address/);
    expect(none).toHaveTextContent('Team on Live');
    expect(none).not.toHaveTextContent(/Board/);
    await user.click(screen.getByRole('button', { name: 'Send' }));
    expect(await screen.findByText('Add at least one recipient')).toBeVisible();
    expect(sent).toEqual([]);
  });

  it('names the allowed domains and refuses an address outside them before sending', async () => {
    const sent = serve([], { domains: ['kestrel.test'] });
    const user = userEvent.setup();
    renderDialog();
    const field = await screen.findByRole('textbox', { name: 'Recipients' });
    expect(
      await screen.findByText('Addresses at kestrel.test only, separated by commas'),
    ).toBeVisible();
    await user.click(field);
    await user.paste('lead@kestrel.test, someone@mail.example, x@kestrel.test.evil.example');
    await user.click(screen.getByRole('button', { name: 'Send' }));
    expect(field).toHaveAccessibleDescription(
      "someone@mail.example is outside the organisation's e-mail domains (kestrel.test); " +
        "x@kestrel.test.evil.example is outside the organisation's e-mail domains (kestrel.test)",
    );
    expect(field).toBeInvalid();
    expect(sent).toEqual([]);

    await user.clear(field);
    await user.paste('lead@kestrel.test, quality@icu.kestrel.test');
    await user.click(screen.getByRole('button', { name: 'Send' }));
    expect(await screen.findByRole('status')).toHaveTextContent('Sent with the PDF attached.');
    expect(sent).toEqual([{ recipients: ['lead@kestrel.test', 'quality@icu.kestrel.test'] }]);
  });

  it('says a draft goes out marked "Draft — not signed", and a signed record does not', async () => {
    serve([]);
    const { unmount } = renderDialog();
    expect(
      await screen.findByText('This record is not signed: the subject says “Draft — not signed”.'),
    ).toBeVisible();
    unmount();
    serve([], { status: 'signed' });
    renderDialog();
    await screen.findByRole('textbox', { name: 'Recipients' });
    expect(screen.queryByText(/Draft — not signed/)).toBeNull();
  });
});
