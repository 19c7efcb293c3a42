import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import type { BakingClass, DevMailListResponse } from '@peakwise/shared';
import type { Page } from 'playwright-core';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, launchBrowser, PHONE, RESULTS_DIR, uniqueEmail, type Browser } from './browser';
import { createCulture, createFeeding, HOUR, PASSWORD, post, signUp } from './helpers';

// A bake for the instructor to look at: 75 % water, 20 % levain, 2 % salt (baker's percentages).
const COUNTRY_LOAF = {
  name: 'Country loaf 75 %',
  ingredients: [
    { kind: 'flour', name: 'Bread flour', amount: 1000, unit: 'g' },
    { kind: 'water', name: 'Water', amount: 750, unit: 'g' },
    { kind: 'starter', name: 'Levain', amount: 200, unit: 'g' },
    { kind: 'salt', name: 'Salt', amount: 20, unit: 'g' },
  ],
};

/**
 * Gives an account the instructor role straight in the database: an admin would do it on the
 * admin page, but a fresh test database has no admin. Needs the DATABASE_URL the harness uses.
 */
function makeInstructor(email: string): void {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: this test makes an instructor in the database');
  execFileSync('psql', [url, '-qc', `UPDATE account SET role = 'instructor' WHERE email = '${email}'`]);
}

