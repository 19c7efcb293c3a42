import type { Culture, Feeding, FeedingListResponse } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { expectError, expectFieldErrors, signUp, type InjectResponse, type SignedUp, send } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

let theo: SignedUp;
let culture: Culture;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
  culture = (await call('POST', '/api/cultures', { name: 'Bramble' })).json<Culture>();
});

function call(method: 'GET' | 'POST' | 'PATCH' | 'DELETE', url: string, payload?: unknown): Promise<InjectResponse> {
  return send(t.app, method, url, theo.cookie, payload);
}

const FED_AT = '2025-02-01T07:30:00.000Z';
const feedingsUrl = () => `/api/cultures/${culture.id}/feedings`;

async function addFeeding(payload: Record<string, unknown>): Promise<Feeding> {
  const res = await call('POST', feedingsUrl(), { fedAt: FED_AT, starterG: 20, flourG: 100, waterG: 100, ...payload });
  expect(res.statusCode, res.body).toBe(201);
  return res.json<Feeding>();
}

const feedingCount = async () => (await t.db.selectFrom('feeding').select('id').execute()).length;

describe('POST /api/cultures/:cultureId/feedings', () => {
  it('stores a feeding and answers the Feeding shape, times in UTC', async () => {
    const feeding = await addFeeding({
      fedAt: '2025-02-01T08:30:00+01:00',
      flour: 'whole rye',
      waterTemperatureC: 27.5,
      temperatureC: 22,
      initialHeightMm: 41,
      notes: 'Smelled fruity.',
      observations: ['bubbles', 'sour-smell'],
    });
    expect(feeding).toEqual({
      id: expect.any(String) as string,
      cultureId: culture.id,
      fedAt: '2025-02-01T07:30:00.000Z',
      starterG: 20,
      flourG: 100,
      waterG: 100,
      flour: 'whole rye',
      waterTemperatureC: 27.5,
      temperatureC: 22,
      initialHeightMm: 41,
      notes: 'Smelled fruity.',
      observations: ['bubbles', 'sour-smell'],
      createdAt: expect.any(String) as string,
      updatedAt: expect.any(String) as string,
    });
    expect((await call('GET', `/api/feedings/${feeding.id}`)).json()).toEqual(feeding);
    expect((await call('GET', `/api/cultures/${culture.id}`)).json<Culture>().lastFedAt).toBe(feeding.fedAt);
  });

  it('takes now as fedAt when it is left out', async () => {
    const before = Date.now();
    const res = await call('POST', feedingsUrl(), { starterG: 10, flourG: 50, waterG: 50 });
    const fedAt = Date.parse(res.json<Feeding>().fedAt);
    expect(fedAt).toBeGreaterThanOrEqual(before);
    expect(fedAt).toBeLessThanOrEqual(Date.now());
  });

  it('turns a ratio and a total into grams', async () => {
    const res = await call('POST', feedingsUrl(), { fedAt: FED_AT, ratio: '1:2:2', totalG: 150 });
    expect(res.statusCode, res.body).toBe(201);
    expect(res.json<Feeding>()).toMatchObject({ starterG: 30, flourG: 60, waterG: 60 });
    // 100 g at 1:1:1 is not evenly divisible; the parts still add up to 100 g.
    const odd = (await call('POST', feedingsUrl(), { ratio: '1:1:1', totalG: 100 })).json<Feeding>();
    expect([odd.starterG, odd.flourG, odd.waterG]).toEqual([33.4, 33.3, 33.3]);
  });

  it('refuses a feeding with both weights and a ratio, or with neither', async () => {
    const both = await call('POST', feedingsUrl(), {
      starterG: 20,
      flourG: 100,
      waterG: 100,
      ratio: '1:5:5',
      totalG: 220,
    });
    expectFieldErrors(both, ['starterG', 'flourG', 'waterG']);
    expectFieldErrors(await call('POST', feedingsUrl(), { fedAt: FED_AT }), ['starterG', 'flourG', 'waterG']);
    expectFieldErrors(await call('POST', feedingsUrl(), { starterG: 20, flourG: 100 }), ['waterG']);
    expectFieldErrors(await call('POST', feedingsUrl(), { ratio: '1:2:2' }), ['totalG']);
    expectFieldErrors(await call('POST', feedingsUrl(), { totalG: 100 }), ['ratio']);
    expectFieldErrors(await call('POST', feedingsUrl(), { ratio: '1:2', totalG: 100 }), ['ratio']);
    expectFieldErrors(await call('POST', feedingsUrl(), { ratio: '0:1:1', totalG: 100 }), ['ratio']);
    expect(await feedingCount()).toBe(0);
  });

  it('refuses a ratio whose parts would fall outside the gram limits, naming totalG', async () => {
    // 1:1000:1000 over 1 g leaves under 0.1 g of starter; 1:10:10 over 60 kg is 28.6 kg of flour;
    // 1:1:1 over 60 kg is 20 kg each, just within the limit.
    expectFieldErrors(await call('POST', feedingsUrl(), { ratio: '1:1000:1000', totalG: 1 }), ['totalG']);
    expectFieldErrors(await call('POST', feedingsUrl(), { ratio: '1:10:10', totalG: 60_000 }), ['totalG']);
    expect((await call('POST', feedingsUrl(), { ratio: '1:1:1', totalG: 60_000 })).statusCode).toBe(201);
    expect(await feedingCount()).toBe(1);
  });

  it('refuses out-of-range values with 400 naming each field, and writes nothing', async () => {
    const soon = new Date(Date.now() + 10 * 60_000).toISOString();
    const cases: Array<[Record<string, unknown>, string[]]> = [
      [{ starterG: 0 }, ['starterG']],
      [{ flourG: -1 }, ['flourG']],
      [{ waterG: 20_000.1 }, ['waterG']],
      [{ starterG: '20' }, ['starterG']],
      [{ starterG: null }, ['starterG']],
      [{ temperatureC: 50.5, waterTemperatureC: -6 }, ['temperatureC', 'waterTemperatureC']],
      [{ initialHeightMm: 0 }, ['initialHeightMm']],
      [{ initialHeightMm: 1001 }, ['initialHeightMm']],
      [{ fedAt: soon }, ['fedAt']],
      [{ fedAt: '1999-12-31T23:59:59Z' }, ['fedAt']],
      [{ fedAt: '2025-02-01T07:30:00' }, ['fedAt']],
      [{ fedAt: '2025-02-30T07:30:00Z' }, ['fedAt']],
      [{ fedAt: null }, ['fedAt']],
      [{ observations: ['bubbles', 'glitter'] }, ['observations']],
      [{ observations: ['hooch', 'hooch'] }, ['observations']],
      [{ observations: 'bubbles' }, ['observations']],
      [{ notes: 'n'.repeat(2001) }, ['notes']],
      [{ cultureId: culture.id }, ['cultureId']],
    ];
    for (const [payload, fields] of cases) {
      const res = await call('POST', feedingsUrl(), {
        fedAt: FED_AT,
        starterG: 20,
        flourG: 100,
        waterG: 100,
        ...payload,
      });
      expectFieldErrors(res, fields);
    }
    expect(await feedingCount()).toBe(0);
  });

  it('accepts a time a few minutes ahead of the server clock (phones drift)', async () => {
    const res = await call('POST', feedingsUrl(), {
      fedAt: new Date(Date.now() + 3 * 60_000).toISOString(),
      starterG: 10,
      flourG: 50,
      waterG: 50,
    });
    expect(res.statusCode, res.body).toBe(201);
  });
});

