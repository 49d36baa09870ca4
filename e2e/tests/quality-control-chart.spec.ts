import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { FunnelResponse } from '@upstroke/contracts';
import type { Browser } from 'playwright-core';
import { launchBrowser, newTabletContext, signIn } from '../support/browser';
import { baseUrl, demoPassword, emailOf } from '../support/env';

/**
 * The last month before the demo's Emergency improvement: the seed changes practice on the
 * first day of the 7th calendar month before today (IMPROVEMENT_MONTHS_AGO in
 * db/seeds/demo-records.ts), so the committee's baseline ends the month before.
 */
function lastMonthBeforeImprovement(today = new Date()): string {
  const d = new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth() - 8, 1));
  return d.toISOString().slice(0, 7);
}

/** "Jun 2026" from "2026-06": the demo site writes months in en-GB (db/seeds). */
const monthName = (month: string) =>
  new Intl.DateTimeFormat('en-GB', { month: 'short', year: 'numeric', timeZone: 'UTC' }).format(
    new Date(`${month}-01T00:00:00Z`),
  );

async function apiFunnel(): Promise<FunnelResponse> {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: emailOf('quality'), password: demoPassword }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const res = await fetch(`${baseUrl}/api/trends/funnel?measure=anyRosc`, {
    headers: { Authorization: `Bearer ${accessToken}` },
  });
  return (await res.json()) as FunnelResponse;
}

describe('quality committee: control charts and the funnel plot', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchBrowser());
  });
  after(() => close());

  it('the funnel shows every unit with its n', async () => {
    const expected = await apiFunnel();
    assert.ok(expected.points.length >= 3, 'the demo has three units');
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await signIn(page, 'quality');
    await page.goto('/trends');
    const table = page.getByRole('table', { name: 'Units on the funnel plot' });
    await table.waitFor();
    for (const unit of expected.points) {
      const row = table.getByRole('row').filter({ hasText: unit.name });
      assert.equal(await row.count(), 1, `${unit.name} is listed once`);
      assert.equal((await row.getByRole('cell').nth(1).innerText()).trim(), String(unit.n));
    }
    await context.close();
  });

  it('switches a chart to its control chart, sees the signal, opens the records behind it', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await signIn(page, 'quality');
    await page.goto('/trends');
    await page.getByRole('combobox', { name: 'Unit' }).click();
    await page.getByRole('option', { name: 'Emergency', exact: true }).click();
    const toggle = page.getByRole('group', { name: 'Median compression fraction: how to show it' });
    await toggle.getByRole('button', { name: 'Control chart' }).click();
    await page.getByRole('combobox', { name: 'Baseline to' }).click();
    await page
      .getByRole('option', { name: monthName(lastMonthBeforeImprovement()), exact: true })
      .click();
    // The chart keeps the previous answer on screen while the new baseline's is fetched:
    // wait for the caption naming the chosen baseline before reading the signals.
    await page
      .getByText(new RegExp(`Baseline .* to ${monthName(lastMonthBeforeImprovement())}\\.`))
      .first()
      .waitFor();
    const signals = page.getByRole('list', { name: 'Signals' });
    const first = signals.getByRole('listitem').first();
    await first.waitFor();
    assert.match(await first.innerText(), /above the upper control limit/);
    // The month is written in words; its key ("2026-06") rides along for comparing.
    // Key and words read together, from the same element.
    const [month, words] = await first
      .locator('strong')
      .evaluate((el) => [el.getAttribute('data-month') ?? '', (el.textContent ?? '').trim()]);
    assert.ok(month > lastMonthBeforeImprovement(), 'the signal comes after the baseline');
    assert.equal(words, monthName(month));
    assert.match(
      await page
        .getByText(/Nelson 1984/)
        .first()
        .innerText(),
      /Benneyan/,
    );

    await page.getByRole('button', { name: 'Points and their records' }).click();
    await page.getByRole('button', { name: `Records behind ${monthName(month)}` }).click();
    const dialog = page.getByRole('dialog');
    await dialog
      .getByRole('heading', { name: new RegExp(`Records behind ${monthName(month)}`) })
      .waitFor();
    const links = dialog.getByRole('link');
    await links.first().waitFor();
    assert.ok((await links.count()) >= 1);
    await links.first().click();
    await page.waitForURL('**/debrief/*');
    await context.close();
  });
});
