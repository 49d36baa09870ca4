import { mkdirSync } from 'node:fs';
import path from 'node:path';
import {
  type Browser,
  type BrowserContext,
  chromium,
  type Locator,
  type Page,
} from 'playwright-core';
import { baseUrl, type DemoRole, demoPassword, emailOf } from './env';

/**
 * Debian's Chromium, headless, with the flags this closed network needs. Playwright gives
 * every launch a fresh, empty profile of its own (it refuses a --user-data-dir here).
 */
export async function launchBrowser(): Promise<{ browser: Browser; close: () => Promise<void> }> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    browser,
    close: () => browser.close(),
  };
}

/** A tablet-sized context (landscape 1280×800) on the app under test. */
export async function newTabletContext(browser: Browser): Promise<BrowserContext> {
  const context = await browser.newContext({
    baseURL: baseUrl,
    viewport: { width: 1280, height: 800 },
    serviceWorkers: 'allow',
  });
  // Generous waits: beside another test run on two cores a page can take many seconds to
  // settle. A step that never happens still fails, later.
  context.setDefaultTimeout(60_000);
  context.setDefaultNavigationTimeout(90_000);
  return context;
}

/** Signs in through the real Sign in page, as a person would. */
export async function signIn(page: Page, role: DemoRole): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('Email').fill(emailOf(role));
  await page.getByLabel('Password').fill(demoPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('button', { name: 'Sign out' }).waitFor();
}

/** Screenshots for people to read (git-ignored): the accessibility pass and failed waits. */
export const artifactsDir = path.resolve(__dirname, '..', 'artifacts');

/**
 * Waits for `locator`; when it does not come, keeps the screen under e2e/artifacts
 * (`<name>.png`) and fails with what the page showed and which API calls it had made,
 * so that a failure seen only on a busy machine can be read afterwards.
 */
export async function waitOrExplain(
  page: Page,
  locator: Locator,
  name: string,
  timeout = 30_000,
): Promise<void> {
  try {
    await locator.waitFor({ timeout });
  } catch (error) {
    mkdirSync(artifactsDir, { recursive: true });
    await page.screenshot({ path: path.join(artifactsDir, `${name}.png`), fullPage: true });
    const shown = await page.locator('body').innerText();
    const calls = (await page.evaluate(
      "performance.getEntriesByType('resource').filter((r) => r.name.includes('/api/')).slice(-8).map((r) => `${r.name.replace(/^.*\\/api/, '/api')} ${Math.round(r.duration)} ms`)",
    )) as string[];
    throw new Error(
      `${name}: not shown within ${timeout} ms. Last API calls: ${calls.join(', ')}. The page showed:\n${shown}`,
      { cause: error },
    );
  }
}
