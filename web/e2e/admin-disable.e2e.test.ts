import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import { request } from 'playwright-core';
import { afterEach, describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, launchBrowser, PHONE, RESULTS_DIR, uniqueEmail, type Browser } from './browser';
import { PASSWORD, signUp } from './helpers';

/** A fresh test database has no admin: the role is given straight in the database. */
function makeAdmin(email: string): void {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: this test makes an admin in the database');
  execFileSync('psql', [url, '-qc', `UPDATE account SET role = 'admin' WHERE email = '${email}'`]);
}

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

describe('admin: disabling an account', () => {
  for (const [size, viewport] of [
    ['phone', PHONE],
    ['desk', DESKTOP],
  ] as const) {
    it(`signs the baker out at once and refuses their sign-in until enabled again (${size})`, async () => {
      const base = baseUrl();
      // The baker, signed in through the API with a session of their own.
      const baker = await request.newContext({ baseURL: base });
      const bakerEmail = uniqueEmail('dev');
      const name = `Dev Rowan ${size}`;
      const signUpRes = await baker.post('/api/auth/sign-up', {
        data: { displayName: name, email: bakerEmail, password: PASSWORD },
      });
      expect(signUpRes.status()).toBe(201);
      expect((await baker.get('/api/account')).status()).toBe(200);

      const browser = await launchBrowser(viewport);
      browsers.push(browser);
      const page = await browser.context.newPage();
      const adminEmail = uniqueEmail('ines');
      await signUp(page, base, `Ines Marlow ${size}`, adminEmail);
      makeAdmin(adminEmail);
      await page.goto(`${base}/admin/accounts?page=1`);
      await page.locator('[aria-label="Accounts"]').waitFor();
      // Other tests' accounts may fill the first pages: open the page (20 rows each, oldest
      // first) that holds the account, found through the admin's own list.
      const pageTo = async (email: string) => {
        const index = await (async () => {
          for (let offset = 0; ; offset += 200) {
            const res = await page.request.get(`${base}/api/admin/accounts?limit=200&offset=${offset}`);
            const { items } = (await res.json()) as { items: { email: string }[] };
            const at = items.findIndex((a) => a.email === email);
            if (at >= 0) return offset + at;
            if (items.length < 200) throw new Error(`${email} is not in the admin's list`);
          }
        })();
        await page.goto(`${base}/admin/accounts?page=${Math.floor(index / 20) + 1}`);
        await page.getByText(email).first().waitFor();
      };
      await pageTo(bakerEmail);
      await page.getByRole('button', { name: `Disable ${name}` }).click();
      await page.getByRole('dialog', { name: `Disable ${name}?` }).waitFor();
      await page.screenshot({ path: join(RESULTS_DIR, `${size}-admin-disable-confirm.png`) });
      await page.getByRole('button', { name: 'Disable account' }).click();
      await page.getByText(`${name} is disabled and has been signed out everywhere.`).waitFor();
      await page.getByRole('button', { name: `Enable ${name}` }).waitFor();
      await page.screenshot({ path: join(RESULTS_DIR, `${size}-admin-disabled.png`) });

      // The baker's captured session is over, and signing in again is refused with a reason.
      expect((await baker.get('/api/account')).status()).toBe(401);
      const refused = await baker.post('/api/auth/sign-in', { data: { email: bakerEmail, password: PASSWORD } });
      expect(refused.status()).toBe(403);
      expect(((await refused.json()) as { message: string }).message).toMatch(/disabled/);

      await page.getByRole('button', { name: `Enable ${name}` }).click();
      await page.getByText(`${name} can sign in again.`).waitFor();
      const again = await baker.post('/api/auth/sign-in', { data: { email: bakerEmail, password: PASSWORD } });
      expect(again.status()).toBe(200);
      await baker.dispose();

      // The admin's own row offers no Disable button.
      await pageTo(adminEmail);
      expect(await page.getByRole('button', { name: `Disable Ines Marlow ${size}` }).count()).toBe(0);
    });
  }

  it('shows a disabled baker why the sign-in form refuses them', async () => {
    const base = baseUrl();
    const browser = await launchBrowser(PHONE);
    browsers.push(browser);
    const page = await browser.context.newPage();
    const email = uniqueEmail('amara');
    await signUp(page, base, 'Amara Quist', email);
    const url = process.env.DATABASE_URL!;
    execFileSync('psql', [url, '-qc', `UPDATE account SET disabled_at = now() WHERE email = '${email}'`]);
    // The session guard refuses the next request and the app falls back to signing in.
    await page.goto(`${base}/account`);
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText(/This account has been disabled/).waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'phone-sign-in-disabled.png') });
  });
});
