import assert from 'node:assert/strict';
import { randomUUID } from 'node:crypto';
import { after, before, describe, it } from 'node:test';
import pg from 'pg';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, newTabletContext, signIn } from '../support/browser';
import { databaseUrl } from '../support/env';
import { until } from '../support/live';

// Plain JavaScript for the page: an event written to the tablet's store as a tap would, but
// two days after the arrest, which the server refuses (entries after arrest + 24 h).
const queueLateNote = `async ({ id, eventId, arrestAt }) => {
  const db = await new Promise((ok, ko) => { const r = indexedDB.open('upstroke'); r.onsuccess = () => ok(r.result); r.onerror = () => ko(r.error); });
  const tx = db.transaction('events', 'readwrite');
  tx.objectStore('events').add({ id: eventId, resuscitationId: id, kind: 'note',
    at: new Date(Date.parse(arrestAt) + 48 * 3600 * 1000).toISOString(),
    data: { text: 'Typed on the wrong code' }, deviceId: 'e2e-tablet' });
  await new Promise((ok) => { tx.oncomplete = ok; });
  db.close();
}`;

async function arrestAtOf(recordId: string): Promise<string> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const res = await client.query<{ arrest_at: Date }>(
      'select arrest_at from resuscitations where id = $1',
      [recordId],
    );
    return res.rows[0]?.arrest_at.toISOString() ?? '';
  } finally {
    await client.end();
  }
}

/** The lead starts a code; one of its entries is refused by the server (too late). */
async function refusedEntry(page: Page): Promise<{ recordId: string; eventId: string }> {
  await signIn(page, 'lead');
  await page.getByRole('button', { name: 'Start', exact: true }).click();
  await page.waitForURL(/\/live\/[0-9a-f-]{36}$/);
  const recordId = page.url().split('/').pop() as string;
  const arrestAt = await until(() => arrestAtOf(recordId), Boolean, 60_000);
  assert.ok(arrestAt, 'the record reached the server');
  const eventId = randomUUID();
  await page.evaluate(`(${queueLateNote})(${JSON.stringify({ id: recordId, eventId, arrestAt })})`);
  await page.getByRole('button', { name: 'Sync: 1 not accepted — show' }).waitFor();
  return { recordId, eventId };
}

describe('a lead resolves an entry the server refused', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchBrowser());
  });
  after(() => close());

  it('discards it from the Debrief with a reason; the badge goes; the admin reads the audit entry', async () => {
    const tablet = await newTabletContext(browser);
    const page = await tablet.newPage();
    const { recordId, eventId } = await refusedEntry(page);

    await page.goto(`/debrief/${recordId}`);
    const section = page.getByRole('region', { name: /^Not accepted by the server/ });
    await section.getByText(/\(event\)/).waitFor();
    await section.getByText(/more than 24 h after the arrest/).waitFor();
    const discard = section.getByRole('button', { name: 'Discard 1 refused' });
    assert.equal(await discard.isDisabled(), true, 'a reason is required');
    await section.getByLabel(/Why discard/).fill('Typed on the wrong code');
    await discard.click();
    await section.getByRole('status').filter({ hasText: '1 discarded' }).waitFor();
    await section.getByText('Nothing is waiting here: all accepted.').waitFor();
    await page.getByRole('button', { name: /not accepted — show/ }).waitFor({ state: 'detached' });
    await tablet.close();

    const office = await newTabletContext(browser);
    const admin = await office.newPage();
    await signIn(admin, 'admin');
    await admin.goto('/admin/users');
    await admin.getByRole('tab', { name: 'Audit log' }).click();
    await admin.getByRole('combobox', { name: 'Action' }).click();
    await admin.getByRole('option', { name: 'Refused entries discarded', exact: true }).click();
    await admin
      .getByRole('grid', { name: 'Audit log' })
      .getByRole('button', { name: 'Details of Refused entries discarded' })
      .first()
      .click();
    const dialog = admin.getByRole('dialog', { name: 'Refused entries discarded' });
    await dialog.getByText(recordId, { exact: true }).first().waitFor();
    await dialog.getByText('Typed on the wrong code', { exact: true }).first().waitFor();
    // The entry itself: its id, the server's reason and its content, all in the one entry.
    const entries = dialog.getByText(new RegExp(`Id: ${eventId}; Kind: events`));
    await entries.waitFor();
    const text = await entries.innerText();
    assert.match(text, /Server's reason: .*more than 24 h after the arrest/);
    assert.match(text, /Content: .*"text":"Typed on the wrong code"/);
    await office.close();
  });
});