describe('GET /api/cultures/:cultureId/feedings', () => {
  it('pages newest first by default, oldest first on request, with the total', async () => {
    for (let day = 1; day <= 5; day += 1) await addFeeding({ fedAt: `2025-01-0${day}T08:00:00.000Z` });
    const first = (await call('GET', `${feedingsUrl()}?limit=2`)).json<FeedingListResponse>();
    expect(first.items.map((f) => f.fedAt.slice(0, 10))).toEqual(['2025-01-05', '2025-01-04']);
    expect(first).toMatchObject({ total: 5, limit: 2, offset: 0 });
    const last = (await call('GET', `${feedingsUrl()}?limit=2&offset=4`)).json<FeedingListResponse>();
    expect(last.items.map((f) => f.fedAt.slice(0, 10))).toEqual(['2025-01-01']);
    const asc = (await call('GET', `${feedingsUrl()}?order=asc&limit=3`)).json<FeedingListResponse>();
    expect(asc.items.map((f) => f.fedAt.slice(0, 10))).toEqual(['2025-01-01', '2025-01-02', '2025-01-03']);
    expect(asc.total).toBe(5);
    expectFieldErrors(await call('GET', `${feedingsUrl()}?order=newest`), ['order']);
    expectFieldErrors(await call('GET', `${feedingsUrl()}?limit=abc`), ['limit']);
  });

  it("lists only this culture's feedings", async () => {
    await addFeeding({});
    const other = (await call('POST', '/api/cultures', { name: 'Pip' })).json<Culture>();
    const list = (await call('GET', `/api/cultures/${other.id}/feedings`)).json<FeedingListResponse>();
    expect(list).toEqual({ items: [], total: 0, limit: 50, offset: 0 });
  });
});

