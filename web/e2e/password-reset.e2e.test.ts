import { join } from 'node:path';
import type { DevMailListResponse } from '@peakwise/shared';
import type { Page } from 'playwright-core';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, launchBrowser, PHONE, RESULTS_DIR, uniqueEmail, type Browser } from './browser';
import { PASSWORD, signUp } from './helpers';

const NEW_PASSWORD = 'proofing basket dusted with rice flour';

/** The reset link mailed to `email`, read from the development mailbox (the mail leaves after the 202). */
async function resetLinkFor(page: Page, base: string, email: string): Promise<string> {
  for (let i = 0; i < 100; i++) {
    const res = await page.request.get(`${base}/api/dev/mail`);
    expect(res.status(), await res.text()).toBe(200);
    const { items } = (await res.json()) as DevMailListResponse;
    const mail = items.find((m) => m.to.includes(email));
    if (mail) {
      const link = /(http\S+\/reset-password\?token=[A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
      if (!link) throw new Error(`no reset link in: ${mail.text}`);
      return link;
    }
    await page.waitForTimeout(100);
  }
  throw new Error(`no mail reached ${email}`);
}

describe('forgot password', () => {
  let base: string;
  let browser: Browser;

  beforeEach(() => {
    base = baseUrl();
  });

  afterEach(async () => {
    await browser?.close();
  });

  it('mails a link at phone size; the link sets a new password that signs in', async () => {
    browser = await launchBrowser(PHONE);
    const page = await browser.context.newPage();
    const email = uniqueEmail('reset');
    await signUp(page, base, 'Theo Park', email);
    await page.context().clearCookies();

    await page.goto(`${base}/sign-in`);
    await page.getByRole('link', { name: 'Forgot password?' }).waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'sign-in-forgot-link.png') });
    await page.getByRole('link', { name: 'Forgot password?' }).click();
    await page.waitForURL(`${base}/forgot-password`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('button', { name: 'Send me a link' }).click();
    await page.getByRole('status').filter({ hasText: 'works for an hour' }).waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'forgot-password.png') });

    const link = await resetLinkFor(page, base, email);
    // The link points at this server (PUBLIC_URL comes from HOST and PORT).
    expect(new URL(link).origin).toBe(new URL(base).origin);
    await page.goto(`${base}/dev/mail`);
    await page.getByRole('list', { name: 'Messages' }).getByText(email).first().click();
    await page.frameLocator('iframe').getByRole('link', { name: 'Choose a new password' }).waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'dev-mail-phone.png') });

    await page.goto(link);
    await page.getByRole('heading', { name: 'Choose a new password' }).waitFor();
    await page.getByLabel('New password', { exact: true }).fill('short');
    await page.getByRole('button', { name: 'Set new password' }).click();
    await page.getByText('Use at least 8 characters.').waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'reset-password.png') });
    await page.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD);
    await page.getByRole('button', { name: 'Set new password' }).click();
    await page.getByRole('status').filter({ hasText: 'Your password is changed' }).waitFor();

    await page.getByRole('link', { name: 'Sign in' }).first().click();
    await page.waitForURL(`${base}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').waitFor();
    await page.getByLabel('Password', { exact: true }).fill(NEW_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${base}/`);

    // The same link a second time is refused with a way to ask again.
    await page.context().clearCookies();
    await page.goto(link);
    await page.getByLabel('New password', { exact: true }).fill('another loaf another day');
    await page.getByRole('button', { name: 'Set new password' }).click();
    await page.getByRole('alert').filter({ hasText: 'expired or was already used' }).waitFor();
  });

  it('shows the caught mail on the development mail page', async () => {
    browser = await launchBrowser(DESKTOP);
    const page = await browser.context.newPage();
    const email = uniqueEmail('mailpage');
    await signUp(page, base, 'Amara Quist', email);
    await page.context().clearCookies();
    const res = await page.request.post(`${base}/api/auth/password-reset`, { data: { email } });
    expect(res.status()).toBe(202);
    await resetLinkFor(page, base, email);

    await page.goto(`${base}/dev/mail`);
    await page.getByRole('heading', { name: 'Mail and push sent by Peakwise in development' }).waitFor();
    await page.getByRole('list', { name: 'Messages' }).getByText(email).first().click();
    const frame = page.locator('iframe');
    await expect(frame.getAttribute('sandbox')).resolves.toBe('');
    await page.frameLocator('iframe').getByRole('link', { name: 'Choose a new password' }).waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'dev-mail.png') });
    await page.getByRole('tab', { name: 'Plain text' }).click();
    await page.getByText('/reset-password?token=').waitFor();
  });
});
