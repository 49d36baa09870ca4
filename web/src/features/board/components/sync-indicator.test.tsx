import { render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { authStore } from '../../../lib/auth-store';
import { offlineDb, syncEngine } from '../../../lib/offline';
import { recordEvent, startResuscitation } from '../../../lib/offline/record';
import { SyncIndicator } from './sync-indicator';

const siteId = '0b7e6a50-3b1e-4c55-9a51-6a0b7d2d1a01';
const DAY_MS = 24 * 3_600_000;

/** The API as the tablet meets it: its clock, and what it answers to everything else. */
function serverAt(serverNow: () => number, answer: (path: string) => Response) {
  const paths: string[] = [];
  vi.spyOn(globalThis, 'fetch').mockImplementation(async (input) => {
    const path = String(input).replace(/^\/api/, '');
    paths.push(path);
    if (path === '/context')
      return Response.json({ serverTime: new Date(serverNow()).toISOString(), sites: [] });
    return answer(path);
  });
  return paths;
}

/** The API's answer to a batch sent with a clock offset beyond a day (clock-offset.ts). */
const clockRefused = () =>
  Response.json(
    {
      statusCode: 400,
      error: 'Bad Request',
      message: "X-Clock-Offset-Ms: check the tablet's date and time",
      details: [{ path: 'X-Clock-Offset-Ms', message: "check the tablet's date and time" }],
    },
    { status: 400 },
  );

async function oneRecordWithTwoNotes() {
  const rec = await startResuscitation({ siteId });
  await recordEvent(rec.id, 'note', { text: 'first' });
  await recordEvent(rec.id, 'note', { text: 'second' });
}

afterEach(async () => {
  syncEngine.stop();
  vi.restoreAllMocks();
  authStore.clear();
  await Promise.all(
    [offlineDb.resuscitations, offlineDb.events, offlineDb.outbox, offlineDb.acks].map((t) =>
      t.clear(),
    ),
  );
});

describe('the top bar when the tablet clock is wrong', { timeout: 30_000 }, () => {
  it("says to check the tablet's time when the server refuses its clock, and keeps the entries", async () => {
    authStore.set({ accessToken: 't', user: { id: siteId } } as Parameters<
      typeof authStore.set
    >[0]);
    await oneRecordWithTwoNotes();
    const paths = serverAt(Date.now, (path) =>
      path.endsWith('/batch') ? clockRefused() : Response.json({}, { status: 201 }),
    );
    await syncEngine.syncNow(true);
    render(<SyncIndicator />);
    expect(await screen.findByRole('alert')).toHaveTextContent("Check this tablet's date and time");
    expect(screen.getByRole('alert')).toHaveAccessibleName(/entries are kept on the tablet/);
    // The record start went; both notes wait on the tablet, none refused or dropped.
    expect(paths.filter((p) => p.endsWith('/events/batch'))).toHaveLength(1);
    expect(await screen.findByRole('status', { name: 'Sync: 2 waiting' })).toBeInTheDocument();
    expect(await offlineDb.acks.count()).toBe(0);
    expect(await offlineDb.events.count()).toBe(2);
  });

  it('sends nothing from a tablet whose clock is days off, and says so', async () => {
    authStore.set({ accessToken: 't', user: { id: siteId } } as Parameters<
      typeof authStore.set
    >[0]);
    await oneRecordWithTwoNotes();
    const paths = serverAt(
      () => Date.now() - 3 * DAY_MS,
      () => Response.json({}),
    );
    await syncEngine.syncNow(true);
    render(<SyncIndicator />);
    expect(await screen.findByRole('alert')).toHaveTextContent("Check this tablet's date and time");
    expect(paths).toEqual(['/context']);
    expect(await screen.findByRole('status', { name: 'Sync: 3 waiting' })).toBeInTheDocument();
    expect(await offlineDb.outbox.count()).toBe(1);
  });
});
