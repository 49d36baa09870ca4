import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { Site } from '@upstroke/contracts';
import { describe, expect, it } from 'vitest';
import { UserDialog } from './user-dialog';

const site = {
  id: '6f1c1f0e-8a51-4d5e-9d8e-2f1c8c3c0a11',
  name: 'Kestrel Bay Regional Hospital',
} as Site;

function dialog(sites: Site[]) {
  return (
    <QueryClientProvider client={new QueryClient()}>
      <UserDialog user={null} sites={sites} onClose={() => undefined} onDone={() => undefined} />
    </QueryClientProvider>
  );
}

describe('Invite user', { timeout: 30_000 }, () => {
  it('ticks the only site when the site list arrives after the form opened', () => {
    const { rerender } = render(dialog([]));
    rerender(dialog([site]));
    expect(screen.getByRole('checkbox', { name: site.name })).toBeChecked();
  });

  it('leaves the sites alone once the admin has changed them', async () => {
    const { rerender } = render(dialog([site]));
    const box = screen.getByRole('checkbox', { name: site.name });
    expect(box).toBeChecked();
    await userEvent.click(box);
    rerender(dialog([{ ...site }]));
    expect(screen.getByRole('checkbox', { name: site.name })).not.toBeChecked();
  });
});
