import type { Culture, Feeding, RiseCheck, TemperatureReadingBatchResponse } from '@peakwise/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  expectError,
  expectFieldErrors,
  signUp,
  type InjectResponse,
  type SignedUp,
  send,
  type HttpMethod,
} from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Every logbook route, asked by the owner, by another baker, without a session, and with an id
// that is not a uuid. Another baker's ids must look exactly like ids that do not exist: 404.

let t: TestApp;
let theo: SignedUp;
let amara: SignedUp;
let culture: Culture;
let feeding: Feeding;
let check: RiseCheck;
let readingId: string;

function call(method: HttpMethod, url: string, cookie: string | null, payload?: unknown): Promise<InjectResponse> {
  return send(t.app, method, url, cookie, payload);
}

async function created<T>(res: InjectResponse): Promise<T> {
  expect(res.statusCode, res.body).toBe(201);
  return Promise.resolve(res.json<T>());
}

const FED_AT = '2025-01-10T08:00:00.000Z';

beforeAll(async () => {
  t = await createTestApp();
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
  amara = await signUp(t.app, { displayName: 'Amara Quist' });
  culture = await created(await call('POST', '/api/cultures', theo.cookie, { name: 'Bramble' }));
  feeding = await created(
    await call('POST', `/api/cultures/${culture.id}/feedings`, theo.cookie, {
      fedAt: FED_AT,
      starterG: 20,
      flourG: 100,
      waterG: 100,
      initialHeightMm: 40,
    }),
  );
  check = await created(
    await call('POST', `/api/feedings/${feeding.id}/rise-checks`, theo.cookie, {
      takenAt: '2025-01-10T10:00:00Z',
      heightMm: 55,
    }),
  );
  const batch = await created<TemperatureReadingBatchResponse>(
    await call('POST', `/api/feedings/${feeding.id}/temperatures`, theo.cookie, {
      readings: [{ takenAt: '2025-01-10T09:00:00Z', temperatureC: 23 }],
    }),
  );
  readingId = batch.items[0]!.id;
});
afterAll(() => t.close());

interface Route {
  name: string;
  method: HttpMethod;
  url: () => string;
  /** The id parameter's name, and the URL with a non-uuid in its place. */
  param: [string, string];
  payload?: () => unknown;
  /** The owner's status. Deleting routes are checked last, in their own test. */
  ok: number;
}

const readRoutes: Route[] = [
  { name: 'list cultures', method: 'GET', url: () => '/api/cultures', param: ['', ''], ok: 200 },
  {
    name: 'get culture',
    method: 'GET',
    url: () => `/api/cultures/${culture.id}`,
    param: ['id', '/api/cultures/x'],
    ok: 200,
  },
  {
    name: 'update culture',
    method: 'PATCH',
    url: () => `/api/cultures/${culture.id}`,
    param: ['id', '/api/cultures/1'],
    payload: () => ({ notes: 'rye, fed twice a day' }),
    ok: 200,
  },
  {
    name: 'add feeding',
    method: 'POST',
    url: () => `/api/cultures/${culture.id}/feedings`,
    param: ['cultureId', '/api/cultures/nope/feedings'],
    payload: () => ({ ratio: '1:1:1', totalG: 90 }),
    ok: 201,
  },
  {
    name: 'list feedings',
    method: 'GET',
    url: () => `/api/cultures/${culture.id}/feedings`,
    param: ['cultureId', '/api/cultures/nope/feedings'],
    ok: 200,
  },
  {
    name: 'get feeding',
    method: 'GET',
    url: () => `/api/feedings/${feeding.id}`,
    param: ['id', '/api/feedings/1'],
    ok: 200,
  },
  {
    name: 'update feeding',
    method: 'PATCH',
    url: () => `/api/feedings/${feeding.id}`,
    param: ['id', '/api/feedings/1'],
    payload: () => ({ temperatureC: 24 }),
    ok: 200,
  },
  {
    name: 'add rise check',
    method: 'POST',
    url: () => `/api/feedings/${feeding.id}/rise-checks`,
    param: ['feedingId', '/api/feedings/1/rise-checks'],
    payload: () => ({ takenAt: '2025-01-10T11:00:00Z', multiple: 1.5 }),
    ok: 201,
  },
  {
    name: 'list rise checks',
    method: 'GET',
    url: () => `/api/feedings/${feeding.id}/rise-checks`,
    param: ['feedingId', '/api/feedings/1/rise-checks'],
    ok: 200,
  },
  {
    name: 'update rise check',
    method: 'PATCH',
    url: () => `/api/rise-checks/${check.id}`,
    param: ['id', '/api/rise-checks/1'],
    payload: () => ({ heightMm: 56 }),
    ok: 200,
  },
  {
    name: 'add temperatures',
    method: 'POST',
    url: () => `/api/feedings/${feeding.id}/temperatures`,
    param: ['feedingId', '/api/feedings/1/temperatures'],
    payload: () => ({ readings: [{ takenAt: '2025-01-10T09:30:00Z', temperatureC: 22.5 }] }),
    ok: 201,
  },
  {
    name: 'list temperatures',
    method: 'GET',
    url: () => `/api/feedings/${feeding.id}/temperatures`,
    param: ['feedingId', '/api/feedings/1/temperatures'],
    ok: 200,
  },
];

