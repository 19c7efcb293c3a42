import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, PHONE, RESULTS_DIR } from './browser';
import { addRiseChecks, browserPerTest, HOUR, localInput, patchAccount, signUp } from './helpers';

interface FeedingJson {
  id: string;
  fedAt: string;
  starterG: number;
  flourG: number;
  temperatureC: number | null;
  initialHeightMm: number | null;
  observations: string[];
}

/** A US-units baker (°F, inches) with a culture and one feeding logged through the form 3 h ago. */
async function bakerWithFeeding(page: Page, base: string): Promise<{ cultureId: string; feeding: FeedingJson }> {
  await signUp(page, base, 'Dev Rowan');
  await patchAccount(page, base, { unitSystem: 'us', temperatureUnit: 'F' });

  await page.goto(`${base}/shelf`);
  await page.getByLabel('Name').fill('Pip');
  await page.getByRole('button', { name: 'Add culture' }).click();
  await page.waitForURL(/\/cultures\/[^/]+\/feed$/);
  const cultureId = new URL(page.url()).pathname.split('/')[2]!;

  await page.getByRole('button', { name: '1:2:2' }).click();
  await page.getByLabel('Total in the jar after feeding').fill('150');
  await page.getByLabel('Fed at').fill(await localInput(page, Date.now() - 3 * HOUR));
  await page.getByLabel('Room or jar temperature').fill('75.2');
  await page.getByLabel('Height in the jar now').fill('1.6');
  await page.getByRole('button', { name: 'Bubbles' }).click();
  await page.getByRole('button', { name: 'Save feeding' }).click();
  await page.waitForURL(`${base}/cultures/${cultureId}`);

  const list = await page.request.get(`${base}/api/cultures/${cultureId}/feedings`);
  const feeding = ((await list.json()) as { items: FeedingJson[] }).items[0]!;
  // 75.2 °F = 24 °C; 1.6 in = 40.64 mm, stored to 0.1 mm (NIST SP 811: 1 in = 25.4 mm exactly).
  expect(feeding).toMatchObject({ starterG: 30, flourG: 60, temperatureC: 24, initialHeightMm: 40.6 });
  return { cultureId, feeding };
}

/** Waits out the dialog's fade-in, so a screenshot shows it as the baker sees it. */
async function dialogShown(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const dialog = document.querySelector('[role="dialog"]');
    return dialog !== null && getComputedStyle(dialog.parentElement!).opacity === '1';
  });
}

async function getJson<T>(page: Page, url: string): Promise<T> {
  const res = await page.request.get(url);
  expect(res.status()).toBe(200);
  return (await res.json()) as T;
}

