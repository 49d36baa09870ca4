import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser } from 'playwright-core';
import { newTabletContext, signIn } from '../support/browser';
import { watchLink } from '../support/link-wire';
import { baseUrl } from '../support/env';
import { apiToken, launchChromium, tapAndPick, until } from '../support/live';

// The simulated monitor's link falls silent 20 s into its stream, for 20 s (the simulator's
// `dropAfter`/`dropFor`), at speed 1: the stored record has a 20-s hole.
const DROP_AFTER_SEC = 20;
const DROP_FOR_SEC = 20;

async function debriefOf(id: string) {
  const res = await fetch(`${baseUrl}/api/resuscitations/${id}/debrief`, {
    headers: { Authorization: `Bearer ${await apiToken('lead')}` },
  });
  return (await res.json()) as {
    findings: { kind: string }[];
    timeline: { gaps: { startSec: number; endSec: number }[] };
    record: { arrestAt: string };
  };
}

describe('monitor link drop: a data gap, never a clinical finding', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchChromium());
  });
  after(() => close());

  it('says "Link lost" within 3 s of the last sample; the debrief shows a gap band, no waveform-absent', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    // The page's clock: the link's silence timer is the subject, so the test moves it.
    await page.clock.install();
    await signIn(page, 'recorder');
    await page.getByRole('button', { name: 'Start', exact: true }).click();
    await page.waitForURL(/\/live\/[0-9a-f-]{36}$/);
    const id = page.url().split('/').pop() as string;
    const panel = page.getByRole('region', { name: 'Monitor link' });
    const status = panel.getByRole('status', { name: 'Link status' });
    const wire = watchLink(page);

    // A seed of its own: the simulator knows a monitor by its address.
    const ws = new URL(baseUrl);
    ws.protocol = ws.protocol === 'https:' ? 'wss:' : 'ws:';
    ws.pathname = '/api/link/simulator';
    const seed = Math.floor(Math.random() * 2 ** 30);
    ws.search = `?scenario=improving-cpr&seed=${seed}&dropAfter=${DROP_AFTER_SEC}&dropFor=${DROP_FOR_SEC}`;
    await panel.getByRole('combobox', { name: 'Link' }).click();
    await page.getByRole('option', { name: 'Bedside link' }).click();
    await panel.getByLabel('Link address').fill(ws.toString());
    await panel.getByRole('button', { name: 'Connect monitor' }).click();
    await status.filter({ hasText: 'Live' }).waitFor();

    // From here the page's clock follows the stream (by the samples received, not by the
    // wall clock): a slow machine delays frames and page time alike, never one without the
    // other. The frames keep arriving while it is paused; each re-arms the silence timer.
    const anchor = (await until(
      async () => wire.anchorMs,
      (a) => a !== null,
      60_000,
    )) as number;
    const dropFromMs = anchor + DROP_AFTER_SEC * 1000;
    let pageAt = await until(
      async () => wire.endMs,
      (e) => e > 0,
      60_000,
    );
    // A little ahead of the page's own time, which runs on meanwhile.
    await page.clock.pauseAt((await page.evaluate(() => Date.now())) + 500);
    while (pageAt < dropFromMs) {
      const end = await until(
        async () => wire.endMs,
        (e) => e > pageAt,
        60_000,
      );
      assert.ok(end > pageAt, 'the stream stalled before the drop');
      await page.clock.runFor(end - pageAt);
      pageAt = end;
    }
    // The last sample before the drop is in. Once the page has taken every sample received
    // (its count shows after the panel's next 250-ms refresh), 2 s of silence make it lost.
    const framesAtDrop = wire.frames;
    const taken = async () => Number(await panel.getAttribute('data-samples'));
    let waited = 0;
    for (; waited < 900 && (await taken()) < wire.samples; waited += 50)
      await page.clock.runFor(50);
    assert.match((await status.textContent()) ?? '', /^Live$/);
    await page.clock.runFor(1000);
    assert.match((await status.textContent()) ?? '', /^Live$/);
    await page.clock.runFor(2000 - waited);
    await status.filter({ hasText: /^Link lost/ }).waitFor({ timeout: 10_000 });
    // Twelve seconds on, the last value is shown as past, never as current.
    await page.clock.runFor(9000);
    await panel
      .getByLabel('Age of the last value')
      .filter({ hasText: /^No current value/ })
      .waitFor();
    assert.equal((await panel.getByLabel('EtCO2', { exact: true }).textContent())?.[0], '—');
    await page.clock.resume();

    // The link comes back by itself after the drop and the stream goes on at the present.
    const dropToMs = dropFromMs + DROP_FOR_SEC * 1000;
    await until(
      async () => wire.endMs,
      (e) => e >= dropToMs + 10_000,
      120_000,
    );
    assert.ok(wire.frames > framesAtDrop);
    await status.filter({ hasText: /^Live$/ }).waitFor({ timeout: 60_000 });
    await panel.getByRole('button', { name: 'Disconnect monitor' }).click();
    await tapAndPick(page, 'End', 'Terminated');
    await page.getByText('Code ended · Terminated').waitFor();

    // The server's debrief: one gap over the drop, and no "no waveform" finding.
    const dropSec = (ms: number, d: { record: { arrestAt: string } }) =>
      (ms - Date.parse(d.record.arrestAt)) / 1000;
    const covers = (d: Awaited<ReturnType<typeof debriefOf>>) =>
      d.timeline.gaps.some(
        (g) => g.startSec <= dropSec(dropFromMs, d) + 0.5 && g.endSec >= dropSec(dropToMs, d) - 0.5,
      );
    const d = await until(() => debriefOf(id), covers, 60_000);
    assert.ok(covers(d), `gaps ${JSON.stringify(d.timeline.gaps)}`);
    assert.deepEqual(
      d.findings.filter((f) => f.kind === 'waveform-absent'),
      [],
    );

    // The debrief screen draws that gap band and lists no such finding.
    await page.getByRole('link', { name: 'Open debrief' }).click();
    await page.waitForURL(new RegExp(`/debrief/${id}$`));
    const chart = page.getByRole('img', { name: /EtCO2 timeline/ });
    await chart.waitFor();
    const bands = ((await chart.getAttribute('data-gaps')) ?? '')
      .split(' ')
      .filter(Boolean)
      .map((b) => b.split('-').map(Number));
    assert.ok(
      bands.some(([s, e]) => s <= dropSec(dropFromMs, d) + 0.5 && e >= dropSec(dropToMs, d) - 0.5),
      `bands ${JSON.stringify(bands)}`,
    );
    assert.match((await chart.getAttribute('aria-label')) ?? '', /[1-9]\d* data gaps/);
    const findings = page.getByRole('list', { name: 'Findings' });
    assert.equal(await findings.getByText('No waveform', { exact: true }).count(), 0);
    await context.close();
  });
});
