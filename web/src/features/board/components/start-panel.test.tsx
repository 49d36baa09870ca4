import { fireEvent, render, screen } from '@testing-library/react';
import { MemoryRouter, Route, Routes, useLocation, useParams } from 'react-router-dom';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { startResuscitation } from '../../../lib/offline';
import { StartPanel } from './start-panel';

const siteId = '0b7e6a50-3b1e-4c55-9a51-6a0b7d2d1a01';

vi.mock('../../../lib/offline', () => ({ startResuscitation: vi.fn() }));
vi.mock('../hooks/use-recording-context', () => ({
  useRecordingContext: () => ({ sites: [], siteId, unitId: undefined, setChoice: () => {} }),
}));

/** Live's route as far as this test needs: which record, and what Start handed over. */
function LiveProbe() {
  const { id } = useParams();
  const state = useLocation().state as { started?: { id: string } } | null;
  return <p>{`Live ${id}, handed ${state?.started?.id ?? 'nothing'}`}</p>;
}

function renderBoard() {
  render(
    <MemoryRouter>
      <Routes>
        <Route path="/" element={<StartPanel />} />
        <Route path="/live/:id" element={<LiveProbe />} />
      </Routes>
    </MemoryRouter>,
  );
}

beforeEach(() => vi.mocked(startResuscitation).mockReset());

describe('Start', () => {
  it('opens Live on the stored record and hands it over (no read-back before the first draw)', async () => {
    vi.mocked(startResuscitation).mockResolvedValue({
      id: 'rec-1',
      siteId,
      arrestAt: '2026-12-03T05:00:00.000Z',
      roster: [],
      status: 'open',
      local: 1,
      createdAt: 0,
    });
    renderBoard();
    fireEvent.click(screen.getByRole('button', { name: 'Start' }));
    fireEvent.click(screen.getByRole('button', { name: 'Start' })); // a second tap starts nothing
    expect(await screen.findByText('Live rec-1, handed rec-1')).toBeInTheDocument();
    expect(startResuscitation).toHaveBeenCalledTimes(1);
  });

  it('says so when the tablet could not store the code, and Start works again', async () => {
    vi.mocked(startResuscitation).mockRejectedValueOnce(new Error('QuotaExceededError'));
    renderBoard();
    fireEvent.click(screen.getByRole('button', { name: 'Start' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      /could not be stored on this tablet \(QuotaExceededError\)\. Tap Start again/,
    );
    expect(screen.queryByText(/^Live /)).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Start' }));
    expect(startResuscitation).toHaveBeenCalledTimes(2);
  });
});