/** The invitation link mailed to `email`, read from the development mailbox. */
async function inviteLinkFor(page: Page, base: string, email: string): Promise<string> {
  for (let i = 0; i < 100; i++) {
    const res = await page.request.get(`${base}/api/dev/mail`);
    expect(res.status(), await res.text()).toBe(200);
    const { items } = (await res.json()) as DevMailListResponse;
    const mail = items.find((m) => m.to.includes(email));
    if (mail) {
      const link = /(http\S+\/invites\/[A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
      if (!link) throw new Error(`no invitation link in: ${mail.text}`);
      return link;
    }
    await page.waitForTimeout(100);
  }
  throw new Error(`no mail reached ${email}`);
}

/** Waits for running CSS transitions (a button fading back from its loading state) before a screenshot. */
async function settled(page: Page): Promise<void> {
  await expect
    .poll(() => page.evaluate(() => document.getAnimations().filter((a) => a.playState === 'running').length))
    .toBe(0);
}

async function signIn(page: Page, email: string): Promise<void> {
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

describe('joining a class and its comments', () => {
  let base: string;
  const browsers: Browser[] = [];

  beforeEach(() => {
    base = baseUrl();
  });

  afterEach(async () => {
    await Promise.all(browsers.splice(0).map((b) => b.close()));
  });

  it('a student joins from the mailed link, the instructor comments, the student sees it and its alert', async () => {
    const teacher = await launchBrowser(DESKTOP);
    const student = await launchBrowser(PHONE);
    browsers.push(teacher, student);
    const t = await teacher.context.newPage();
    const s = await student.context.newPage();

    // The student has a logbook already.
    const studentEmail = uniqueEmail('theo');
    await signUp(s, base, 'Theo Park', studentEmail);
    const cultureId = await createCulture(s, base, 'Bramble');
    const fedAt = Date.now() - 3 * HOUR;
    const feedingId = await createFeeding(s, base, cultureId, {
      fedAt: new Date(fedAt).toISOString(),
      starterG: 20,
      flourG: 100,
      waterG: 100,
      temperatureC: 24,
      initialHeightMm: 35,
    });
    await post(s, `${base}/api/feedings/${feedingId}/rise-checks`, {
      takenAt: new Date(fedAt + 2 * HOUR).toISOString(),
      heightMm: 70,
    });
    // A solo baker's feeding page has no comment box.
    await s.goto(`${base}/feedings/${feedingId}`);
    await s.getByRole('heading', { name: 'Rise checks' }).waitFor();
    expect(await s.getByRole('heading', { name: 'Comments from your class' }).count()).toBe(0);
    // Signed out on the server, so a late response re-setting the cookie cannot sign the student back in.
    await s.goto('about:blank');
    expect((await s.request.post(`${base}/api/auth/sign-out`)).status()).toBe(204);
    await s.context().clearCookies();

    // The instructor makes a class and invites the student.
    const teacherEmail = uniqueEmail('ines');
    await signUp(t, base, 'Ines Marlow', teacherEmail);
    makeInstructor(teacherEmail);
    const cls = await post<BakingClass>(t, `${base}/api/classes`, {
      name: 'Weekend Levain',
      description: 'Six Saturdays at the Larkspur Community Kitchen.',
      startsOn: '2027-01-09',
      endsOn: '2027-02-13',
    });
    await post(t, `${base}/api/classes/${cls.id}/invites`, { emails: [studentEmail] });
    const link = await inviteLinkFor(t, base, studentEmail);
    expect(new URL(link).origin).toBe(new URL(base).origin);

    // Another account (the instructor's own) is told whose link it is and offered a way out.
    await t.goto(link);
    await t
      .getByRole('alert')
      .filter({ hasText: `You are signed in as ${teacherEmail}` })
      .waitFor();
    await t.getByRole('button', { name: 'Sign out and use the invited address' }).waitFor();
    await t.screenshot({ path: join(RESULTS_DIR, 'class-invite-other-account-desktop.png') });
    // Signing out from there comes back to the invitation after signing in again.
    await t.getByRole('button', { name: 'Sign out and use the invited address' }).click();
    await t.waitForURL(/\/sign-in\?next=%2Finvites%2F/);
    await signIn(t, teacherEmail);
    await t.waitForURL(link);

    // Signed out, the link goes by sign-in and comes back.
    await s.goto(link);
    await s.waitForURL(/\/sign-in\?next=%2Finvites%2F/);
    await signIn(s, studentEmail);
    await s.waitForURL(link);
    const preview = s.getByTestId('join-preview');
    await preview.getByRole('heading', { name: 'Weekend Levain' }).waitFor();
    await preview.getByText('taught by Ines Marlow').waitFor();
    await preview.getByText('Only with this class’s instructor, only while you are a member').waitFor();
    await s.screenshot({ path: join(RESULTS_DIR, 'class-invite-phone.png'), fullPage: true });
    await s.getByRole('button', { name: 'Join class' }).click();
    await s.getByRole('status').filter({ hasText: 'You joined Weekend Levain' }).waitFor();
    await s.screenshot({ path: join(RESULTS_DIR, 'class-invite-joined-phone.png'), fullPage: true });

    // The same link again is spent, in words.
    await s.reload();
    await s.getByRole('alert').filter({ hasText: 'This invitation can no longer be used' }).waitFor();
    await s.screenshot({ path: join(RESULTS_DIR, 'class-invite-spent-phone.png') });

    // The instructor reads the feeding, read-only, and comments.
    await t.goto(`${base}/classes/${cls.id}/feedings/${feedingId}`);
    await t.getByText('Read-only: shared with you as this class’s instructor.').waitFor();
    await t.getByRole('table', { name: 'Rise checks' }).waitFor();
    expect(await t.getByRole('button', { name: /Edit rise check|Delete rise check|Edit feeding/ }).count()).toBe(0);
    await t.getByLabel('Comment for your student').fill('Lovely rise. Try a warmer spot for the next feeding.');
    await t.getByRole('button', { name: 'Post comment' }).click();
    const teacherComment = t.getByTestId('comment').filter({ hasText: 'Lovely rise' });
    await teacherComment.getByText('You', { exact: true }).waitFor();
    await expect.poll(() => t.getByRole('button', { name: 'Post comment' }).isEnabled()).toBe(true);
    await settled(t);
    await t.screenshot({ path: join(RESULTS_DIR, 'class-feeding-desktop.png'), fullPage: true });

    // The student sees it under their own feeding, marked as the instructor's, and the alert.
    await s.goto(`${base}/feedings/${feedingId}`);
    const thread = s.getByRole('region', { name: 'Comments from your class' });
    const comment = thread.getByTestId('comment').filter({ hasText: 'Lovely rise' });
    await comment.getByText('Instructor', { exact: true }).waitFor();
    await comment.getByText('Ines Marlow').waitFor();
    await s
      .getByTestId('alert-bell')
      .and(s.getByLabel(/Alerts, [1-9]\d* unread/))
      .waitFor();
    await thread.scrollIntoViewIfNeeded();
    await s.screenshot({ path: join(RESULTS_DIR, 'feeding-comments-phone.png') });

    // A reply from the student reaches the instructor's open page by polling.
    await thread.getByLabel('Reply or ask your instructor').fill('Thank you! Top of the fridge it is.');
    await thread.getByRole('button', { name: 'Post comment' }).click();
    await thread
      .getByTestId('comment')
      .filter({ hasText: 'Top of the fridge' })
      .getByText('You', { exact: true })
      .waitFor();
    await t
      .getByTestId('comment')
      .filter({ hasText: 'Top of the fridge' })
      .getByText('Student')
      .waitFor({ timeout: 30_000 });

    // The student deletes their reply after confirming.
    await thread.getByRole('button', { name: /Delete your comment/ }).click();
    await s
      .getByRole('dialog', { name: 'Delete your comment?' })
      .getByRole('button', { name: 'Delete comment' })
      .click();
    await thread.getByText('Top of the fridge').waitFor({ state: 'detached' });

    // A bake, read-only for the instructor, with its own thread.
    const formula = await post(s, `${base}/api/formulas`, COUNTRY_LOAF);
    const plan = await post(s, `${base}/api/plans`, {
      formulaId: formula.id,
      cultureId,
      mode: 'start-now',
      doughTemperatureC: 24,
      option: 'same-day',
    });
    await t.goto(`${base}/classes/${cls.id}/plans/${plan.id}`);
    await t.getByText('Read-only: shared with you as this class’s instructor.').waitFor();
    await t.getByRole('list', { name: 'Steps' }).waitFor();
    expect(await t.getByRole('button', { name: /^(Done|Undo|Log reading now)/ }).count()).toBe(0);
    await t.getByLabel('Comment for your student').fill('Check the dough at the second fold.');
    await t.getByRole('button', { name: 'Post comment' }).click();
    await t.getByTestId('comment').filter({ hasText: 'second fold' }).waitFor();
    await expect.poll(() => t.getByRole('button', { name: 'Post comment' }).isEnabled()).toBe(true);
    await settled(t);
    await t.screenshot({ path: join(RESULTS_DIR, 'class-plan-desktop.png'), fullPage: true });
    await t.setViewportSize(PHONE);
    await t.screenshot({ path: join(RESULTS_DIR, 'class-plan-phone.png'), fullPage: true });
    await t.getByRole('link', { name: 'Go to the comments' }).click();
    await expect.poll(() => t.getByTestId('comment').filter({ hasText: 'second fold' }).isVisible()).toBe(true);
    await settled(t);
    await t.screenshot({ path: join(RESULTS_DIR, 'class-plan-comments-phone.png') });
    await s.goto(`${base}/bench/${plan.id}`);
    const bakeThread = s.getByRole('region', { name: 'Comments from your class' });
    await bakeThread.getByTestId('comment').filter({ hasText: 'second fold' }).getByText('Instructor').waitFor();
    await bakeThread.scrollIntoViewIfNeeded();
    await s.screenshot({ path: join(RESULTS_DIR, 'bench-comments-phone.png') });

    await s.goto(`${base}/alerts`);
    await s
      .getByText(/Ines Marlow/)
      .first()
      .waitFor();
    await s.screenshot({ path: join(RESULTS_DIR, 'alerts-comment-phone.png') });
  });

  it('joins with a code typed in lower case with a dash, at phone and desktop size', async () => {
    const teacher = await launchBrowser(DESKTOP);
    browsers.push(teacher);
    const t = await teacher.context.newPage();
    const teacherEmail = uniqueEmail('ines');
    await signUp(t, base, 'Ines Marlow', teacherEmail);
    makeInstructor(teacherEmail);
    const cls = await post<BakingClass>(t, `${base}/api/classes`, {
      name: 'Rye Basics',
      startsOn: '2027-03-06',
      endsOn: '2027-04-10',
    });
    const code = cls.joinCode ?? '';
    expect(code).toHaveLength(8);
    const typed = `${code.slice(0, 4)}-${code.slice(4)}`.toLowerCase();

    for (const [size, viewport] of [
      ['phone', PHONE],
      ['desktop', DESKTOP],
    ] as const) {
      const student = await launchBrowser(viewport);
      browsers.push(student);
      const s = await student.context.newPage();
      await signUp(s, base, 'Amara Quist');
      await s.goto(`${base}/classes/join`);
      await s.getByLabel('Join code').fill('ABCD-EF0H');
      await s.getByRole('button', { name: 'Find class' }).click();
      await s.getByText('Codes never use I, O, 0 or 1').waitFor();
      await s.getByLabel('Join code').fill('ABCD-EFGH');
      await s.getByRole('button', { name: 'Find class' }).click();
      await s.getByText('No class has this code.').waitFor();
      await expect.poll(() => s.getByRole('button', { name: 'Find class' }).isEnabled()).toBe(true);
      await settled(s);
      await s.screenshot({ path: join(RESULTS_DIR, `class-join-unknown-${size}.png`) });
      await s.getByLabel('Join code').fill(typed);
      await s.getByRole('button', { name: 'Find class' }).click();
      await s.getByTestId('join-preview').getByRole('heading', { name: 'Rye Basics' }).waitFor();
      await expect.poll(() => s.getByRole('button', { name: 'Find class' }).isEnabled()).toBe(true);
      await settled(s);
      await s.screenshot({ path: join(RESULTS_DIR, `class-join-${size}.png`), fullPage: true });
      await s.getByRole('button', { name: 'Join class' }).click();
      await s.getByRole('status').filter({ hasText: 'You joined Rye Basics' }).waitFor();
      // Looking the code up again says so instead of offering to join twice.
      await s.getByRole('button', { name: 'Find class' }).click();
      await s.getByRole('status').filter({ hasText: 'You are already a student in Rye Basics' }).waitFor();
    }
  });
});
