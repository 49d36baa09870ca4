import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { newTabletContext, signIn } from '../support/browser';
import { launchChromium, tap, tapAndPick, typeEtco2 } from '../support/live';

/** Starts a code from the Board; returns the record id. */
async function start(page: Page): Promise<string> {
  await page.getByRole('button', { name: 'Start', exact: true }).click();
  await page.waitForURL(/\/live\/[0-9a-f-]{36}$/);
  return page.url().split('/').pop() as string;
}

/** A pause prompt: the site's hands-off timer, or the engine's pause in progress. */
const handsOff = /Hands off for \d+ s|Compressions paused for/;
const prompts = (page: Page) => page.getByRole('status', { name: 'Prompts' });

describe('Live follows the patient: ROSC, re-arrest, end', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchChromium());
  });
  after(() => close());

  it('pauses arrest prompts and timers during ROSC, resumes them on re-arrest, ends read-only', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    // The page's clock: minutes of the code pass at once, no waiting.
    await page.clock.install();
    await signIn(page, 'recorder');
    const id = await start(page);
    await tap(page, 'Compressions');
    await tapAndPick(page, 'Drug', 'Epinephrine 1 mg');
    await tap(page, 'Compressions');
    await tap(page, 'ROSC');
    await prompts(page)
      .getByText(/tap Re-arrest/)
      .waitFor();

    await page.clock.fastForward('06:00');
    await page
      .getByRole('timer', { name: 'ROSC for' })
      .filter({ hasText: /^6:0\d$/ })
      .waitFor();
    // Site defaults passed long ago: rhythm check 2 min, epinephrine 3 min, pause 10 s.
    assert.doesNotMatch(
      (await prompts(page).textContent()) ?? '',
      /Rhythm|Epinephrine|Hands off|Compressions paused/,
    );
    assert.equal(await page.getByRole('timer', { name: 'Rhythm check in' }).count(), 0);
    assert.equal(await page.getByRole('timer', { name: 'Since epinephrine' }).count(), 0);
    const compressions = page.getByRole('button', { name: 'Compressions' });
    assert.doesNotMatch((await compressions.textContent()) ?? '', /hands off/);

    await tap(page, 'Re-arrest');
    await prompts(page)
      .getByText(/Epinephrine interval reached/)
      .waitFor();
    await page.getByRole('timer', { name: 'Rhythm check in' }).waitFor();
    await page.clock.fastForward('00:30');
    await prompts(page).getByText(handsOff).waitFor();
    await compressions.filter({ hasText: /hands off \d+ s/ }).waitFor();
    await page.clock.fastForward('02:00');
    await prompts(page).getByText('Rhythm check due').waitFor();

    await tapAndPick(page, 'End', 'Terminated');
    await page.getByText('Code ended · Terminated').waitFor();
    assert.equal(await page.getByRole('timer').count(), 0);
    for (const name of ['Compressions', 'Shock', 'Drug', 'Undo', 'Re-arrest', 'End'])
      assert.equal(await page.getByRole('button', { name, exact: true }).count(), 0, name);
    await page.getByRole('link', { name: 'Open debrief' }).waitFor();

    await page.getByRole('link', { name: 'Board' }).first().click();
    const recent = page.getByRole('list', { name: 'Records on your sites' });
    await recent.locator(`a[href="/debrief/${id}"]`).waitFor();
    assert.equal(await page.locator(`a[href="/live/${id}"]`).count(), 0);
    await recent.locator(`a[href="/debrief/${id}"]`).click();
    await page.waitForURL(new RegExp(`/debrief/${id}$`));
    await context.close();
  });

  it('Undo after a typed EtCO2 value takes back that value, says so, and strikes it through', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await signIn(page, 'recorder');
    await start(page);
    await tapAndPick(page, 'Rhythm', 'VF');
    await typeEtco2(page, '18');
    await tap(page, 'Undo');
    await page.getByRole('status', { name: 'Undo' }).getByText('Undid: EtCO2 18 mmHg').waitFor();
    const log = page.getByRole('list', { name: 'Recorded events' });
    await log.getByText(/Undid: EtCO2 18 mmHg$/).waitFor();
    await log.locator('del', { hasText: 'EtCO2 18 mmHg' }).waitFor();
    assert.equal(await log.locator('del', { hasText: 'Rhythm' }).count(), 0);
    await context.close();
  });

  it('two tablets: ROSC and an arrest-time change on one reach the other by push, not by the 5-s ask', async () => {
    const a = await newTabletContext(browser);
    const b = await newTabletContext(browser);
    const pageA = await a.newPage();
    const pageB = await b.newPage();
    await signIn(pageA, 'recorder');
    const id = await start(pageA);
    await tap(pageA, 'Compressions');
    await tap(pageA, 'Compressions');
    await pageA.getByRole('status', { name: 'Sync: All saved' }).waitFor({ timeout: 30_000 });

    const subscribed = new Promise<void>((resolve) =>
      pageB.on('websocket', (ws) => {
        if (!ws.url().endsWith('/api/live-feed')) return;
        ws.on('framereceived', (f) => {
          if (String(f.payload).includes('"subscribed"')) resolve();
        });
      }),
    );
    await signIn(pageB, 'lead');
    await pageB.goto(`/live/${id}`);
    await subscribed;
    // Hands off since A's stop: past the site's 10-s pause limit, B prompts it.
    await prompts(pageB).getByText(handsOff).waitFor({ timeout: 60_000 });

    const asked: number[] = [];
    pageB.on('request', (r) => {
      if (r.url().includes(`/api/resuscitations/${id}/entries`)) asked.push(Date.now());
    });
    const tapped = Date.now();
    await tap(pageA, 'ROSC');
    await prompts(pageB)
      .getByText(/tap Re-arrest/)
      .waitFor({ timeout: 20_000 });
    const tookMs = Date.now() - tapped;
    assert.doesNotMatch((await prompts(pageB).textContent()) ?? '', handsOff);
    // B never asked the server: the ROSC came by the live feed.
    assert.deepEqual(asked, []);
    process.stdout.write(`# ROSC on tablet A reached tablet B in ${tookMs} ms\n`);

    // "The arrest was 10 min before": a correction on A moves B's clocks too, by push.
    const sinceArrest = (p: Page) => p.getByRole('timer', { name: 'Since arrest' });
    assert.match((await sinceArrest(pageB).textContent()) ?? '', /^\d:\d\d$/);
    await pageA.getByRole('button', { name: 'Arrest time', exact: true }).click();
    const dialog = pageA.getByRole('dialog', { name: 'Arrest time' });
    await dialog.getByRole('button', { name: '10 min', exact: true }).click();
    await dialog.getByLabel('Reason').fill('Collapse seen by the ward nurse before the call');
    await dialog.getByRole('button', { name: 'Set arrest time' }).click();
    await dialog.waitFor({ state: 'detached' });
    await sinceArrest(pageA)
      .filter({ hasText: /^1\d:\d\d$/ })
      .waitFor();
    await sinceArrest(pageB)
      .filter({ hasText: /^1\d:\d\d$/ })
      .waitFor({ timeout: 20_000 });
    assert.deepEqual(asked, []);
    await a.close();
    await b.close();
  });
});
