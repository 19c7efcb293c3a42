// Web push: a browser turns notifications on by subscribing with the server's VAPID public key
// (RFC 8292) and sending the subscription here. Alerts then reach that browser through its
// vendor's push service, encrypted for it alone (RFC 8291).

export const PUSH_LABEL_MAX_LENGTH = 120;
export const PUSH_ENDPOINT_MAX_LENGTH = 2000;

/** GET /api/push/key — the applicationServerKey for PushManager.subscribe(). */
export interface PushPublicKey {
  /** Uncompressed P-256 public key, base64url. */
  publicKey: string;
}

/** POST /api/push/subscriptions — PushSubscription.toJSON(), plus a name for the device list. */
export interface CreatePushSubscriptionRequest {
  endpoint: string;
  keys: { p256dh: string; auth: string };
  /** e.g. "Chrome on Android"; the API makes one from the User-Agent when left out. */
  label?: string;
}

/** A device that receives push alerts. The endpoint is a secret capability and is never answered. */
export interface PushDevice {
  id: string;
  label: string;
  createdAt: string;
  lastSentAt: string | null;
  /** The last failure the push service reported, if the latest attempt failed. */
  lastError: string | null;
}

export interface PushDeviceListResponse {
  items: PushDevice[];
}

/** POST /api/push/subscriptions/:id/test — what the push service said. */
export interface PushTestResponse {
  delivered: boolean;
  /** Present when not delivered, in plain words. */
  problem?: string;
}

/** The JSON the service worker receives in a push event. */
export interface PushPayload {
  title: string;
  body: string;
  /** A path in the web app to open when the notification is tapped. */
  url: string;
  /** Same tag → the newer notification replaces the older one (a resend never stacks). */
  tag: string;
}
