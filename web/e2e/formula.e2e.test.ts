import { join } from 'node:path';
import type { FormulaComputed } from '@peakwise/shared';
import type { Page } from 'playwright-core';
import { beforeEach, describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, RESULTS_DIR } from './browser';
import { browserPerTest, signUp } from './helpers';

/** Fills line `n` (1-based) of the editor. */
async function line(page: Page, n: number, amount: string, unit: string, food?: string) {
  await page.getByLabel(`Amount of line ${n}`).fill(amount);
  await page.getByLabel(`Unit of line ${n}`).selectOption(unit);
  if (food)
    await page
      .getByTestId('ingredient-row')
      .nth(n - 1)
      .getByLabel('What it is')
      .selectOption(food);
}

const resultOf = (page: Page, n: number) => page.getByTestId('line-result').nth(n - 1);

// The same formula as typed in the browser, for asking the API directly.
const TYPED = {
  ingredients: [
    { kind: 'flour', name: 'Bread flour', amount: 3, unit: 'cup', food: 'bread-flour' },
    { kind: 'water', name: 'Water', amount: 1, unit: 'cup' },
    { kind: 'starter', name: 'Levain', amount: 100, unit: 'g', starterHydrationPct: 100 },
    { kind: 'salt', name: 'Salt', amount: 1.5, unit: 'tsp', food: 'table-salt' },
    { kind: 'milk', name: 'Milk', amount: 0.5, unit: 'cup' },
  ],
  blend: [],
};

