import { randomUUID } from 'node:crypto';
import type { BakePlanView, Culture, Feeding, RiseCheck } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { DB } from '../src/db/types.js';
import {
  HOUR,
  MINUTE,
  NOW,
  caller,
  createFormula,
  iso,
  mockClock,
  planBody,
  type Clock,
} from './bake-plan.fixtures.js';
import { created, expectError, expectFieldErrors, signUp, type InjectResponse, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Which logbook writes require an Idempotency-Key and which only honour one, route by route. The
// protocol itself (409, expiry, accounts, malformed keys): idempotency.api.test.ts.
//
// Required: the writes an offline outbox replays, where a write stored twice is a wrong log —
// feedings, rise checks, temperature readings, comments (feeding and bake), step check-offs and
// dough readings. Honoured when sent: the other writes of the logbook and the bench.

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

let theo: SignedUp;
let clock: Clock;
let culture: Culture;
let feeding: Feeding;
let check: RiseCheck;
let plan: BakePlanView;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park', timeZone: 'UTC' });
  clock = mockClock(t);
  const call = caller(t, () => theo);
  culture = await created<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }));
  feeding = await created<Feeding>(
    call('POST', `/api/cultures/${culture.id}/feedings`, {
      fedAt: iso(NOW - 4 * HOUR),
      starterG: 20,
      flourG: 40,
      waterG: 40,
    }),
  );
  check = await created<RiseCheck>(
    call('POST', `/api/feedings/${feeding.id}/rise-checks`, { takenAt: iso(NOW - 3 * HOUR), heightMm: 60 }),
  );
  plan = await created<BakePlanView>(call('POST', '/api/plans', planBody((await createFormula(call)).id)));
  clock.set(NOW + HOUR);
});

type Method = 'POST' | 'PATCH' | 'DELETE';

function write(method: Method, url: string, payload?: unknown, key?: string): Promise<InjectResponse> {
  return t.app.inject({
    method,
    url,
    payload: payload as never,
    headers: { cookie: theo.cookie, ...(key === undefined ? {} : { 'idempotency-key': key }) },
  });
}

/** Every row of a table, to show a replay wrote nothing (not even an update). */
const rows = (table: keyof DB) => t.db.selectFrom(table).selectAll().execute();

interface Route {
  method: Method;
  url: () => string;
  body: () => unknown;
  /** The table the write lands in. */
  table: keyof DB;
  status: number;
}

const REQUIRED: Record<string, Route> = {
  'POST /api/cultures/:id/feedings': {
    method: 'POST',
    url: () => `/api/cultures/${culture.id}/feedings`,
    body: () => ({ fedAt: iso(NOW - HOUR), starterG: 20, flourG: 40, waterG: 40 }),
    table: 'feeding',
    status: 201,
  },
  'POST /api/feedings/:id/rise-checks': {
    method: 'POST',
    url: () => `/api/feedings/${feeding.id}/rise-checks`,
    body: () => ({ takenAt: iso(NOW - 2 * HOUR), heightMm: 70 }),
    table: 'riseCheck',
    status: 201,
  },
  'POST /api/feedings/:id/temperatures': {
    method: 'POST',
    url: () => `/api/feedings/${feeding.id}/temperatures`,
    body: () => ({ readings: [{ takenAt: iso(NOW - 2 * HOUR), temperatureC: 24.5 }] }),
    table: 'temperatureReading',
    status: 201,
  },
  'POST /api/feedings/:id/comments': {
    method: 'POST',
    url: () => `/api/feedings/${feeding.id}/comments`,
    body: () => ({ body: 'Domed nicely at four hours.' }),
    table: 'comment',
    status: 201,
  },
  'POST /api/plans/:id/comments': {
    method: 'POST',
    url: () => `/api/plans/${plan.id}/comments`,
    body: () => ({ body: 'Mixed a little warm today.' }),
    table: 'comment',
    status: 201,
  },
  'POST /api/plans/:id/steps/:stepId/done': {
    method: 'POST',
    url: () => `/api/plans/${plan.id}/steps/feed-starter/done`,
    body: () => ({ startedAt: iso(NOW + 5 * MINUTE) }),
    table: 'bakePlanStep',
    status: 201,
  },
  'POST /api/plans/:id/readings': {
    method: 'POST',
    url: () => `/api/plans/${plan.id}/readings`,
    body: () => ({ takenAt: iso(NOW + 30 * MINUTE), risePct: 20 }),
    table: 'doughReading',
    status: 201,
  },
};

