import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { CSV_COLUMNS, REQUEST_BODY_MAX_BYTES } from '@peakwise/shared';
import type { Download, Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, PHONE, RESULTS_DIR } from './browser';
import { browserPerTest, createCulture, createFeeding, HOUR, post, signUp } from './helpers';

async function feedingCount(page: Page, base: string, cultureId: string): Promise<number> {
  const res = await page.request.get(`${base}/api/cultures/${cultureId}/feedings?limit=1`);
  return ((await res.json()) as { total: number }).total;
}

async function downloadedText(download: Download): Promise<string> {
  return readFile(await download.path(), 'utf8');
}

// Whole minutes, so the times in the file equal the logged ones to the second.
const at = (ms: number) => new Date(Math.floor(ms / 60_000) * 60_000).toISOString();

/**
 * A log kept in a spreadsheet with its own headers: the feeding already in Peakwise (with its
 * first check), a new feeding with two checks, one whose jar temperature is `jarTemp`, one
 * with a note holding a comma. Line numbers: the header is line 1.
 */
function spreadsheet(t: { logged: number; loggedCheck: number }, jarTemp: string): string {
  // Relative to the logged feeding, so each call writes the same times.
  const a = t.logged + 24 * HOUR;
  const b = t.logged + 42 * HOUR;
  const c = t.logged + 60 * HOUR;
  return [
    'Fed on,Starter (g),Flour g,Water g,Jar temp,Flour,Checked at,Height mm,Notes',
    `${at(t.logged)},20,100,100,24,,${at(t.loggedCheck)},60,`,
    `${at(a)},25,50,50,23,whole rye,${at(a + 3 * HOUR)},62,`,
    `${at(a)},25,50,50,23,whole rye,${at(a + 5 * HOUR)},81,`,
    `${at(b)},25,50,50,${jarTemp},whole rye,,,`,
    `${at(c)},25,50,50,22,,,,"Fed late, smelled sweet"`,
  ].join('\r\n');
}

/** Scrolls `target` to the top of the screen, below the fixed app bar, for a screenshot. */
async function scrollToTop(page: Page, target: Locator) {
  await target.evaluate((e) => window.scrollTo(0, e.getBoundingClientRect().top + window.scrollY - 72));
}

const csvFile = (text: string) => ({ name: 'kitchen-log.csv', mimeType: 'text/csv', buffer: Buffer.from(text) });

/** The four columns named too differently to be matched for the baker. */
async function mapColumns(page: Page) {
  await page.getByLabel('Fed at').selectOption('Fed on');
  await page.getByLabel('Room or jar temperature (°C)').selectOption('Jar temp');
  await page.getByLabel('Rise check: taken at').selectOption('Checked at');
  await page.getByLabel('Rise check: height (mm)').selectOption('Height mm');
}