describe('Formula on a phone', () => {
  const base = baseUrl();
  const browser = browserPerTest();
  let page: Page;

  beforeEach(async () => {
    page = await browser.context.newPage();
  });

  it('weighs a volume recipe, switches views, scales to pieces, picks the water, saves and reopens', async () => {
    await signUp(page, base, 'Dev Rowan');
    await page.getByTestId('bottom-nav').getByRole('link', { name: 'Formula' }).click();
    await page.waitForURL(`${base}/formulas`);
    await page.getByRole('link', { name: 'New formula' }).click();
    await page.waitForURL(`${base}/formulas/new`);

    await page.getByLabel('Formula name').fill('Milk loaf by the cup');
    await line(page, 1, '3', 'cup', 'bread-flour');
    await line(page, 2, '1', 'cup');
    await line(page, 3, '100', 'g');
    await line(page, 4, '1.5', 'tsp', 'table-salt');
    await page.getByRole('button', { name: 'Add an ingredient' }).click();
    await page.getByLabel('Kind of line 5').selectOption('milk');
    await page.getByLabel('Name of line 5').fill('Milk');
    await line(page, 5, '0.5', 'cup');

    // USDA SR 20083 weighs a cup of bread flour at 137 g (shared food catalogue): 3 cups = 411 g.
    await expect.poll(() => resultOf(page, 1).innerText(), { timeout: 10_000 }).toContain('411 g');
    // The page shows what the API computes for the same formula, milk's water included.
    const res = await page.request.post(`${base}/api/formulas/compute`, { data: TYPED });
    expect(res.status()).toBe(200);
    const expected = (await res.json()) as FormulaComputed;
    const pct = (p: number | null) => `${p!.toFixed(1)} %`;
    await expect.poll(() => page.getByTestId('hydration').innerText()).toBe(pct(expected.totalHydrationPercent));
    expect(expected.totalHydrationPercent).toBeGreaterThan(
      ((expected.lines[1]!.grams + 50) / (expected.lines[0]!.grams + 50)) * 100,
    );
    await page.getByText('This dough has milk, butter or egg', { exact: false }).waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'formula-editor.png'), fullPage: true });

    // Final-dough view: water lines over the flour weighed in.
    await page.getByRole('button', { name: 'Final dough' }).click();
    await expect.poll(() => page.getByTestId('hydration').innerText()).toBe(pct(expected.finalDoughHydrationPercent));
    await page.getByText('Final-dough hydration').waitFor();
    await page.getByRole('button', { name: 'Total formula' }).click();

    // Six rolls of 150 g: 900 g of dough, weighable grams per line.
    await page.getByRole('button', { name: 'Pieces' }).click();
    await page.getByLabel('Pieces', { exact: true }).fill('6');
    await page.getByLabel('Each').fill('150');
    const scaled = page.getByTestId('scaled');
    await expect.poll(() => scaled.innerText(), { timeout: 10_000 }).toContain('900 g of dough');
    await scaled.scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(RESULTS_DIR, 'formula-scaled.png') });

    await page.getByRole('button', { name: 'Save formula' }).click();
    await page.waitForURL(/\/formulas\/[0-9a-f-]{36}$/);
    const id = new URL(page.url()).pathname.split('/')[2]!;
    await page.getByText('Saved. Only you can see your formulas.').waitFor();

    // Water temperature, 4 factors: 4 × 24 − (27 + 27 + 27 + 2.8) = 12.2 °C (hand-mixing friction
    // 5 °F = 2.8 °C); the formula's 237 g of water come along, and a 20 °C tap needs ice.
    await page.getByRole('link', { name: 'Water temperature' }).click();
    await page.waitForURL(`${base}/formulas/water-temperature?waterG=237`);
    await page.getByLabel('Desired dough temperature').fill('24');
    await page.getByLabel('Room', { exact: true }).fill('27');
    await page.getByLabel('Flour', { exact: true }).fill('27');
    await page.getByLabel('Levain or preferment', { exact: true }).fill('27');
    await expect.poll(() => page.getByTestId('water-temperature').innerText()).toBe('12.2 °C');
    await page.getByLabel('Tap water').fill('20');
    await expect.poll(() => page.getByTestId('ice').innerText()).toMatch(/g of ice \+ \d+ g of tap water/);
    // A past bake: 4 × 25 − (22 + 22 + 24 + 30) = 2 °C of friction.
    await page.getByLabel('Past bake: room').fill('22');
    await page.getByLabel('Past bake: flour').fill('22');
    await page.getByLabel('Past bake: water used').fill('30');
    await page.getByLabel('Past bake: levain').fill('24');
    await page.getByLabel('Past bake: dough after mixing').fill('25');
    await page.getByRole('button', { name: 'Use 2 °C above' }).click();
    await expect.poll(() => page.getByTestId('water-temperature').innerText()).toBe('13 °C');
    await page.getByTestId('water-temperature').scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(RESULTS_DIR, 'water-temperature.png'), fullPage: true });

    // Reopen from the list: the volumes come back as typed, and weigh the same.
    await page.getByTestId('bottom-nav').getByRole('link', { name: 'Formula' }).click();
    await page.getByTestId('formula-card').filter({ hasText: 'Milk loaf by the cup' }).click();
    await page.waitForURL(`${base}/formulas/${id}`);
    expect(await page.getByLabel('Amount of line 1').inputValue()).toBe('3');
    expect(await page.getByLabel('Unit of line 1').inputValue()).toBe('cup');
    await expect.poll(() => resultOf(page, 1).innerText(), { timeout: 10_000 }).toContain('411 g');
    expect(await page.getByLabel('Pieces', { exact: true }).inputValue()).toBe('6');

    await page.getByRole('link', { name: 'Print view' }).click();
    await page.waitForURL(`${base}/formulas/${id}/print`);
    // The editor's heading has the same name: wait for the sheet's own Print button instead.
    await page.getByRole('button', { name: 'Print', exact: true }).waitFor();
    expect(await page.getByTestId('bottom-nav').count()).toBe(0);
    await page.screenshot({ path: join(RESULTS_DIR, 'formula-print.png'), fullPage: true });

    // The same editor on a wide screen: lines on the left, figures beside them.
    await page.setViewportSize(DESKTOP);
    await page.goto(`${base}/formulas/${id}`);
    await expect.poll(() => resultOf(page, 1).innerText(), { timeout: 10_000 }).toContain('411 g');
    await page.screenshot({ path: join(RESULTS_DIR, 'formula-editor-desktop.png') });

    // Deleting asks once more, then the list is empty again.
    await page.getByRole('button', { name: 'Delete formula' }).click();
    await page.getByRole('button', { name: 'Delete', exact: true }).click();
    await page.waitForURL(`${base}/formulas`);
    await page.getByText('No formulas yet.', { exact: false }).waitFor();
  });
});
