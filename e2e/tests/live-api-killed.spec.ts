import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import pg from 'pg';
import type { Browser } from 'playwright-core';
import { signIn } from '../support/browser';
import { databaseUrl } from '../support/env';
import { launchChromium, localIds, queueEvents, serverIds, tap } from '../support/live';
import { freePort, OwnServer } from '../support/own-server';

const QUEUED = 2500; // five batches of 500: the sync is still under way when the API dies

describe('live recording while the API is killed during a sync', () => {
  let browser: Browser;
  let close: (() => Promise<void>) | undefined;
  let server: OwnServer | undefined;
  let db: pg.Client | undefined;
  before(async () => {
    ({ browser, close } = await launchChromium());
    db = new pg.Client({ connectionString: databaseUrl });
    await db.connect();
    server = new OwnServer(await freePort());
    await server.start();
  });
  after(async () => {
    // Each part is let go even if set-up stopped half way, so the run never hangs.
    await server?.kill();
    await db?.end().catch(() => undefined);
    await close?.();
  });

  const stored = async (id: string) =>
    Number(
      (
        await (db as pg.Client).query<{ n: string }>(
          'select count(*) as n from resuscitation_events where resuscitation_id = $1',
          [id],
        )
      ).rows[0].n,
    );

  it('loses nothing and duplicates nothing when the API dies mid-sync and comes back', async (t) => {
    if (!server) throw new Error('the app of this test did not start');
    const app = server;
    const context = await browser.newContext({
      baseURL: app.url,
      viewport: { width: 1280, height: 800 },
    });
    const page = await context.newPage();
    await signIn(page, 'recorder');
    await page.getByRole('button', { name: 'Start', exact: true }).click();
    await page.waitForURL(/\/live\/[0-9a-f-]{36}$/);
    const recordId = page.url().split('/').pop() as string;
    await page.getByRole('status', { name: 'Sync: All saved' }).waitFor();
    // As in the offline journey: the app is stored for offline use before the network goes,
    // so a service-worker install finishing offline cannot take the screen away.
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));

    await context.setOffline(true);
    await page.getByRole('status', { name: /^Sync: Offline/ }).waitFor();
    for (const name of ['Compressions', 'ROSC', 'Re-arrest', 'Compressions']) await tap(page, name);
    await queueEvents(page, recordId, QUEUED, 'e2e');
    const queued = await localIds(page, recordId);
    assert.equal(queued.events.length, QUEUED + 4);

    // Back online; SIGKILL the API as soon as the first batch is in the database.
    await context.setOffline(false);
    const deadline = Date.now() + 15_000;
    while ((await stored(recordId)) === 0 && Date.now() < deadline)
      await new Promise((r) => setTimeout(r, 5));
    await app.kill();
    const atKill = await stored(recordId);
    t.diagnostic(`killed with ${atKill} of ${queued.events.length} events stored`);
    assert.ok(
      atKill > 0 && atKill < queued.events.length,
      `the API died during the sync (${atKill} of ${queued.events.length} stored)`,
    );

    // The tablet keeps recording while the API is down, and says what waits.
    await tap(page, 'ROSC');
    await tap(page, 'Re-arrest');
    await page.getByRole('status', { name: /^Sync: \d+ waiting$/ }).waitFor();

    await app.start();
    await page.getByRole('status', { name: 'Sync: All saved' }).waitFor({ timeout: 60_000 });
    const local = await localIds(page, recordId);
    assert.equal(local.events.length, QUEUED + 6);
    // Every id the tablet holds is on the server exactly once, and nothing else is.
    assert.deepEqual(await serverIds(recordId), local);
    await context.close();
  });
});
