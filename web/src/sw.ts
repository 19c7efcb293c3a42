/// <reference lib="webworker" />
// Peakwise's one service worker, at /sw.js with scope / (the push code in features/alerts
// registers the same path). It does three things:
//  - keeps the app shell (HTML, scripts, styles, fonts, icons) so the app opens without a signal;
//  - shows push alerts and opens their page when one is tapped;
//  - never touches /api: the logbook's reads and writes always go to the network. Writes made
//    offline wait in the page's own outbox (lib/outbox), not here.
// vite-plugin-pwa builds this file (injectManifest) and fills in self.__WB_MANIFEST.
import { cleanupOutdatedCaches, createHandlerBoundToURL, precacheAndRoute } from 'workbox-precaching';
import { NavigationRoute, registerRoute } from 'workbox-routing';

declare const self: ServiceWorkerGlobalScope;

precacheAndRoute(self.__WB_MANIFEST);
cleanupOutdatedCaches();

// Any page of the app is the same index.html; the router inside picks the page. /api (and the
// API's own docs under it) are left alone: no respondWith, so the browser fetches them as usual.
registerRoute(new NavigationRoute(createHandlerBoundToURL('index.html'), { denylist: [/^\/api(\/|$)/] }));

// A new version takes over at once: the shell is a cache of the current build, and an old
// shell asking a new API for shapes it no longer knows is worse than a reload.
self.addEventListener('install', () => {
  void self.skipWaiting();
});
self.addEventListener('activate', (event) => {
  event.waitUntil(self.clients.claim());
});

interface PushPayload {
  title?: string;
  body?: string;
  tag?: string;
  url?: unknown;
}

self.addEventListener('push', (event) => {
  let data: PushPayload;
  try {
    data = event.data ? (event.data.json() as PushPayload) : {};
  } catch {
    data = { title: 'Peakwise', body: event.data ? event.data.text() : '' };
  }
  const title = data.title || 'Peakwise';
  event.waitUntil(
    self.registration.showNotification(title, {
      body: data.body || '',
      // The same tag replaces an earlier notification of the same alert instead of stacking a copy.
      tag: data.tag || undefined,
      icon: '/icons/icon-192.png',
      badge: '/favicon.svg',
      data: { url: typeof data.url === 'string' && data.url.startsWith('/') ? data.url : '/alerts' },
    }),
  );
});

self.addEventListener('notificationclick', (event) => {
  event.notification.close();
  const target = (event.notification.data as { url?: string } | null)?.url || '/alerts';
  const url = new URL(target, self.location.origin).href;
  event.waitUntil(
    (async () => {
      const open = await self.clients.matchAll({ type: 'window', includeUncontrolled: true });
      for (const client of open) {
        if (new URL(client.url).origin === self.location.origin && 'focus' in client) {
          await client.focus();
          await client.navigate(url);
          return;
        }
      }
      await self.clients.openWindow(url);
    })(),
  );
});
