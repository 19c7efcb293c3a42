import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, launchBrowser, RESULTS_DIR, uniqueEmail } from './browser';
import {
  addRiseChecks,
  browserPerTest,
  createCulture,
  createFeeding,
  HOUR,
  patchAccount,
  post,
  signUp,
} from './helpers';

// A bake to photograph: 75 % water, 20 % levain, 2 % salt (baker's percentages).
const COUNTRY_LOAF = {
  name: 'Country loaf 75 %',
  ingredients: [
    { kind: 'flour', name: 'Bread flour', amount: 1000, unit: 'g' },
    { kind: 'water', name: 'Water', amount: 750, unit: 'g' },
    { kind: 'starter', name: 'Levain', amount: 200, unit: 'g' },
    { kind: 'salt', name: 'Salt', amount: 20, unit: 'g' },
  ],
};

interface PhotoJson {
  id: string;
  subjectType: string;
  subjectId: string;
  feedingId: string | null;
  caption: string | null;
  thumbnailUrl: string;
  displayUrl: string;
}

/**
 * A small JPEG drawn in the page (a jar with a band and a risen starter), as a phone's camera
 * would hand it over: no fixture file needed, and the bytes are a real JPEG the server must decode.
 */
async function jarJpeg(page: Page, level: number): Promise<Buffer> {
  const base64 = await page.evaluate((risen) => {
    const canvas = document.createElement('canvas');
    canvas.width = 480;
    canvas.height = 640;
    const g = canvas.getContext('2d')!;
    g.fillStyle = '#FBF7F0';
    g.fillRect(0, 0, 480, 640);
    g.fillStyle = '#E8DCC4';
    g.fillRect(120, 640 - risen, 240, risen - 60);
    g.strokeStyle = '#2F4858';
    g.lineWidth = 8;
    g.strokeRect(110, 120, 260, 460);
    g.fillStyle = '#C9832E';
    g.fillRect(104, 430, 272, 14);
    return canvas.toDataURL('image/jpeg', 0.85).split(',')[1]!;
  }, level);
  return Buffer.from(base64, 'base64');
}

/** A larger JPEG (noise compresses badly), so a throttled upload takes a while. */
async function noisyJpeg(page: Page): Promise<Buffer> {
  const base64 = await page.evaluate(() => {
    const canvas = document.createElement('canvas');
    canvas.width = 900;
    canvas.height = 900;
    const g = canvas.getContext('2d')!;
    const image = g.createImageData(900, 900);
    // A fixed-seed generator: the same bytes every run.
    let seed = 42;
    for (let i = 0; i < image.data.length; i++) {
      seed = (seed * 1_103_515_245 + 12_345) % 2_147_483_648;
      image.data[i] = i % 4 === 3 ? 255 : seed % 256;
    }
    g.putImageData(image, 0, 0);
    return canvas.toDataURL('image/jpeg', 0.95).split(',')[1]!;
  });
  return Buffer.from(base64, 'base64');
}

async function photosOf(page: Page, url: string): Promise<PhotoJson[]> {
  const res = await page.request.get(url);
  expect(res.status()).toBe(200);
  return ((await res.json()) as { items: PhotoJson[] }).items;
}

/** Every <img> under the locator has loaded real pixels (fetched with the session cookie). */
async function imagesLoaded(page: Page, selector: string): Promise<void> {
  await expect
    .poll(() =>
      page.evaluate(
        (sel) => [...document.querySelectorAll<HTMLImageElement>(sel)].every((i) => i.complete && i.naturalWidth > 0),
        selector,
      ),
    )
    .toBe(true);
}

async function settled(page: Page): Promise<void> {
  await expect
    .poll(() => page.evaluate(() => document.getAnimations().filter((a) => a.playState === 'running').length))
    .toBe(0);
}

