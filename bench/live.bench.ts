/**
 * Live recording benchmark, in Chromium against the running built app, three runs unthrottled
 * and three with the CPU slowed 4× (DevTools protocol `Emulation.setCPUThrottlingRate`, a
 * mid-range tablet):
 *  - Start tap → Live usable: from the tap on Start (the click event, on the page's clock) to
 *    the first frame drawn after the ROSC button of the Live screen is in the page and enabled
 *    (found by a MutationObserver, then timed in the next requestAnimationFrame); target ≤ 1 s
 *    throttled. Timed in the page, because Playwright's own steps (actionability checks before
 *    the click, polling for the button after it) run in the throttled page too and added
 *    0.3–0.4 s that no user waits for; that driver's-eye figure is kept as `driverMs`;
 *  - tap → IndexedDB commit: 200 taps on the Live screen per run, timed by the app's own User
 *    Timing entry `upstroke:tap-commit`: from the tap handler's start to the moment the
 *    transaction completed in the tap-writer worker (its completion time, read on the
 *    worker's clock and placed on the page's by `performance.timeOrigin`); target p95
 *    ≤ 10 ms unthrottled, ≤ 32 ms throttled;
 *  - sync: 1,000 events queued offline, then back online; time until the database holds them
 *    all (loopback); target ≤ 2 s.
 * Needs BENCH_BASE_URL and BENCH_DATABASE_URL (set by `npm run bench`); skips without them.
 * Merges its figures into bench/results.json under `live`.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { resolve } from 'node:path';
import pg from 'pg';
import type { Browser, BrowserContext, Page } from 'playwright-core';
// The browser tests' launcher and queue helper: the bench drives the app the same way.
import { launchBrowser } from '../e2e/support/browser';
import { queueEvents } from '../e2e/support/live';

const RESULTS = resolve(__dirname, 'results.json');
const baseUrl = process.env.BENCH_BASE_URL;
const databaseUrl = process.env.BENCH_DATABASE_URL;
const TAPS = 200;
const RUNS = 3;
const QUEUED = 1000;

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];

async function countEvents(db: pg.Client, id: string): Promise<number> {
  const r = await db.query<{ n: string }>(
    'select count(*) as n from resuscitation_events where resuscitation_id = $1',
    [id],
  );
  return Number(r.rows[0].n);
}

// The floor on this machine: 500 sequential single-row IndexedDB writes on an idle page.
const rawWrites = `async (n) => {
  const db = await new Promise((ok) => { const r = indexedDB.open('bench-floor', 1);
    r.onupgradeneeded = () => r.result.createObjectStore('rows', { keyPath: 'id' }); r.onsuccess = () => ok(r.result); });
  const out = [];
  for (let i = 0; i < n; i++) {
    const t = performance.now();
    const tx = db.transaction('rows', 'readwrite');
    tx.objectStore('rows').add({ id: crypto.randomUUID(), i });
    await new Promise((ok) => { tx.oncomplete = ok; });
    out.push(performance.now() - t);
  }
  db.close();
  return out;
}`;

/**
 * In the page: the time of the click on Start and of the first frame after the ROSC button of
 * Live is there and enabled (a string, so that no transpiler helper reaches the page).
 */
const usableProbe = `
  window.__startTap = null; window.__usableAt = null;
  document.addEventListener('click', (e) => {
    const b = e.target instanceof Element ? e.target.closest('button') : null;
    if (b && b.textContent.trim() === 'Start' && window.__startTap === null) window.__startTap = e.timeStamp;
  }, true);
  const seen = () => [...document.querySelectorAll('button')].some((b) => b.textContent === 'ROSC' && !b.disabled);
  new MutationObserver((_, obs) => {
    if (window.__startTap === null || !location.pathname.startsWith('/live/') || !seen()) return;
    obs.disconnect();
    requestAnimationFrame(() => { window.__usableAt = performance.now(); });
  }).observe(document, { subtree: true, childList: true, attributes: true });
`;

