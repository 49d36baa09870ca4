import assert from 'node:assert/strict';
import { randomUUID } from 'node:crypto';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import pg from 'pg';
import { launchBrowser, newTabletContext, signIn } from '../support/browser';
import { baseUrl, databaseUrl } from '../support/env';
import { apiToken } from '../support/live';

const siteName = 'Kestrel Bay Regional Hospital';

async function api(token: string, method: string, path: string, body?: unknown) {
  const res = await fetch(`${baseUrl}/api${path}`, {
    method,
    headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return {
    status: res.status,
    body: (await res.json().catch(() => null)) as Record<string, unknown>,
  };
}

/** An invented record made through the API: low EtCO2 during compressions, a long pre-shock pause. */
async function makeRecord(token: string): Promise<string> {
  const me = await api(token, 'GET', '/context');
  const site = (me.body.sites as { id: string; name: string }[]).find((s) => s.name === siteName);
  assert.ok(site, 'the demo site is there');
  const id = randomUUID();
  const arrest = Date.now() - 30 * 60_000;
  const at = (s: number) => new Date(arrest + s * 1000).toISOString();
  assert.equal(
    (
      await api(token, 'POST', '/resuscitations', {
        id,
        siteId: site.id,
        arrestAt: at(0),
        location: 'Bay 2',
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
  return id;
}

async function pick(page: Page, label: string, option: string) {
  await page.getByRole('combobox', { name: label }).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

describe('debrief, sign and amend as the lead', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchBrowser());
  });
  after(() => close());

  it('reviews the timeline, lands on a finding, signs, is offered Amend, amends; the lock holds', async () => {
    const token = await apiToken('lead');
    const id = await makeRecord(token);
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await signIn(page, 'lead');
    await page.goto(`/debrief/${id}`);

    const chart = page.getByRole('img', { name: /EtCO2 timeline/ });
    await chart.waitFor();
    assert.equal(await chart.getAttribute('data-markers'), '10');
    assert.ok(
      Number(await chart.getAttribute('data-low-intervals')) >= 1,
      'a low-EtCO2 interval is shaded',
    );
    assert.ok(await page.locator('canvas').isVisible());

    const findings = page.getByRole('list', { name: 'Findings' }).getByRole('button');
    const first = findings.filter({ hasText: 'Low EtCO2' }).first();
    await first.click();
    assert.equal(await first.getAttribute('aria-current'), 'true');
    // The low interval starts at 0:20 after the arrest: the view is framed around it.
    await page
      .getByTestId('timeline-view')
      .filter({ hasText: /Showing 0:00 – [1-4]:\d\d/ })
      .waitFor();

    await pick(page, 'Outcome', 'ROSC, sustained');
    await pick(page, 'First documented rhythm', 'VF');
    await pick(page, 'Witnessed', 'Yes');
    await pick(page, 'Monitored', 'No');
    await page.getByRole('button', { name: 'Sign and lock…' }).click();
    const confirm = page.getByRole('dialog', { name: 'Sign and lock this record?' });
    await confirm.getByLabel('I have reviewed this record and it is ready to sign').check();
    await confirm.getByRole('button', { name: 'Sign and lock', exact: true }).click();
    await page.getByText(/Signed by .* The record is locked/).waitFor();

    // Signed: no more editing, "Amend" instead.
    assert.equal(await page.getByRole('button', { name: 'Save closing details' }).count(), 0);
    assert.equal(
      await page.getByRole('combobox', { name: 'Outcome' }).getAttribute('aria-disabled'),
      'true',
    );
    assert.ok(await page.getByLabel('What went well').isDisabled());
    await page.getByRole('button', { name: 'Amend' }).click();
    const dialog = page.getByRole('dialog', { name: 'Amend the signed record' });
    const reason = 'Outcome corrected after the handover call';
    await dialog.getByLabel(/Reason for the amendment/).fill(reason);
    await dialog.getByLabel('Add a note to the record').fill('Handover to ICU team confirmed');
    await dialog.getByRole('button', { name: 'Save amendment' }).click();
    await page
      .getByRole('region', { name: 'Amendments' })
      .getByText(reason, { exact: false })
      .waitFor();
    await context.close();

    const patch = await api(token, 'PATCH', `/resuscitations/${id}`, { location: 'Bay 9' });
    assert.equal(patch.status, 409);
    const db = new pg.Client({ connectionString: databaseUrl });
    await db.connect();
    try {
      await assert.rejects(
        db.query("update resuscitations set location = 'Bay 9' where id = $1", [id]),
        /signed and locked/,
      );
      await assert.rejects(
        db.query('delete from etco2_samples where resuscitation_id = $1', [id]),
        /signed and locked/,
      );
      const amend = await db.query<{ reason: string }>(
        'select reason from amendments where resuscitation_id = $1',
        [id],
      );
      assert.deepEqual(
        amend.rows.map((r) => r.reason),
        [reason],
      );
    } finally {
      await db.end();
    }
  });
});