const HONOURED: Record<string, Route> = {
  'POST /api/cultures': {
    method: 'POST',
    url: () => '/api/cultures',
    body: () => ({ name: 'Rye jar' }),
    table: 'culture',
    status: 201,
  },
  'PATCH /api/cultures/:id': {
    method: 'PATCH',
    url: () => `/api/cultures/${culture.id}`,
    body: () => ({ name: 'Bramble the second' }),
    table: 'culture',
    status: 200,
  },
  'PATCH /api/feedings/:id': {
    method: 'PATCH',
    url: () => `/api/feedings/${feeding.id}`,
    body: () => ({ starterG: 25 }),
    table: 'feeding',
    status: 200,
  },
  'PATCH /api/rise-checks/:id': {
    method: 'PATCH',
    url: () => `/api/rise-checks/${check.id}`,
    body: () => ({ heightMm: 62 }),
    table: 'riseCheck',
    status: 200,
  },
  'POST /api/plans': {
    method: 'POST',
    url: () => '/api/plans',
    body: () => planBody(plan.formulaId!),
    table: 'bakePlan',
    status: 201,
  },
  'PATCH /api/plans/:id': {
    method: 'PATCH',
    url: () => `/api/plans/${plan.id}`,
    body: () => ({ name: 'Sunday country loaf' }),
    table: 'bakePlan',
    status: 200,
  },
  'POST /api/plans/:id/finish': {
    method: 'POST',
    url: () => `/api/plans/${plan.id}/finish`,
    body: () => ({ notes: 'Open crumb, a little pale.', rating: 4 }),
    table: 'bakePlan',
    status: 200,
  },
};

describe.each(Object.entries(REQUIRED))('%s requires a key', (_name, route) => {
  it('refuses the write without one (400 naming the header), stores it once with one, replays a retry', async () => {
    const before = await rows(route.table);
    expectFieldErrors(await write(route.method, route.url(), route.body()), ['Idempotency-Key']);
    expect(await rows(route.table)).toEqual(before);

    const key = randomUUID();
    const first = await write(route.method, route.url(), route.body(), key);
    expect(first.statusCode, first.body).toBe(route.status);
    const afterFirst = await rows(route.table);
    expect(afterFirst).not.toEqual(before);
    const retry = await write(route.method, route.url(), route.body(), key);
    expect(retry.statusCode).toBe(route.status);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body).toBe(first.body);
    expect(await rows(route.table)).toEqual(afterFirst);
  });
});

describe.each(Object.entries(HONOURED))('%s honours a key', (_name, route) => {
  it('writes without one; with one, a retry is a replay and another body a 422', async () => {
    const without = await write(route.method, route.url(), route.body());
    expect(without.statusCode, without.body).toBe(route.status);

    const key = randomUUID();
    const first = await write(route.method, route.url(), route.body(), key);
    expect(first.statusCode, first.body).toBe(route.status);
    const afterFirst = await rows(route.table);
    const retry = await write(route.method, route.url(), route.body(), key);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body).toBe(first.body);
    expect(await rows(route.table)).toEqual(afterFirst);
    expectError(await write(route.method, route.url(), { ...(route.body() as object), x: 1 }, key), 422);
  });
});

describe('undoing a check-off (DELETE) honours a key', () => {
  it('a late retry of an undo replays its 204 instead of undoing the check-off made after it', async () => {
    const done = `/api/plans/${plan.id}/steps/feed-starter/done`;
    const checked = async () => (await rows('bakePlanStep')).length;
    expect((await write('POST', done, { startedAt: iso(NOW + 5 * MINUTE) }, randomUUID())).statusCode).toBe(201);
    const undoKey = randomUUID();
    const undo = await write('DELETE', done, undefined, undoKey);
    expect(undo.statusCode, undo.body).toBe(204);
    expect(await checked()).toBe(0);
    expect((await write('POST', done, { startedAt: iso(NOW + 10 * MINUTE) }, randomUUID())).statusCode).toBe(201);

    const late = await write('DELETE', done, undefined, undoKey);
    expect(late.statusCode).toBe(204);
    expect(late.headers['idempotent-replayed']).toBe('true');
    expect(late.body).toBe('');
    expect(await checked()).toBe(1);
  });
});
