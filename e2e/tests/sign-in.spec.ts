import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser } from 'playwright-core';
import { launchBrowser, newTabletContext, signIn } from '../support/browser';
import type { DemoRole } from '../support/env';

/** Each demo user reaches the app with the menu of that role, and nothing more. */
const menus: Record<DemoRole, string[]> = {
  recorder: ['Board'],
  lead: ['Board', 'Trends'],
  quality: ['Board', 'Trends', 'Review queue'],
  admin: ['Trends', 'Admin'],
};

describe('sign-in and role menus', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchBrowser());
  });
  after(() => close());

  it('stores the app for offline use on the first visit, before anyone signs in', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await page.goto('/sign-in');
    assert.equal(await page.evaluate(() => navigator.serviceWorker.ready.then(() => true)), true);
    await context.setOffline(true);
    await page.reload();
    await page.getByLabel('Email').waitFor();
    await context.close();
  });

  for (const role of Object.keys(menus) as DemoRole[]) {
    it(`signs in the ${role} and shows that role's menu`, async () => {
      const context = await newTabletContext(browser);
      const page = await context.newPage();
      await signIn(page, role);
      const nav = page.getByRole('navigation', { name: 'Main' });
      const labels = (await nav.getByRole('link').allInnerTexts()).map((s) => s.trim());
      assert.deepEqual(labels, menus[role]);
      await context.close();
    });
  }

  it('refuses a wrong password with a message and stays on Sign in', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await page.goto('/sign-in');
    await page.getByLabel('Email').fill('lead@kestrel.test');
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('E-mail or password is not right').waitFor();
    assert.match(page.url(), /\/sign-in$/);
    await context.close();
  });

  it('sends a signed-out visitor of a screen to Sign in', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await page.goto('/trends');
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    assert.match(page.url(), /\/sign-in$/);
    await context.close();
  });
});
