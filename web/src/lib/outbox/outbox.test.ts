import 'fake-indexeddb/auto';
import { IDEMPOTENCY_KEY_HEADER } from '@peakwise/shared';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../api-client';
import { discardEntry, sendOrHold, startOutbox } from './outbox';
import { openOutboxStore } from './outbox-db';

// The page's side of the outbox: when a save is sent, when it is kept, and what is kept.
const net = { onLine: true };
beforeEach(() => {
  net.onLine = true;
  vi.stubGlobal('navigator', net);
  const target = new EventTarget();
  vi.stubGlobal('window', target);
  vi.stubGlobal('document', Object.assign(new EventTarget(), { visibilityState: 'visible' }));
});
afterEach(async () => {
  vi.unstubAllGlobals();
  const store = await openOutboxStore();
  for (const e of await store.list()) await discardEntry(e.key);
});

const body = { starterG: 20, flourG: 100, waterG: 100 };
const write = (key: string) => ({
  accountId: 'baker-a',
  kind: 'feeding' as const,
  path: '/cultures/c1/feedings',
  body,
  headers: { [IDEMPOTENCY_KEY_HEADER]: key },
  openPath: '/cultures/c1',
  stamped: (at: string) => ({ ...body, fedAt: at }),
});
const kept = async () => (await openOutboxStore()).list();
const noAnswer = new ApiError({ statusCode: 0, error: 'Network Error', message: 'Peakwise could not be reached.' });

describe('sendOrHold', () => {
  it('online with nothing waiting: sends with the form’s key and returns the answer', async () => {
    const send = vi.fn((h: Record<string, string>) => Promise.resolve({ id: 'f1', key: h[IDEMPOTENCY_KEY_HEADER] }));
    await expect(sendOrHold(write('"k1"'), send)).resolves.toEqual({ id: 'f1', key: '"k1"' });
    expect(await kept()).toEqual([]);
  });

  it('offline: keeps the write, with the moment of saving filled in, and does not try to send', async () => {
    net.onLine = false;
    const send = vi.fn(() => Promise.resolve({ id: 'never' }));
    const before = Date.now();
    await expect(sendOrHold(write('k-off'), send)).resolves.toBeUndefined();
    expect(send).not.toHaveBeenCalled();
    const [entry] = await kept();
    expect(entry).toMatchObject({ key: 'k-off', accountId: 'baker-a', state: 'waiting', attempts: 0 });
    const fedAt = Date.parse((entry?.body as { fedAt: string }).fedAt);
    expect(fedAt).toBeGreaterThanOrEqual(before);
    expect(fedAt).toBeLessThanOrEqual(Date.now());
  });

  it('no answer: keeps the body exactly as sent (the server may have it under this key already)', async () => {
    const send = vi.fn(() => Promise.reject(noAnswer));
    await expect(sendOrHold(write('k-lost'), send)).resolves.toBeUndefined();
    const [entry] = await kept();
    // …and counts as tried: the server may already hold it under this key.
    expect(entry).toMatchObject({ key: 'k-lost', body, attempts: 1 });
  });

  it('a refusal from the server is the form’s to show: thrown, nothing kept', async () => {
    const refusal = new ApiError({ statusCode: 400, error: 'Bad Request', message: 'Check the grams.' });
    await expect(sendOrHold(write('k-bad'), () => Promise.reject(refusal))).rejects.toBe(refusal);
    expect(await kept()).toEqual([]);
  });

  it('while earlier writes wait, a new one queues behind them instead of overtaking', async () => {
    net.onLine = false;
    await sendOrHold(write('first'), () => Promise.resolve({}));
    net.onLine = true;
    const send = vi.fn(() => Promise.resolve({}));
    // No runner is started here, so nothing is sent in the background.
    await expect(sendOrHold(write('second'), send)).resolves.toBeUndefined();
    expect(send).not.toHaveBeenCalled();
    expect((await kept()).map((e) => e.key)).toEqual(['first', 'second']);
  });
});

describe('startOutbox', () => {
  it('sends what waits when started, with each write’s own key, then tells the screens', async () => {
    net.onLine = false;
    await sendOrHold(write('a'), () => Promise.resolve({}));
    await sendOrHold(write('b'), () => Promise.resolve({}));
    net.onLine = true;
    const keys: string[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn((url: string, init: RequestInit) => {
        keys.push(`${url} ${(init.headers as Record<string, string>)[IDEMPOTENCY_KEY_HEADER]}`);
        return Promise.resolve(new Response('{}', { status: 201 }));
      }),
    );
    const sent = new Promise<void>((resolve) => {
      const stop = startOutbox('baker-a', () => {
        stop();
        resolve();
      });
    });
    await sent;
    expect(keys).toEqual(['/api/cultures/c1/feedings a', '/api/cultures/c1/feedings b']);
    expect(await kept()).toEqual([]);
  });

  it('waits offline and sends when the browser says it is online again', async () => {
    net.onLine = false;
    await sendOrHold(write('later'), () => Promise.resolve({}));
    const fetch = vi.fn(() => Promise.resolve(new Response('{}', { status: 201 })));
    vi.stubGlobal('fetch', fetch);
    let resolveSent: () => void = () => {};
    const sent = new Promise<void>((r) => (resolveSent = r));
    const stop = startOutbox('baker-a', resolveSent);
    await new Promise((r) => setTimeout(r, 50));
    expect(fetch).not.toHaveBeenCalled();
    net.onLine = true;
    window.dispatchEvent(new Event('online'));
    await sent;
    stop();
    expect(fetch).toHaveBeenCalledTimes(1);
    expect(await kept()).toEqual([]);
  });

  it('keeps a refused write, with the server’s words, until the baker discards it', async () => {
    net.onLine = false;
    await sendOrHold(write('refused'), () => Promise.resolve({}));
    net.onLine = true;
    const answer = {
      statusCode: 422,
      error: 'Unprocessable Entity',
      message: 'This Idempotency-Key was already used.',
    };
    vi.stubGlobal('fetch', () => Promise.resolve(new Response(JSON.stringify(answer), { status: 422 })));
    const stop = startOutbox('baker-a', () => {});
    await vi.waitFor(async () => expect((await kept())[0]?.state).toBe('failed'));
    stop();
    expect((await kept())[0]?.error).toEqual({ status: 422, message: 'This Idempotency-Key was already used.' });
    await discardEntry('refused');
    expect(await kept()).toEqual([]);
  });
});