/** Signs in, taps Start; returns the record id and the time until Live is usable. */
async function startCode(
  page: Page,
): Promise<{ id: string; startToUsableMs: number; driverMs: number }> {
  await page.addInitScript(usableProbe);
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('Email').fill('recorder@kestrel.test');
  await page.getByLabel('Password').fill('upstroke-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  const start = page.getByRole('button', { name: 'Start', exact: true });
  await start.waitFor();
  const t0 = performance.now();
  await start.click();
  await page.getByRole('button', { name: 'ROSC', exact: true }).waitFor();
  const driverMs = performance.now() - t0;
  await page.waitForFunction('window.__usableAt !== null');
  const startToUsableMs = (await page.evaluate('window.__usableAt - window.__startTap')) as number;
  await page.waitForURL(/\/live\/[0-9a-f-]{36}$/);
  await page.getByRole('status', { name: 'Sync: All saved' }).waitFor({ timeout: 30_000 });
  return { id: page.url().split('/').pop() as string, startToUsableMs, driverMs };
}

/** One run: a fresh page at the given CPU slow-down, Start, then the taps. */
async function run(browser: Browser, rate: number) {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate });
  const { id, startToUsableMs, driverMs } = await startCode(page);
  for (let i = 0; i < TAPS; i++)
    await page.getByRole('button', { name: i % 2 ? 'Re-arrest' : 'ROSC', exact: true }).click();
  const durations = (await page.evaluate(
    "performance.getEntriesByName('upstroke:tap-commit').map((e) => e.duration)",
  )) as number[];
  const sorted = [...durations].sort((a, b) => a - b);
  const figures = {
    cpuSlowdown: rate,
    startToUsableMs: Math.round(startToUsableMs),
    driverMs: Math.round(driverMs),
    taps: durations.length,
    p50Ms: Number(percentile(sorted, 50).toFixed(2)),
    p95Ms: Number(percentile(sorted, 95).toFixed(2)),
    maxMs: Number(sorted.at(-1)?.toFixed(2)),
    loadAverage1m: Number(loadavg()[0].toFixed(2)),
  };
  return { context, page, id, figures };
}

async function main(): Promise<void> {
  if (!baseUrl || !databaseUrl) {
    console.log(
      'live bench skipped: BENCH_BASE_URL and BENCH_DATABASE_URL are not set (npm run bench sets them)',
    );
    return;
  }
  const { browser } = await launchBrowser();
  let last: { context: BrowserContext; page: Page; id: string } | undefined;
  const db = new pg.Client({ connectionString: databaseUrl });
  await db.connect();
  try {
    const runs = [];
    for (const rate of [1, 4])
      for (let r = 0; r < RUNS; r++) {
        const one = await run(browser, rate);
        runs.push(one.figures);
        if (rate > 1 || r < RUNS - 1) await one.context.close();
        else last = one; // the sync measure goes on in the last unthrottled run's page
      }
    if (!last) throw new Error('no run');
    const { context, page, id } = last;
    await (await context.newCDPSession(page)).send('Emulation.setCPUThrottlingRate', { rate: 1 });
    const floor = ((await page.evaluate(`(${rawWrites})(${TAPS})`)) as number[]).sort(
      (a, b) => a - b,
    );
    await page.getByRole('status', { name: 'Sync: All saved' }).waitFor({ timeout: 30_000 });
    const before = await countEvents(db, id);

    await context.setOffline(true);
    await page.getByRole('status', { name: /^Sync: Offline/ }).waitFor();
    await queueEvents(page, id, QUEUED, 'bench');
    const t0 = performance.now();
    await context.setOffline(false);
    while ((await countEvents(db, id)) < before + QUEUED && performance.now() - t0 < 30_000)
      await new Promise((r) => setTimeout(r, 10));
    const syncMs = performance.now() - t0;
    await page.getByRole('status', { name: 'Sync: All saved' }).waitFor({ timeout: 30_000 });
    const allSavedMs = performance.now() - t0;
    const stored = (await countEvents(db, id)) - before;

    const live = {
      measuredAt: new Date().toISOString(),
      chromium: browser.version(),
      runs,
      targets: { startToUsableMs: 1000, tapP95Ms: 10, tapP95ThrottledMs: 32 },
      pass: runs.every(
        (r) =>
          r.p95Ms <= (r.cpuSlowdown > 1 ? 32 : 10) &&
          (r.cpuSlowdown === 1 || r.startToUsableMs <= 1000),
      ),
      bareIndexedDbWriteP95Ms: Number(percentile(floor, 95).toFixed(2)),
      sync1000: {
        events: QUEUED,
        stored,
        toDatabaseMs: Math.round(syncMs),
        toAllSavedMs: Math.round(allSavedMs),
        targetMs: 2000,
      },
    };
    const all = existsSync(RESULTS)
      ? (JSON.parse(readFileSync(RESULTS, 'utf8')) as Record<string, unknown>)
      : {};
    all.live = live;
    writeFileSync(RESULTS, `${JSON.stringify(all, null, 2)}\n`);
    console.log(JSON.stringify(live, null, 2));
    await context.close();
  } finally {
    await db.end();
    await browser.close();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
