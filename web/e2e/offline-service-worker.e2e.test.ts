import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl } from './browser';
import { browserPerTest, signUp } from './helpers';

// The one service worker: installable app, shell kept for offline, push alerts still shown, and
// the API never served from a cache.
const base = baseUrl();

async function waitForServiceWorker(page: Page): Promise<void> {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
    if (navigator.serviceWorker.controller) return;
    await new Promise<void>((resolve) =>
      navigator.serviceWorker.addEventListener('controllerchange', () => resolve(), { once: true }),
    );
  });
}

describe('service worker', () => {
  const browser = browserPerTest();

  it('offers an installable app with our name, colours and icons', async () => {
    const page = await browser.context.newPage();
    await page.goto(`${base}/sign-in`);
    const href = await page.locator('link[rel="manifest"]').getAttribute('href');
    expect(href).toBe('/manifest.webmanifest');
    const res = await page.request.get(`${base}${href}`);
    expect(res.status()).toBe(200);
    const manifest = (await res.json()) as {
      name: string;
      start_url: string;
      display: string;
      theme_color: string;
      background_color: string;
      icons: { src: string; sizes: string; purpose?: string }[];
    };
    expect(manifest).toMatchObject({
      name: 'Peakwise',
      start_url: '/',
      display: 'standalone',
      theme_color: '#2F4858',
      background_color: '#FBF7F0',
    });
    expect(manifest.icons.map((i) => `${i.sizes} ${i.purpose}`)).toEqual(
      expect.arrayContaining(['192x192 any', '512x512 any', '512x512 maskable']),
    );
    for (const icon of manifest.icons) {
      const png = await page.request.get(`${base}${icon.src}`);
      expect(png.status(), icon.src).toBe(200);
      expect(png.headers()['content-type']).toBe('image/png');
    }
  });

  it('keeps the app shell but nothing from /api, and shows a push alert with its page', async () => {
    const page = await browser.context.newPage();
    await signUp(page, base, 'Ines Marlow');
    await waitForServiceWorker(page);
    // Read a few API answers while controlled, so a caching worker would have had its chance.
    await page.goto(`${base}/alerts`);
    await page.getByRole('heading', { name: 'Alerts' }).first().waitFor();

    const cached = await page.evaluate(async () => {
      const urls: string[] = [];
      for (const name of await caches.keys()) {
        for (const request of await (await caches.open(name)).keys()) urls.push(new URL(request.url).pathname);
      }
      return urls;
    });
    expect(cached).toContain('/index.html');
    expect(cached.some((u) => u.startsWith('/assets/') && u.endsWith('.js'))).toBe(true);
    expect(cached.filter((u) => u.startsWith('/api'))).toEqual([]);

    // A push message delivered to the worker (as the browser's push service would) becomes a
    // notification whose tap opens the alert's page.
    await browser.context.grantPermissions(['notifications'], { origin: base });
    const cdp = await browser.context.newCDPSession(page);
    const registrationId = new Promise<string>((resolve) => {
      cdp.on('ServiceWorker.workerRegistrationUpdated', ({ registrations }) => {
        const ours = registrations.find((r) => r.scopeURL === `${base}/` && !r.isDeleted);
        if (ours) resolve(ours.registrationId);
      });
    });
    await cdp.send('ServiceWorker.enable');
    await cdp.send('ServiceWorker.deliverPushMessage', {
      origin: base,
      registrationId: await registrationId,
      data: JSON.stringify({ title: 'Pip is near its peak', body: 'Mix within the hour.', tag: 'a1', url: '/alerts' }),
    });
    await expect
      .poll(
        () =>
          page.evaluate(async () => {
            const reg = await navigator.serviceWorker.ready;
            return (await reg.getNotifications()).map((n) => ({
              title: n.title,
              body: n.body,
              url: (n.data as { url?: string }).url,
            }));
          }),
        { timeout: 10_000 },
      )
      .toEqual([{ title: 'Pip is near its peak', body: 'Mix within the hour.', url: '/alerts' }]);
  });
});
