import type {
  Culture,
  Feeding,
  TemperatureReadingBatchResponse,
  TemperatureReadingListResponse,
} from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { expectError, expectFieldErrors, signUp, type InjectResponse, type SignedUp, send } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const FED_AT = '2025-01-15T21:00:00.000Z';

let theo: SignedUp;
let feeding: Feeding;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
  const culture = (await call('POST', '/api/cultures', { name: 'Bramble', location: 'fridge' })).json<Culture>();
  feeding = (
    await call('POST', `/api/cultures/${culture.id}/feedings`, { fedAt: FED_AT, starterG: 10, flourG: 50, waterG: 50 })
  ).json<Feeding>();
});

function call(method: 'GET' | 'POST' | 'DELETE', url: string, payload?: unknown): Promise<InjectResponse> {
  return send(t.app, method, url, theo.cookie, payload);
}

const url = () => `/api/feedings/${feeding.id}/temperatures`;
const readingCount = async () => (await t.db.selectFrom('temperatureReading').select('id').execute()).length;

/** An overnight series: a kitchen cooling from 21 °C, then a fridge at 4 °C. */
const NIGHT = [
  { takenAt: '2025-01-15T22:00:00Z', temperatureC: 21 },
  { takenAt: '2025-01-16T02:00:00Z', temperatureC: 17.5 },
  { takenAt: '2025-01-16T00:00:00+01:00', temperatureC: 19 },
  { takenAt: '2025-01-16T06:00:00Z', temperatureC: 4 },
];

describe('POST /api/feedings/:feedingId/temperatures', () => {
  it('stores a batch and answers the readings in the order sent, times in UTC', async () => {
    const res = await call('POST', url(), { readings: NIGHT });
    expect(res.statusCode, res.body).toBe(201);
    const { items } = res.json<TemperatureReadingBatchResponse>();
    expect(items.map((r) => [r.takenAt, r.temperatureC])).toEqual([
      ['2025-01-15T22:00:00.000Z', 21],
      ['2025-01-16T02:00:00.000Z', 17.5],
      ['2025-01-15T23:00:00.000Z', 19],
      ['2025-01-16T06:00:00.000Z', 4],
    ]);
    expect(Object.keys(items[0]!).sort()).toEqual(['createdAt', 'feedingId', 'id', 'takenAt', 'temperatureC']);
    expect(items.every((r) => r.feedingId === feeding.id)).toBe(true);
  });

  it('accepts a batch of one', async () => {
    const res = await call('POST', url(), { readings: [{ takenAt: '2025-01-15T21:30:00Z', temperatureC: -5 }] });
    expect(res.json<TemperatureReadingBatchResponse>().items).toHaveLength(1);
  });

  it('refuses the whole batch when one reading is wrong, naming it by position', async () => {
    const readings = [...NIGHT];
    readings[1] = { takenAt: '2025-01-16T02:00:00Z', temperatureC: 50.1 };
    readings[3] = { takenAt: '2025-01-15T20:00:00Z', temperatureC: 4 };
    const first = await call('POST', url(), { readings });
    expectFieldErrors(first, ['readings.1.temperatureC']);
    // With every reading valid on its own, the one before the feeding is named.
    readings[1] = NIGHT[1]!;
    expectFieldErrors(await call('POST', url(), { readings }), ['readings.3.takenAt']);
    expect(await readingCount()).toBe(0);
  });

  it('refuses malformed batches with 400 naming the field, and writes nothing', async () => {
    const cases: Array<[unknown, string[]]> = [
      [{}, ['readings']],
      [{ readings: [] }, ['readings']],
      [{ readings: { takenAt: '2025-01-15T22:00:00Z', temperatureC: 20 } }, ['readings']],
      [{ takenAt: '2025-01-15T22:00:00Z', temperatureC: 20 }, ['takenAt', 'temperatureC', 'readings']],
      [{ readings: [{ temperatureC: 20 }] }, ['readings.0.takenAt']],
      [{ readings: [{ takenAt: '2025-01-15T22:00:00Z' }] }, ['readings.0.temperatureC']],
      [{ readings: [{ takenAt: '2025-01-15T22:00:00Z', temperatureC: 20, humidity: 60 }] }, ['readings.0.humidity']],
      [{ readings: [{ takenAt: '2025-01-15 22:00', temperatureC: 20 }] }, ['readings.0.takenAt']],
      [{ readings: [{ takenAt: '2025-01-15T22:00:00Z', temperatureC: null }] }, ['readings.0.temperatureC']],
      [{ readings: Array.from({ length: 1001 }, () => NIGHT[0]) }, ['readings']],
    ];
    for (const [payload, fields] of cases) expectFieldErrors(await call('POST', url(), payload), fields);
    expect(await readingCount()).toBe(0);
  });
});

describe('GET /api/feedings/:feedingId/temperatures', () => {
  it('lists oldest first with paging and a total', async () => {
    await call('POST', url(), { readings: NIGHT });
    const list = (await call('GET', url())).json<TemperatureReadingListResponse>();
    expect(list.items.map((r) => r.temperatureC)).toEqual([21, 19, 17.5, 4]);
    expect(list).toMatchObject({ total: 4, limit: 500, offset: 0 });
    const page = (await call('GET', `${url()}?limit=2&offset=2`)).json<TemperatureReadingListResponse>();
    expect(page.items.map((r) => r.temperatureC)).toEqual([17.5, 4]);
    expectFieldErrors(await call('GET', `${url()}?limit=1001`), ['limit']);
  });
});

describe('DELETE /api/temperatures/:id', () => {
  it('deletes one reading', async () => {
    const { items } = (await call('POST', url(), { readings: NIGHT })).json<TemperatureReadingBatchResponse>();
    expect((await call('DELETE', `/api/temperatures/${items[0]!.id}`)).statusCode).toBe(204);
    expectError(await call('DELETE', `/api/temperatures/${items[0]!.id}`), 404);
    expect(await readingCount()).toBe(3);
  });
});
