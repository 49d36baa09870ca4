import axe from 'axe-core';
import assert from 'node:assert/strict';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { after, before, describe, it } from 'node:test';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import pg from 'pg';
import { artifactsDir, launchBrowser, newTabletContext, signIn } from '../support/browser';
import { databaseUrl, type DemoRole } from '../support/env';

// Every screen in both themes at the tablet's size and a phone's (390×844, a common phone's
// CSS viewport): axe (WCAG 2.x rules, colour contrast included) must find nothing serious or
// critical; a screenshot of each is kept for people to review (git-ignored).
const sizes = [
  { name: 'tablet', width: 1280, height: 800 },
  { name: 'phone', width: 390, height: 844 },
] as const;
type Theme = 'light' | 'dark';

interface Screen {
  name: string;
  role: DemoRole;
  path: () => string;
  /** What shows once the screen has drawn its content (not just its loading state). */
  ready: (page: Page) => Promise<void>;
  /** What the phone layout must do on this screen, checked at 390×844. */
  phone?: (page: Page) => Promise<void>;
}

/** The demo's signed record with the most events (a full timeline to draw and read). */
async function fullestRecord(): Promise<string> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const { rows } = await client.query<{ id: string }>(
      `select r.id from resuscitations r join resuscitation_events e on e.resuscitation_id = r.id
       where r.status = 'signed' group by r.id order by count(*) desc, r.id limit 1`,
    );
    assert.ok(rows[0], 'the demo seed has a signed record');
    return rows[0].id;
  } finally {
    await client.end();
  }
}

const heading = (page: Page, name: RegExp | string) =>
  page.getByRole('heading', { level: 1, name }).waitFor();

/** Opens a context in a theme, signed in as `role` (theme chosen before the first draw). */
async function themedContext(browser: Browser, theme: Theme, role: DemoRole) {
  const context = await newTabletContext(browser);
  await context.addInitScript(`localStorage.setItem('upstroke.colorMode', '${theme}')`);
  const page = await context.newPage();
  await signIn(page, role);
  return { context, page };
}

/** Live on a phone: the bar folds into a Menu button (keyboard too); the buttons stay large. */
async function livePhone(page: Page): Promise<void> {
  assert.equal(await page.getByRole('button', { name: 'Sign out' }).isVisible(), false);
  const menu = page.getByRole('button', { name: 'Menu' });
  await menu.focus();
  await page.keyboard.press('Enter');
  await page.getByRole('menuitem', { name: 'Board' }).waitFor();
  // While the menu is open the page behind it is hidden from assistive technology: read the
  // button by its label attribute.
  assert.equal(await page.locator('[aria-label="Menu"]').getAttribute('aria-expanded'), 'true');
  await page.keyboard.press('Escape');
  await page.getByRole('menu').waitFor({ state: 'detached' });
  for (const name of ['Shock', 'Drug', 'EtCO2', 'End']) {
    const box = await page.getByRole('button', { name, exact: true }).boundingBox();
    assert.ok(box, `${name} is drawn`);
    // Large enough for a gloved finger (common practice: 48 px is the least touch target).
    assert.ok(box.height >= 64 && box.width >= 96, `${name} is ${box.width}×${box.height}`);
    assert.ok(box.x >= 0 && box.x + box.width <= 390, `${name} fits the width`);
  }
}

/** The debrief on a phone: fewer markers than events, so none pile up; the table keeps all. */
async function debriefPhone(page: Page): Promise<void> {
  const chart = page.getByRole('img', { name: /^EtCO2 timeline/ });
  const all = Number(await chart.getAttribute('data-markers'));
  const shown = Number(await chart.getAttribute('data-markers-shown'));
  assert.ok(shown > 0 && shown < all, `${shown} of ${all} markers drawn on a phone`);
  const rows = await page.getByRole('table', { name: /event/i }).getByRole('row').count();
  assert.ok(rows - 1 >= all, `the event table has a row for each of the ${all} events`);
}

/** A code started on the Board as a person would, so Live has a record to show. */
async function startCode(page: Page): Promise<string> {
  await page.goto('/');
  await page.getByRole('button', { name: 'Start', exact: true }).click();
  await page.waitForURL(/\/live\/[0-9a-f-]{36}$/);
  return new URL(page.url()).pathname;
}

/** axe-core injected into the page and run over the whole document (WCAG 2.1 A/AA rules). */
async function runAxe(page: Page): Promise<axe.AxeResults> {
  // Evaluated through the DevTools protocol, which the page's Content-Security-Policy allows.
  await page.evaluate(axe.source);
  return page.evaluate(
    (tags) =>
      (window as unknown as { axe: typeof axe }).axe.run(document, {
        runOnly: { type: 'tag', values: tags },
      }),
    ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'],
  );
}

async function check(page: Page, screen: Screen, theme: Theme): Promise<string[]> {
  const found: string[] = [];
  for (const size of sizes) {
    await page.setViewportSize({ width: size.width, height: size.height });
    await page.goto(screen.path());
    await screen.ready(page);
    const result = await runAxe(page);
    if (size.name === 'phone') await screen.phone?.(page);
    for (const v of result.violations)
      if (v.impact === 'serious' || v.impact === 'critical')
        found.push(
          `${screen.name} ${theme} ${size.name}: ${v.id} (${v.impact}) at ${v.nodes
            .slice(0, 4)
            .map((n) => n.target.join(' '))
            .join(', ')}${v.nodes[0]?.failureSummary ? ` — ${v.nodes[0].failureSummary}` : ''}`,
        );
    await page.screenshot({
      path: path.join(artifactsDir, `${screen.name}-${theme}-${size.name}.png`),
      fullPage: true,
    });
  }
  return found;
}

describe('accessibility: axe in both themes at tablet and phone sizes', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  let debriefId: string;
  const contexts: BrowserContext[] = [];
  before(async () => {
    mkdirSync(artifactsDir, { recursive: true });
    ({ browser, close } = await launchBrowser());
    debriefId = await fullestRecord();
  });
  after(async () => {
    for (const c of contexts) await c.close();
    await close();
  });

  for (const theme of ['light', 'dark'] as const) {
    it(`has no serious or critical violations in the ${theme} theme`, async () => {
      const lead = await themedContext(browser, theme, 'lead');
      const admin = await themedContext(browser, theme, 'admin');
      contexts.push(lead.context, admin.context);
      const livePath = await startCode(lead.page);
      const screens: Screen[] = [
        { name: 'board', role: 'lead', path: () => '/', ready: (p) => heading(p, 'Board') },
        {
          name: 'live',
          role: 'lead',
          path: () => livePath,
          ready: (p) => p.getByRole('button', { name: 'Compressions' }).waitFor(),
          phone: livePhone,
        },
        {
          name: 'debrief',
          role: 'lead',
          path: () => `/debrief/${debriefId}`,
          ready: async (p) => {
            await heading(p, /^Debrief/);
            await p.getByRole('img', { name: /^EtCO2 timeline/ }).waitFor();
          },
          phone: debriefPhone,
        },
        {
          name: 'trends',
          role: 'lead',
          path: () => '/trends',
          ready: async (p) => {
            await heading(p, 'Trends');
            await p.getByRole('grid').waitFor();
          },
        },
        { name: 'admin', role: 'admin', path: () => '/admin', ready: (p) => heading(p, 'Admin') },
      ];
      const found: string[] = [];
      for (const screen of screens)
        found.push(
          ...(await check(screen.role === 'admin' ? admin.page : lead.page, screen, theme)),
        );
      assert.deepEqual(found, []);
    });
  }
});
