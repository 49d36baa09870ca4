import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { MonitorImport } from '@upstroke/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { authStore } from '../../../lib/auth-store';
import { ImportPanel } from './import-panel';

const id = '0b7e2c4a-3f5d-4e6a-9b1c-2d3e4f5a6b7c';
const imported: MonitorImport = {
  id: '1c8f3d5b-4a6e-4f7b-8c2d-3e4f5a6b7c8d',
  resuscitationId: id,
  fileName: 'monitor.csv',
  sha256: 'a'.repeat(64),
  rows: 36000,
  startedAt: '2026-03-04T10:01:37.000Z',
  endedAt: '2026-03-04T10:07:37.000Z',
  unit: 'mmHg',
  sampleRateHz: 100,
  offsetSec: 97.2,
  offsetMethod: 'auto',
  offsetChosenBy: null,
  residualSec: 0.3,
  markers: 3,
  matchedMarkers: 3,
  breaths: 60,
  createdAt: '2026-03-04T11:00:00.000Z',
  createdBy: null,
};

/** Answers the pending fake upload; until then the panel shows its progress. */
let answerUpload: () => void = () => undefined;

/**
 * XMLHttpRequest stand-in: reports upload progress at once, then answers `status` with
 * `body` when the test calls `answerUpload()` (no timers, so no race on a loaded machine).
 */
function fakeXhr(status: number, body: object, answerAtOnce = true) {
  return class {
    status = 0;
    responseText = '';
    upload: { onprogress: ((e: object) => void) | null } = { onprogress: null };
    onload: (() => void) | null = null;
    onerror: (() => void) | null = null;
    open() {}
    setRequestHeader() {}
    send() {
      this.upload.onprogress?.({ lengthComputable: true, loaded: 50, total: 100 });
      answerUpload = () => {
        this.status = status;
        this.responseText = JSON.stringify(body);
        this.onload?.();
      };
      if (answerAtOnce) setTimeout(answerUpload, 0);
    }
  };
}

function renderPanel(list: MonitorImport[], onOffsetPreview = vi.fn()) {
  vi.stubGlobal(
    'fetch',
    vi.fn(
      async () =>
        new Response(JSON.stringify({ items: list, total: list.length }), { status: 200 }),
    ),
  );
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <ImportPanel resuscitationId={id} onOffsetPreview={onOffsetPreview} />
    </QueryClientProvider>,
  );
  return onOffsetPreview;
}

describe('ImportPanel', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    authStore.clear();
  });

  it('shows every line the server refused', async () => {
    vi.stubGlobal(
      'XMLHttpRequest',
      fakeXhr(400, {
        statusCode: 400,
        error: 'Bad Request',
        message: 'monitor.csv was not imported: line 4: co2: "high" is not a number',
        details: [
          { path: 'line 4', message: 'co2: "high" is not a number' },
          { path: 'line 9', message: 'time: goes backwards' },
        ],
      }),
    );
    renderPanel([]);
    const file = new File(['time,co2\n'], 'monitor.csv', { type: 'text/csv' });
    await userEvent.upload(screen.getByLabelText('Monitor file'), file);
    const list = await screen.findByRole('list', { name: 'Line errors' });
    expect(
      within(list)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual(['line 4: co2: "high" is not a number', 'line 9: time: goes backwards']);
  });

  it('shows upload progress, then the chosen offset; a lead can preview another', async () => {
    authStore.set({
      accessToken: 't',
      user: {
        id: imported.id,
        email: 'lead@kestrel.test',
        name: 'Lead',
        role: 'lead',
        siteIds: [],
      },
    } as never);
    vi.stubGlobal('XMLHttpRequest', fakeXhr(201, imported, false));
    const preview = renderPanel([imported]);
    await userEvent.upload(
      screen.getByLabelText('Monitor file'),
      new File(['x'], 'monitor.csv', { type: 'text/csv' }),
    );
    expect(await screen.findByRole('progressbar', { name: 'Upload progress' })).toHaveAttribute(
      'aria-valuenow',
      '50',
    );
    act(() => answerUpload());
    expect(await screen.findByText('Imported monitor.csv.')).toBeInTheDocument();
    expect(screen.getByText(/from 3 of 3 shock marker\(s\), residual 0.3 s/)).toBeInTheDocument();
    const field = screen.getByRole('spinbutton', { name: 'Offset (s)' });
    await userEvent.clear(field);
    await userEvent.type(field, '90');
    expect(preview).toHaveBeenLastCalledWith(90);
    expect(screen.getByRole('button', { name: 'Save offset' })).toBeEnabled();
  });
});
