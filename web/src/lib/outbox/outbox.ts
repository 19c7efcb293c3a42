import { IDEMPOTENCY_KEY_HEADER, type ErrorResponse } from '@peakwise/shared';
import { isApiError } from '../api-client';
import { openOutboxStore, type OutboxStore } from './outbox-db';
import type { OutboxEntry, OutboxKind, SendOutcome } from './outbox-types';
import { replayRound } from './replay';

// The outbox in the page: writes saved without a signal wait in IndexedDB and are sent in order
// when the connection returns (the online event, the app starting, and retries with backoff).
// One tab sends at a time (a Web Lock); the others just show the list.

let storePromise: Promise<OutboxStore> | null = null;
const store = () => (storePromise ??= openOutboxStore());

// ── What the screens show: every entry on this device, refreshed on each change ──────────────
let snapshot: readonly OutboxEntry[] = [];
const listeners = new Set<() => void>();
const channel = typeof BroadcastChannel === 'undefined' ? null : new BroadcastChannel('peakwise-outbox');

async function refresh(): Promise<void> {
  try {
    snapshot = await (await store()).list();
  } catch {
    snapshot = [];
  }
  for (const listener of listeners) listener();
}

/** Something changed here: refresh this tab and tell the others. */
function changed(): void {
  void refresh();
  channel?.postMessage('changed');
}
if (channel) channel.onmessage = () => void refresh();

