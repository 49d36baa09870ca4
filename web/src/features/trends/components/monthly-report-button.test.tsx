import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { lastMonth, MonthlyReportButton } from './monthly-report-button';

const siteId = '6f1c1f0e-8a51-4d5e-9d8e-2f1c8c3c0a11';
const filter = { siteId, from: '2025-01-01', to: '2026-01-01', firstRhythm: 'shockable' } as const;

function serve(answer: () => Promise<Response>) {
  const urls: string[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn((url: string) => {
      urls.push(url);
      return answer();
    }),
  );
  vi.stubGlobal(
    'URL',
    Object.assign(URL, { createObjectURL: () => 'blob:x', revokeObjectURL() {} }),
  );
  return urls;
}

describe('Monthly report download', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('takes last month by default and asks for it with the filters, not the date range', async () => {
    expect(lastMonth(new Date('2026-01-15T00:00:00Z'))).toBe('2025-12');
    let finish: (r: Response) => void = () => undefined;
    const urls = serve(() => new Promise((resolve) => (finish = resolve)));
    render(<MonthlyReportButton filter={filter} />);
    await userEvent.click(screen.getByRole('button', { name: 'Monthly report' }));
    const month = screen.getByLabelText('Report month');
    await userEvent.clear(month);
    await userEvent.type(month, '2025-10');
    await userEvent.click(screen.getByRole('button', { name: 'Download PDF' }));
    expect(await screen.findByRole('button', { name: /Preparing PDF/ })).toBeDisabled();
    const query = new URLSearchParams(urls[0].split('?')[1]);
    expect(Object.fromEntries(query)).toEqual({
      siteId,
      firstRhythm: 'shockable',
      month: '2025-10',
    });
    finish(new Response('%PDF', { status: 200 }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
  });

  it("shows the API's message when the report cannot be made, and refuses a bad month", async () => {
    const message = 'baselineFrom 2023-01 lies outside the charted months';
    serve(async () => new Response(JSON.stringify({ statusCode: 400, message }), { status: 400 }));
    render(<MonthlyReportButton filter={filter} />);
    await userEvent.click(screen.getByRole('button', { name: 'Monthly report' }));
    await userEvent.click(screen.getByRole('button', { name: 'Download PDF' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(message);
    expect(screen.getByRole('dialog')).toBeInTheDocument();
    const month = screen.getByLabelText('Report month');
    await userEvent.clear(month);
    expect(screen.getByRole('button', { name: 'Download PDF' })).toBeDisabled();
  });
});
