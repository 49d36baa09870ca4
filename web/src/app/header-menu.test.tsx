import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import { HeaderMenu, type HeaderProps } from './header-menu';

function setup(overrides: Partial<HeaderProps> = {}) {
  const props: HeaderProps = {
    entries: [
      { to: '/', label: 'Board', roles: ['lead'] },
      { to: '/trends', label: 'Trends', roles: ['lead'] },
    ],
    who: 'Dr Test · Lead',
    mode: 'light',
    onToggleMode: vi.fn(),
    onSignOut: vi.fn(),
    ...overrides,
  };
  render(
    <MemoryRouter>
      <HeaderMenu {...props} />
    </MemoryRouter>,
  );
  return props;
}

describe('HeaderMenu (the top bar on a narrow screen)', () => {
  it('is one labelled button that opens the screens, the theme and sign out', async () => {
    setup();
    const button = screen.getByRole('button', { name: 'Menu' });
    expect(button).toHaveAttribute('aria-haspopup', 'menu');
    expect(button).toHaveAttribute('aria-expanded', 'false');
    expect(screen.queryByRole('menu')).not.toBeInTheDocument();
    await userEvent.click(button);
    const menu = await screen.findByRole('menu');
    expect(button).toHaveAttribute('aria-expanded', 'true');
    expect(button).toHaveAttribute('aria-controls', menu.id);
    const items = screen.getAllByRole('menuitem').map((i) => i.textContent);
    expect(items).toEqual(['Board', 'Trends', 'Use dark theme', 'Sign out']);
    expect(screen.getByText('Dr Test · Lead')).toBeInTheDocument();
  });

  it('works from the keyboard: Enter opens, arrows move, Escape closes back on the button', async () => {
    const props = setup({ mode: 'dark' });
    const user = userEvent.setup();
    await user.tab();
    expect(screen.getByRole('button', { name: 'Menu' })).toHaveFocus();
    await user.keyboard('{Enter}');
    await screen.findByRole('menu');
    await waitFor(() => expect(screen.getByRole('menuitem', { name: 'Board' })).toHaveFocus());
    await user.keyboard('{ArrowDown}{ArrowDown}');
    expect(screen.getByRole('menuitem', { name: 'Use light theme' })).toHaveFocus();
    await user.keyboard('{Enter}');
    expect(props.onToggleMode).toHaveBeenCalledTimes(1);
    await waitFor(() => expect(screen.queryByRole('menu')).not.toBeInTheDocument());
    await user.click(screen.getByRole('button', { name: 'Menu' }));
    await screen.findByRole('menu');
    await user.keyboard('{Escape}');
    await waitFor(() => expect(screen.queryByRole('menu')).not.toBeInTheDocument());
    expect(screen.getByRole('button', { name: 'Menu' })).toHaveAttribute('aria-expanded', 'false');
  });

  it('signs out from the menu', async () => {
    const props = setup();
    await userEvent.click(screen.getByRole('button', { name: 'Menu' }));
    await userEvent.click(await screen.findByRole('menuitem', { name: 'Sign out' }));
    expect(props.onSignOut).toHaveBeenCalledTimes(1);
  });
});