const deleteRoutes: Route[] = [
  {
    name: 'delete temperature',
    method: 'DELETE',
    url: () => `/api/temperatures/${readingId}`,
    param: ['id', '/api/temperatures/1'],
    ok: 204,
  },
  {
    name: 'delete rise check',
    method: 'DELETE',
    url: () => `/api/rise-checks/${check.id}`,
    param: ['id', '/api/rise-checks/1'],
    ok: 204,
  },
  {
    name: 'delete feeding',
    method: 'DELETE',
    url: () => `/api/feedings/${feeding.id}`,
    param: ['id', '/api/feedings/1'],
    ok: 204,
  },
  {
    name: 'delete culture',
    method: 'DELETE',
    url: () => `/api/cultures/${culture.id}`,
    param: ['id', '/api/cultures/1'],
    ok: 204,
  },
];

const allRoutes = [...readRoutes, ...deleteRoutes];

async function rowCounts() {
  const count = async (table: 'culture' | 'feeding' | 'riseCheck' | 'temperatureReading') =>
    Number(
      (
        await t.db
          .selectFrom(table)
          .select((eb) => eb.fn.countAll<string>().as('n'))
          .executeTakeFirstOrThrow()
      ).n,
    );
  return {
    culture: await count('culture'),
    feeding: await count('feeding'),
    riseCheck: await count('riseCheck'),
    temperatureReading: await count('temperatureReading'),
  };
}

describe('logbook access', () => {
  it('answers 401 on every route without a session', async () => {
    for (const route of allRoutes) {
      expectError(await call(route.method, route.url(), null, route.payload?.()), 401);
    }
  });

  it("answers 404 on every route to another baker's culture, feeding, rise check or reading, and changes nothing", async () => {
    const before = await rowCounts();
    for (const route of allRoutes.filter((r) => r.param[0] !== '')) {
      const res = await call(route.method, route.url(), amara.cookie, route.payload?.());
      expect(res.statusCode, `${route.name}: ${res.body}`).toBe(404);
      expectError(res, 404);
    }
    expect(await rowCounts()).toEqual(before);
    const theirs = await call('GET', '/api/cultures', amara.cookie);
    expect(theirs.json<{ total: number }>().total).toBe(0);
  });

  it('answers 400 naming the id parameter when it is not a uuid', async () => {
    for (const route of allRoutes.filter((r) => r.param[0] !== '')) {
      const [field, url] = route.param;
      expectFieldErrors(await call(route.method, url, theo.cookie, route.payload?.()), [field]);
    }
  });

  it("answers 404 for a well-formed id that does not exist, the same as another baker's", async () => {
    const missing = '00000000-0000-4000-8000-000000000000';
    for (const route of allRoutes.filter((r) => r.param[0] !== '')) {
      const url = route.url().replace(/[0-9a-f-]{36}/, missing);
      const mine = await call(route.method, url, theo.cookie, route.payload?.());
      const theirs = await call(route.method, route.url(), amara.cookie, route.payload?.());
      expect(mine.statusCode, route.name).toBe(404);
      expect(mine.json()).toEqual(theirs.json());
    }
  });

  it('lets the owner use every route', async () => {
    for (const route of allRoutes) {
      const res = await call(route.method, route.url(), theo.cookie, route.payload?.());
      expect(res.statusCode, `${route.name}: ${res.body}`).toBe(route.ok);
    }
    expect(await rowCounts()).toEqual({ culture: 0, feeding: 0, riseCheck: 0, temperatureReading: 0 });
  });
});
