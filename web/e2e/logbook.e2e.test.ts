import { join } from 'node:path';
import { request, type Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, RESULTS_DIR, uniqueEmail } from './browser';
import {
  addRiseChecks,
  browserPerTest,
  createCulture,
  createFeeding,
  HOUR,
  localInput,
  PASSWORD,
  patchAccount,
  signUp,
} from './helpers';

/** Whether this server answers GET /api/cultures/:id/summary (asked once, with a throwaway account). */
async function probeSummary(base: string): Promise<boolean> {
  const api = await request.newContext({ baseURL: base });
  try {
    await api.post('/api/auth/sign-up', {
      data: { displayName: 'Probe', email: uniqueEmail('probe'), password: PASSWORD },
    });
    const culture = await api.post('/api/cultures', { data: { name: 'Probe' } });
    const { id } = (await culture.json()) as { id: string };
    return (await api.get(`/api/cultures/${id}/summary`)).status() === 200;
  } finally {
    await api.dispose();
  }
}

const summaryAvailable = await probeSummary(baseUrl());

// [hours, height in mm] of a 40 mm starter climbing towards about 2.2 × (a Gompertz-like rise; invented).
const CHECKS = [
  [1, 43.2],
  [2, 58],
  [3, 73.6],
  [3.5, 78.8],
] as const;

/** Creates the culture, logs a 1:2:2 feeding 4 h ago in the form, then five rise checks. */
async function logFeedingAndChecks(page: Page, base: string): Promise<string> {
  await page.getByTestId('bottom-nav').getByRole('link', { name: 'Shelf' }).click();
  await page.waitForURL(`${base}/shelf`);
  await page.getByRole('heading', { name: 'Add your first culture' }).waitFor();
  await page.screenshot({ path: join(RESULTS_DIR, 'shelf-empty.png') });
  await page.getByLabel('Name').fill('Bramble');
  await page.getByLabel('Flour it is fed').fill('80 % bread flour, 20 % whole rye');
  await page.getByRole('button', { name: 'Add culture' }).click();
  await page.waitForURL(/\/cultures\/[^/]+\/feed$/);
  const cultureId = new URL(page.url()).pathname.split('/')[2]!;

  // Log feeding: the 1:2:2 preset and a total fill the three grams.
  await page.getByRole('button', { name: '1:2:2' }).click();
  await page.getByLabel('Total in the jar after feeding').fill('150');
  await page.waitForFunction(
    () => (document.querySelector('input[name="starterG"]') as HTMLInputElement)?.value === '30',
  );
  expect(await page.locator('input[name="flourG"]').inputValue()).toBe('60');
  expect(await page.locator('input[name="waterG"]').inputValue()).toBe('60');
  await page.getByLabel('Fed at').fill(await localInput(page, Date.now() - 4 * HOUR));
  await page.getByLabel('Room or jar temperature').fill('24');
  await page.getByLabel('Height in the jar now').fill('40');
  await page.getByRole('button', { name: 'Bubbles' }).click();
  // The discolouration chip shows the caution right in the form; take it off again.
  await page.getByRole('button', { name: 'Discolouration' }).click();
  await page
    .getByText('A culture with pink, orange or fuzzy growth is discarded, not rescued.', { exact: false })
    .waitFor();
  await page.getByRole('button', { name: '1:2:2' }).scrollIntoViewIfNeeded();
  await page.screenshot({ path: join(RESULTS_DIR, 'log-feeding.png') });
  await page.getByRole('button', { name: 'Save feeding' }).scrollIntoViewIfNeeded();
  await page.screenshot({ path: join(RESULTS_DIR, 'log-feeding-bottom.png') });
  await page.getByRole('button', { name: 'Discolouration' }).click();
  await page.getByRole('button', { name: 'Save feeding' }).click();
  await page.waitForURL(`${base}/cultures/${cultureId}`);

  const feedings = await page.request.get(`${base}/api/cultures/${cultureId}/feedings?limit=1`);
  const feeding = (
    (await feedings.json()) as { items: { id: string; fedAt: string; starterG: number; initialHeightMm: number }[] }
  ).items[0]!;
  expect(feeding).toMatchObject({ starterG: 30, initialHeightMm: 40 });
  const fedAt = new Date(feeding.fedAt).getTime();
  expect(Math.abs(fedAt - (Date.now() - 4 * HOUR))).toBeLessThan(5 * 60_000);

  // Four past rise checks through the API with this session, each with its own idempotency key…
  await addRiseChecks(page, base, feeding.id, fedAt, CHECKS);
  // …and the fifth, now, through the Rise check page.
  await page.goto(`${base}/shelf`);
  const card = page.getByTestId('culture-card').filter({ hasText: 'Bramble' });
  await card.getByRole('link', { name: 'Rise check' }).click();
  await page.waitForURL(`${base}/cultures/${cultureId}/rise-check`);
  await page.getByLabel('Height from the jar’s base').fill('82');
  await page.screenshot({ path: join(RESULTS_DIR, 'rise-check.png') });
  await page.getByRole('button', { name: 'Save rise check' }).click();
  // Saved: the jar's photo is offered, and the curve is one tap away.
  await page.getByTestId('rise-check-saved').getByText('Rise check saved.').waitFor();
  await page.screenshot({ path: join(RESULTS_DIR, 'rise-check-saved.png') });
  await page.getByRole('link', { name: 'See the curve' }).click();
  await page.waitForURL(`${base}/cultures/${cultureId}`);
  const checks = await page.request.get(`${base}/api/feedings/${feeding.id}/rise-checks`);
  expect(((await checks.json()) as { total: number }).total).toBe(5);
  return cultureId;
}