describe('jar photos from a phone', () => {
  const base = baseUrl();
  const browser = browserPerTest();

  it('adds photos to a feeding (camera and gallery), refuses wrong files per file, shows them on the culture strip, captions and deletes one', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Theo Park');
    // A baker on US units in Chicago: a 12-hour clock, in their own zone.
    await patchAccount(page, base, { unitSystem: 'us', temperatureUnit: 'F', timeZone: 'America/Chicago' });
    const cultureId = await createCulture(page, base, 'Bramble');
    const fedAt = Date.now() - 4 * HOUR;
    const feedingId = await createFeeding(page, base, cultureId, {
      fedAt: new Date(fedAt).toISOString(),
      ratio: '1:2:2',
      totalG: 150,
      temperatureC: 24,
      initialHeightMm: 40,
    });
    await addRiseChecks(page, base, feedingId, fedAt, [
      [1, 44],
      [2, 58],
      [3, 75],
    ]);

    await page.goto(`${base}/feedings/${feedingId}`);
    const card = page.getByRole('region', { name: 'Jar photos' });
    await card.getByText('No jar photos of this feeding yet.').waitFor();

    // The gallery: two at once, one a real JPEG, one a text file dressed up as one (the server reads the bytes).
    await card.getByTestId('photo-files').setInputFiles([
      { name: 'jar-start.jpg', mimeType: 'image/jpeg', buffer: await jarJpeg(page, 200) },
      { name: 'notes.jpg', mimeType: 'image/jpeg', buffer: Buffer.from('fed at 7, smells of apples\n') },
    ]);
    const rows = card.getByTestId('upload-row');
    await expect
      .poll(() => rows.evaluateAll((els) => els.map((e) => e.getAttribute('data-status'))))
      .toEqual(['done', 'failed']);
    const refusal = await rows.nth(1).getByRole('alert').textContent();
    expect(refusal).toMatch(/JPEG|PNG|WebP/);
    await settled(page);
    await card.screenshot({ path: join(RESULTS_DIR, 'photos-refused-phone.png') });

    // A GIF never leaves the phone: the contract's types are checked first, with the reason.
    await card
      .getByTestId('photo-files')
      .setInputFiles([{ name: 'crumb.gif', mimeType: 'image/gif', buffer: Buffer.from('GIF89a') }]);
    await card.getByText('Not a photo Peakwise takes: only JPEG, PNG or WebP.').waitFor();

    // "Take photo": the input that opens the camera.
    expect(await card.getByTestId('photo-camera').getAttribute('capture')).toBe('environment');
    await card
      .getByTestId('photo-camera')
      .setInputFiles([{ name: 'jar-peak.jpg', mimeType: 'image/jpeg', buffer: await jarJpeg(page, 420) }]);
    await expect.poll(() => card.getByTestId('photo-thumb').count()).toBe(2);
    // Thumbnails load lazily: in view first, as the baker would scroll to them.
    await card.getByTestId('photo-thumb').nth(1).scrollIntoViewIfNeeded();
    await imagesLoaded(page, '[data-testid="photos-card"] img');
    await settled(page);
    await card.screenshot({ path: join(RESULTS_DIR, 'photos-feeding-phone.png') });
    await page.screenshot({ path: join(RESULTS_DIR, 'photos-feeding-page-phone.png'), fullPage: true });

    const stored = await photosOf(page, `${base}/api/feedings/${feedingId}/photos`);
    expect(stored).toHaveLength(2);
    expect(stored.every((p) => p.feedingId === feedingId)).toBe(true);

    // The viewer: the display image, a caption.
    await card.getByTestId('photo-thumb').nth(1).click();
    const dialog = page.getByRole('dialog', { name: /Jar photo/ });
    await dialog.waitFor();
    await imagesLoaded(page, '[role="dialog"] img');
    await dialog.getByLabel('Caption').fill('Domed at peak, 3 h');
    await dialog.getByRole('button', { name: 'Save caption' }).click();
    await dialog.getByText('Saved.').waitFor();
    await settled(page);
    await page.screenshot({ path: join(RESULTS_DIR, 'photos-viewer-phone.png') });
    await dialog.getByRole('button', { name: 'Close' }).click();
    await dialog.waitFor({ state: 'hidden' });

    // The culture's strip: both photos in time order, under their feeding, each opening the viewer.
    await page.goto(`${base}/cultures/${cultureId}`);
    const strip = page.getByTestId('photo-strip');
    await strip.scrollIntoViewIfNeeded();
    await expect.poll(() => strip.getByTestId('photo-thumb').count()).toBe(2);
    await imagesLoaded(page, '[data-testid="photo-strip"] img');
    const feedingLink = strip.getByRole('link', { name: /^Fed \d{1,2} \w{3}, \d{1,2}:\d{2} (AM|PM)$/ });
    expect(await feedingLink.getAttribute('href')).toBe(`/feedings/${feedingId}`);
    expect(await strip.getByTestId('photo-thumb').nth(1).getAttribute('aria-label')).toBe('Open Domed at peak, 3 h');
    await settled(page);
    await strip.screenshot({ path: join(RESULTS_DIR, 'photos-culture-strip-phone.png') });
    await page.screenshot({ path: join(RESULTS_DIR, 'photos-culture-page-phone.png'), fullPage: true });

    await strip.getByTestId('photo-thumb').nth(0).click();
    await dialog.waitFor();
    await dialog.getByText('1 of 2').waitFor();
    await dialog.getByRole('link', { name: /^feeding of / }).waitFor();
    await dialog.getByRole('button', { name: 'Delete photo' }).click();
    await dialog.getByRole('alertdialog').waitFor();
    await settled(page);
    await page.screenshot({ path: join(RESULTS_DIR, 'photos-delete-confirm-phone.png') });
    await dialog.getByRole('alertdialog').getByRole('button', { name: 'Delete', exact: true }).click();
    await dialog.waitFor({ state: 'hidden' });
    await expect.poll(() => strip.getByTestId('photo-thumb').count()).toBe(1);

    // Gone on the server too: the list, and the image itself.
    const left = await photosOf(page, `${base}/api/cultures/${cultureId}/photos`);
    expect(left.map((p) => p.caption)).toEqual(['Domed at peak, 3 h']);
    const deleted = stored.find((p) => p.id !== left[0]!.id)!;
    expect((await page.request.get(`${base}${deleted.thumbnailUrl}`)).status()).toBe(404);
  });

  it('offers the camera right after a rise check is saved, and the photo joins the culture’s strip', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Amara Quist');
    const cultureId = await createCulture(page, base, 'Larkspur');
    const fedAt = Date.now() - 3 * HOUR;
    const feedingId = await createFeeding(page, base, cultureId, {
      fedAt: new Date(fedAt).toISOString(),
      ratio: '1:2:2',
      totalG: 150,
      temperatureC: 24,
      initialHeightMm: 40,
    });
    await page.goto(`${base}/cultures/${cultureId}/rise-check`);
    await page.getByLabel('Height from the jar’s base').fill('71');
    await page.getByRole('button', { name: 'Save rise check' }).click();
    const saved = page.getByTestId('rise-check-saved');
    await saved.getByText('A photo of the jar?').waitFor();
    await saved
      .getByTestId('photo-camera')
      .setInputFiles({ name: 'jar.jpg', mimeType: 'image/jpeg', buffer: await jarJpeg(page, 260) });
    await expect.poll(() => saved.getByTestId('upload-row').getAttribute('data-status')).toBe('done');
    await settled(page);
    await page.screenshot({ path: join(RESULTS_DIR, 'photos-rise-check-phone.png') });

    // On the server the photo names the rise check and its feeding; the culture's strip shows it.
    const checks = (await (await page.request.get(`${base}/api/feedings/${feedingId}/rise-checks`)).json()) as {
      items: { id: string }[];
    };
    const strip = await photosOf(page, `${base}/api/cultures/${cultureId}/photos`);
    expect(strip).toHaveLength(1);
    expect(strip[0]).toMatchObject({ subjectType: 'rise-check', subjectId: checks.items[0]?.id, feedingId });
    await saved.getByRole('link', { name: 'See the curve' }).click();
    await page.waitForURL(`${base}/cultures/${cultureId}`);
    await expect.poll(() => page.getByTestId('photo-strip').getByTestId('photo-thumb').count()).toBe(1);
  });

  it('adds a crumb photo to a bake from the gallery and shows it in the bake’s photos', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Amara Quist');
    const formula = await post(page, `${base}/api/formulas`, COUNTRY_LOAF);
    const plan = await post(page, `${base}/api/plans`, {
      formulaId: formula.id,
      mode: 'start-now',
      doughTemperatureC: 24,
      option: 'same-day',
    });
    await page.goto(`${base}/bench/${plan.id}`);
    const card = page.getByRole('region', { name: 'Crumb photos' });
    await card.getByText('No crumb photos of this bake yet.').waitFor();
    await card
      .getByTestId('photo-files')
      .setInputFiles([{ name: 'crumb.jpg', mimeType: 'image/jpeg', buffer: await jarJpeg(page, 300) }]);
    await expect.poll(() => card.getByTestId('photo-thumb').count()).toBe(1);
    // Thumbnails load lazily: in view first, as the baker would scroll to them.
    await card.getByTestId('photo-thumb').scrollIntoViewIfNeeded();
    await imagesLoaded(page, '[data-testid="photos-card"] img');
    const stored = await photosOf(page, `${base}/api/plans/${plan.id}/photos`);
    expect(stored).toHaveLength(1);
    expect(stored[0]!.feedingId).toBeNull();
    await card.getByTestId('photo-thumb').click();
    await page.getByRole('dialog', { name: /Crumb photo/ }).waitFor();
    await settled(page);
    await page.screenshot({ path: join(RESULTS_DIR, 'photos-crumb-viewer-phone.png') });
  });

  it('shows each file’s own progress while a slow connection sends it', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Dev Rowan');
    const cultureId = await createCulture(page, base, 'Pip');
    const feedingId = await createFeeding(page, base, cultureId, {
      fedAt: new Date(Date.now() - HOUR).toISOString(),
      ratio: '1:1:1',
      totalG: 90,
    });
    await page.goto(`${base}/feedings/${feedingId}`);
    const card = page.getByRole('region', { name: 'Jar photos' });
    await card.getByText('No jar photos of this feeding yet.').waitFor();
    const big = await noisyJpeg(page);
    expect(big.length).toBeGreaterThan(300_000);

    // A kitchen's weak signal: Chromium's own throttling, about 200 kB/s up.
    const cdp = await page.context().newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 40,
      downloadThroughput: 1_000_000,
      uploadThroughput: 200_000,
    });
    await card.getByTestId('photo-files').setInputFiles([
      { name: 'jar-1.jpg', mimeType: 'image/jpeg', buffer: big },
      { name: 'jar-2.jpg', mimeType: 'image/jpeg', buffer: big },
    ]);
    const rows = card.getByTestId('upload-row');
    // The first goes up while the second waits its turn; its bar is part-way.
    const first = rows.nth(0).getByRole('progressbar');
    await expect
      .poll(async () => Number((await first.getAttribute('aria-valuenow')) ?? 0), { timeout: 20_000 })
      .toBeGreaterThan(0);
    expect(await rows.nth(1).getAttribute('data-status')).toBe('waiting');
    expect(
      await rows
        .nth(0)
        .getByText(/^Sending · \d+ %$/)
        .count(),
    ).toBe(1);
    await card.screenshot({ path: join(RESULTS_DIR, 'photos-progress-phone.png'), animations: 'disabled' });
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 0,
      downloadThroughput: -1,
      uploadThroughput: -1,
    });
    await expect
      .poll(() => rows.evaluateAll((els) => els.map((e) => e.getAttribute('data-status'))), { timeout: 30_000 })
      .toEqual(['done', 'done']);
    await card.getByText('2 of 2 photos added').waitFor();
  });
});

