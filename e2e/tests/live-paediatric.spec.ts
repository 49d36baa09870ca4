import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Browser, Page } from 'playwright-core';
import { newTabletContext, signIn } from '../support/browser';
import { launchChromium, tap } from '../support/live';

/** Starts a code from the Board and records the age group (and weight) in Details. */
async function startChild(page: Page, ageGroup: 'Child' | 'Infant', weightKg?: string) {
  await page.getByRole('button', { name: 'Start', exact: true }).click();
  await page.waitForURL(/\/live\/[0-9a-f-]{36}$/);
  await tap(page, 'Details');
  const details = page.getByRole('dialog', { name: 'Details' });
  await details.getByRole('combobox', { name: 'Age group' }).click();
  await page.getByRole('option', { name: ageGroup, exact: true }).click();
  if (weightKg) await details.getByRole('textbox', { name: 'Weight (kg)' }).fill(weightKg);
  await details.getByRole('button', { name: 'Save details' }).click();
  await details.waitFor({ state: 'detached' });
}

/** The accessible names of the choice buttons of the open dialog. */
async function choiceNames(page: Page): Promise<string[]> {
  const names = await page.getByRole('dialog').getByRole('button').allTextContents();
  return names.map((n) => n.trim());
}

describe('children are not small adults: Live offers weight-based doses and energies', () => {
  let browser: Browser;
  let close: () => Promise<void>;
  before(async () => {
    ({ browser, close } = await launchChromium());
  });
  after(() => close());

  it('a 20 kg child: weight-based drug choices only, each with arithmetic; shocks 40 J then 80 J', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await signIn(page, 'recorder');
    await startChild(page, 'Child', '20');

    await tap(page, 'Drug');
    const drug = page.getByRole('dialog', { name: 'Drug given' });
    // AHA paediatric drug table (Kleinman 2010, Table 1; AHA 2020): epinephrine 0.01 mg/kg
    // (max 1 mg), amiodarone 5 mg/kg (max 300 mg), lidocaine 1 mg/kg.
    await drug.getByRole('button', { name: /^Epinephrine 0\.2 mg/ }).waitFor();
    const names = await choiceNames(page);
    assert.ok(
      names.includes('Epinephrine 0.2 mg0.01 mg/kg × 20 kg = 0.2 mg (max 1 mg)'),
      names.join(' | '),
    );
    assert.ok(names.includes('Amiodarone 100 mg5 mg/kg × 20 kg = 100 mg (max 300 mg)'));
    assert.ok(names.includes('Lidocaine 20 mg1 mg/kg × 20 kg = 20 mg'));
    assert.ok(names.some((n) => n.startsWith('Calcium chloride 10 % 4 mL')));
    for (const adult of ['Epinephrine 1 mg', 'Amiodarone 300 mg', 'Lidocaine 100 mg'])
      assert.ok(!names.some((n) => n.startsWith(adult)), `${adult} offered directly`);
    // Every dose choice shows its arithmetic.
    for (const n of names.filter((x) => / (mg|mmol|mL)/.test(x.split('×')[0])))
      assert.match(n, /\/kg × 20 kg = /);

    // The adult fixed doses are one explicit step away, and say so.
    await drug.getByRole('button', { name: 'Adult doses…' }).click();
    await drug.getByText(/fixed adult values, not weight-based/).waitFor();
    await drug.getByRole('button', { name: 'Epinephrine 1 mg', exact: true }).waitFor();
    await drug.getByRole('button', { name: 'Back to weight-based choices' }).click();
    await drug.getByRole('button', { name: /^Epinephrine 0\.2 mg/ }).click();
    await drug.waitFor({ state: 'detached' });

    // AHA 2020 paediatric guideline: 2 J/kg, then 4 J/kg (from memory; docs/paediatric-values.md).
    await tap(page, 'Shock');
    const shock = page.getByRole('dialog', { name: 'Shock: energy' });
    await shock
      .getByRole('button', { name: /^40 J\s*2 J\/kg × 20 kg = 40 J \(max 200 J\)$/ })
      .click();
    await shock.waitFor({ state: 'detached' });
    await tap(page, 'Shock');
    await shock.getByRole('button', { name: /^80 J\s*4 J\/kg × 20 kg = 80 J/ }).waitFor();
    const energies = await choiceNames(page);
    assert.ok(!energies.some((n) => /^(120|150|200|300|360) J$/.test(n)), energies.join(' | '));
    await shock.getByRole('button', { name: /^80 J/ }).click();
    await shock.waitFor({ state: 'detached' });
    await page
      .getByText(/Shock: 80 J|Shock 80 J/)
      .first()
      .waitFor();
    await context.close();
  });

  it('a child with no weight is asked for one (or an age, with the APLS formula named)', async () => {
    const context = await newTabletContext(browser);
    const page = await context.newPage();
    await signIn(page, 'recorder');
    await startChild(page, 'Child');

    await tap(page, 'Drug');
    const drug = page.getByRole('dialog', { name: 'Drug given' });
    await drug.getByText(/Child record with no weight/).waitFor();
    const before = await choiceNames(page);
    assert.ok(
      !before.some((n) => /^(Epinephrine|Amiodarone|Lidocaine) /.test(n)),
      before.join(' | '),
    );
    await drug.getByRole('textbox', { name: 'Age (years)' }).fill('4');
    // APLS formula for 1–5 years: (2 × age) + 8 (from memory; REFERENCE.md).
    await drug
      .getByText('Estimated 16 kg — APLS formula for 1–5 years: (2 × age in years) + 8', {
        exact: false,
      })
      .waitFor();
    await drug.getByRole('button', { name: 'Use 16 kg' }).click();
    await drug.getByRole('button', { name: /^Epinephrine 0\.16 mg/ }).waitFor();
    await context.close();
  });
});
