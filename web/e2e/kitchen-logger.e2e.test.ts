import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { baseUrl, RESULTS_DIR } from './browser';
import { browserPerTest, patchAccount, post, signUp } from './helpers';

// A bake started now, and a kitchen logger's file covering the last hour at 29 °C (warmer than
// the 24 °C the plan assumed): after the import the bulk ends earlier.

const COUNTRY_LOAF = {
  name: 'Country loaf 75 %',
  ingredients: [
    { kind: 'flour', name: 'Bread flour', amount: 1000, unit: 'g' },
    { kind: 'water', name: 'Water', amount: 750, unit: 'g' },
    { kind: 'starter', name: 'Levain', amount: 200, unit: 'g' },
    { kind: 'salt', name: 'Salt', amount: 20, unit: 'g' },
  ],
};

/** One row a minute over the last `minutes`, ISO times in UTC; a warm kitchen. */
function loggerFile(minutes: number, c: number): Buffer {
  const now = Date.now();
  const rows = ['Timestamp (UTC),Room temperature °C'];
  for (let m = minutes; m >= 1; m--) rows.push(`${new Date(now - m * 60_000).toISOString()},${c.toFixed(1)}`);
  return Buffer.from(rows.join('\n') + '\n');
}

interface PlanJson {
  kitchen: { count: number } | null;
  live: { steps: { id: string; startAt: string }[] };
}

describe('a kitchen logger file on a bake, on a phone', () => {
  const base = baseUrl();
  const browser = browserPerTest();

  it('imports the room series from the bake page and the bulk end comes earlier', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Amara Quist');
    await patchAccount(page, base, { timeZone: 'Europe/Berlin' });
    const formula = await post(page, `${base}/api/formulas`, COUNTRY_LOAF);
    // The levain is ready: the mix is now, so the last hour is inside the bake's window.
    const plan = await post(page, `${base}/api/plans`, {
      formulaId: formula.id,
      mode: 'start-now',
      doughTemperatureC: 24,
      option: 'same-day',
      starter: { skipFeeding: true },
    });
    const read = async () => (await (await page.request.get(`${base}/api/plans/${plan.id}`)).json()) as PlanJson;
    const bulkEnd = (p: PlanJson) => Date.parse(p.live.steps.find((s) => s.id === 'bulk-end')?.startAt ?? '');
    const before = await read();

    await page.goto(`${base}/bench/${plan.id}`);
    const card = page.getByTestId('kitchen-card');
    await card.getByText('A temperature logger in the kitchen?').waitFor();
    await card.getByRole('link', { name: 'Import logger file' }).click();
    await page.waitForURL(`${base}/bench/${plan.id}/kitchen/import`);
    await page
      .getByTestId('logger-file')
      .setInputFiles({ name: 'kitchen.csv', mimeType: 'text/csv', buffer: loggerFile(55, 29) });
    const selected = (label: string) =>
      page.getByLabel(label).evaluate((e) => (e as HTMLSelectElement).selectedOptions[0]?.text);
    await expect.poll(() => selected('Temperature column')).toBe('Room temperature °C');
    expect(await selected('Temperatures are in')).toBe('°C (Celsius)');

    await page.getByRole('button', { name: 'Check file' }).click();
    const check = page.getByTestId('logger-check');
    // 55 rows from 55 min ago; one kept per 5 minutes, counted from an hour before the mix.
    await expect.poll(() => check.innerText()).toMatch(/^1[01] readings to add, from 55 rows read\./);
    await page.screenshot({ path: join(RESULTS_DIR, 'kitchen-import-check.png') });
    await page.getByRole('button', { name: /^Add 1[01] readings$/ }).click();
    const done = page.getByTestId('logger-import-done');
    await expect.poll(() => done.innerText()).toMatch(/1[01] readings added\. The bulk forecast/);

    await page.getByRole('link', { name: 'Back to the bake' }).click();
    await page.waitForURL(`${base}/bench/${plan.id}`);
    await expect.poll(() => card.innerText()).toMatch(/1[01] room readings from/);
    await card.scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(RESULTS_DIR, 'kitchen-card-phone.png') });

    const after = await read();
    expect(after.kitchen?.count).toBeGreaterThanOrEqual(10);
    expect(bulkEnd(after)).toBeLessThan(bulkEnd(before));

    // Removing them puts the forecast back.
    await card.getByRole('button', { name: 'Remove readings' }).click();
    await card.getByRole('button', { name: 'Remove', exact: true }).click();
    await card.getByText('A temperature logger in the kitchen?').waitFor();
    const cleared = await read();
    expect(cleared.kitchen).toBeNull();
    expect(Math.abs(bulkEnd(cleared) - bulkEnd(before))).toBeLessThan(5 * 60_000);
  });
});
