import { join } from 'node:path';
import { request, type Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, PHONE, RESULTS_DIR, uniqueEmail } from './browser';
import { browserPerTest, PASSWORD, signUp } from './helpers';

/** The page heading greets the baker by name ("Good morning, Theo Park"); returns its text. */
async function greetingFor(page: Page, name: string): Promise<string> {
  // The URL can change a moment before the new page renders: wait for the heading itself.
  const heading = page.getByRole('heading', { level: 1, name: new RegExp(`, ${name}$`) });
  await heading.waitFor();
  return (await heading.textContent()) ?? '';
}

describe('signing up, out and in', () => {
  const base = baseUrl();
  const browser = browserPerTest();

  it('works end to end at phone size, with the bottom navigation', async () => {
    const page = await browser.context.newPage();
    const name = 'Amara Quist';
    const email = uniqueEmail('amara');

    // A signed-out visit to a signed-in page goes to sign in, remembering where it was going.
    await page.goto(`${base}/`);
    await page.waitForURL(`${base}/sign-in`);
    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.waitForURL(`${base}/sign-up`);

    await signUp(page, base, name, email);
    expect(await greetingFor(page, name)).toMatch(/^(Good (morning|afternoon|evening)|Hello), /);
    const bottomNav = page.getByTestId('bottom-nav');
    expect(await bottomNav.isVisible()).toBe(true);
    expect(await page.getByTestId('side-rail').count()).toBe(0);
    // It really sits at the bottom of the phone screen, in thumb reach.
    const box = await bottomNav.boundingBox();
    expect(box).not.toBeNull();
    expect(Math.round((box?.y ?? 0) + (box?.height ?? 0))).toBe(PHONE.height);
    await expect(bottomNav.getByRole('link', { name: 'Home' }).getAttribute('aria-current')).resolves.toBe('page');
    // No admin entry for a new baker.
    expect(await bottomNav.getByRole('link', { name: 'Admin' }).count()).toBe(0);
    // What the phone shows (the bar fixed at the bottom), then the whole scrolling page.
    await page.screenshot({ path: join(RESULTS_DIR, 'phone-home.png') });
    await page.screenshot({ path: join(RESULTS_DIR, 'phone-home-full.png'), fullPage: true });

    // Sign out from the account menu.
    await page.getByRole('button', { name: `Account menu for ${name}` }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.waitForURL(`${base}/sign-in`);
    await page.getByText('You’re signed out.').waitFor();

    // Signed out, the account page is closed: sign in there and come back to it.
    await page.goto(`${base}/account`);
    await page.waitForURL(`${base}/sign-in?next=%2Faccount`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill('not the password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('E-mail or password is incorrect.').waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'phone-sign-in-error.png') });

    await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${base}/account`);
    await page.getByRole('heading', { name: 'Account', level: 1 }).waitFor();
    expect(await page.getByLabel('Your name').inputValue()).toBe(name);
    await page.screenshot({ path: join(RESULTS_DIR, 'phone-account.png') });

    // Home from the bottom navigation.
    await page.getByTestId('bottom-nav').getByRole('link', { name: 'Home' }).click();
    await page.waitForURL(`${base}/`);
    expect(await greetingFor(page, name)).toMatch(/^(Good (morning|afternoon|evening)|Hello), /);

    // Signed in, the sign-in page sends you home.
    await page.goto(`${base}/sign-in`);
    await page.waitForURL(`${base}/`);
    await page.close();
  });

  it('shows a taken e-mail at the e-mail field', async () => {
    // Someone already holds this e-mail: made through the API in a separate cookie jar, so this
    // browser stays signed out.
    const email = uniqueEmail('dev');
    const api = await request.newContext({ baseURL: base });
    const created = await api.post('/api/auth/sign-up', {
      data: { displayName: 'Dev Rowan', email, password: PASSWORD },
    });
    expect(created.status()).toBe(201);
    await api.dispose();

    const page = await browser.context.newPage();
    await page.goto(`${base}/sign-up`);
    await page.getByLabel('Your name').fill('Dev Rowan again');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByText('This e-mail is already registered.').waitFor();
    const emailInput = page.getByLabel('E-mail');
    await page.waitForFunction(
      () => document.querySelector('input[name="email"]')?.getAttribute('aria-invalid') === 'true',
    );
    expect(await emailInput.getAttribute('aria-invalid')).toBe('true');
    expect(page.url()).toBe(`${base}/sign-up`);
    await page.close();
  });

  it('shows the side rail instead of the bottom navigation on a wide screen', async () => {
    const page = await browser.context.newPage();
    await page.setViewportSize(DESKTOP);
    const name = 'Ines Marlow';
    await signUp(page, base, name, uniqueEmail('ines'));

    expect(await greetingFor(page, name)).toMatch(/^(Good (morning|afternoon|evening)|Hello), /);
    const rail = page.getByTestId('side-rail');
    expect(await rail.isVisible()).toBe(true);
    expect(await page.getByTestId('bottom-nav').count()).toBe(0);
    const box = await rail.boundingBox();
    expect(box?.x).toBe(0);
    // The name is written out in the app bar on a wide screen.
    expect(await page.getByRole('banner').getByText(name).isVisible()).toBe(true);
    await page.screenshot({ path: join(RESULTS_DIR, 'desktop-home.png') });

    await rail.getByRole('link', { name: 'Account' }).click();
    await page.waitForURL(`${base}/account`);
    await page.screenshot({ path: join(RESULTS_DIR, 'desktop-account.png') });
    await page.close();
  });
});
