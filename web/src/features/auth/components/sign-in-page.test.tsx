import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { authStore } from '../../../lib/auth-store';
import { SignInPage } from './sign-in-page';

function renderPage() {
  return render(
    <QueryClientProvider client={new QueryClient()}>
      <MemoryRouter>
        <SignInPage />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

describe('SignInPage', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    authStore.clear();
  });

  it('explains a malformed e-mail without calling the server', async () => {
    const fetchSpy = vi.fn();
    vi.stubGlobal('fetch', fetchSpy);
    renderPage();
    await userEvent.type(screen.getByLabelText(/email/i), 'not-an-address');
    await userEvent.type(screen.getByLabelText(/password/i), 'x');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter a valid e-mail address')).toBeInTheDocument();
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it('shows the server message when the password is wrong', async () => {
    const body = {
      statusCode: 401,
      error: 'Unauthorized',
      message: 'E-mail or password is not right',
    };
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response(JSON.stringify(body), { status: 401 })),
    );
    renderPage();
    await userEvent.type(screen.getByLabelText(/email/i), 'lead@kestrel.test');
    await userEvent.type(screen.getByLabelText(/password/i), 'wrong');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('E-mail or password is not right')).toBeInTheDocument();
    expect(authStore.get()).toBeNull();
  });
});
