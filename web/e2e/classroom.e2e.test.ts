import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import type { RosterResponse } from '@peakwise/shared';
import { request, type APIRequestContext, type Page } from 'playwright-core';
import { afterEach, describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, launchBrowser, PHONE, RESULTS_DIR, uniqueEmail, type Browser } from './browser';
import { HOUR, PASSWORD, signUp } from './helpers';

/**
 * Gives an account the instructor role straight in the database: an admin would do it on the
 * admin page, but a fresh test database has no admin. Needs the DATABASE_URL the harness uses.
 */
function makeInstructor(email: string): void {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: this test makes an instructor in the database');
  execFileSync('psql', [url, '-qc', `UPDATE account SET role = 'instructor' WHERE email = '${email}'`]);
}

/** Jar height over time: a Gompertz rise to ~95 % at the peak, then a slow fall (invented, like the demo seed). */
function heightAt(hours: number, h0: number, peakHours: number, multiple: number): number {
  const A = multiple - 1;
  const lag = 0.3 * peakHours;
  const mu = (A * (1 - Math.log(-Math.log(0.95)))) / (Math.E * (peakHours - lag));
  const rise = A * Math.exp(-Math.exp(((mu * Math.E) / A) * (lag - hours) + 1));
  const fall = hours > peakHours + 1 ? 0.06 * (hours - peakHours - 1) : 0;
  return Math.round(h0 * (1 + rise * Math.max(0, 1 - fall)) * 10) / 10;
}

/** A student with their own session, made through the API (no browser needed for their side). */
async function student(base: string, name: string): Promise<{ api: APIRequestContext; email: string }> {
  const api = await request.newContext({ baseURL: base });
  const email = uniqueEmail(name.split(' ')[0]!.toLowerCase());
  const res = await api.post('/api/auth/sign-up', { data: { displayName: name, email, password: PASSWORD } });
  expect(res.status(), await res.text()).toBe(201);
  return { api, email };
}

async function post<T = { id: string }>(api: APIRequestContext, url: string, data: unknown, status = 201): Promise<T> {
  const res = await api.post(url, { headers: { 'Idempotency-Key': crypto.randomUUID() }, data });
  expect(res.status(), await res.text()).toBe(status);
  return (await res.json()) as T;
}

/**
 * A counter culture fed 1:1:1 at 24 °C once a day, the last feeding 14 h ago; `peaks` are each
 * feeding's hours to peak, oldest first, and every feeding gets rise checks past its peak.
 */
async function keepCulture(api: APIRequestContext, name: string, peaks: number[]): Promise<string> {
  const { id } = await post(api, '/api/cultures', { name });
  for (const [i, peak] of peaks.entries()) {
    const fedAt = Date.now() - (14 + 24 * (peaks.length - 1 - i)) * HOUR;
    const feeding = await post(api, `/api/cultures/${id}/feedings`, {
      fedAt: new Date(fedAt).toISOString(),
      starterG: 30,
      flourG: 30,
      waterG: 30,
      temperatureC: 24,
      initialHeightMm: 40,
    });
    for (let h = 1; h <= Math.ceil(peak) + 4; h++) {
      await post(api, `/api/feedings/${feeding.id}/rise-checks`, {
        takenAt: new Date(fedAt + h * HOUR).toISOString(),
        heightMm: heightAt(h, 40, peak, 2.4),
      });
    }
  }
  return id;
}

const isoDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

