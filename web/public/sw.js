// Peakwise service worker: shows push alerts and opens the right page when one is tapped.
// Plain JavaScript served as-is from the site root, so its scope covers the whole app.

self.addEventListener('push', (event) => {
  let data = {};
  try {
    data = event.data ? event.data.json() : {};
  } catch {
    data = { title: 'Peakwise', body: event.data ? event.data.text() : '' };
  }
  const title = data.title || 'Peakwise';
  event.waitUntil(
    self.registration.showNotification(title, {
      body: data.body || '',
      // The same tag replaces an earlier notification of the same alert instead of stacking a copy.
      tag: data.tag || undefined,
      icon: '/favicon.svg',
      badge: '/favicon.svg',
      data: { url: typeof data.url === 'string' && data.url.startsWith('/') ? data.url : '/alerts' },
    }),
  );
});

self.addEventListener('notificationclick', (event) => {
  event.notification.close();
  const url = new URL(event.notification.data?.url || '/alerts', self.location.origin).href;
  event.waitUntil(
    (async () => {
      const open = await self.clients.matchAll({ type: 'window', includeUncontrolled: true });
      for (const client of open) {
        if (new URL(client.url).origin === self.location.origin && 'focus' in client) {
          await client.focus();
          return client.navigate(url);
        }
      }
      return self.clients.openWindow(url);
    })(),
  );
});
