import { randomUUID } from 'node:crypto';
import type { Culture, Feeding } from '@peakwise/shared';
import { sql } from 'kysely';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { expectError, expectFieldErrors, signUp, type InjectResponse, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

let theo: SignedUp;
let culture: Culture;
let feeding: Feeding;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
  culture = (await post('/api/cultures', { name: 'Bramble' })).json<Culture>();
  feeding = (await post(feedingsUrl(), FEEDING)).json<Feeding>();
});

function post(url: string, payload: unknown, key?: string, cookie = theo.cookie): Promise<InjectResponse> {
  return t.app.inject({
    method: 'POST',
    url,
    payload: payload as never,
    headers: { cookie, ...(key === undefined ? {} : { 'idempotency-key': key }) },
  });
}

const feedingsUrl = () => `/api/cultures/${culture.id}/feedings`;
const FEEDING = { fedAt: '2025-03-01T07:00:00Z', ratio: '1:2:2', totalG: 100, initialHeightMm: 40 };
const feedingCount = async () => (await t.db.selectFrom('feeding').select('id').execute()).length;

describe('Idempotency-Key on POST', () => {
  it('answers a retry with the first response, byte for byte, and stores one feeding', async () => {
    const key = randomUUID();
    const first = await post(feedingsUrl(), FEEDING, key);
    expect(first.statusCode, first.body).toBe(201);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    const retry = await post(feedingsUrl(), FEEDING, key);
    expect(retry.statusCode).toBe(201);
    expect(retry.body).toBe(first.body);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(await feedingCount()).toBe(2); // the one from beforeEach and this one
  });

  it('treats the same body with its keys in another order as the same request', async () => {
    const key = randomUUID();
    const first = await post(feedingsUrl(), { a: 1, ...FEEDING }, key);
    expectFieldErrors(first, ['a']); // a refused request releases its key …
    const ok = await post(
      feedingsUrl(),
      { totalG: 100, ratio: '1:2:2', initialHeightMm: 40, fedAt: FEEDING.fedAt },
      key,
    );
    expect(ok.statusCode).toBe(201); // … so the corrected one runs
    const retry = await post(feedingsUrl(), FEEDING, key);
    expect(retry.body).toBe(ok.body);
    expect(await feedingCount()).toBe(2);
  });

  it('refuses the same key with another body or on another route with 422 naming the header', async () => {
    const key = randomUUID();
    expect((await post(feedingsUrl(), FEEDING, key)).statusCode).toBe(201);
    const other = await post(feedingsUrl(), { ...FEEDING, totalG: 120 }, key);
    expect(expectError(other, 422).details).toEqual([
      { field: 'Idempotency-Key', message: 'Already used for a different request.' },
    ]);
    expectError(await post('/api/cultures', { name: 'Pip' }, key), 422);
    expect(await feedingCount()).toBe(2);
    expect(await t.db.selectFrom('culture').select('id').execute()).toHaveLength(1);
  });

  it('keeps keys per account: the same key from another baker is a new request', async () => {
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    const key = randomUUID();
    const mine = await post('/api/cultures', { name: 'Pip' }, key);
    const theirs = await post('/api/cultures', { name: 'Pip' }, key, amara.cookie);
    expect([mine.statusCode, theirs.statusCode]).toEqual([201, 201]);
    expect(theirs.json<Culture>().id).not.toBe(mine.json<Culture>().id);
    // Nor can a baker replay another's response by guessing their key: a 404 is not stored.
    expectError(await post(feedingsUrl(), FEEDING, randomUUID(), amara.cookie), 404);
  });

  it('writes again without a key', async () => {
    await post(feedingsUrl(), FEEDING);
    await post(feedingsUrl(), FEEDING);
    expect(await feedingCount()).toBe(3);
  });

  it('refuses a malformed key with 400 naming the header, and writes nothing', async () => {
    for (const key of ['', 'with space', 'ü-key', 'k'.repeat(256)]) {
      expectFieldErrors(await post(feedingsUrl(), FEEDING, key), ['Idempotency-Key']);
    }
    expect(await feedingCount()).toBe(1);
  });

  it('forgets keys after 24 hours', async () => {
    const key = randomUUID();
    await post(feedingsUrl(), FEEDING, key);
    await t.db
      .updateTable('idempotencyKey')
      .set({ createdAt: sql<Date>`now() - interval '24 hours 1 minute'` })
      .execute();
    const later = await post(feedingsUrl(), FEEDING, key);
    expect(later.statusCode).toBe(201);
    expect(later.headers['idempotent-replayed']).toBeUndefined();
    expect(await feedingCount()).toBe(3);
    expect(await t.db.selectFrom('idempotencyKey').select('key').execute()).toHaveLength(1);
  });

  it('answers 409 while the first request with the key is still running, and runs an abandoned one again', async () => {
    const key = randomUUID();
    const fingerprint = await post(feedingsUrl(), FEEDING, key); // learn the stored method/path/hash
    await t.db.updateTable('idempotencyKey').set({ statusCode: null, responseBody: null, completedAt: null }).execute();
    expectError(await post(feedingsUrl(), FEEDING, key), 409);
    // Two minutes on, nothing finished it: the claim was abandoned (the server died) and a retry runs.
    await t.db
      .updateTable('idempotencyKey')
      .set({ createdAt: sql<Date>`now() - interval '3 minutes'` })
      .execute();
    const retry = await post(feedingsUrl(), FEEDING, key);
    expect(retry.statusCode).toBe(201);
    expect(retry.json<Feeding>().id).not.toBe(fingerprint.json<Feeding>().id);
  });

  it('runs concurrent duplicates once', async () => {
    const key = randomUUID();
    const results = await Promise.all(Array.from({ length: 5 }, () => post(feedingsUrl(), FEEDING, key)));
    const statuses = results.map((r) => r.statusCode);
    expect(
      statuses.every((s) => s === 201 || s === 409),
      statuses.join(),
    ).toBe(true);
    const ids = new Set(results.filter((r) => r.statusCode === 201).map((r) => r.json<Feeding>().id));
    expect(ids.size).toBe(1);
    expect(await feedingCount()).toBe(2);
  });

  it('covers every POST of the logbook', async () => {
    const writes: Array<[string, unknown, 'culture' | 'feeding' | 'riseCheck' | 'temperatureReading']> = [
      ['/api/cultures', { name: 'Pip' }, 'culture'],
      [feedingsUrl(), FEEDING, 'feeding'],
      [`/api/feedings/${feeding.id}/rise-checks`, { takenAt: '2025-03-01T09:00:00Z', risePct: 50 }, 'riseCheck'],
      [
        `/api/feedings/${feeding.id}/temperatures`,
        { readings: [{ takenAt: '2025-03-01T08:00:00Z', temperatureC: 24 }] },
        'temperatureReading',
      ],
    ];
    for (const [url, payload, table] of writes) {
      const key = randomUUID();
      const count = async () => (await t.db.selectFrom(table).select('id').execute()).length;
      const before = await count();
      const first = await post(url, payload, key);
      const retry = await post(url, payload, key);
      expect([first.statusCode, retry.statusCode], url).toEqual([201, 201]);
      expect(retry.body, url).toBe(first.body);
      expect(await count(), url).toBe(before + 1);
    }
  });
});
