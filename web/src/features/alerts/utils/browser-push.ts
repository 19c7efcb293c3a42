import type { CreatePushSubscriptionRequest } from '@peakwise/shared';

/** What this browser can do about notifications, in the words the card shows. */
export type PushSupport = 'supported' | 'unsupported' | 'insecure';

export function pushSupport(): PushSupport {
  if (typeof window === 'undefined') return 'unsupported';
  // Browsers offer push only to secure pages (https, or http on localhost).
  if (!window.isSecureContext) return 'insecure';
  return 'serviceWorker' in navigator && 'PushManager' in window && 'Notification' in window
    ? 'supported'
    : 'unsupported';
}

/** The VAPID key arrives as base64url; PushManager.subscribe wants its bytes. */
export function base64UrlToBytes(value: string): Uint8Array<ArrayBuffer> {
  const padded = value.replace(/-/g, '+').replace(/_/g, '/') + '='.repeat((4 - (value.length % 4)) % 4);
  const binary = atob(padded);
  const bytes = new Uint8Array(new ArrayBuffer(binary.length));
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  return bytes;
}

/** The service worker at the site root (web/public/sw.js), registered once. */
async function registration(): Promise<ServiceWorkerRegistration> {
  await navigator.serviceWorker.register('/sw.js', { scope: '/' });
  return navigator.serviceWorker.ready;
}

/**
 * Asks for permission, subscribes this browser with the server's key and answers what to send to
 * the API. Throws an Error with a plain-words message when the baker says no or the browser fails.
 */
export async function subscribeThisBrowser(publicKey: string): Promise<CreatePushSubscriptionRequest> {
  const permission = await Notification.requestPermission();
  if (permission !== 'granted')
    throw new Error(
      'Notifications are blocked for this site. Allow them in the browser’s site settings, then try again.',
    );
  const reg = await registration();
  const existing = await reg.pushManager.getSubscription();
  const subscription =
    existing ??
    (await reg.pushManager.subscribe({ userVisibleOnly: true, applicationServerKey: base64UrlToBytes(publicKey) }));
  const json = subscription.toJSON();
  if (!json.endpoint || !json.keys?.p256dh || !json.keys.auth)
    throw new Error('This browser gave an incomplete subscription; try again, or use e-mail.');
  return { endpoint: json.endpoint, keys: { p256dh: json.keys.p256dh, auth: json.keys.auth } };
}

/** This browser's current push endpoint, if it has one (to mark "this device" in the list). */
export async function currentEndpoint(): Promise<string | null> {
  if (pushSupport() !== 'supported') return null;
  const reg = await navigator.serviceWorker.getRegistration('/');
  const sub = await reg?.pushManager.getSubscription();
  return sub?.endpoint ?? null;
}

/** Ends this browser's subscription (the server row is removed separately). */
export async function unsubscribeThisBrowser(): Promise<void> {
  const reg = await navigator.serviceWorker.getRegistration('/');
  await (await reg?.pushManager.getSubscription())?.unsubscribe();
}
