import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import {
  type Debrief,
  defaultDisplayFormat,
  formatPercent,
  formatDateTime,
  type RecordingContext,
  type ReviewQueueItem,
} from '@upstroke/contracts';
import type { Browser } from 'playwright-core';
import { launchBrowser, newTabletContext, signIn } from '../support/browser';
import { baseUrl, demoPassword, emailOf } from '../support/env';
import { until } from '../support/live';

/** The first day of the calendar quarter holding `iso`, and of the next one (UTC dates). */
function quarterOf(iso: string): { from: string; to: string } {
  const d = new Date(iso);
  const q = Math.floor(d.getUTCMonth() / 3);
  const day = (y: number, m: number) => new Date(Date.UTC(y, m, 1)).toISOString().slice(0, 10);
  return { from: day(d.getUTCFullYear(), q * 3), to: day(d.getUTCFullYear(), q * 3 + 3) };
}

/** A signed demo record awaiting review (the demo seed signs most of its records). */
async function recordAwaitingReview(): Promise<{
  item: ReviewQueueItem;
  when: string;
  debrief: Debrief;
}> {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: emailOf('quality'), password: demoPassword }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const res = await fetch(`${baseUrl}/api/reviews?status=awaiting&limit=500`, {
    headers: { Authorization: `Bearer ${accessToken}` },
  });
  const { items } = (await res.json()) as { items: ReviewQueueItem[] };
  const item = items.find((i) => i.unitName);
  assert.ok(item, 'the demo seed leaves signed records awaiting review');
  // Screens write the arrest time in the site's language, zone and clock (Admin → Sites).
  const context = (await (
    await fetch(`${baseUrl}/api/context`, { headers: { Authorization: `Bearer ${accessToken}` } })
  ).json()) as RecordingContext;
  const display = context.sites.find((s) => s.id === item.siteId)?.display;
  // The debrief the API composes: the review dialog must show its measures and findings.
  const debrief = (await (
    await fetch(`${baseUrl}/api/resuscitations/${item.resuscitationId}/debrief`, {
      headers: { Authorization: `Bearer ${accessToken}` },
    })
  ).json()) as Debrief;
  return { item, when: formatDateTime(item.arrestAt, display ?? defaultDisplayFormat), debrief };
}

describe('quality committee reviews a record found through Trends', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchBrowser());
  });
  after(() => close());

  it('filters to one unit and one quarter, opens the record, marks it reviewed', async () => {
    const { item: target, when, debrief } = await recordAwaitingReview();
    const { from, to } = quarterOf(target.arrestAt);
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await signIn(page, 'quality');

    await page.goto('/trends');
    await page.getByRole('combobox', { name: 'Unit' }).click();
    await page.getByRole('option', { name: target.unitName ?? '', exact: true }).click();
    await page.getByLabel('From', { exact: true }).fill(from);
    await page.getByLabel('To (not included)', { exact: true }).fill(to);
    const grid = page.getByRole('grid', { name: 'Records' });
    const link = grid.getByRole('link', { name: when });
    await link.waitFor();
    // Every row on screen belongs to the chosen unit, once the filtered page has replaced the
    // unfiltered one (the grid keeps the previous rows on screen while the next page loads).
    const unitCells = grid.locator('[data-field="unitName"][role="gridcell"]');
    const units = await until(
      () => unitCells.allInnerTexts(),
      (texts) => texts.length > 0 && texts.every((u) => u.trim() === target.unitName),
      15_000,
    );
    assert.ok(units.length > 0, 'the filtered grid lists the record');
    assert.deepEqual(
      units.filter((u) => u.trim() !== target.unitName),
      [],
      'every listed record belongs to the chosen unit',
    );
    await link.click();
    await page.waitForURL(`**/debrief/${target.resuscitationId}`);

    await page.goto('/review');
    const count = page.getByTestId('queue-count');
    const before = Number.parseInt(await count.innerText(), 10);
    const row = page.getByRole('row').filter({ has: page.getByRole('link', { name: when }) });
    await row.getByRole('button', { name: 'Review' }).click();
    const dialog = page.getByRole('dialog');
    // The record's measures and findings, as the API's debrief has them, and its Debrief.
    const fraction = dialog
      .getByRole('table', { name: 'Measures' })
      .getByRole('row', { name: /Compression fraction/ });
    await fraction.waitFor();
    const cells = (await fraction.getByRole('cell').allInnerTexts()).map((c) => c.trim());
    assert.deepEqual(cells, [formatPercent(debrief.measures.compressionFraction)]);
    await dialog.getByText(`Findings (${debrief.findings.length})`).waitFor();
    const findings = dialog.getByRole('list', { name: 'Findings' }).getByRole('listitem');
    assert.equal(await findings.count(), Math.max(1, debrief.findings.length));
    const open = dialog.getByRole('link', { name: 'Open the Debrief' });
    assert.equal(await open.getAttribute('href'), `/debrief/${target.resuscitationId}`);
    await dialog.getByRole('radio', { name: 'Reviewed' }).check();
    await dialog.getByLabel('Comment').fill('Pauses discussed with the team; no further action.');
    await dialog.getByRole('button', { name: 'Save review' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByText(`${before - 1} records`).waitFor();
    assert.equal(await page.getByRole('link', { name: when }).count(), 0);
    await context.close();
  });
});
