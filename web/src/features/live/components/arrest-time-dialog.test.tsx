import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ArrestTimeDialog } from './arrest-time-dialog';

describe('Arrest time dialog', () => {
  it("names Start's time on the site's 24-hour clock, not the browser's", async () => {
    render(
      <ArrestTimeDialog
        open
        startAt="2026-07-01T15:05:09.000Z"
        onSave={() => undefined}
        onClose={() => undefined}
      />,
    );
    // No site cached: the defaults (en-GB, UTC, 24 h) apply.
    expect(
      await screen.findByText('The arrest was this many minutes before Start (15:05:09):'),
    ).toBeVisible();
  });
});
