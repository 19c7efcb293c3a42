import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { baseUrl, launchBrowser, PHONE, RESULTS_DIR, uniqueEmail, type Browser } from './browser';

const HOUR = 3_600_000;

async function signUp(page: Page, base: string, name: string): Promise<void> {
  await page.goto(`${base}/sign-up`);
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('E-mail').fill(uniqueEmail('alerts'));
  await page.getByLabel('Password', { exact: true }).fill('rye starter bubbles at dawn');
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.waitForURL(`${base}/`);
}

/** A logbook POST with this session and a fresh Idempotency-Key; answers the new id. */
async function post(page: Page, url: string, data: unknown): Promise<string> {
  const res = await page.request.post(url, { headers: { 'Idempotency-Key': crypto.randomUUID() }, data });
  expect(res.status(), await res.text()).toBe(201);
  return ((await res.json()) as { id: string }).id;
}

// A feeding logged 2 h ago with a lead time of 240 min puts the culture-ready alert at "now": the
// server's queue delivers it, and the bell (polling every 10 s) shows it.

let browser: Browser;
beforeEach(async () => {
  browser = await launchBrowser(PHONE);
});
afterEach(async () => {
  await browser.close();
});

describe('alerts at phone size', () => {
  it('the bell counts a due alert, the Alerts page lists it, marking it read clears the bell', async () => {
    const base = baseUrl();
    const page = await browser.context.newPage();
    await signUp(page, base, 'Theo Park');
    const emailOff = { email: false };
    const prefs = await page.request.patch(`${base}/api/account/alert-preferences`, {
      data: {
        leadMinutes: 240,
        channels: { 'culture-ready': emailOff, 'past-peak': emailOff, 'feeding-due': emailOff, 'plan-step': emailOff },
      },
    });
    expect(prefs.status(), await prefs.text()).toBe(200);
    const cultureId = await post(page, `${base}/api/cultures`, { name: 'Bramble' });
    await post(page, `${base}/api/cultures/${cultureId}/feedings`, {
      fedAt: new Date(Date.now() - 2 * HOUR).toISOString(),
      starterG: 20,
      flourG: 40,
      waterG: 40,
      temperatureC: 24,
    });

    await page.goto(`${base}/shelf`);
    const bell = page.getByTestId('alert-bell');
    await page.getByRole('link', { name: 'Alerts, 1 unread' }).waitFor({ timeout: 30_000 });
    await bell.click();
    await page.waitForURL(`${base}/alerts`);
    const card = page.getByRole('article', { name: 'Bramble will be ready soon' });
    await card.waitFor();
    await expect.poll(() => card.getByText('New').count()).toBe(1);
    await page.screenshot({ path: join(RESULTS_DIR, 'alerts.png') });

    await card.getByRole('button', { name: 'Mark read' }).click();
    await page.getByRole('link', { name: 'Alerts, none unread' }).waitFor();
    await expect.poll(() => card.getByText('New').count()).toBe(0);
    await card.getByRole('link', { name: 'Open culture' }).click();
    await page.waitForURL(`${base}/cultures/${cultureId}`);

    await page.goto(`${base}/account/alerts`);
    const lead = page.getByLabel('Lead time before a culture is ready (min)');
    await lead.waitFor();
    expect(await lead.inputValue()).toBe('240');
    await lead.fill('300');
    await page.getByRole('button', { name: 'Save alert settings' }).click();
    await page.getByText('Enter a lead time from 0 to 240 minutes.').waitFor();
    await lead.fill('30');
    await page.getByLabel('Keep quiet hours').check();
    await page.getByRole('button', { name: 'Save alert settings' }).click();
    await page.getByText('Alert settings saved.').waitFor();
    // The quiet hours and the first channel rows, as a phone shows them after saving.
    await page.getByRole('heading', { name: 'Quiet hours' }).scrollIntoViewIfNeeded();
    await page.evaluate(() => window.scrollBy(0, -120));
    await page.screenshot({ path: join(RESULTS_DIR, 'alert-settings.png') });
    const saved = (await (await page.request.get(`${base}/api/account/alert-preferences`)).json()) as {
      leadMinutes: number;
      quietHours: { from: string; until: string } | null;
    };
    expect(saved).toMatchObject({ leadMinutes: 30, quietHours: { from: '22:00', until: '07:00' } });
  });
});
