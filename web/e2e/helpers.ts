import type { BrowserContext, Page } from 'playwright-core';
import { afterEach, beforeEach, expect } from 'vitest';
import { launchBrowser, PHONE, uniqueEmail, type Browser } from './browser';

export const PASSWORD = 'rye starter bubbles at dawn';
export const HOUR = 3_600_000;

/**
 * A fresh browser (and so a fresh cookie jar) for each test of the enclosing describe, closed
 * after it: clearing cookies in a shared one races with a late response of the previous test
 * setting the rolling session cookie again. Read `.context` inside a test.
 */
export function browserPerTest(viewport: { width: number; height: number } = PHONE): {
  readonly context: BrowserContext;
} {
  let browser: Browser | undefined;
  beforeEach(async () => {
    browser = await launchBrowser(viewport);
  });
  afterEach(async () => {
    await browser?.close();
  });
  return {
    get context() {
      if (!browser) throw new Error('browserPerTest: the browser opens before each test');
      return browser.context;
    },
  };
}

/**
 * Creates a fresh account through the sign-up form and waits for Home, so each test starts signed
 * in with its own empty logbook. The e-mail is unique per call unless one is given.
 */
export async function signUp(page: Page, base: string, name: string, email = uniqueEmail('baker')): Promise<void> {
  await page.goto(`${base}/sign-up`);
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.waitForURL(`${base}/`);
}

/** Changes the signed-in account's settings (units, time zone) through the API. */
export async function patchAccount(page: Page, base: string, data: Record<string, string>): Promise<void> {
  const res = await page.request.patch(`${base}/api/account`, { data });
  expect(res.status()).toBe(200);
}

/** POSTs with this session and a fresh idempotency key (the logbook's POSTs need one); expects 201. */
export async function post<T = { id: string }>(page: Page, url: string, data: unknown): Promise<T> {
  const res = await page.request.post(url, { headers: { 'Idempotency-Key': crypto.randomUUID() }, data });
  expect(res.status(), await res.text()).toBe(201);
  return (await res.json()) as T;
}

/** A culture created straight through the API; returns its id. */
export async function createCulture(page: Page, base: string, name: string): Promise<string> {
  return (await post(page, `${base}/api/cultures`, { name })).id;
}

/** A feeding logged straight through the API (any CreateFeeding body); returns its id. */
export async function createFeeding(page: Page, base: string, cultureId: string, data: object): Promise<string> {
  return (await post(page, `${base}/api/cultures/${cultureId}/feedings`, data)).id;
}

/** Rise checks through the API, each `[hours after fedAt, height in mm]`. */
export async function addRiseChecks(
  page: Page,
  base: string,
  feedingId: string,
  fedAt: number,
  checks: readonly (readonly [number, number])[],
): Promise<void> {
  for (const [hours, heightMm] of checks) {
    await post(page, `${base}/api/feedings/${feedingId}/rise-checks`, {
      takenAt: new Date(fedAt + hours * HOUR).toISOString(),
      heightMm,
    });
  }
}

/** "2026-12-01T10:05" in the browser's zone, as a datetime-local input takes it. */
export async function localInput(page: Page, ms: number): Promise<string> {
  return page.evaluate((t) => {
    const d = new Date(t);
    const pad = (n: number) => String(n).padStart(2, '0');
    return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
  }, ms);
}
