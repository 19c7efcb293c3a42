import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { openOutboxStore } from './outbox-db';
import type { OutboxEntry, SendOutcome } from './outbox-types';
import { KEY_SAFE_MS, replayRound, retryDelay, TOO_OLD_MESSAGE, verdictOf } from './replay';

let dbCount = 0;
const freshStore = () => openOutboxStore(`outbox-test-${++dbCount}`);

function entry(key: string, overrides: Partial<OutboxEntry> = {}): OutboxEntry {
  return {
    key,
    accountId: 'baker-a',
    kind: 'feeding',
    path: '/cultures/c1/feedings',
    body: { starterG: 20, flourG: 100, waterG: 100, note: key },
    openPath: '/cultures/c1',
    savedAt: '2026-12-02T08:00:00.000Z',
    attempts: 0,
    state: 'waiting',
    ...overrides,
  };
}

const refused = (status: number, message = 'no'): SendOutcome => ({ ok: false, status, message });

describe('verdictOf', () => {
  it.each([
    [0, 'retry'],
    [401, 'retry'],
    [408, 'retry'],
    [409, 'retry'],
    [429, 'retry'],
    [500, 'retry'],
    [503, 'retry'],
    [400, 'failed'],
    [403, 'failed'],
    [404, 'failed'],
    [422, 'failed'],
  ] as const)('status %i → %s', (status, verdict) => {
    expect(verdictOf(refused(status))).toBe(verdict);
  });

  it('an answer in the 2xx is sent', () => {
    expect(verdictOf({ ok: true })).toBe('sent');
  });
});

describe('retryDelay', () => {
  it('doubles from 2 s and stops growing at 5 min', () => {
    const mid = () => 0.5; // no spread
    expect([1, 2, 3, 4].map((n) => retryDelay(n, mid))).toEqual([2_000, 4_000, 8_000, 16_000]);
    expect(retryDelay(20, mid)).toBe(300_000);
    expect(retryDelay(200, mid)).toBe(300_000);
  });

  it('spreads each wait by ±20 %, so many phones coming back online do not all knock at once', () => {
    expect(retryDelay(3, () => 0)).toBe(6_400);
    expect(retryDelay(3, () => 1)).toBe(9_600);
  });
});

describe('replayRound', () => {
  it('sends in the order of saving, each with its own key, and empties the outbox', async () => {
    const store = await freshStore();
    for (const k of ['k1', 'k2', 'k3']) await store.add(entry(k));
    const seen: string[] = [];
    const result = await replayRound(store, 'baker-a', (e) => {
      seen.push(e.key);
      return Promise.resolve({ ok: true });
    });
    expect(seen).toEqual(['k1', 'k2', 'k3']);
    expect(result).toEqual({ sent: 3, failed: 0 });
    expect(await store.list()).toEqual([]);
  });

  it('stops at a write worth retrying, so nothing overtakes it, and keeps its key for next time', async () => {
    const store = await freshStore();
    for (const k of ['k1', 'k2', 'k3']) await store.add(entry(k));
    const seen: string[] = [];
    const result = await replayRound(
      store,
      'baker-a',
      (e) => {
        seen.push(e.key);
        return Promise.resolve(e.key === 'k2' ? refused(0, 'Peakwise could not be reached.') : { ok: true });
      },
      () => 0.5,
    );
    expect(seen).toEqual(['k1', 'k2']);
    expect(result).toEqual({ sent: 1, failed: 0, retryInMs: 2_000 });
    const left = await store.list();
    expect(left.map((e) => [e.key, e.attempts, e.state])).toEqual([
      ['k2', 1, 'waiting'],
      ['k3', 0, 'waiting'],
    ]);

    // The next round starts with k2 again, under the same key, and the wait grows.
    const again = await replayRound(
      store,
      'baker-a',
      () => Promise.resolve(refused(409)),
      () => 0.5,
    );
    expect(again.retryInMs).toBe(4_000);
    expect((await store.list())[0]).toMatchObject({ key: 'k2', attempts: 2 });
  });

  it('sets a refused write aside with the server’s words and goes on with the rest', async () => {
    const store = await freshStore();
    for (const k of ['k1', 'k2', 'k3']) await store.add(entry(k));
    const result = await replayRound(store, 'baker-a', (e) =>
      Promise.resolve(e.key === 'k1' ? refused(404, 'No culture with this id.') : { ok: true }),
    );
    expect(result).toEqual({ sent: 2, failed: 1 });
    const left = await store.list();
    expect(left).toHaveLength(1);
    expect(left[0]).toMatchObject({
      key: 'k1',
      state: 'failed',
      attempts: 1,
      error: { status: 404, message: 'No culture with this id.' },
    });

    // Set aside means set aside: the next round does not send it again.
    let sends = 0;
    await replayRound(store, 'baker-a', () => {
      sends += 1;
      return Promise.resolve({ ok: true });
    });
    expect(sends).toBe(0);
  });

  it('sends only the signed-in baker’s writes', async () => {
    const store = await freshStore();
    await store.add(entry('mine'));
    await store.add(entry('theirs', { accountId: 'baker-b' }));
    const seen: string[] = [];
    await replayRound(store, 'baker-a', (e) => {
      seen.push(e.key);
      return Promise.resolve({ ok: true });
    });
    expect(seen).toEqual(['mine']);
    expect((await store.list()).map((e) => e.key)).toEqual(['theirs']);
  });
});

describe('replayRound near the end of a key’s life', () => {
  const savedAt = Date.parse('2026-12-02T08:00:00.000Z');
  const later = savedAt + KEY_SAFE_MS + 60_000;

  it('stops sending a write that was tried without an answer once the server may forget its key', async () => {
    const store = await freshStore();
    await store.add(entry('tried', { attempts: 3 }));
    const send = () => Promise.resolve<SendOutcome>({ ok: true });
    let sends = 0;
    const result = await replayRound(store, 'baker-a', () => (sends++, send()), Math.random, later);
    expect(sends).toBe(0);
    expect(result).toEqual({ sent: 0, failed: 1 });
    expect((await store.list())[0]).toMatchObject({ state: 'failed', error: { status: 0, message: TOO_OLD_MESSAGE } });
  });

  it('still sends a write never tried: its key was never used', async () => {
    const store = await freshStore();
    await store.add(entry('untried', { attempts: 0 }));
    const result = await replayRound(store, 'baker-a', () => Promise.resolve({ ok: true }), Math.random, later);
    expect(result).toEqual({ sent: 1, failed: 0 });
  });
});

describe('OutboxStore', () => {
  it('keeps one entry per key: saving the same write twice queues it once', async () => {
    const store = await freshStore();
    expect(await store.add(entry('k1'))).toBe(true);
    expect(await store.add(entry('k1'))).toBe(false);
    expect(await store.list()).toHaveLength(1);
  });

  it('survives reopening (a reload)', async () => {
    const name = `outbox-reopen-${Date.now()}`;
    await (await openOutboxStore(name)).add(entry('k1'));
    const reopened = await openOutboxStore(name);
    expect((await reopened.list()).map((e) => e.key)).toEqual(['k1']);
  });
});