describe('the instructor’s class', () => {
  const browsers: Browser[] = [];
  const apis: APIRequestContext[] = [];

  afterEach(async () => {
    await Promise.all(browsers.splice(0).map((b) => b.close()));
    await Promise.all(apis.splice(0).map((a) => a.dispose()));
  });

  it(
    'creates a class, students join by code, sluggish first finds Pip, and its culture opens read-only',
    { timeout: 240_000 },
    async () => {
      const base = baseUrl();
      const desk = await launchBrowser(DESKTOP);
      browsers.push(desk);
      const page = await desk.context.newPage();

      // The instructor signs up; an admin would give the role, here the database does.
      const ines = uniqueEmail('ines');
      await signUp(page, base, 'Ines Marlow', ines);
      makeInstructor(ines);
      await page.goto(`${base}/`);
      const rail = page.getByTestId('side-rail');
      await rail.getByRole('link', { name: 'Classroom' }).click();
      await page.waitForURL(`${base}/classes`);
      await page.getByRole('heading', { name: 'No classes yet' }).waitFor();

      // New class: the dates are checked in the form before the API sees them.
      await page.getByRole('button', { name: 'New class' }).click();
      await page.getByLabel('Class name').fill('Weekend Levain');
      await page.getByLabel('What the class covers').fill('Six weekends of keeping a levain and baking with it.');
      await page.getByLabel('First day').fill(isoDay(Date.now() + 2 * 24 * HOUR));
      await page.getByLabel('Last day').fill(isoDay(Date.now()));
      await page.getByRole('button', { name: 'Create class' }).click();
      await page.getByText('The last day comes on or after the first.').waitFor();
      await page.getByLabel('First day').fill(isoDay(Date.now() - 8 * 24 * HOUR));
      await page.getByLabel('Last day').fill(isoDay(Date.now() + 33 * 24 * HOUR));
      await page.screenshot({ path: join(RESULTS_DIR, 'classroom-new-class.png') });
      await page.getByRole('button', { name: 'Create class' }).click();
      await page.waitForURL(/\/classes\/[0-9a-f-]{36}$/);
      const classId = new URL(page.url()).pathname.split('/')[2]!;
      await page.getByRole('heading', { name: 'Weekend Levain', level: 1 }).waitFor();
      await page.getByText('Week 2 of 6', { exact: false }).first().waitFor();
      const code = (await page.getByTestId('join-code').textContent())!.trim();
      expect(code).toMatch(/^[A-HJ-NP-Z2-9]{8}$/);

      // Three students join by code: Theo's Bramble is steady, Dev's Pip slows from 4 h to 6.5 h
      // (the roster's 25 % line, shared/src/classroom/roster.ts), Amara has no culture yet.
      const { api: theo } = await student(base, 'Theo Park');
      const { api: dev, email: devEmail } = await student(base, 'Dev Rowan');
      const { api: amara } = await student(base, 'Amara Quist');
      apis.push(theo, dev, amara);
      await keepCulture(theo, 'Bramble', [4.5, 4.4, 4.6, 4.5, 4.5, 4.4, 4.6]);
      const pipId = await keepCulture(dev, 'Pip', [4, 4.1, 3.9, 4, 6.2, 6.5, 6.8]);
      for (const api of [theo, dev, amara]) await post(api, '/api/class-join', { code }, 200);

      // The instructor's page: the summary names Pip before any sorting.
      await page.reload();
      const summary = page.getByTestId('roster-summary');
      await summary.getByText('Pip (Dev Rowan)').waitFor();
      expect(await summary.textContent()).toContain('sluggish');
      const table = page.getByRole('table', { name: 'Roster' });
      await table.getByText('Bramble').waitFor();

      // Sort by student, then back to sluggish first: Dev Rowan's Pip tops the table.
      await table.getByRole('button', { name: 'Student · culture' }).click();
      await expect.poll(() => table.locator('tbody tr').first().textContent()).toContain('Amara Quist');
      await page.getByRole('button', { name: 'Sluggish first' }).click();
      await expect.poll(() => table.locator('tbody tr').first().textContent()).toContain('Dev Rowan');
      const first = table.locator('tbody tr').first();
      expect(await first.textContent()).toContain('Sluggish');
      expect(await first.textContent()).toContain('Slower');
      // Filtering by a flag leaves only that culture.
      await page
        .getByRole('group', { name: 'Show only rows flagged' })
        .getByRole('button', { name: 'No culture yet' })
        .click();
      await expect.poll(() => table.locator('tbody tr').count()).toBe(1);
      expect(await table.textContent()).toContain('Amara Quist');
      await page.getByRole('group', { name: 'Show only rows flagged' }).getByRole('button', { name: 'All' }).click();
      await expect.poll(() => table.locator('tbody tr').count()).toBe(3);
      await page.getByTestId('class-chart').locator('svg').first().waitFor();
      await page.screenshot({ path: join(RESULTS_DIR, 'classroom-class-desktop.png'), fullPage: true });

      // The CSV link carries the table's order; the API answers it.
      const csvHref = await page.getByRole('link', { name: 'Download roster (CSV)' }).getAttribute('href');
      const csv = await page.request.get(`${base}${csvHref}`);
      expect(csv.status()).toBe(200);
      expect((await csv.text()).split('\r\n')[1]).toContain('Dev Rowan,Pip');

      // Invitations: a stray word is caught in the form; two addresses get a link each; one is revoked.
      const box = page.getByLabel('E-mail addresses');
      await box.fill('first.baker@example.test, amara');
      await page.getByRole('button', { name: 'Send invitations' }).click();
      await page.getByText('Not an e-mail address: amara').waitFor();
      await box.fill('first.baker@example.test\nSecond Baker <second.baker@example.test>');
      await page.getByRole('button', { name: 'Send invitations' }).click();
      await page.getByText('2 invitations sent.').waitFor();
      const invites = page.getByRole('list', { name: 'Invitations' });
      await invites.getByText('second.baker@example.test').waitFor();
      const firstInvite = invites.getByRole('listitem').filter({ hasText: 'first.baker@example.test' });
      await firstInvite.getByRole('button', { name: 'Revoke' }).click();
      await page.getByRole('dialog').getByRole('button', { name: 'Revoke' }).click();
      await firstInvite.getByText('Revoked').waitFor();
      await invites.scrollIntoViewIfNeeded();
      await page.screenshot({ path: join(RESULTS_DIR, 'classroom-invites-desktop.png') });

      // A row opens the student's culture, read-only, with the student's charts.
      await first.getByRole('link', { name: 'Pip' }).click();
      await page.waitForURL(`${base}/classes/${classId}/cultures/${pipId}`);
      await page.getByTestId('read-only-banner').waitFor();
      await page.getByRole('heading', { name: 'Pip', level: 1 }).waitFor();
      await page.getByText('Dev Rowan’s culture', { exact: false }).waitFor();
      await page.getByRole('heading', { name: 'How it answers to temperature' }).waitFor();
      await page.getByTestId('rise-overlay').waitFor();
      expect(await page.getByRole('link', { name: 'Log feeding' }).count()).toBe(0);
      const feedingLink = page.getByRole('table', { name: 'Feedings' }).getByRole('link').first();
      expect(await feedingLink.getAttribute('href')).toMatch(new RegExp(`^/classes/${classId}/feedings/`));
      await page.screenshot({ path: join(RESULTS_DIR, 'classroom-culture-desktop.png'), fullPage: true });

      // The classes list: the instructor's part in the class, and how many are in it.
      await page.getByRole('link', { name: /Back to Weekend Levain/ }).click();
      await page.getByRole('link', { name: '← All classes' }).click();
      const mine = page.getByRole('list', { name: 'Your classes' }).getByRole('listitem').first();
      await mine.getByText('You teach').waitFor();
      expect(await mine.textContent()).toContain('3 students');
      await page.screenshot({ path: join(RESULTS_DIR, 'classroom-classes-desktop.png') });

      // The same pages at phone size.
      const phone = await launchBrowser(PHONE);
      browsers.push(phone);
      const p = await phone.context.newPage();
      await signInAs(p, base, ines);
      await p.getByTestId('bottom-nav').getByRole('link', { name: 'Classroom' }).click();
      await p.getByRole('link', { name: /Weekend Levain/ }).click();
      await p.getByTestId('roster-summary').getByText('Pip (Dev Rowan)').waitFor();
      await p.screenshot({ path: join(RESULTS_DIR, 'classroom-class-phone.png') });
      // On a phone the roster is a list, sluggish first too, flags in sight without scrolling sideways.
      const list = p.getByRole('list', { name: 'Roster' });
      await list.scrollIntoViewIfNeeded();
      expect(await list.getByRole('link').first().textContent()).toContain('Dev Rowan');
      await p.screenshot({ path: join(RESULTS_DIR, 'classroom-roster-phone.png') });
      await p.screenshot({ path: join(RESULTS_DIR, 'classroom-class-phone-full.png'), fullPage: true });
      await p.goto(`${base}/classes/${classId}/cultures/${pipId}`);
      await p.getByTestId('read-only-banner').waitFor();
      await p.getByRole('heading', { name: 'How it answers to temperature' }).waitFor();
      await p.screenshot({ path: join(RESULTS_DIR, 'classroom-culture-phone.png') });

      // A student sees the plain class page, no roster, and can leave: sharing ends at once.
      expect((await dev.get(`/api/classes/${classId}/roster`)).status()).toBe(403);
      const devPhone = await launchBrowser(PHONE);
      browsers.push(devPhone);
      const d = await devPhone.context.newPage();
      await signInAs(d, base, devEmail);
      await d.getByRole('button', { name: 'Account menu for Dev Rowan' }).click();
      await d.getByRole('menuitem', { name: 'Classroom' }).click();
      await d.waitForURL(`${base}/classes`);
      const card = d.getByRole('list', { name: 'Your classes' }).getByRole('listitem').first();
      await card.getByText('Taught by Ines Marlow').waitFor();
      expect(await card.textContent()).toContain('Student');
      await d.screenshot({ path: join(RESULTS_DIR, 'classroom-classes-student-phone.png') });
      await card.getByRole('link').first().click();
      await d.waitForURL(`${base}/classes/${classId}`);
      await d.getByRole('heading', { name: 'What you share' }).waitFor();
      expect(await d.getByRole('heading', { name: 'Roster' }).count()).toBe(0);
      await d.screenshot({ path: join(RESULTS_DIR, 'classroom-class-student-phone.png') });
      await d.getByRole('button', { name: 'Leave class' }).click();
      const dialog = d.getByRole('dialog');
      await dialog.getByText('Sharing ends at once', { exact: false }).waitFor();
      await d.screenshot({ path: join(RESULTS_DIR, 'classroom-leave-phone.png') });
      await dialog.getByRole('button', { name: 'Leave class' }).click();
      await d.waitForURL(`${base}/classes`);
      await d.getByText('No classes yet').waitFor();
      const after = (await (await page.request.get(`${base}/api/classes/${classId}/roster`)).json()) as RosterResponse;
      expect(after.items.map((r) => r.studentName).sort()).toEqual(['Amara Quist', 'Theo Park']);
      expect((await page.request.get(`${base}/api/classes/${classId}/cultures/${pipId}`)).status()).toBe(404);
    },
  );
});

async function signInAs(page: Page, base: string, email: string): Promise<void> {
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${base}/`);
}
