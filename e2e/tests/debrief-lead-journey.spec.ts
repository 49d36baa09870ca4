import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, newTabletContext, signIn } from '../support/browser';
import { baseUrl } from '../support/env';
import { apiToken } from '../support/live';

const siteName = 'Kestrel Bay Regional Hospital';

async function api(token: string, method: string, route: string, body?: unknown) {
  const res = await fetch(`${baseUrl}/api${route}`, {
    method,
    headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return {
    status: res.status,
    body: (await res.json().catch(() => null)) as Record<string, unknown>,
  };
}

/** `YYYY-MM-DD` of an instant in a time zone. */
const dayIn = (ms: number, timeZone: string) =>
  new Intl.DateTimeFormat('en-CA', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
  }).format(ms);

/** Yesterday's invented code, ended: low EtCO2 early on, one shock, epinephrine 1 mg IV. */
async function yesterdaysRecord(token: string, place: string) {
  const me = await api(token, 'GET', '/context');
  type Site = { id: string; name: string; display?: { timeZone: string } };
  const site = (me.body.sites as Site[]).find((s) => s.name === siteName);
  assert.ok(site, 'the demo site is there');
  const timeZone = site.display?.timeZone ?? 'UTC';
  const arrest = Date.now() - 24 * 3600_000;
  const at = (s: number) => new Date(arrest + s * 1000).toISOString();
  const id = randomUUID();
  assert.equal(
    (
      await api(token, 'POST', '/resuscitations', {
        id,
        siteId: site.id,
        arrestAt: at(0),
        location: place,
      })
    ).status,
    201,
  );
  const ev = (s: number, kind: string, data: Record<string, unknown> = {}) => ({
    id: randomUUID(),
    at: at(s),
    kind,
    data,
  });
  const events = [
    ev(0, 'arrest', { witnessed: true }),
    ev(10, 'compressions-start'),
    ev(15, 'rhythm', { rhythm: 'vf' }),
    ev(120, 'compressions-stop'),
    ev(140, 'shock', { energyJ: 200 }),
    ev(142, 'compressions-start'),
    ev(200, 'drug', { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'iv' }),
    ev(400, 'compressions-stop'),
    ev(405, 'rosc'),
    ev(500, 'end', { reason: 'rosc-sustained' }),
  ];
  assert.equal(
    (await api(token, 'POST', `/resuscitations/${id}/events/batch`, { events })).status,
    201,
  );
  const samples = [20, 40, 60, 80, 100, 200, 260, 320].map((s, i) => ({
    id: randomUUID(),
    at: at(s),
    value: i < 5 ? 5 : 25,
    unit: 'mmHg',
    source: 'manual',
  }));
  assert.equal(
    (await api(token, 'POST', `/resuscitations/${id}/etco2/batch`, { samples })).status,
    201,
  );
  assert.equal(
    (await api(token, 'PATCH', `/resuscitations/${id}`, { status: 'closed' })).status,
    200,
  );
  return { id, day: dayIn(arrest, timeZone) };
}

async function pick(page: Page, label: string, option: string | RegExp) {
  await page.getByRole('combobox', { name: label }).click();
  await page
    .getByRole(
      'option',
      typeof option === 'string' ? { name: option, exact: true } : { name: option },
    )
    .first()
    .click();
}

describe("the lead's debrief: find, read, sign, amend", () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchBrowser());
  });
  after(() => close());

  it('finds yesterday’s record, reads the dose, follows a finding, signs with intent and amends a route', async () => {
    const token = await apiToken('lead');
    const place = `Resus ${randomUUID().slice(0, 6)}`;
    const { id, day } = await yesterdaysRecord(token, place);
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await signIn(page, 'lead');

    // Finding the record: yesterday, by search, on the Board.
    const finder = page.getByRole('search', { name: 'Find a record' });
    await finder.getByLabel('From').fill(day);
    await finder.getByLabel('To').fill(day);
    await finder.getByLabel('Search').fill(place);
    await finder.getByRole('button', { name: 'Search' }).click();
    await page.waitForURL(/q=Resus/);
    await page.getByText('1 record matches').waitFor();
    const records = page.getByRole('list', { name: 'Records on your sites' });
    await records.getByRole('link').filter({ hasText: place }).waitFor();
    assert.equal(await records.getByRole('link').count(), 1, 'only that record matches');
    await records.getByRole('link').filter({ hasText: place }).click();
    await page.waitForURL(new RegExp(`/debrief/${id}$`));

    // Reading: the epinephrine dose and route in the event table, linked to its marker.
    const table = page.getByRole('table', { name: 'Events' });
    const epi = table.getByRole('row').filter({ hasText: 'Epinephrine 1 mg IV' });
    await epi.waitFor();
    assert.match((await epi.textContent()) ?? '', /3:20/);
    await epi.click();
    assert.equal(await epi.getAttribute('aria-selected'), 'true');
    await page
      .getByRole('region', { name: 'Marker legend' })
      .getByText('Epinephrine (adrenaline)')
      .waitFor();

    // A finding brings the timeline into view with its interval highlighted.
    await page.getByRole('button', { name: 'Show whole code' }).waitFor();
    await page.evaluate(() => window.scrollTo(0, document.body.scrollHeight));
    const finding = page
      .getByRole('list', { name: 'Findings' })
      .getByRole('button')
      .filter({ hasText: 'Low EtCO2' })
      .first();
    await finding.click();
    await page
      .getByTestId('timeline-highlight')
      .filter({ hasText: /Low EtCO2, 0:\d\d – \d:\d\d/ })
      .waitFor();
    // Scrolled (smoothly) until the highlighted interval's name and the chart are both in view.
    await page.waitForFunction(() =>
      ['[data-testid="timeline-highlight"]', '[aria-label="Timeline and events"] canvas'].every(
        (sel) => {
          const r = document.querySelector(sel)?.getBoundingClientRect();
          return Boolean(r && r.top >= 0 && r.bottom <= window.innerHeight + 1);
        },
      ),
    );

    // Signing with intent: what it means, what is unresolved, an explicit confirmation.
    await page.getByRole('button', { name: 'Sign and lock…' }).click();
    let confirm = page.getByRole('dialog', { name: 'Sign and lock this record?' });
    await confirm.getByText(/changes? is made only as an amendment with a reason/).waitFor();
    await confirm
      .getByRole('list', { name: 'Unresolved items' })
      .getByText('Outcome: not recorded (needed to sign)')
      .waitFor();
    assert.ok(
      await confirm.getByRole('button', { name: 'Sign and lock', exact: true }).isDisabled(),
    );
    await confirm.getByRole('button', { name: 'Cancel' }).click();
    await pick(page, 'Outcome', 'ROSC, sustained');
    await pick(page, 'First documented rhythm', 'VF');
    await pick(page, 'Witnessed', 'Yes');
    await pick(page, 'Monitored', 'No');
    await page.getByRole('button', { name: 'Sign and lock…' }).click();
    confirm = page.getByRole('dialog', { name: 'Sign and lock this record?' });
    await confirm.getByText(/^None:/).waitFor();
    const go = confirm.getByRole('button', { name: 'Sign and lock', exact: true });
    assert.ok(await go.isDisabled(), 'signing needs the confirmation');
    await confirm.getByLabel('I have reviewed this record and it is ready to sign').check();
    await go.click();
    await page.getByText(/Signed by .* The record is locked/).waitFor();
    assert.equal(await page.getByText('Import monitor file').count(), 0);

    // Amending an event: IV corrected to IO with a reason, struck through and replaced.
    await page.getByRole('button', { name: 'Amend' }).click();
    const dialog = page.getByRole('dialog', { name: 'Amend the signed record' });
    const reason = 'Given through the IO needle, not IV';
    await dialog.getByLabel(/Reason for the amendment/).fill(reason);
    await pick(page, 'Correct an event', /Epinephrine 1 mg IV/);
    await pick(page, 'Route', 'IO');
    await dialog.getByRole('button', { name: 'Save amendment' }).click();
    await dialog.waitFor({ state: 'detached' });
    const replaced = table.getByRole('row').filter({ hasText: 'Epinephrine 1 mg IO' });
    await replaced.waitFor();
    assert.match((await replaced.textContent()) ?? '', /Amended/);
    assert.match((await replaced.textContent()) ?? '', new RegExp(reason));
    const struck = table
      .locator('tr[data-struck="true"]')
      .filter({ hasText: 'Epinephrine 1 mg IV' });
    assert.equal(await struck.locator('del').filter({ hasText: 'Epinephrine 1 mg IV' }).count(), 1);
    await context.close();

    // The PDF says the same: the IV entry corrected, the IO replacement with the reason.
    const pdf = await fetch(`${baseUrl}/api/resuscitations/${id}/report.pdf`, {
      headers: { Authorization: `Bearer ${token}` },
    });
    assert.equal(pdf.status, 200);
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'upstroke-pdf-')), 'report.pdf');
    writeFileSync(file, Buffer.from(await pdf.arrayBuffer()));
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
    assert.match(text, /Epinephrine 1 mg IV.*corrected later/);
    // In reading order (no layout), the correction row reads as one sentence.
    const flow = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    assert.match(flow, /Replaces Epinephrine 1 mg IV with Epinephrine 1 mg IO/);
    assert.match(flow, /Given through the IO needle/);
    // The PDF's marker legend is the screen's (one table in contracts).
    assert.match(flow, /Shk Shock · Epi Epinephrine \(adrenaline\)/);
  });
});
