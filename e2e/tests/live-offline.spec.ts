import AxeBuilder from '@axe-core/playwright';
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { newTabletContext, signIn } from '../support/browser';
import { baseUrl } from '../support/env';
import {
  apiToken,
  launchChromium,
  localIds,
  serverIds,
  tap,
  tapAndPick,
  typeEtco2,
  until,
} from '../support/live';

/** 30 taps of every kind the Live screen offers (the count is checked on screen and server). */
async function logThirtyEvents(page: Page): Promise<void> {
  for (let i = 0; i < 12; i++) await page.getByRole('button', { name: 'Compressions' }).click();
  for (let i = 0; i < 3; i++) await tapAndPick(page, 'Shock', '200 J');
  for (let i = 0; i < 3; i++) await tapAndPick(page, 'Rhythm', 'VF');
  for (let i = 0; i < 2; i++) await tapAndPick(page, 'Drug', 'Epinephrine 1 mg');
  await tapAndPick(page, 'Airway', 'Tracheal tube', 'Waveform capnography');
  await tapAndPick(page, 'Access', 'IO');
  await tapAndPick(page, 'Pulse', 'No pulse');
  await tap(page, 'ROSC');
  await tap(page, 'Re-arrest');
  await tap(page, 'Note');
  await page.getByLabel('Note text').fill('Offline note');
  await page.getByRole('button', { name: 'Save note' }).click();
  await page.getByLabel('Hypoxia').check();
  await tap(page, 'Undo'); // a correction event: 28
  await tap(page, 'ROSC');
  await tap(page, 'Re-arrest'); // 30
}

describe('live recording offline, then lossless sync', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchChromium());
  });
  after(() => close());

  it('records 30 events and 10 EtCO2 values offline, survives a reload, and syncs exactly once', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await signIn(page, 'recorder');
    // The service worker must hold the app shell before the network goes away.
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.getByRole('button', { name: 'Start', exact: true }).click();
    await page.waitForURL(/\/live\/[0-9a-f-]{36}$/);
    const recordId = page.url().split('/').pop() as string;

    const axe = await new AxeBuilder({ page }).analyze();
    const serious = axe.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
    assert.deepEqual(
      serious.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`),
      [],
    );

    await context.setOffline(true);
    await page.getByRole('status', { name: /^Sync: Offline/ }).waitFor();
    await logThirtyEvents(page);
    for (let i = 0; i < 10; i++) await typeEtco2(page, String(8 + i));
    const summary = page.getByRole('heading', { name: 'Recorded: 30 events, 10 EtCO2 values' });
    await summary.waitFor();

    await page.reload(); // still offline: the service worker serves the app, IndexedDB the data
    await summary.waitFor();
    await page.getByRole('status', { name: /^Sync: Offline · \d+ waiting$/ }).waitFor();
    const local = await localIds(page, recordId);
    assert.equal(local.events.length, 30);
    assert.equal(local.etco2.length, 10);
    assert.deepEqual(await serverIds(recordId), { events: [], etco2: [] });

    await context.setOffline(false);
    // Everything arrives (how fast is measured by bench/live.bench.ts, sync1000, not here).
    const server = await until(
      () => serverIds(recordId),
      (s) => s.events.length >= 30 && s.etco2.length >= 10,
      60_000,
    );
    assert.deepEqual(server, local);
    await page.getByRole('status', { name: 'Sync: All saved' }).waitFor();

    // Replaying the same batches three times through the API changes nothing.
    const token = await apiToken('recorder');
    const detail = (await (
      await fetch(`${baseUrl}/api/resuscitations/${recordId}`, {
        headers: { Authorization: `Bearer ${token}` },
      })
    ).json()) as {
      events: { id: string; at: string; kind: string; data: object }[];
      etco2: { id: string; at: string; value: number; unit: string; source: string }[];
    };
    const events = detail.events.map(({ id, at, kind, data }) => ({ id, at, kind, data }));
    const samples = detail.etco2.map(({ id, at, value, unit, source }) => ({
      id,
      at,
      value,
      unit,
      source,
    }));
    for (let i = 0; i < 3; i++) {
      for (const [path, body, n] of [
        ['events', { events }, 30],
        ['etco2', { samples }, 10],
      ] as const) {
        const res = await fetch(`${baseUrl}/api/resuscitations/${recordId}/${path}/batch`, {
          method: 'POST',
          headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
          body: JSON.stringify(body),
        });
        assert.deepEqual(await res.json(), { accepted: 0, duplicates: n, rejected: [] });
      }
    }
    assert.deepEqual(await serverIds(recordId), local);
    await context.close();
  });

  it("shows each tablet the other's taps: the epinephrine timer counts a dose given on the other tablet", async () => {
    const a = await newTabletContext(browser);
    const b = await newTabletContext(browser);
    const pageA = await a.newPage();
    const pageB = await b.newPage();
    await signIn(pageA, 'recorder');
    await pageA.getByRole('button', { name: 'Start', exact: true }).click();
    await pageA.waitForURL(/\/live\/[0-9a-f-]{36}$/);
    const recordId = pageA.url().split('/').pop() as string;
    await tap(pageA, 'Compressions');
    await pageA.getByRole('status', { name: 'Sync: All saved' }).waitFor();

    await signIn(pageB, 'lead');
    await pageB.goto(`/live/${recordId}`);
    const sinceEpiB = pageB.getByRole('timer', { name: 'Since epinephrine' });
    await pageB.getByRole('heading', { name: 'Recorded: 1 events, 0 EtCO2 values' }).waitFor();
    assert.equal(await sinceEpiB.textContent(), '—');

    await tapAndPick(pageA, 'Drug', 'Epinephrine 1 mg');
    await pageB
      .getByRole('heading', { name: 'Recorded: 2 events, 0 EtCO2 values' })
      .waitFor({ timeout: 60_000 });
    assert.match((await sinceEpiB.textContent()) ?? '', /^\d+:\d\d$/);

    await tap(pageB, 'ROSC');
    await pageA
      .getByRole('heading', { name: 'Recorded: 3 events, 0 EtCO2 values' })
      .waitFor({ timeout: 60_000 });
    await pageB.getByRole('status', { name: 'Sync: All saved' }).waitFor();
    const server = await serverIds(recordId);
    assert.equal(server.events.length, 3);
    assert.deepEqual(await localIds(pageA, recordId), server);
    assert.deepEqual(await localIds(pageB, recordId), server);
    await a.close();
    await b.close();
  });
});