describe('PATCH /api/feedings/:id', () => {
  it('changes only the fields sent; null clears optional ones', async () => {
    const feeding = await addFeeding({ temperatureC: 21, notes: 'cool day', initialHeightMm: 40 });
    const res = await call('PATCH', `/api/feedings/${feeding.id}`, {
      flourG: 120,
      notes: null,
      observations: ['hooch'],
    });
    expect(res.statusCode, res.body).toBe(200);
    expect(res.json<Feeding>()).toMatchObject({
      starterG: 20,
      flourG: 120,
      waterG: 100,
      temperatureC: 21,
      notes: null,
      observations: ['hooch'],
      initialHeightMm: 40,
    });
  });

  it('replaces all three weights from a ratio and a total', async () => {
    const feeding = await addFeeding({});
    const res = await call('PATCH', `/api/feedings/${feeding.id}`, { ratio: '1:5:5', totalG: 110 });
    expect(res.json<Feeding>()).toMatchObject({ starterG: 10, flourG: 50, waterG: 50 });
    expectFieldErrors(await call('PATCH', `/api/feedings/${feeding.id}`, { ratio: '1:1:1', totalG: 90, waterG: 30 }), [
      'waterG',
    ]);
  });

  it('refuses invalid values and writes nothing', async () => {
    const feeding = await addFeeding({});
    expectFieldErrors(await call('PATCH', `/api/feedings/${feeding.id}`, { starterG: 0 }), ['starterG']);
    expectFieldErrors(await call('PATCH', `/api/feedings/${feeding.id}`, { starterG: null }), ['starterG']);
    expectFieldErrors(await call('PATCH', `/api/feedings/${feeding.id}`, { observations: null }), ['observations']);
    expect((await call('GET', `/api/feedings/${feeding.id}`)).json()).toEqual(feeding);
  });

  it('refuses moving fedAt past its rise checks or temperatures', async () => {
    const feeding = await addFeeding({});
    await call('POST', `/api/feedings/${feeding.id}/rise-checks`, { takenAt: '2025-02-01T09:00:00Z', heightMm: 50 });
    expectFieldErrors(await call('PATCH', `/api/feedings/${feeding.id}`, { fedAt: '2025-02-01T09:30:00Z' }), ['fedAt']);
    const earlier = await call('PATCH', `/api/feedings/${feeding.id}`, { fedAt: '2025-02-01T07:00:00Z' });
    expect(earlier.json<Feeding>().fedAt).toBe('2025-02-01T07:00:00.000Z');
  });
});

describe('DELETE /api/feedings/:id', () => {
  it('deletes the feeding with its rise checks and temperatures, and nothing else', async () => {
    const keep = await addFeeding({ fedAt: '2025-01-31T07:00:00Z' });
    const feeding = await addFeeding({ initialHeightMm: 40 });
    await call('POST', `/api/feedings/${feeding.id}/rise-checks`, { takenAt: '2025-02-01T09:00:00Z', risePct: 50 });
    await call('POST', `/api/feedings/${feeding.id}/temperatures`, {
      readings: [{ takenAt: '2025-02-01T09:00:00Z', temperatureC: 22 }],
    });
    expect((await call('DELETE', `/api/feedings/${feeding.id}`)).statusCode).toBe(204);
    expectError(await call('GET', `/api/feedings/${feeding.id}`), 404);
    expect((await t.db.selectFrom('feeding').select('id').execute()).map((f) => f.id)).toEqual([keep.id]);
    expect(await t.db.selectFrom('riseCheck').select('id').execute()).toEqual([]);
    expect(await t.db.selectFrom('temperatureReading').select('id').execute()).toEqual([]);
    expect((await call('GET', `/api/cultures/${culture.id}`)).json<Culture>().lastFedAt).toBe(
      '2025-01-31T07:00:00.000Z',
    );
  });
});