describe('import and export on a phone', () => {
  const base = baseUrl();
  const browser = browserPerTest();

  it('downloads the CSV, imports a spreadsheet with its own headers after fixing a row, and skips it the second time', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Amara Quist');
    const id = await createCulture(page, base, 'Bramble');
    const logged = Date.now() - 72 * HOUR;
    const feedingId = await createFeeding(page, base, id, {
      fedAt: at(logged),
      starterG: 20,
      flourG: 100,
      waterG: 100,
      temperatureC: 24,
    });
    for (const [hours, heightMm] of [
      [2, 60],
      [4, 84.5],
    ] as const) {
      await post(page, `${base}/api/feedings/${feedingId}/rise-checks`, {
        takenAt: at(logged + hours * HOUR),
        heightMm,
      });
    }

    // The culture page's Files card: download, import, and the units of the file.
    await page.goto(`${base}/cultures/${id}`);
    const files = page.getByTestId('culture-files');
    await files.getByRole('heading', { name: 'Files' }).waitFor();
    await files.scrollIntoViewIfNeeded();
    expect(await files.getByTestId('si-note').textContent()).toContain('grams (g), millimetres (mm)');
    await page.screenshot({ path: join(RESULTS_DIR, 'culture-files.png') });

    const [csvDownload] = await Promise.all([
      page.waitForEvent('download'),
      files.getByRole('button', { name: 'Download CSV' }).click(),
    ]);
    expect(csvDownload.suggestedFilename()).toBe('Bramble-feedings.csv');
    const lines = (await downloadedText(csvDownload)).trim().split(/\r\n/);
    expect(lines[0]).toBe(CSV_COLUMNS.join(','));
    // One row per rise check, the feeding's columns repeated (SI: g, °C, mm).
    expect(lines.slice(1)).toEqual([
      `${at(logged)},20,100,100,,24,,,,,${at(logged + 2 * HOUR)},60,`,
      `${at(logged)},20,100,100,,24,,,,,${at(logged + 4 * HOUR)},84.5,`,
    ]);
    await files.getByRole('status').filter({ hasText: 'Saved Bramble-feedings.csv' }).waitFor();

    // Import: the file's own headers; same names are matched, the rest mapped by hand.
    await files.getByRole('link', { name: 'Import from CSV' }).click();
    await page.waitForURL(`${base}/cultures/${id}/import`);
    // A file over the request limit is refused in the browser, before anything is sent.
    const huge = Buffer.alloc(REQUEST_BODY_MAX_BYTES + 1, 'a');
    await page.getByTestId('csv-file').setInputFiles({ name: 'huge.csv', mimeType: 'text/csv', buffer: huge });
    await page.getByRole('alert').getByText('“huge.csv” is 1.1 MB, over the 1 MB Peakwise takes at once.').waitFor();
    const times = { logged, loggedCheck: logged + 2 * HOUR };
    await page.getByTestId('csv-file').setInputFiles(csvFile(spreadsheet(times, '80')));
    await page.getByText('kitchen-log.csv').waitFor();
    expect(await page.locator('select[name="starter_g"]').inputValue()).toBe('Starter (g)');
    expect(await page.locator('select[name="flour_g"]').inputValue()).toBe('Flour g');
    expect(await page.locator('select[name="notes"]').inputValue()).toBe('Notes');
    expect(await page.locator('select[name="fed_at"]').inputValue()).toBe('');
    // A required column left unmatched is named at its field, and nothing is sent.
    await page.getByRole('button', { name: 'Check file' }).click();
    await page.getByText('Choose the column of your file that holds this.').waitFor();
    await mapColumns(page);
    await scrollToTop(page, page.getByRole('heading', { name: '2. Match the columns' }));
    await page.screenshot({ path: join(RESULTS_DIR, 'import-mapping.png') });
    await page.screenshot({ path: join(RESULTS_DIR, 'import-mapping-full.png'), fullPage: true });

    // The check finds the bad row by line and by the baker's own column; no way to import yet.
    await page.getByRole('button', { name: 'Check file' }).click();
    const errors = page.getByTestId('import-errors');
    await errors.waitFor();
    expect(await errors.textContent()).toContain('Line 5, column “Jar temp” (Room or jar temperature (°C)):');
    expect(await errors.textContent()).toContain('Enter a temperature from');
    expect(await page.getByRole('button', { name: /^Import \d/ }).count()).toBe(0);
    await scrollToTop(page, page.getByRole('heading', { name: '3. Check and import' }));
    await page.screenshot({ path: join(RESULTS_DIR, 'import-errors.png') });

    // The corrected file, chosen again, keeps the matched columns; the check counts what is new.
    await page.getByTestId('csv-file').setInputFiles(csvFile(spreadsheet(times, '21.5')));
    await page.getByText('kitchen-log.csv').waitFor();
    expect(await page.locator('select[name="fed_at"]').inputValue()).toBe('Fed on');
    await page.getByRole('button', { name: 'Check file' }).click();
    const counts = page.getByTestId('import-counts');
    await counts.waitFor();
    expect(await counts.innerText()).toMatch(/Feedings\s+3 new\s+1 already in the logbook/);
    expect(await counts.innerText()).toMatch(/Rise checks\s+2 new\s+1 already in the logbook/);
    const preview = page.getByRole('table', { name: 'Preview of the file' });
    await preview.getByText('Fed late, smelled sweet').waitFor();
    expect(await preview.locator('tbody tr').count()).toBe(5);
    expect(await page.getByTestId('import-errors').count()).toBe(0);
    // Checking wrote nothing.
    expect(await feedingCount(page, base, id)).toBe(1);
    await scrollToTop(page, page.getByRole('heading', { name: '3. Check and import' }));
    await page.screenshot({ path: join(RESULTS_DIR, 'import-preview.png') });
    await page.screenshot({ path: join(RESULTS_DIR, 'import-preview-full.png'), fullPage: true });

    await page.getByRole('button', { name: 'Import 3 feedings' }).click();
    await page.getByTestId('import-done').getByText('Imported 3 feedings and 2 rise checks into Bramble.').waitFor();
    expect(await feedingCount(page, base, id)).toBe(4);
    await page.getByRole('link', { name: 'Back to Bramble' }).click();
    await page.waitForURL(`${base}/cultures/${id}`);
    // The imported feedings are in the culture's list (25 : 50 : 50 g is only theirs).
    await page.getByText('25 : 50 : 50 g').first().waitFor();
    expect(await page.getByText('25 : 50 : 50 g').count()).toBe(3);

    // The same file again: everything is already there, and there is nothing to confirm.
    await page.goto(`${base}/cultures/${id}/import`);
    await page.getByTestId('csv-file').setInputFiles(csvFile(spreadsheet(times, '21.5')));
    await mapColumns(page);
    await page.getByRole('button', { name: 'Check file' }).click();
    await page.getByText('Nothing new: everything in this file is already in Bramble’s logbook.').waitFor();
    expect(await page.getByTestId('import-counts').innerText()).toMatch(/Feedings\s+0 new\s+4 already/);
    expect(await page.getByRole('button', { name: /^Import \d/ }).count()).toBe(0);
    expect(await feedingCount(page, base, id)).toBe(4);
    await page.setViewportSize(DESKTOP);
    await page.screenshot({ path: join(RESULTS_DIR, 'import-nothing-new-desktop.png'), fullPage: true });
    await page.setViewportSize(PHONE);

    // The account page: the whole account as one JSON file.
    await page.goto(`${base}/account`);
    const [jsonDownload] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download all my data (JSON)' }).click(),
    ]);
    expect(jsonDownload.suggestedFilename()).toMatch(/^peakwise-export-\d{4}-\d{2}-\d{2}\.json$/);
    const all = JSON.parse(await downloadedText(jsonDownload)) as {
      format: string;
      cultures: unknown[];
      feedings: unknown[];
      riseChecks: unknown[];
    };
    expect(all).toMatchObject({ format: 'peakwise-export', version: 1 });
    expect([all.cultures.length, all.feedings.length, all.riseChecks.length]).toEqual([1, 4, 4]);
    await page.getByText(/^Saved peakwise-export-.+: 1 culture, 4 feedings, 4 rise checks\.$/).waitFor();
    await scrollToTop(page, page.getByRole('heading', { name: 'Your data' }));
    await page.screenshot({ path: join(RESULTS_DIR, 'account-data.png') });
    await page.close();
  });
});
