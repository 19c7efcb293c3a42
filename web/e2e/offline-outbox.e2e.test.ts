import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, launchBrowser, RESULTS_DIR } from './browser';
import { browserPerTest, createCulture, createFeeding, HOUR, signUp } from './helpers';

// A baker at phone size logs feedings without a signal; they wait on the device and reach the
// server exactly once each, also when the server's answers get lost on the way back.
const base = baseUrl();
const FEEDINGS = 20;

/** Waits until the service worker controls the page: the app shell is then in its cache. */
async function waitForServiceWorker(page: Page): Promise<void> {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
    if (navigator.serviceWorker.controller) return;
    await new Promise<void>((resolve) =>
      navigator.serviceWorker.addEventListener('controllerchange', () => resolve(), { once: true }),
    );
  });
}

/** One feeding through Log feeding (the 1:1:1 default, 150 g), numbered in its notes. */
async function logFeeding(page: Page, cultureId: string, n: number): Promise<void> {
  await page.getByRole('link', { name: 'Log feeding' }).first().click();
  await page.waitForURL(`${base}/cultures/${cultureId}/feed`);
  await page.getByLabel('Notes').fill(`Feeding ${n}`);
  await page.getByRole('button', { name: 'Save feeding' }).click();
  await page.waitForURL(`${base}/cultures/${cultureId}`);
}

interface FeedingRow {
  notes: string | null;
  fedAt: string;
}

async function serverFeedings(page: Page, cultureId: string): Promise<{ total: number; items: FeedingRow[] }> {
  const res = await page.request.get(`${base}/api/cultures/${cultureId}/feedings?limit=100&order=asc`);
  expect(res.status()).toBe(200);
  return (await res.json()) as { total: number; items: FeedingRow[] };
}

const indicator = (page: Page) => page.getByTestId('outbox-indicator');