/** The instructor role straight in the database (a fresh test database has no admin to give it). */
function makeInstructor(email: string): void {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: this test makes an instructor in the database');
  execFileSync('psql', [url, '-qc', `UPDATE account SET role = 'instructor' WHERE email = '${email}'`]);
}

const isoDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

describe('a student’s photos for the class’s instructor', () => {
  const base = baseUrl();
  const browser = browserPerTest();

  it('shows the strip beside the rise curves, the feeding’s and the bake’s photos, read-only', async () => {
    // The student, on a phone: a feeding with a captioned jar photo, a bake with a crumb photo.
    const s = await browser.context.newPage();
    await signUp(s, base, 'Theo Park');
    const cultureId = await createCulture(s, base, 'Bramble');
    const fedAt = Date.now() - 3 * HOUR;
    const feedingId = await createFeeding(s, base, cultureId, {
      fedAt: new Date(fedAt).toISOString(),
      ratio: '1:2:2',
      totalG: 150,
      temperatureC: 23,
      initialHeightMm: 40,
    });
    await addRiseChecks(s, base, feedingId, fedAt, [
      [1, 46],
      [2, 64],
    ]);
    const upload = async (path: string, name: string, level: number) => {
      const res = await s.request.post(`${base}/api/${path}/photos`, {
        headers: { 'Idempotency-Key': crypto.randomUUID() },
        multipart: { photos: { name, mimeType: 'image/jpeg', buffer: await jarJpeg(s, level) } },
      });
      expect(res.status(), await res.text()).toBe(201);
      return ((await res.json()) as { items: PhotoJson[] }).items[0]!;
    };
    const jar = await upload(`feedings/${feedingId}`, 'jar.jpg', 380);
    expect(
      (await s.request.patch(`${base}/api/photos/${jar.id}`, { data: { caption: 'Two hours in' } })).status(),
    ).toBe(200);
    const formula = await post(s, `${base}/api/formulas`, COUNTRY_LOAF);
    const plan = await post(s, `${base}/api/plans`, {
      formulaId: formula.id,
      cultureId,
      mode: 'start-now',
      doughTemperatureC: 24,
      option: 'same-day',
    });
    await upload(`plans/${plan.id}`, 'crumb.jpg', 300);

    // The instructor, at a desk: a class the student joins by code.
    const desk = await launchBrowser(DESKTOP);
    try {
      const t = await desk.context.newPage();
      const ines = uniqueEmail('ines');
      await signUp(t, base, 'Ines Marlow', ines);
      makeInstructor(ines);
      const cls = await post<{ id: string; joinCode: string }>(t, `${base}/api/classes`, {
        name: 'Weekend Levain',
        startsOn: isoDay(Date.now() - 7 * 24 * HOUR),
        endsOn: isoDay(Date.now() + 30 * 24 * HOUR),
      });
      const joined = await s.request.post(`${base}/api/class-join`, { data: { code: cls.joinCode } });
      expect(joined.status(), await joined.text()).toBe(200);

      await t.goto(`${base}/classes/${cls.id}/cultures/${cultureId}`);
      const strip = t.getByTestId('photo-strip');
      await strip.scrollIntoViewIfNeeded();
      await expect.poll(() => strip.getByTestId('photo-thumb').count()).toBe(1);
      await imagesLoaded(t, '[data-testid="photo-strip"] img');
      await settled(t);
      await t.screenshot({ path: join(RESULTS_DIR, 'photos-class-culture-desktop.png'), fullPage: true });
      await strip.getByTestId('photo-thumb').click();
      const dialog = t.getByRole('dialog', { name: /Jar photo/ });
      await dialog.getByText('Two hours in').waitFor();
      expect(await dialog.getByRole('link', { name: /^feeding of / }).getAttribute('href')).toBe(
        `/classes/${cls.id}/feedings/${feedingId}`,
      );
      // Read-only: no caption to edit, nothing to delete.
      expect(await dialog.getByLabel('Caption').count()).toBe(0);
      expect(await dialog.getByRole('button', { name: 'Delete photo' }).count()).toBe(0);
      await imagesLoaded(t, '[role="dialog"] img');
      await settled(t);
      await t.screenshot({ path: join(RESULTS_DIR, 'photos-class-viewer-desktop.png') });
      await dialog.getByRole('button', { name: 'Close' }).click();

      await t.goto(`${base}/classes/${cls.id}/feedings/${feedingId}`);
      const jarCard = t.getByRole('region', { name: 'Jar photos' });
      await expect.poll(() => jarCard.getByTestId('photo-thumb').count()).toBe(1);
      expect(await jarCard.getByRole('button', { name: 'Take photo' }).count()).toBe(0);

      await t.goto(`${base}/classes/${cls.id}/plans/${plan.id}`);
      const crumbCard = t.getByRole('region', { name: 'Crumb photos' });
      await expect.poll(() => crumbCard.getByTestId('photo-thumb').count()).toBe(1);
      expect(await crumbCard.getByRole('button', { name: 'Choose photos' }).count()).toBe(0);
      await crumbCard.scrollIntoViewIfNeeded();
      await imagesLoaded(t, '[data-testid="photos-card"] img');
      await settled(t);
      await t.screenshot({ path: join(RESULTS_DIR, 'photos-class-plan-desktop.png'), fullPage: true });
    } finally {
      await desk.close();
    }
  });
});
