import assert from 'node:assert/strict';
import fs from 'node:fs/promises';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, newTabletContext, signIn } from '../support/browser';

async function pick(page: Page, label: string, option: string) {
  await page.getByRole('combobox', { name: label }).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

/** Splits one CSV line (RFC 4180 quoting: a quoted field may hold commas and doubled quotes). */
function cells(line: string): string[] {
  const out: string[] = [];
  const re = /("(?:[^"]|"")*"|[^,]*)(,|$)/g;
  for (let m = re.exec(line); m && m.index < line.length; m = re.exec(line)) out.push(m[1]);
  return out;
}

describe('the quality committee filters, reloads, prints and exports Trends', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchBrowser());
  });
  after(() => close());

  it('keeps the filters across a reload, names them on the printout, exports rounded numbers', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await signIn(page, 'quality');
    await page.goto('/trends');
    await pick(page, 'Unit', 'Emergency');
    await pick(page, 'Outcome', 'Died');
    await page.getByRole('textbox', { name: 'From', exact: true }).fill('2025-01-01');
    const summary = page.getByTestId('trends-filters-summary');
    await summary.filter({ hasText: 'Period: From 1 Jan 2025' }).waitFor();

    await page.reload();
    assert.match(page.url(), /unitId=[0-9a-f-]{36}/);
    assert.match(page.url(), /outcome=died/);
    assert.equal(
      await page.getByRole('textbox', { name: 'From', exact: true }).inputValue(),
      '2025-01-01',
    );
    await page.getByRole('combobox', { name: 'Outcome' }).filter({ hasText: 'Died' }).waitFor();
    await summary.filter({ hasText: 'Unit: Emergency' }).waitFor();

    // Every column of the records grid fits at 1280 px; more or fewer through the chooser.
    const grid = page.getByRole('grid', { name: 'Records' });
    await grid.getByRole('columnheader', { name: 'Review' }).waitFor();
    const right = (b: { x: number; width: number } | null) => (b ? b.x + b.width : Infinity);
    const lastColumn = await grid.getByRole('columnheader').last().boundingBox();
    assert.ok(right(lastColumn) <= right(await grid.boundingBox()) + 1, 'no column is cut off');
    await page.getByRole('button', { name: 'Columns' }).waitFor();

    await page.emulateMedia({ media: 'print' });
    const printed = await summary.innerText();
    for (const part of ['Site: ', 'Unit: Emergency', 'Period: From 1 Jan 2025', 'Outcome: Died'])
      assert.ok(printed.includes(part), `the printout names "${part}"`);
    assert.equal(await page.getByRole('search', { name: 'Trend filters' }).isVisible(), false);
    await page.emulateMedia({ media: 'screen' });

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export records CSV' }).click(),
    ]);
    const csv = (await fs.readFile(await download.path(), 'utf8')).replace(/^\uFEFF/, '');
    const [header, ...rows] = csv.trim().split(/\r?\n/).map(cells);
    assert.ok(rows.length > 0, 'the demo has records that died in the Emergency unit');
    const outcome = header.indexOf('Outcome');
    assert.ok(
      rows.every((r) => r[outcome] === 'Died'),
      'the export follows the filters',
    );
    // Percentages and mmHg to one decimal, seconds whole: no 0.9017857142857143.
    for (const [i, name] of header.entries()) {
      const unit = /\((%|s|mmHg)\)$/.exec(name)?.[1];
      if (!unit) continue;
      const places = unit === 's' ? 0 : 1;
      for (const r of rows) {
        const decimals = r[i].split('.')[1]?.length ?? 0;
        assert.ok(decimals <= places, `${name} "${r[i]}" is rounded to ${places} places`);
      }
    }
    await context.close();
  });
});
