import assert from 'node:assert/strict';
import { randomUUID } from 'node:crypto';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, newTabletContext, signIn, waitOrExplain } from '../support/browser';
import { baseUrl, emailOf } from '../support/env';
import { apiToken } from '../support/live';

async function call(token: string, method: string, path: string, body?: unknown) {
  const res = await fetch(`${baseUrl}/api${path}`, {
    method,
    headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return res.status;
}

/** The lead starts a record, downloads its PDF and e-mails the (draft) debrief to the team. */
async function leadExportsAndMails(): Promise<string> {
  const token = await apiToken('lead');
  const context = (await (
    await fetch(`${baseUrl}/api/context`, { headers: { Authorization: `Bearer ${token}` } })
  ).json()) as { sites: { id: string }[] };
  const id = randomUUID();
  const arrestAt = new Date(Date.now() - 20 * 60_000).toISOString();
  const siteId = context.sites[0].id;
  assert.equal(await call(token, 'POST', '/resuscitations', { id, siteId, arrestAt }), 201);
  assert.equal(await call(token, 'GET', `/resuscitations/${id}/report.pdf`), 200);
  const mailed = await call(token, 'POST', `/resuscitations/${id}/email`, {
    recipients: ['resus-team@kestrel.test'],
  });
  assert.equal(mailed, 202);
  return id;
}

async function filterAction(page: Page, action: string) {
  await page.getByRole('combobox', { name: 'Action' }).click();
  await page.getByRole('option', { name: action, exact: true }).click();
  // The filter took: the field shows the action (a click that missed would leave it as it was).
  await page.getByRole('combobox', { name: 'Action' }).filter({ hasText: action }).waitFor();
}

/**
 * Opens the newest entry of the grid (the log is newest first) in its detail view. This
 * failed once, unexplained, with two test runs side by side: a failure now keeps the screen.
 */
async function openNewest(page: Page, action: string) {
  await filterAction(page, action);
  const grid = page.getByRole('grid', { name: 'Audit log' });
  const details = grid.getByRole('button', { name: `Details of ${action}` }).first();
  await waitOrExplain(page, details, `audit-entry-${action.toLowerCase().replace(/\W+/g, '-')}`);
  await details.click();
  return page.getByRole('dialog', { name: action });
}

async function changeLowEtco2(page: Page): Promise<[string, string]> {
  await page.getByRole('tab', { name: 'Protocol profiles' }).click();
  const field = page.getByRole('spinbutton', { name: 'Low EtCO2', exact: true });
  const before = await field.inputValue();
  const after = before === '10' ? '11' : '10';
  await field.fill(after);
  await page.getByRole('button', { name: 'Save as new version' }).click();
  // The confirmation stays visible after the form reloads on the new version.
  await page
    .getByRole('status')
    .filter({ hasText: /Saved .* as version \d+/ })
    .waitFor();
  return [before, after];
}

describe('admin reads the audit trail and the mail viewer', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchBrowser());
  });
  after(() => close());

  it('sees a failed sign-in, a PDF export and a profile change before → after; reads the mail', async () => {
    const recordId = await leadExportsAndMails();
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await page.goto('/sign-in');
    await page.getByLabel('Email').fill(emailOf('admin'));
    await page.getByLabel('Password').fill('not-my-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('E-mail or password is not right').waitFor();
    await signIn(page, 'admin');
    await page.goto('/admin/users');
    const [before, after] = await changeLowEtco2(page);

    await page.getByRole('tab', { name: 'Audit log' }).click();
    let dialog = await openNewest(page, 'Failed sign-in');
    await dialog.getByText('wrong password').waitFor();
    await dialog.getByText(emailOf('admin')).first().waitFor();
    await dialog.getByRole('button', { name: 'Close' }).click();

    dialog = await openNewest(page, 'PDF exported');
    // Ids in full, never cut short.
    await dialog.getByText(recordId, { exact: true }).first().waitFor();
    await dialog.getByText(/^resuscitation-.*\.pdf$/).waitFor();
    await dialog.getByRole('button', { name: 'Close' }).click();

    dialog = await openNewest(page, 'Protocol profile saved');
    const row = dialog.getByRole('table', { name: 'Changes' }).getByRole('row', {
      name: /Low EtCO2/,
    });
    const cells = (await row.getByRole('cell').allInnerTexts()).map((s) => s.trim());
    assert.deepEqual(cells.slice(0, 2), [`${before} mmHg`, `${after} mmHg`]);
    await dialog.getByRole('button', { name: 'Close' }).click();

    await page.getByRole('tab', { name: 'Mail' }).click();
    const subject = /^Draft — not signed: Resuscitation debrief — /;
    await page
      .getByRole('button', {
        name: /^Open message to resus-team@kestrel\.test: Draft — not signed/,
      })
      .first()
      .click();
    const mail = page.getByRole('dialog', { name: subject });
    await mail.waitFor();
    assert.equal(await mail.getByText('=?UTF-8?').count(), 0, 'no encoded-word left undecoded');
    const attachments = mail.getByRole('list', { name: 'Attachments' });
    await attachments.getByText(/resuscitation-.*\.pdf · application\/pdf · \d+ KB/).waitFor();
    await context.close();
  });
});