/** A small seeded generator (mulberry32), so a run's losses can be repeated. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('offline outbox', () => {
  const browser = browserPerTest();

  it('keeps 20 feedings logged offline through a reload and sends each exactly once', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Dev Rowan');
    const cultureId = await createCulture(page, base, 'Pip');
    await page.goto(`${base}/cultures/${cultureId}`);
    await page.getByRole('link', { name: 'Log feeding' }).first().waitFor();
    await waitForServiceWorker(page);

    await browser.context.setOffline(true);
    await logFeeding(page, cultureId, 1);
    await page.getByText('Saved on this device; it will be sent when you are online.').waitFor();
    await indicator(page).getByText('1 not yet sent', { exact: false }).waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'offline-saved.png') });
    for (let n = 2; n <= FEEDINGS; n++) await logFeeding(page, cultureId, n);
    await indicator(page).getByText(`${FEEDINGS} not yet sent`, { exact: false }).waitFor();
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.screenshot({ path: join(RESULTS_DIR, 'offline-strip.png') });

    await indicator(page).click();
    await page.getByRole('dialog', { name: 'Not yet sent' }).waitFor();
    await page.waitForTimeout(500); // the dialog's fade-in
    expect(await page.getByRole('list', { name: 'Writes not yet sent' }).getByRole('listitem').count()).toBe(FEEDINGS);
    await page.screenshot({ path: join(RESULTS_DIR, 'offline-list.png') });
    await page.keyboard.press('Escape');

    // A reload without a signal: the service worker serves the app, the outbox is still there.
    await page.reload();
    await page.getByTestId('outbox-offline-start').getByText(`${FEEDINGS} not yet sent`).waitFor();
    expect(await page.evaluate(() => navigator.serviceWorker.controller !== null)).toBe(true);
    await page.screenshot({ path: join(RESULTS_DIR, 'offline-reloaded.png') });
    expect((await serverFeedings(page, cultureId)).total).toBe(0);

    await browser.context.setOffline(false);
    await page.getByRole('link', { name: 'Log feeding' }).first().waitFor();
    await expect.poll(async () => (await serverFeedings(page, cultureId)).total, { timeout: 30_000 }).toBe(FEEDINGS);
    await indicator(page).waitFor({ state: 'detached' });
    // The page asks again once they are sent: the culture is fed, so a rise check can follow.
    await expect.poll(() => page.getByRole('link', { name: 'Rise check' }).isEnabled()).toBe(true);
    await page.getByRole('link', { name: 'Log feeding' }).first().scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(RESULTS_DIR, 'offline-sent.png') });

    // In the order they were saved, each stamped with the moment of saving (not of sending).
    const { items } = await serverFeedings(page, cultureId);
    expect(items.map((f) => f.notes)).toEqual(Array.from({ length: FEEDINGS }, (_, i) => `Feeding ${i + 1}`));
    const fedAt = items.map((f) => Date.parse(f.fedAt));
    expect(new Set(fedAt).size).toBe(FEEDINGS);
  }, 180_000);

  it('sends 20 feedings exactly once when 30 % of the answers are lost after the server saved them', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Amara Quist');
    const cultureId = await createCulture(page, base, 'Old Copper');
    await page.goto(`${base}/cultures/${cultureId}`);
    await page.getByRole('link', { name: 'Log feeding' }).first().waitFor();

    // The request reaches the server and is committed; its answer never reaches the app.
    const random = seeded(20261202);
    const keys = new Map<string, number>();
    let lost = 0;
    await page.route(`${base}/api/cultures/${cultureId}/feedings`, async (route) => {
      if (route.request().method() !== 'POST') return route.fallback();
      const key = route.request().headers()['idempotency-key'] ?? '(none)';
      keys.set(key, (keys.get(key) ?? 0) + 1);
      const response = await route.fetch();
      if (random() < 0.3) {
        lost += 1;
        return route.abort('connectionreset');
      }
      return route.fulfill({ response });
    });

    for (let n = 1; n <= FEEDINGS; n++) await logFeeding(page, cultureId, n);
    await expect
      .poll(async () => (await serverFeedings(page, cultureId)).total, { timeout: 120_000, interval: 1_000 })
      .toBe(FEEDINGS);
    await indicator(page).waitFor({ state: 'detached', timeout: 60_000 });
    await page.screenshot({ path: join(RESULTS_DIR, 'offline-lossy-sent.png') });

    const { items, total } = await serverFeedings(page, cultureId);
    expect(total).toBe(FEEDINGS);
    expect(items.map((f) => f.notes)).toEqual(Array.from({ length: FEEDINGS }, (_, i) => `Feeding ${i + 1}`));
    // Answers were lost and the same keys were sent again: 20 keys, more than 20 requests.
    expect(lost).toBeGreaterThan(0);
    expect(keys.size).toBe(FEEDINGS);
    expect([...keys.values()].reduce((a, b) => a + b, 0)).toBe(FEEDINGS + lost);
    console.log(`lossy replay: ${FEEDINGS + lost} requests, ${lost} answers lost, ${keys.size} keys`);
  }, 240_000);

  it('keeps a rise check made offline, stamped with the moment it was saved', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Theo Park');
    const cultureId = await createCulture(page, base, 'Bramble');
    const fedAt = Date.now() - 2 * HOUR;
    const feedingId = await createFeeding(page, base, cultureId, {
      fedAt: new Date(fedAt).toISOString(),
      ratio: '1:1:1',
      totalG: 150,
      initialHeightMm: 40,
    });
    // Rise check opened once with a signal (its page needs the latest feeding), then back.
    await page.goto(`${base}/cultures/${cultureId}`);
    await page.getByRole('link', { name: 'Rise check' }).click();
    await page.getByRole('button', { name: 'Save rise check' }).waitFor();
    await waitForServiceWorker(page);
    await page.goBack();
    await page.getByRole('link', { name: 'Rise check' }).waitFor();

    await browser.context.setOffline(true);
    await page.getByRole('link', { name: 'Rise check' }).click();
    await page.getByLabel(/Height from the jar/).fill('61');
    const savedAt = Date.now();
    await page.getByRole('button', { name: 'Save rise check' }).click();
    await page.waitForURL(`${base}/cultures/${cultureId}`);
    await indicator(page).getByText('1 not yet sent', { exact: false }).waitFor();
    // The server only hears of it later; it must not take that later moment as the reading's time.
    await page.waitForTimeout(3_000);

    await browser.context.setOffline(false);
    await indicator(page).waitFor({ state: 'detached', timeout: 30_000 });
    const res = await page.request.get(`${base}/api/feedings/${feedingId}/rise-checks`);
    const checks = ((await res.json()) as { items: { heightMm: number; takenAt: string }[] }).items;
    expect(checks.map((c) => c.heightMm)).toEqual([61]);
    expect(Math.abs(Date.parse(checks[0]!.takenAt) - savedAt)).toBeLessThan(2_000);
  }, 120_000);

  it('on a desk-size screen the top bar says Offline, then how many wait', async () => {
    const desk = await launchBrowser(DESKTOP);
    try {
      const page = await desk.context.newPage();
      await signUp(page, base, 'Theo Park');
      const cultureId = await createCulture(page, base, 'Bramble');
      await page.goto(`${base}/cultures/${cultureId}`);
      await page.getByRole('link', { name: 'Log feeding' }).first().waitFor();
      // Until the worker has the shell, a page not opened yet has no code to run offline.
      await waitForServiceWorker(page);
      await desk.context.setOffline(true);
      await page.getByRole('banner').getByTestId('outbox-indicator').getByText('Offline').waitFor();
      await logFeeding(page, cultureId, 1);
      await page.getByRole('banner').getByTestId('outbox-indicator').getByText('1 not yet sent').waitFor();
      await page.screenshot({ path: join(RESULTS_DIR, 'offline-desktop.png') });
      await desk.context.setOffline(false);
      await expect.poll(async () => (await serverFeedings(page, cultureId)).total, { timeout: 30_000 }).toBe(1);
    } finally {
      await desk.close();
    }
  }, 120_000);
});
