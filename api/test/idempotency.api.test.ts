import { randomUUID } from 'node:crypto';
import type { Culture, Feeding } from '@peakwise/shared';
import { sql } from 'kysely';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { AlertScheduler } from '../src/alert/alert.scheduler.js';
import { IdempotencyRepository } from '../src/common/idempotency/idempotency.repository.js';
import { IdempotencySweeper } from '../src/common/idempotency/idempotency.sweeper.js';
import { expectError, expectFieldErrors, signUp, type InjectResponse, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// The Idempotency-Key protocol on one key-required write, logging a feeding. Statuses after
// draft-ietf-httpapi-idempotency-key-header, sections 2.6 and 2.7 (verified in the working
// group's editor's copy): replay of a completed request, 422 for a key reused with another
// payload, 409 while the first request is still being processed, 400 when a required key is
// missing. Which routes require a key, and that each honours one: idempotency-routes.api.test.ts.

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());
afterEach(() => vi.restoreAllMocks());

let theo: SignedUp;
let culture: Culture;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
  culture = (await post('/api/cultures', { name: 'Bramble' })).json<Culture>();
});

function post(url: string, payload: unknown, key?: string, cookie = theo.cookie): Promise<InjectResponse> {
  return t.app.inject({
    method: 'POST',
    url,
    payload: payload as never,
    headers: { cookie, ...(key === undefined ? {} : { 'idempotency-key': key }) },
  });
}

const feedingsUrl = (of: Culture = culture) => `/api/cultures/${of.id}/feedings`;
const FEEDING = { fedAt: '2025-03-01T07:00:00Z', ratio: '1:2:2', totalG: 100, initialHeightMm: 40 };
const feedingCount = async () => (await t.db.selectFrom('feeding').select('id').execute()).length;
const keyRows = () => t.db.selectFrom('idempotencyKey').selectAll().execute();

describe('a retry with the same key and body', () => {
  it('answers with the first status and body, byte for byte, marked Idempotent-Replayed, and stores one feeding', async () => {
    const key = randomUUID();
    const first = await post(feedingsUrl(), FEEDING, key);
    expect(first.statusCode, first.body).toBe(201);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    const retry = await post(feedingsUrl(), FEEDING, key);
    expect(retry.statusCode).toBe(201);
    expect(retry.body).toBe(first.body);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(await feedingCount()).toBe(1);
  });

  it('reads the draft’s quoted form and the bare form as one key', async () => {
    const key = randomUUID();
    const quoted = await post(feedingsUrl(), FEEDING, `"${key}"`);
    expect(quoted.statusCode, quoted.body).toBe(201);
    const bare = await post(feedingsUrl(), FEEDING, key);
    expect(bare.headers['idempotent-replayed']).toBe('true');
    expect(bare.body).toBe(quoted.body);
    expect(await feedingCount()).toBe(1);
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
    expect(await feedingCount()).toBe(1);
  });

  it('runs concurrent duplicates once: the others are replays or 409s', async () => {
    const key = randomUUID();
    const results = await Promise.all(Array.from({ length: 5 }, () => post(feedingsUrl(), FEEDING, key)));
    const statuses = results.map((r) => r.statusCode);
    expect(
      statuses.every((s) => s === 201 || s === 409),
      statuses.join(),
    ).toBe(true);
    const ids = new Set(results.filter((r) => r.statusCode === 201).map((r) => r.json<Feeding>().id));
    expect(ids.size).toBe(1);
    expect(await feedingCount()).toBe(1);
  });
});

describe('the same key on another request', () => {
  it('is a 422 naming the header, with another body or on another route, and writes nothing', async () => {
    const key = randomUUID();
    expect((await post(feedingsUrl(), FEEDING, key)).statusCode).toBe(201);
    const other = await post(feedingsUrl(), { ...FEEDING, totalG: 120 }, key);
    expect(expectError(other, 422).details).toEqual([
      { field: 'Idempotency-Key', message: 'Already used for a different request.' },
    ]);
    expect(other.headers.link).toContain('rel="describedby"');
    expectError(await post('/api/cultures', { name: 'Pip' }, key), 422);
    expect(await feedingCount()).toBe(1);
    expect(await t.db.selectFrom('culture').select('id').execute()).toHaveLength(1);
  });
});

