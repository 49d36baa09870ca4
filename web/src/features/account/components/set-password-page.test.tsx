import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { SetPasswordPage } from './set-password-page';

function renderAt(url: string) {
  return render(
    <QueryClientProvider client={new QueryClient()}>
      <MemoryRouter initialEntries={[url]}>
        <SetPasswordPage />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

describe('SetPasswordPage', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('explains a missing rule and a mismatch before sending anything', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderAt('/set-password?token=abcdefghijklmnopqrstuvwxyz0123456789');
    await userEvent.type(screen.getByLabelText('New password'), 'short1');
    await userEvent.type(screen.getByLabelText('Repeat password'), 'short2');
    await userEvent.click(screen.getByRole('button', { name: 'Set password' }));
    expect(await screen.findByText('Use at least 10 characters')).toBeInTheDocument();
    await userEvent.clear(screen.getByLabelText('New password'));
    await userEvent.type(screen.getByLabelText('New password'), 'long-enough-1');
    await userEvent.click(screen.getByRole('button', { name: 'Set password' }));
    expect(await screen.findByText('The two passwords differ')).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('sends the token with the password and offers Sign in', async () => {
    const fetchMock = vi.fn(
      async () => new Response(JSON.stringify({ email: 'ash@kestrel.test' })),
    );
    vi.stubGlobal('fetch', fetchMock);
    renderAt('/set-password?token=abcdefghijklmnopqrstuvwxyz0123456789');
    await userEvent.type(screen.getByLabelText('New password'), 'long-enough-1');
    await userEvent.type(screen.getByLabelText('Repeat password'), 'long-enough-1');
    await userEvent.click(screen.getByRole('button', { name: 'Set password' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalled());
    expect(await screen.findByText(/Sign in with ash@kestrel.test/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to Sign in' })).toHaveAttribute('href', '/sign-in');
  });

  it('says so when the link has no token', () => {
    renderAt('/set-password');
    expect(screen.getByText(/This link is incomplete/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Set password' })).toBeDisabled();
  });
});
