import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { baseUrl, RESULTS_DIR } from './browser';
import { browserPerTest, createCulture, createFeeding, patchAccount, signUp } from './helpers';

// The invented sample test-fixtures/logger/kitchen-fahrenheit-mdy.csv: two metadata lines, then
// "Date Time","Temp (°F)", one row a minute from 28 Nov 2026 06:00 to 29 Nov 17:59 (naive times).
const sample = (name: string) => fileURLToPath(new URL(`../../test-fixtures/logger/${name}`, import.meta.url));
const SAMPLE = sample('kitchen-fahrenheit-mdy.csv');

describe('importing a temperature logger file on a phone', () => {
  const base = baseUrl();
  const browser = browserPerTest();

  it('preselects the columns, °F and the account zone, and adds the feeding’s part of the file', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Ines Vale');
    await patchAccount(page, base, { timeZone: 'Europe/Berlin' });
    const cultureId = await createCulture(page, base, 'Larkspur rye');
    // 13:00 in Berlin (UTC+1 in November): the file's 06:00–12:59 (420 rows) is before the feeding.
    const feedingId = await createFeeding(page, base, cultureId, {
      fedAt: '2026-11-28T12:00:00.000Z',
      starterG: 20,
      flourG: 100,
      waterG: 100,
      temperatureC: 20,
    });

    await page.goto(`${base}/feedings/${feedingId}`);
    await page.getByRole('link', { name: 'Import logger file' }).click();
    await page.waitForURL(`${base}/feedings/${feedingId}/temperatures/import`);
    await page.getByTestId('logger-file').setInputFiles(SAMPLE);

    await expect.poll(() => page.getByLabel('Time column').inputValue()).toBe('0');
    const selected = (label: string) =>
      page.getByLabel(label).evaluate((e) => (e as HTMLSelectElement).selectedOptions[0]?.text);
    expect(await selected('Time column')).toBe('Date Time');
    expect(await selected('Temperature column')).toBe('Temp (°F)');
    expect(await selected('Temperatures are in')).toBe('°F (Fahrenheit)');
    expect(await selected('Dates are written')).toContain('Month first');
    expect(await page.getByLabel('Times without a zone are in').inputValue()).toBe('Europe/Berlin');
    // The first data row is line 4 (two metadata lines and the header above it); 80.0 °F is 26.7 °C.
    const preview = page.getByTestId('logger-preview');
    await expect
      .poll(() => preview.locator('tbody tr').first().innerText())
      .toMatch(/^4\s+28 Nov 2026, 06:00\s+26\.7 °C$/);
    await page.getByRole('heading', { name: '2. Check the columns' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(RESULTS_DIR, 'logger-import-mapping.png'), fullPage: true });

    await page.getByRole('button', { name: 'Check file' }).click();
    const check = page.getByTestId('logger-check');
    await expect.poll(() => check.innerText()).toContain('348 readings to add, from 2,160 rows read.');
    expect(await check.innerText()).toContain('420 readings outside this feeding’s time');
    await page.screenshot({ path: join(RESULTS_DIR, 'logger-import-check.png') });

    await page.getByRole('button', { name: 'Add 348 readings' }).click();
    const done = page.getByTestId('logger-import-done');
    await expect
      .poll(() => done.innerText())
      .toContain('348 readings added; 420 outside this feeding’s time left out.');
    await page.screenshot({ path: join(RESULTS_DIR, 'logger-import-done.png') });

    // Back on the feeding, the card lists them (and the link to import more).
    await page.getByRole('link', { name: 'Back to the feeding' }).click();
    await page.waitForURL(`${base}/feedings/${feedingId}`);
    const card = page.getByRole('heading', { name: 'Temperatures' });
    await card.evaluate((e) => window.scrollTo(0, e.getBoundingClientRect().top + window.scrollY - 72));
    await page.screenshot({ path: join(RESULTS_DIR, 'logger-import-feeding.png') });

    const res = await page.request.get(`${base}/api/feedings/${feedingId}/temperatures?limit=1`);
    expect(((await res.json()) as { total: number }).total).toBe(348);
  });

  it('lists the rows it cannot read by line, and reads a "DateTime (UTC)" file as UTC', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Ines Vale');
    await patchAccount(page, base, { timeZone: 'America/Chicago' });
    const cultureId = await createCulture(page, base, 'Larkspur rye');
    const feedingId = await createFeeding(page, base, cultureId, {
      fedAt: '2026-11-28T07:00:00.000Z',
      starterG: 20,
      flourG: 100,
      waterG: 100,
    });
    await page.goto(`${base}/feedings/${feedingId}/temperatures/import`);
    // Invented sample: 12 rows every 10 min from 07:15 UTC, line 6 without a temperature, line 9 "ERR".
    await page.getByTestId('logger-file').setInputFiles(sample('cellar-celsius-utc.csv'));
    await expect.poll(() => page.getByLabel('Times without a zone are in').inputValue()).toBe('UTC');
    await page.getByRole('button', { name: 'Check file' }).click();
    const problems = page.getByTestId('logger-problems');
    await expect.poll(() => problems.innerText()).toContain('2 rows could not be read');
    expect(await problems.innerText()).toContain('Line 9: “ERR” is not a number.');
    expect(await page.getByTestId('logger-check').innerText()).toContain('10 readings to add');
    await page.mouse.move(0, 0);
    await page.screenshot({ path: join(RESULTS_DIR, 'logger-import-problems.png') });
  });
});