describe('while the first request with a key is still running', () => {
  it('a retry is a 409 naming the header; once the first finishes, the retry is its replay', async () => {
    const key = randomUUID();
    // Hold the first request inside its write: a transaction of the test's own locks the feeding
    // table, so the request has claimed its key and waits at its INSERT until we let go.
    let letGo!: () => void;
    let locked!: () => void;
    const isLocked = new Promise<void>((resolve) => (locked = resolve));
    const lock = t.db.transaction().execute(async (trx) => {
      await sql`LOCK TABLE feeding IN ACCESS EXCLUSIVE MODE`.execute(trx);
      locked();
      await new Promise<void>((resolve) => (letGo = resolve));
    });
    await isLocked;
    let first: Promise<InjectResponse> | undefined;
    try {
      first = post(feedingsUrl(), FEEDING, key);
      for (let i = 0; i < 200 && !(await keyRows()).some((r) => r.key === key); i += 1) {
        await new Promise((resolve) => setTimeout(resolve, 10));
      }
      const [claim] = await keyRows();
      expect(claim).toMatchObject({ key, completedAt: null, statusCode: null });

      const during = await post(feedingsUrl(), FEEDING, key);
      expect(expectError(during, 409).details).toEqual([
        { field: 'Idempotency-Key', message: 'The first request with this key has not finished.' },
      ]);
      expect(during.headers['retry-after']).toBe('1');
    } finally {
      letGo();
      await lock;
    }
    const done = await first;
    expect(done.statusCode, done.body).toBe(201);
    const after = await post(feedingsUrl(), FEEDING, key);
    expect(after.headers['idempotent-replayed']).toBe('true');
    expect(after.body).toBe(done.body);
    expect(await feedingCount()).toBe(1);
  });

  it('a claim nothing finished for two minutes (the server died) is taken over by a retry, which finds the feeding already made', async () => {
    const key = randomUUID();
    const first = await post(feedingsUrl(), FEEDING, key);
    // What a process that died after the feeding committed leaves: the claim without a response.
    await t.db.updateTable('idempotencyKey').set({ statusCode: null, responseBody: null, completedAt: null }).execute();
    expectError(await post(feedingsUrl(), FEEDING, key), 409);
    await t.db
      .updateTable('idempotencyKey')
      .set({ createdAt: sql<Date>`now() - interval '3 minutes'` })
      .execute();
    const retry = await post(feedingsUrl(), FEEDING, key);
    expect(retry.statusCode).toBe(201);
    // The handler ran again, but the feeding keeps its key (WriteKey): no second feeding.
    expect(retry.json<Feeding>()).toEqual(first.json<Feeding>());
    expect(await feedingCount()).toBe(1);
  });

  it('taken over after a crash before the write committed, the retry makes the feeding', async () => {
    const key = randomUUID();
    // A claim the dead process left before its insert: nothing was written.
    await post(feedingsUrl(), FEEDING, key);
    await t.db.deleteFrom('feeding').execute();
    await t.db
      .updateTable('idempotencyKey')
      .set({
        statusCode: null,
        responseBody: null,
        completedAt: null,
        createdAt: sql<Date>`now() - interval '3 minutes'`,
      })
      .execute();
    const retry = await post(feedingsUrl(), FEEDING, key);
    expect(retry.statusCode).toBe(201);
    expect(await feedingCount()).toBe(1);
  });
});

describe('when something fails', () => {
  it('a 4xx gives the key back; a 5xx after the write keeps the claim, so a retry is a 409, not a second feeding', async () => {
    const key = randomUUID();
    expectFieldErrors(await post(feedingsUrl(), { ...FEEDING, totalG: -1 }, key), ['totalG']);
    expect(await keyRows()).toEqual([]);

    // The feeding is inserted, then the step after it fails: the client sees a 500.
    vi.spyOn(t.app.get(AlertScheduler, { strict: false }), 'refreshCulture').mockRejectedValueOnce(new Error('boom'));
    expectError(await post(feedingsUrl(), FEEDING, key), 500);
    expect(await feedingCount()).toBe(1);
    expect(await keyRows()).toMatchObject([{ key, completedAt: null }]);
    expectError(await post(feedingsUrl(), FEEDING, key), 409);
    expect(await feedingCount()).toBe(1);
  });

  it('storing the answer is tried again when the database blinks, and the retry is still a replay', async () => {
    const repository = t.app.get(IdempotencyRepository, { strict: false });
    const spy = vi.spyOn(repository, 'complete').mockRejectedValueOnce(new Error('connection terminated'));
    const key = randomUUID();
    const first = await post(feedingsUrl(), FEEDING, key);
    expect(first.statusCode, first.body).toBe(201);
    expect(spy).toHaveBeenCalledTimes(2);
    const retry = await post(feedingsUrl(), FEEDING, key);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body).toBe(first.body);
    expect(await feedingCount()).toBe(1);
  });
});