describe('correcting one feeding on a phone', () => {
  const base = baseUrl();
  const browser = browserPerTest();

  it('edits the feeding in °F, adds temperatures, corrects and removes rise checks, deletes the feeding', async () => {
    const page = await browser.context.newPage();
    const { cultureId, feeding } = await bakerWithFeeding(page, base);
    const fedAt = Date.parse(feeding.fedAt);
    await addRiseChecks(page, base, feeding.id, fedAt, [
      [1, 45],
      [2, 60],
    ]);

    // The culture page's feedings table: a tap on the row (not only its date link) opens the feeding.
    await page.reload();
    await page.getByRole('table', { name: 'Feedings' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(RESULTS_DIR, 'culture-feedings-table.png') });
    await page.getByRole('table', { name: 'Feedings' }).getByText('75.2 °F').click();
    await page.waitForURL(`${base}/feedings/${feeding.id}`);
    await page.getByRole('heading', { name: 'Feeding · Pip', level: 1 }).waitFor();
    await page.getByText('ratio 1 : 2 : 2', { exact: false }).waitFor();
    expect(await page.getByText('1.6 in', { exact: true }).count()).toBeGreaterThan(0);
    expect(await page.getByRole('link', { name: 'Pip' }).getAttribute('href')).toBe(`/cultures/${cultureId}`);
    // Rise checks in inches with their rise over the 40.6 mm start: 45 mm is +11 %, 60 mm is +48 %.
    const checks = page.getByRole('table', { name: 'Rise checks' });
    await checks.getByText('+48 %').waitFor();
    expect(await checks.getByText('+11 %').count()).toBe(1);

    // Edit: a heavier starter and a warmer room, typed in °F.
    await page.getByRole('button', { name: 'Edit feeding' }).click();
    // The server's refusal lands under the field it is about: a feeding can't move after its rise checks.
    const fedAtText = await page.getByLabel('Fed at').inputValue();
    await page.getByLabel('Fed at').fill(await localInput(page, Date.now()));
    await page.getByRole('button', { name: 'Save changes' }).click();
    const fedAtError = page.getByText('This feeding has rise checks or temperatures from before this time.');
    await fedAtError.waitFor();
    expect(await page.getByLabel('Fed at').getAttribute('aria-invalid')).toBe('true');
    await page.getByLabel('Fed at').fill(fedAtText);
    await page.getByLabel('Starter', { exact: true }).fill('40');
    await page.getByLabel('Room or jar temperature').fill('78.8');
    await page.getByText('Ratio 1 : 1.5 : 1.5 (starter : flour : water)').waitFor();
    await page.getByRole('button', { name: 'Discolouration' }).click();
    expect(await page.getByText('°F', { exact: true }).count()).toBeGreaterThan(0);
    await page.getByRole('heading', { name: 'Correct this feeding' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(RESULTS_DIR, 'feeding-edit.png') });
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByRole('heading', { name: 'As recorded' }).waitFor();
    await page.getByText('Saved. The culture’s forecast now uses the corrected feeding.').waitFor();
    await page.getByText('78.8 °F', { exact: true }).waitFor();
    // A discoloured jar keeps its caution on the record, not only in the form.
    await page.getByRole('alert').getByText('is discarded, not rescued', { exact: false }).waitFor();
    const edited = await getJson<FeedingJson>(page, `${base}/api/feedings/${feeding.id}`);
    // 78.8 °F = 26 °C (NIST SP 811 B.9); the untouched height keeps its stored value.
    expect(edited).toMatchObject({ starterG: 40, flourG: 60, temperatureC: 26, initialHeightMm: 40.6 });
    expect(edited.fedAt).toBe(feeding.fedAt);
    expect(edited.observations).toEqual(['bubbles', 'discolouration']);

    // A reading from before the feeding is refused at its time field.
    await page.getByLabel('Temperature', { exact: true }).fill('70');
    await page.getByLabel('Taken at').fill(await localInput(page, fedAt - HOUR));
    await page.getByRole('button', { name: 'Add reading' }).click();
    await page.getByText(/before (this|the) feeding/i).waitFor();
    expect(await page.getByLabel('Taken at').getAttribute('aria-invalid')).toBe('true');
    await page.getByLabel('Taken at').fill(await localInput(page, Date.now()));

    // Two temperature readings: one now (the default time), one an hour after feeding.
    await page.getByLabel('Temperature', { exact: true }).fill('71.6');
    await page.getByRole('button', { name: 'Add reading' }).click();
    const readings = page.getByRole('table', { name: 'Temperature readings' });
    await readings.getByText('71.6 °F').waitFor();
    // The form clears once the save has come back; the table may show the row a moment earlier.
    await expect.poll(() => page.getByLabel('Temperature', { exact: true }).inputValue()).toBe('');
    await page.getByLabel('Temperature', { exact: true }).fill('69.8');
    await page.getByLabel('Taken at').fill(await localInput(page, fedAt + HOUR));
    await page.getByRole('button', { name: 'Add reading' }).click();
    await readings.getByText('69.8 °F').waitFor();
    const stored = await getJson<{ items: { temperatureC: number; takenAt: string }[] }>(
      page,
      `${base}/api/feedings/${feeding.id}/temperatures`,
    );
    // Oldest first; 69.8 °F = 21 °C and 71.6 °F = 22 °C.
    expect(stored.items.map((r) => r.temperatureC)).toEqual([21, 22]);
    expect(Math.abs(Date.parse(stored.items[1]!.takenAt) - Date.now())).toBeLessThan(5 * 60_000);
    expect(await readings.locator('tbody tr').first().textContent()).toContain('69.8 °F');

    // Correct the first rise check to 2.5 in (63.5 mm).
    await page
      .getByRole('button', { name: /^Edit rise check at / })
      .first()
      .click();
    const dialog = page.getByRole('dialog', { name: 'Edit rise check' });
    expect(await dialog.getByLabel('Height from the jar’s base').inputValue()).toBe('1.77');
    await dialog.getByLabel('Height from the jar’s base').fill('2.5');
    await dialogShown(page);
    await page.screenshot({ path: join(RESULTS_DIR, 'rise-check-edit.png') });
    await dialog.getByRole('button', { name: 'Save rise check' }).click();
    await dialog.waitFor({ state: 'detached' });
    await checks.getByText('+56 %').waitFor();
    type Checks = { items: { heightMm: number }[]; total: number };
    const corrected = await getJson<Checks>(page, `${base}/api/feedings/${feeding.id}/rise-checks`);
    expect(corrected.items.map((c) => c.heightMm)).toEqual([63.5, 60]);

    // Remove the second.
    await page
      .getByRole('button', { name: /^Delete rise check at / })
      .nth(1)
      .click();
    const confirm = page.getByRole('dialog', { name: 'Delete this rise check?' });
    await confirm.getByRole('button', { name: 'Delete rise check' }).click();
    await confirm.waitFor({ state: 'detached' });
    await checks.getByText('+48 %').waitFor({ state: 'detached' });
    expect((await getJson<Checks>(page, `${base}/api/feedings/${feeding.id}/rise-checks`)).total).toBe(1);
    // A phone as tall as the page, so the fixed top bar and bottom navigation sit where they belong.
    const height = await page.evaluate(() => document.documentElement.scrollHeight);
    await page.setViewportSize({ width: PHONE.width, height });
    await page.screenshot({ path: join(RESULTS_DIR, 'feeding-detail.png') });
    await page.setViewportSize(DESKTOP);
    await page.screenshot({ path: join(RESULTS_DIR, 'feeding-detail-desktop.png'), fullPage: true });
    await page.setViewportSize(PHONE);

    // Delete the feeding: the confirmation says what goes with it, then back to the culture.
    await page.getByRole('button', { name: 'Delete feeding' }).click();
    const last = page.getByRole('dialog', { name: 'Delete this feeding?' });
    expect(await last.textContent()).toContain('its 1 rise check and its 2 temperature readings go with it');
    await dialogShown(page);
    await page.screenshot({ path: join(RESULTS_DIR, 'feeding-delete.png') });
    await last.getByRole('button', { name: 'Delete feeding' }).click();
    await page.waitForURL(`${base}/cultures/${cultureId}`);
    await page.getByText('No feedings yet.').waitFor();
    expect((await page.request.get(`${base}/api/feedings/${feeding.id}`)).status()).toBe(404);
    await page.close();
  });
});