/** A finished feeding `hoursAgo` back, with its rise checks, straight through the API. */
async function logPastFeeding(page: Page, base: string, cultureId: string, hoursAgo: number) {
  const fedAt = Date.now() - hoursAgo * HOUR;
  const id = await createFeeding(page, base, cultureId, {
    fedAt: new Date(fedAt).toISOString(),
    ratio: '1:2:2',
    totalG: 150,
    temperatureC: 21,
    initialHeightMm: 40,
  });
  await addRiseChecks(page, base, id, fedAt, [
    [1.5, 42],
    [3, 52],
    [4.5, 66],
    [6, 78],
    [7.5, 84],
    [9, 85],
    [10.5, 80],
  ]);
}

describe('the culture logbook on a phone', () => {
  const base = baseUrl();
  const browser = browserPerTest();

  it('creates a culture, logs a 1:2:2 feeding and five rise checks, and opens the culture page', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Theo Park');
    // Home points the baker to the Shelf; the Shelf is the first navigation entry.
    const firstNav = page.getByTestId('bottom-nav').getByRole('link').first();
    expect(await firstNav.textContent()).toContain('Shelf');

    const cultureId = await logFeedingAndChecks(page, base);
    await logPastFeeding(page, base, cultureId, 28);

    await page.goto(`${base}/shelf`);
    const card = page.getByTestId('culture-card').filter({ hasText: 'Bramble' });
    await card.getByText(/^Fed 4 h( \d+ min)? ago/).waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'shelf.png') });

    await card.getByRole('heading', { name: 'Bramble' }).click();
    await page.waitForURL(`${base}/cultures/${cultureId}`);
    await page.getByRole('heading', { name: 'Bramble', level: 1 }).waitFor();
    await page.getByRole('table', { name: 'Feedings' }).getByText('30 : 60 : 60 g').first().waitFor();
    await expect(page.getByRole('link', { name: 'Log feeding' }).isVisible()).resolves.toBe(true);
    // Yesterday's feeding and today's, overlaid: two fitted lines and their rise checks.
    await page.getByTestId('rise-overlay').waitFor();
    expect(await page.getByText(/^Latest, fed /).count()).toBe(1);
    await page.screenshot({ path: join(RESULTS_DIR, 'culture.png'), fullPage: true });

    await page.setViewportSize(DESKTOP);
    await page.screenshot({ path: join(RESULTS_DIR, 'culture-desktop.png'), fullPage: true });
    await page.goto(`${base}/shelf`);
    await page.getByTestId('culture-card').first().waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'shelf-desktop.png') });
    await page.close();
  });

  it.skipIf(!summaryAvailable)('shows the fitted curve and a predicted ready time', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Amara Quist');
    const cultureId = await logFeedingAndChecks(page, base);

    // The culture page: the running rise as points and fitted curve, and the forecast with its interval.
    await page.getByTestId('rise-chart').waitFor();
    expect(await page.getByTestId('rise-chart').locator('path').count()).toBeGreaterThan(0);
    const forecast = page.getByTestId('forecast');
    await forecast.waitFor();
    expect(await forecast.textContent()).toMatch(
      /^(Ready|Peaks) in about .+ \(.+ – .+\)$|^(Ready|Peaking) now or within .+$/,
    );
    await page.getByTestId('kinetics-sentence').waitFor();
    expect(await page.getByTestId('kinetics-sentence').textContent()).toMatch(
      /^At 24 °C a 1:1:1 feeding peaks in about /,
    );
    await page.screenshot({ path: join(RESULTS_DIR, 'culture-forecast.png'), fullPage: true });

    // The Shelf card: a countdown with its interval and the sparkline.
    await page.goto(`${base}/shelf`);
    const card = page.getByTestId('culture-card').filter({ hasText: 'Bramble' });
    await card.getByTestId('sparkline').waitFor();
    await card.getByTestId('countdown').waitFor();
    expect(await card.getByTestId('countdown').textContent()).toMatch(/^(Ready|Peak)/);
    await page.screenshot({ path: join(RESULTS_DIR, 'shelf-forecast.png') });
    expect(cultureId).not.toBe('');
    await page.close();
  });

  it('takes °F and inches in the feeding form and stores °C and mm', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Dev Rowan');
    await patchAccount(page, base, { unitSystem: 'us', temperatureUnit: 'F' });
    const id = await createCulture(page, base, 'Pip');

    await page.goto(`${base}/cultures/${id}/feed`);
    await page.getByRole('button', { name: '1:1:1' }).click();
    await page.getByLabel('Total in the jar after feeding').fill('90');
    await page.getByLabel('Room or jar temperature').fill('75.2');
    await page.getByLabel('Height in the jar now').fill('2');
    expect(await page.getByText('°F', { exact: true }).count()).toBeGreaterThan(0);
    expect(await page.getByText('in', { exact: true }).count()).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Save feeding' }).click();
    await page.waitForURL(`${base}/cultures/${id}`);

    const list = await page.request.get(`${base}/api/cultures/${id}/feedings`);
    const [feeding] = (
      (await list.json()) as { items: { temperatureC: number; initialHeightMm: number; starterG: number }[] }
    ).items;
    // 75.2 °F = 24 °C; 2 in = 50.8 mm (NIST SP 811; 1 in = 25.4 mm exactly).
    expect(feeding).toMatchObject({ temperatureC: 24, initialHeightMm: 50.8, starterG: 30 });
    // And back: the table shows the baker's units.
    await page.getByRole('table', { name: 'Feedings' }).getByText('75.2 °F').waitFor();
    await page.getByRole('table', { name: 'Feedings' }).getByText('2 in').waitFor();
    await page.close();
  });
});
