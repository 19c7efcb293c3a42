import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { beforeEach, describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, PHONE, RESULTS_DIR } from './browser';
import { browserPerTest, createCulture, createFeeding, HOUR, patchAccount, post, signUp } from './helpers';

/**
 * Whether tomorrow-09:00 leaves room for the overnight retard depends on the baker's clock now
 * (feeding, mixing and bulk must finish before quiet hours at 23:00). So the test's baker lives
 * where it is about half past seven in the morning when the test runs, whatever the machine's
 * time: one zone per hour of offset, the one nearest 07:30 local.
 */
const ZONE = morningZone();

function morningZone(): string {
  const zones = [
    'Pacific/Pago_Pago',
    'Pacific/Honolulu',
    'America/Anchorage',
    'America/Los_Angeles',
    'America/Denver',
    'America/Chicago',
    'America/New_York',
    'America/Halifax',
    'America/Sao_Paulo',
    'Atlantic/South_Georgia',
    'Atlantic/Cape_Verde',
    'Europe/London',
    'Europe/Berlin',
    'Europe/Athens',
    'Europe/Moscow',
    'Asia/Dubai',
    'Asia/Karachi',
    'Asia/Dhaka',
    'Asia/Bangkok',
    'Asia/Shanghai',
    'Asia/Tokyo',
    'Australia/Brisbane',
    'Pacific/Noumea',
    'Pacific/Auckland',
    'Pacific/Kiritimati',
  ];
  const minutesFromHalfSeven = (zone: string) => {
    const [h = 0, m = 0] = new Date()
      .toLocaleTimeString('en-GB', { timeZone: zone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' })
      .split(':')
      .map(Number);
    const d = Math.abs(h * 60 + m - 450);
    return Math.min(d, 1440 - d);
  };
  return zones.reduce((best, z) => (minutesFromHalfSeven(z) < minutesFromHalfSeven(best) ? z : best));
}

// The formula both bakes use: 75 % water, 20 % levain, 2 % salt (baker's percentages).
const COUNTRY_LOAF = {
  name: 'Country loaf 75 %',
  ingredients: [
    { kind: 'flour', name: 'Bread flour', amount: 1000, unit: 'g' },
    { kind: 'water', name: 'Water', amount: 750, unit: 'g' },
    { kind: 'starter', name: 'Levain', amount: 200, unit: 'g' },
    { kind: 'salt', name: 'Salt', amount: 20, unit: 'g' },
  ],
};

/** The whole page on a phone as tall as it, so the fixed bars sit where they belong. */
async function tallShot(page: Page, name: string, only?: Locator) {
  const height = await page.evaluate(() => document.documentElement.scrollHeight);
  await page.setViewportSize({ width: PHONE.width, height });
  const clip = only ? await only.boundingBox() : null;
  await page.screenshot({ path: join(RESULTS_DIR, name), ...(clip ? { clip } : {}) });
  await page.setViewportSize(PHONE);
}

/** `date` on the wall clock of `zone`, "YYYY-MM-DDTHH:MM", as a datetime-local field takes it. */
function wallIn(zone: string, date: Date): string {
  const parts = new Intl.DateTimeFormat('en-CA', {
    timeZone: zone,
    hourCycle: 'h23',
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
  }).formatToParts(date);
  const get = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')}T${get('hour')}:${get('minute')}`;
}

/** Tomorrow's date in `zone`, "YYYY-MM-DD" (en-CA writes dates that way). */
function tomorrowIn(zone: string): string {
  const today = new Date().toLocaleDateString('en-CA', { timeZone: zone });
  const [y, m, d] = today.split('-').map(Number) as [number, number, number];
  return new Date(Date.UTC(y, m - 1, d + 1)).toISOString().slice(0, 10);
}

describe('Bench on a phone', () => {
  const base = baseUrl();
  const browser = browserPerTest();
  let page: Page;

  beforeEach(async () => {
    page = await browser.context.newPage();
  });

  it('plans ready-at tomorrow 09:00 around quiet hours, follows the overnight retard, checks off, logs, exports', async () => {
    await signUp(page, base, 'Theo Park');
    // The baker lives in ZONE while the browser runs in another zone: times follow the account.
    await patchAccount(page, base, { timeZone: ZONE });
    await post(page, `${base}/api/formulas`, COUNTRY_LOAF);
    // Bramble, fed five hours ago: the feeding that will leaven the bake.
    const cultureId = await createCulture(page, base, 'Bramble');
    const feedingId = await createFeeding(page, base, cultureId, {
      fedAt: new Date(Date.now() - 5 * HOUR).toISOString(),
      ratio: '1:2:2',
      totalG: 100,
    });
    await page.reload();

    await page.getByTestId('bottom-nav').getByRole('link', { name: 'Bench' }).click();
    await page.waitForURL(`${base}/bench`);
    await page.getByText('Nothing on the bench').waitFor();
    await page.getByRole('link', { name: 'Plan a bake' }).click();
    await page.waitForURL(`${base}/bench/new`);

    // The only formula is picked; ready at tomorrow 09:00 in the baker's zone; quiet 23:00–06:30.
    await expect.poll(() => page.getByLabel('Formula').inputValue()).not.toBe('');
    expect(await page.getByLabel('Bread ready at').inputValue()).toBe(`${tomorrowIn(ZONE)}T09:00`);
    expect(await page.getByLabel('Quiet from').inputValue()).toBe('23:00');
    expect(await page.getByLabel('Until').inputValue()).toBe('06:30');
    await page.getByLabel('Culture that leavens it').selectOption({ label: 'Bramble' });
    await tallShot(page, 'bench-new.png');

    await page.getByRole('button', { name: 'Show times' }).click();
    const overnight = page.getByTestId('option-overnight-retard');
    await overnight.waitFor();
    await overnight.getByText(/^Fits/).waitFor();
    // The retard's steps are laid out in clock times: shaping today, the bake tomorrow.
    expect(await overnight.getByText('Cold retard in the fridge').count()).toBe(1);
    expect(await overnight.getByText('Bake', { exact: true }).count()).toBe(1);
    expect(await page.getByTestId('option-same-day').count()).toBe(1);
    await tallShot(page, 'bench-options.png', page.locator('section[aria-labelledby="options-heading"]'));

    await overnight.getByRole('button', { name: 'Retard overnight' }).click();
    await page.waitForURL(/\/bench\/[0-9a-f-]{36}$/);
    // The route loads lazily: wait for the timeline itself, not just any heading.
    await page.getByTestId('now-marker').waitFor();
    const done = page.locator('[data-testid="plan-step"][data-done="true"]');
    expect(await done.count()).toBe(0);
    expect(await page.getByTestId('now-marker').count()).toBe(1);

    // Check off the current step twice: the levain's feeding, then the mix. (Waiting steps
    // before a checked one, like the levain's rise, count as done with it.)
    const current = page.locator('[data-testid="plan-step"][aria-current="step"]');
    const isDone = (id: string) =>
      page.locator(`[data-testid="plan-step"][data-step="${id}"]`).getAttribute('data-done');
    expect(await current.getAttribute('data-step')).toBe('feed-starter');
    await current.getByRole('button', { name: 'Done', exact: true }).click();
    await expect.poll(() => isDone('feed-starter')).toBe('true');
    await expect.poll(() => current.getAttribute('data-step')).toBe('mix');
    await current.getByRole('button', { name: 'Done', exact: true }).click();
    await expect.poll(() => isDone('mix')).toBe('true');
    expect(await current.getAttribute('data-step')).not.toBe('mix');

    // Undo takes the mix back; the baker really mixed 40 minutes ago and says so.
    await page.locator('[data-step="mix"]').getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => isDone('mix')).toBe('false');
    expect(await current.getAttribute('data-step')).toBe('mix');
    const mixedAt = new Date(Date.now() - 40 * 60_000);
    await current.getByRole('button', { name: 'Done at another time…' }).click();
    const dialog = page.getByRole('dialog', { name: 'When did you do it?' });
    await dialog.getByLabel('Mix the dough').fill(wallIn(ZONE, mixedAt));
    await dialog.getByRole('button', { name: 'Record' }).click();
    await expect.poll(() => isDone('mix')).toBe('true');
    const mixTime = mixedAt.toLocaleTimeString('en-GB', { timeZone: ZONE, hour: '2-digit', minute: '2-digit' });
    expect(await page.locator('[data-step="mix"]').innerText()).toContain(`Done at ${mixTime}`);

    // A dough reading: temperature and the aliquot jar's rise.
    const bulk = page.getByTestId('bulk-card');
    await bulk.getByLabel('Temperature').fill('25.5');
    await bulk.getByLabel('Jar rise').fill('10');
    await bulk.getByRole('button', { name: 'Log reading now' }).click();
    await bulk.getByTestId('dough-reading').first().waitFor();
    expect(await bulk.getByTestId('dough-reading').first().innerText()).toContain('25.5 °C');
    await bulk.getByText('Estimated from your dough temperatures and 1 reading of the jar’s rise.').waitFor();
    await tallShot(page, 'bench-live.png');

    // The calendar file: RFC 5545, one event per step.
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Add to calendar (.ics)' }).click(),
    ]);
    const ics = await readFile((await download.path()) ?? '', 'utf8');
    expect(ics).toContain('BEGIN:VCALENDAR');
    expect(ics.match(/BEGIN:VEVENT/g)?.length ?? 0).toBeGreaterThan(5);
    expect(download.suggestedFilename()).toMatch(/\.ics$/);

    // The Bench lists it under way with its next step.
    await page.getByTestId('bottom-nav').getByRole('link', { name: 'Bench' }).click();
    await page.waitForURL(`${base}/bench`);
    await page
      .getByTestId('active-plan')
      .getByText(/^Next: /)
      .waitFor();
    await tallShot(page, 'bench-list.png');

    await page.setViewportSize(DESKTOP);
    await page.getByTestId('active-plan').click();
    await page.waitForURL(/\/bench\/[0-9a-f-]{36}$/);
    await page.getByTestId('bulk-card').waitFor();
    await page.screenshot({ path: join(RESULTS_DIR, 'bench-live-desktop.png'), fullPage: true });

    // Every hands-on step done (through the API, to skip a day): the finish form takes the record.
    const planId = page.url().split('/').pop() ?? '';
    type Live = { live: { steps: { id: string; action: boolean; done: boolean }[] } };
    const view = (await (await page.request.get(`${base}/api/plans/${planId}`)).json()) as Live;
    for (const step of view.live.steps.filter((s) => s.action && !s.done)) {
      await post(page, `${base}/api/plans/${planId}/steps/${step.id}/done`, {});
    }
    await page.setViewportSize(PHONE);
    await page.reload();
    const finish = page.getByRole('region', { name: 'Finish the bake' });
    await finish.waitFor();
    // The stars are labels over visually hidden radios: click the fourth star, read the radio.
    await finish.locator('label').filter({ hasText: '4 Stars' }).click();
    expect(await finish.getByRole('radio', { name: '4 Stars' }).isChecked()).toBe(true);
    await finish.getByLabel('Notes').fill('Open crumb, crust a shade dark.');
    // The feeding picked for the record is Bramble's, the one before the mix.
    expect(await finish.getByLabel('The feeding of Bramble that leavened it').inputValue()).toBe(feedingId);
    await finish.getByRole('button', { name: 'Save the bake' }).click();
    await page.getByRole('heading', { name: /^Baked / }).waitFor();
    await page.getByText('Open crumb, crust a shade dark.').waitFor();
    const record = (await (await page.request.get(`${base}/api/plans/${planId}`)).json()) as {
      feedingId: string | null;
      rating: number | null;
    };
    expect(record).toMatchObject({ feedingId, rating: 4 });
    expect(await page.getByRole('button', { name: 'Done', exact: true }).count()).toBe(0);
    await tallShot(page, 'bench-finished.png');

    // Finished, it moves from "Under way" to the past bakes.
    await page.getByTestId('bottom-nav').getByRole('link', { name: 'Bench' }).click();
    await page.getByTestId('past-plan').waitFor();
    expect(await page.getByTestId('active-plan').count()).toBe(0);
  });

  it('offers a warmer spot when a cool kitchen cannot make it the same day', async () => {
    await signUp(page, base, 'Theo Park');
    await patchAccount(page, base, { timeZone: ZONE });
    await post(page, `${base}/api/formulas`, COUNTRY_LOAF);
    await page.goto(`${base}/bench/new`);
    await expect.poll(() => page.getByLabel('Formula').inputValue()).not.toBe('');

    // Ripe levain, no quiet hours, an 18 °C dough and bread wanted 16 h from now: at 18 °C the
    // bulk alone would run past it (the planner's own lever search decides the spot).
    await page.getByLabel('My levain is ripe already (no feeding step)').check();
    await page.getByLabel('Keep my quiet hours free (no hands-on steps)').uncheck();
    await page.getByLabel('Bread ready at').fill(wallIn(ZONE, new Date(Date.now() + 16 * 3_600_000)));
    await page.getByLabel('Dough temperature during bulk').fill('18');
    await page.getByRole('button', { name: 'Show times' }).click();

    const lever = page.getByTestId('option-lever');
    await lever.waitFor();
    // The plan that does not fit says why, with its attempt's times folded away until asked for.
    const sameDay = page.getByTestId('option-same-day');
    expect(await sameDay.getByText(/^Does not fit/).count()).toBe(1);
    expect(await sameDay.getByTestId('option-step').count()).toBe(0);
    await sameDay.getByRole('button', { name: 'Show the times it would need' }).click();
    expect(await sameDay.getByTestId('option-step').count()).toBeGreaterThan(5);
    const words = await lever.getByText(/^Put the dough somewhere near/).innerText();
    const spot = /near ([\d.]+ °C)/.exec(words)?.[1] ?? '';
    expect(spot).not.toBe('');
    expect(words).toContain('instead of 18 °C');
    await tallShot(page, 'bench-lever.png', page.locator('section[aria-labelledby="options-heading"]'));

    await lever.getByRole('button', { name: `Bake the same day at ${spot}` }).click();
    await page.waitForURL(/\/bench\/[0-9a-f-]{36}$/);
    // The live plan follows the warmer spot: its bulk runs at that temperature.
    await page.getByTestId('bulk-card').getByText(`planned dough temperature (${spot})`).waitFor();
    expect(await page.locator('[data-step="bulk"]').innerText()).toContain(`dough ${spot}`);
  });
});