describe('a missing or malformed key', () => {
  it('is a 400 in the one error shape naming the header, pointing at the docs, and writes nothing', async () => {
    const missing = await post(feedingsUrl(), FEEDING);
    const body = expectFieldErrors(missing, ['Idempotency-Key']);
    expect(body.message).toMatch(/needs an Idempotency-Key header/);
    expect(body.details?.[0]?.message).toMatch(/sent again unchanged on a retry/);
    expect(missing.headers.link).toBe('</api/docs>; rel="describedby"; type="text/html"');
    expect(await feedingCount()).toBe(0);
    expect(await keyRows()).toEqual([]);
  });

  it('refuses empty, too long and badly written keys with 400, and writes nothing', async () => {
    const malformed = ['', '""', 'with space', 'ü-key', 'k'.repeat(256), '"unclosed', '"a", "b"', '"a";p=1', 'a"b'];
    for (const key of malformed) {
      const res = await post(feedingsUrl(), FEEDING, key);
      const body = expectFieldErrors(res, ['Idempotency-Key']);
      expect(body.message, key).toMatch(/not a key we can use/);
    }
    expect(await feedingCount()).toBe(0);
    expect(await keyRows()).toEqual([]);
  });

  it('takes a key of exactly 255 characters', async () => {
    expect((await post(feedingsUrl(), FEEDING, 'k'.repeat(255))).statusCode).toBe(201);
  });
});

describe('keys belong to one account', () => {
  it('the same key from two bakers is two keys: each gets its own feeding and its own replay', async () => {
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    const hers = (await post('/api/cultures', { name: 'Pip' }, undefined, amara.cookie)).json<Culture>();
    const key = randomUUID();
    const mine = await post(feedingsUrl(), FEEDING, key);
    const theirs = await post(feedingsUrl(hers), FEEDING, key, amara.cookie);
    expect([mine.statusCode, theirs.statusCode]).toEqual([201, 201]);
    expect(theirs.json<Feeding>().id).not.toBe(mine.json<Feeding>().id);
    expect((await post(feedingsUrl(), FEEDING, key)).body).toBe(mine.body);
    expect((await post(feedingsUrl(hers), FEEDING, key, amara.cookie)).body).toBe(theirs.body);
    expect(await feedingCount()).toBe(2);
    expect(await keyRows()).toHaveLength(2);
  });

  it('another baker cannot replay a response by sending its key to its URL: that is a 404, and is not stored', async () => {
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    const key = randomUUID();
    await post(feedingsUrl(), FEEDING, key);
    expectError(await post(feedingsUrl(), FEEDING, key, amara.cookie), 404);
    expect(await keyRows()).toHaveLength(1);
  });
});

describe('keys are kept 7 days, then swept', () => {
  // Time passes for the keys and for the rows their writes made (a feeding remembers its key).
  const age = async (interval: string) => {
    await t.db
      .updateTable('idempotencyKey')
      .set({ createdAt: sql<Date>`now() - ${interval}::interval` })
      .execute();
    await t.db
      .updateTable('feeding')
      .set({ createdAt: sql<Date>`now() - ${interval}::interval` })
      .execute();
  };
  const sweeper = () => t.app.get(IdempotencySweeper, { strict: false });

  it('replays a key 6 days 23 hours old, and the sweep keeps it', async () => {
    const key = randomUUID();
    const first = await post(feedingsUrl(), FEEDING, key);
    await age('6 days 23 hours');
    expect(await sweeper().sweep()).toBe(0);
    const retry = await post(feedingsUrl(), FEEDING, key);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body).toBe(first.body);
  });

  it('sweeps keys over 7 days old of every account, also of one that never writes again', async () => {
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    const hers = (await post('/api/cultures', { name: 'Pip' }, randomUUID(), amara.cookie)).json<Culture>();
    await post(feedingsUrl(hers), FEEDING, randomUUID(), amara.cookie);
    const key = randomUUID();
    await post(feedingsUrl(), FEEDING, key);
    expect(await keyRows()).toHaveLength(3);
    await age('7 days 1 minute');
    const fresh = randomUUID();
    await post(feedingsUrl(), { ...FEEDING, totalG: 90 }, fresh);

    expect(await sweeper().sweep()).toBe(3);
    expect((await keyRows()).map((r) => r.key)).toEqual([fresh]);
    // The swept key is a new request again.
    const later = await post(feedingsUrl(), FEEDING, key);
    expect(later.statusCode).toBe(201);
    expect(later.headers['idempotent-replayed']).toBeUndefined();
    expect(await feedingCount()).toBe(4);
  });

  it('a claim meets its own expired key as absent even before the sweep runs', async () => {
    const key = randomUUID();
    await post(feedingsUrl(), FEEDING, key);
    await age('7 days 1 minute');
    const later = await post(feedingsUrl(), { ...FEEDING, totalG: 120 }, key); // not a 422: the old key is gone
    expect(later.statusCode).toBe(201);
    expect(await feedingCount()).toBe(2);
  });
});
