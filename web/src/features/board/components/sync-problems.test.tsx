import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { authStore } from '../../../lib/auth-store';
import { offlineDb } from '../../../lib/offline';
import { SyncProblems } from './sync-problems';

const recordId = '3d1f5a2b-6c7d-4e8f-9a0b-1c2d3e4f5a6b';
const valueId = '4e2a6b3c-7d8e-4f9a-8b1c-2d3e4f5a6b7c';

function signIn(role: 'lead' | 'recorder') {
  authStore.set({
    accessToken: 't',
    user: {
      id: recordId,
      email: `${role}@kestrel.test`,
      name: 'A. Person',
      role,
      siteIds: [],
    },
  } as unknown as Parameters<typeof authStore.set>[0]);
}

afterEach(async () => {
  authStore.clear();
  vi.restoreAllMocks();
  await Promise.all([offlineDb.etco2.clear(), offlineDb.acks.clear(), offlineDb.outbox.clear()]);
});

// Dialog journeys with typing: generous timeouts for a loaded machine (not a speed check).
describe('sync problems in the top bar', { timeout: 30_000 }, () => {
  it('stays hidden while the server has accepted everything', async () => {
    render(<SyncProblems />);
    // Give the live query a moment to answer before checking that nothing is drawn.
    await new Promise((r) => setTimeout(r, 50));
    expect(screen.queryByRole('button', { name: /not accepted/ })).toBeNull();
  });

  it('shows a refused value with its reason and sends it again without changing it', async () => {
    await offlineDb.etco2.add({
      id: valueId,
      resuscitationId: recordId,
      at: '2026-03-04T10:05:00.000Z',
      value: 12,
      unit: 'mmHg',
      source: 'manual',
      deviceId: 'd',
    });
    await offlineDb.acks.add({
      id: valueId,
      resuscitationId: recordId,
      state: 2,
      reason: 'resuscitation is signed',
    });
    const user = userEvent.setup();
    signIn('recorder');
    const { unmount } = render(<SyncProblems />);
    await user.click(await screen.findByRole('button', { name: 'Sync: 1 not accepted — show' }));
    // A recorder sees the problem and its reason, but only a lead resolves it.
    const seen = await screen.findByRole('dialog', { name: 'Not accepted by the server' });
    expect(await within(seen).findByText('resuscitation is signed')).toBeVisible();
    expect(within(seen).getByText(/Only a lead can send these again/)).toBeVisible();
    expect(within(seen).queryByRole('button', { name: 'Send again' })).toBeNull();
    expect(within(seen).queryByRole('button', { name: /Discard/ })).toBeNull();
    unmount();

    signIn('lead');
    render(<SyncProblems />);
    await user.click(await screen.findByRole('button', { name: 'Sync: 1 not accepted — show' }));
    const dialog = await screen.findByRole('dialog', { name: 'Not accepted by the server' });
    const list = await within(dialog).findByRole('list', { name: 'Entries not accepted' });
    expect(within(list).getByText(/EtCO2 12 mmHg \(EtCO2 value\) · record 3d1f5a2b/)).toBeVisible();
    expect(within(list).getByText('resuscitation is signed')).toBeVisible();

    await user.click(within(dialog).getByRole('button', { name: 'Send again' }));
    expect(await within(dialog).findByRole('status')).toHaveTextContent('1 sent back to the queue');
    expect(await offlineDb.acks.count()).toBe(0);
    expect(await offlineDb.etco2.get(valueId)).toMatchObject({ value: 12, unit: 'mmHg' });
    expect(await within(dialog).findByText('Nothing is waiting here: all accepted.')).toBeVisible();
  });

  it('lets a lead discard a refused value with a reason, told to the server and kept here', async () => {
    await offlineDb.etco2.add({
      id: valueId,
      resuscitationId: recordId,
      at: '2026-03-04T10:05:00.000Z',
      value: 12,
      unit: 'mmHg',
      source: 'manual',
      deviceId: 'd',
    });
    await offlineDb.acks.add({
      id: valueId,
      resuscitationId: recordId,
      state: 2,
      reason: 'at: late',
    });
    signIn('lead');
    const fetchMock = vi
      .spyOn(globalThis, 'fetch')
      .mockResolvedValue(new Response(JSON.stringify({ discarded: 1 }), { status: 201 }));
    const user = userEvent.setup();
    render(<SyncProblems />);
    await user.click(await screen.findByRole('button', { name: 'Sync: 1 not accepted — show' }));
    const dialog = await screen.findByRole('dialog', { name: 'Not accepted by the server' });
    const discard = await within(dialog).findByRole('button', { name: 'Discard 1 refused' });
    expect(discard).toBeDisabled(); // a reason is required
    await user.type(within(dialog).getByLabelText(/Why discard/), 'Entered on the wrong code');
    await user.click(discard);
    expect(await within(dialog).findByText(/1 discarded; the audit log/)).toBeVisible();
    const [url, init] = fetchMock.mock.calls[0] as [string, RequestInit];
    expect(url).toBe(`/api/resuscitations/${recordId}/discards`);
    expect(JSON.parse(init.body as string)).toEqual({
      reason: 'Entered on the wrong code',
      items: [{ id: valueId, kind: 'etco2', refusal: 'at: late', content: expect.any(String) }],
    });
    // The badge goes once every refused entry is resolved.
    expect(screen.queryByRole('button', { name: /not accepted — show/ })).toBeNull();
    expect(await offlineDb.acks.get(valueId)).toMatchObject({ state: 3 });
    expect(await offlineDb.etco2.get(valueId)).toMatchObject({ value: 12 });
  });
});