export function subscribeOutbox(listener: () => void): () => void {
  if (listeners.size === 0) void refresh();
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export const outboxSnapshot = (): readonly OutboxEntry[] => snapshot;

const heldListeners = new Set<(entry: OutboxEntry) => void>();
/** Called with each write the moment it is kept on this device instead of sent. */
export function onHeld(listener: (entry: OutboxEntry) => void): () => void {
  heldListeners.add(listener);
  return () => heldListeners.delete(listener);
}

// ── Sending ──────────────────────────────────────────────────────────────────────────────────
const SEND_TIMEOUT_MS = 30_000;

/** One attempt at one write, with the key it got when the baker pressed save. */
export async function sendEntry(entry: OutboxEntry): Promise<SendOutcome> {
  try {
    const response = await fetch(`/api${entry.path}`, {
      method: 'POST',
      credentials: 'same-origin',
      headers: { Accept: 'application/json', 'Content-Type': 'application/json', [IDEMPOTENCY_KEY_HEADER]: entry.key },
      body: JSON.stringify(entry.body),
      // A request that hangs would hold up everything behind it; the same key makes a second try safe.
      signal: AbortSignal.timeout(SEND_TIMEOUT_MS),
    });
    if (response.ok) return { ok: true };
    return { ok: false, status: response.status, message: await refusalWords(response) };
  } catch {
    return { ok: false, status: 0, message: 'Peakwise could not be reached.' };
  }
}

async function refusalWords(response: Response): Promise<string> {
  try {
    const body = (await response.json()) as Partial<ErrorResponse>;
    const details = (body.details ?? []).map((d) => d.message);
    const words = [body.message, ...details].filter((w): w is string => typeof w === 'string' && w !== '');
    if (words.length > 0) return [...new Set(words)].join(' ');
  } catch {
    // not JSON: fall through to the status line
  }
  return `The server answered ${response.status}.`;
}

// ── The runner: one per page, for the signed-in account ──────────────────────────────────────
let account: string | null = null;
let afterSent: (() => void) | null = null;
let timer: ReturnType<typeof setTimeout> | undefined;
let running: Promise<void> | null = null;
let again = false;
let retryAt: number | null = null;
const LOCK_BUSY_RETRY_MS = 5_000;

function schedule(ms: number): void {
  clearTimeout(timer);
  retryAt = Date.now() + ms;
  timer = setTimeout(sendNow, ms);
}

/** When the next automatic attempt is due (null: none waiting for a retry). */
export const nextRetryAt = (): number | null => retryAt;

async function round(accountId: string): Promise<void> {
  const result = await replayRound(await store(), accountId, sendEntry);
  if (result.retryInMs !== undefined) schedule(result.retryInMs);
  changed();
  if (result.sent > 0) afterSent?.();
}

async function run(): Promise<void> {
  const accountId = account;
  // Offline: the online event brings us back.
  if (!accountId || !navigator.onLine) return;
  if (!('locks' in navigator)) return round(accountId);
  await navigator.locks.request('peakwise-outbox', { ifAvailable: true }, async (lock) => {
    // Another tab is sending; look again shortly in case it closes.
    if (!lock) schedule(LOCK_BUSY_RETRY_MS);
    else await round(accountId);
  });
}

/** Sends what is waiting now (the baker's "Send now", a new save, the connection returning). */
export function sendNow(): void {
  clearTimeout(timer);
  timer = undefined;
  retryAt = null;
  if (running) {
    again = true;
    return;
  }
  running = run()
    .catch(() => schedule(LOCK_BUSY_RETRY_MS))
    .finally(() => {
      running = null;
      if (again) {
        again = false;
        sendNow();
      }
    });
}

const onVisible = () => {
  if (document.visibilityState === 'visible') sendNow();
};

/**
 * Starts sending the account's waiting writes: now (the app starting), whenever the browser says
 * it is online again or the tab comes back into view, and on each retry's timer. `onSent` runs
 * after a round that sent something, so the screens can fetch again. Returns the stop function.
 */
export function startOutbox(accountId: string, onSent: () => void): () => void {
  account = accountId;
  afterSent = onSent;
  window.addEventListener('online', sendNow);
  document.addEventListener('visibilitychange', onVisible);
  sendNow();
  return () => {
    if (account === accountId) account = null;
    afterSent = null;
    window.removeEventListener('online', sendNow);
    document.removeEventListener('visibilitychange', onVisible);
    clearTimeout(timer);
    retryAt = null;
  };
}

/** Forgets a write the baker chose to drop (one the server refused). */
export async function discardEntry(key: string): Promise<void> {
  await (await store()).remove(key);
  changed();
}

// ── Saving: send now, or keep it here ────────────────────────────────────────────────────────
export interface HoldableWrite<B> {
  /** The signed-in account; without one the write is just sent. */
  accountId: string | undefined;
  kind: OutboxKind;
  path: string;
  body: B;
  /** The headers the form made, carrying its Idempotency-Key. */
  headers?: Record<string, string>;
  openPath: string;
  detail?: string;
  /**
   * The body to keep when the write is not even tried now, with the moment of saving filled in
   * (the server would otherwise stamp it with the moment it finally arrives). A write that was
   * tried keeps its body unchanged: the server may have stored it under this key already.
   */
  stamped?: (savedAt: string) => B;
}

async function hasWaiting(accountId: string): Promise<boolean> {
  try {
    return (await (await store()).list(accountId)).some((e) => e.state === 'waiting');
  } catch {
    return false;
  }
}

async function hold<B>(write: HoldableWrite<B>, key: string, body: B, savedAt: string, tried: boolean): Promise<void> {
  const entry: OutboxEntry = {
    key,
    accountId: write.accountId ?? '',
    kind: write.kind,
    path: write.path,
    body,
    openPath: write.openPath,
    detail: write.detail,
    savedAt,
    // A write sent once without an answer counts that try: the server may hold it already.
    attempts: tried ? 1 : 0,
    state: 'waiting',
  };
  await (await store()).add(entry);
  changed();
  for (const listener of heldListeners) listener(entry);
  if (navigator.onLine) sendNow();
}

/**
 * A logbook write as a form makes it: sent at once when online with nothing waiting before it;
 * otherwise (offline, an earlier write still waiting, or no answer) kept in the outbox with its
 * Idempotency-Key and sent later in order. Resolves to the server's answer, or undefined when the
 * write was kept on this device. A refusal from the server is thrown as before.
 */
export async function sendOrHold<B, T>(
  write: HoldableWrite<B>,
  send: (headers: Record<string, string>) => Promise<T>,
): Promise<T | undefined> {
  const key = write.headers?.[IDEMPOTENCY_KEY_HEADER] ?? crypto.randomUUID();
  const headers = { ...write.headers, [IDEMPOTENCY_KEY_HEADER]: key };
  if (!write.accountId) return send(headers);
  const savedAt = new Date().toISOString();
  if (!navigator.onLine || (await hasWaiting(write.accountId))) {
    await hold(write, key, write.stamped ? write.stamped(savedAt) : write.body, savedAt, false);
    return undefined;
  }
  try {
    return await send(headers);
  } catch (error) {
    if (!(isApiError(error) && error.status === 0)) throw error;
    try {
      await hold(write, key, write.body, savedAt, true);
    } catch {
      throw error; // no IndexedDB here: say it did not save, as before
    }
    return undefined;
  }
}
