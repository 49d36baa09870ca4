import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, newTabletContext, signIn, waitOrExplain } from '../support/browser';

/** The path and query of a set-password link (the mail names the server's public address). */
function localPath(href: string): string {
  const url = new URL(href);
  return `${url.pathname}${url.search}`;
}

async function inviteAndReadLink(page: Page, email: string): Promise<string> {
  await signIn(page, 'admin');
  await page.goto('/admin/users');
  await page.getByRole('button', { name: 'Invite user' }).click();
  const dialog = page.getByRole('dialog', { name: 'Invite user' });
  await dialog.getByLabel('Email').fill(email);
  await dialog.getByLabel('Name').fill('Morgan Keel (RN)');
  // Role stays Recorder; the admin's only site is ticked already.
  await dialog.getByRole('button', { name: 'Send invitation' }).click();
  // Failed once, unexplained, with two test runs side by side: a failure now keeps the screen.
  await waitOrExplain(
    page,
    page.getByText(`Invitation sent to ${email}.`),
    'invitation-sent',
    60_000,
  );
  await page.getByRole('grid', { name: 'Users' }).getByText(email).waitFor();

  await page.getByRole('tab', { name: 'Mail' }).click();
  await page
    .getByRole('button', { name: `Open message to ${email}: Your Upstroke account` })
    .click();
  const mail = page.getByRole('dialog', { name: 'Your Upstroke account' });
  const link = mail.getByRole('link', { name: /\/set-password\?token=/ });
  const href = await link.getAttribute('href');
  assert.ok(href, 'the invitation carries a set-password link');
  return href;
}

describe('admin invites a recorder who sets a password and signs in', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchBrowser());
  });
  after(() => close());

  it('delivers the invitation to the local sink, and the link works once', async () => {
    const email = `morgan.keel.${Date.now()}@kestrel.test`;
    const adminContext = await newTabletContext(browser);
    const href = await inviteAndReadLink(await adminContext.newPage(), email);
    await adminContext.close();

    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await page.goto(localPath(href));
    await page.getByLabel('New password').fill('morning-shift-42');
    await page.getByLabel('Repeat password').fill('morning-shift-42');
    await page.getByRole('button', { name: 'Set password' }).click();
    await page.getByText(`Your password is set. Sign in with ${email}.`).waitFor();
    await page.getByRole('link', { name: 'Go to Sign in' }).click();

    await page.getByLabel('Email').fill(email);
    await page.getByLabel('Password').fill('morning-shift-42');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    const nav = page.getByRole('navigation', { name: 'Main' });
    const labels = (await nav.getByRole('link').allInnerTexts()).map((s) => s.trim());
    assert.deepEqual(labels, ['Board'], 'a recorder sees the recorder menu');
    await page.getByRole('button', { name: 'Sign out' }).click();

    // The same link a second time is refused with a clear message.
    await page.goto(localPath(href));
    await page.getByLabel('New password').fill('another-try-77');
    await page.getByLabel('Repeat password').fill('another-try-77');
    await page.getByRole('button', { name: 'Set password' }).click();
    await page.getByText(/This link is no longer valid/).waitFor();
    await context.close();
  });
});
