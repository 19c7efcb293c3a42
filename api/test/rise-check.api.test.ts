import type { Culture, Feeding, RiseCheck, RiseCheckListResponse } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { expectError, expectFieldErrors, signUp, type InjectResponse, type SignedUp, send } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const FED_AT = '2025-03-01T07:00:00.000Z';

let theo: SignedUp;
let feeding: Feeding;
let noHeight: Feeding;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
  const culture = (await call('POST', '/api/cultures', { name: 'Bramble' })).json<Culture>();
  const feed = (initialHeightMm?: number) =>
    call('POST', `/api/cultures/${culture.id}/feedings`, {
      fedAt: FED_AT,
      ratio: '1:2:2',
      totalG: 100,
      initialHeightMm,
    });
  feeding = (await feed(40)).json<Feeding>();
  noHeight = (await feed()).json<Feeding>();
});

function call(method: 'GET' | 'POST' | 'PATCH' | 'DELETE', url: string, payload?: unknown): Promise<InjectResponse> {
  return send(t.app, method, url, theo.cookie, payload);
}

const checksUrl = (f: Feeding = feeding) => `/api/feedings/${f.id}/rise-checks`;

async function addCheck(payload: Record<string, unknown>, f: Feeding = feeding): Promise<RiseCheck> {
  const res = await call('POST', checksUrl(f), { takenAt: '2025-03-01T09:00:00Z', ...payload });
  expect(res.statusCode, res.body).toBe(201);
  return res.json<RiseCheck>();
}

const checkCount = async () => (await t.db.selectFrom('riseCheck').select('id').execute()).length;

describe('POST /api/feedings/:feedingId/rise-checks', () => {
  it('stores a height in mm and answers the RiseCheck shape', async () => {
    const check = await addCheck({ heightMm: 62.5, temperatureC: 23.5 });
    expect(check).toEqual({
      id: expect.any(String) as string,
      feedingId: feeding.id,
      takenAt: '2025-03-01T09:00:00.000Z',
      heightMm: 62.5,
      temperatureC: 23.5,
      createdAt: expect.any(String) as string,
      updatedAt: expect.any(String) as string,
    });
  });

  it('turns % rise and × initial into mm over the initial height of 40 mm', async () => {
    expect((await addCheck({ risePct: 100 })).heightMm).toBe(80);
    expect((await addCheck({ risePct: 37.5 })).heightMm).toBe(55);
    expect((await addCheck({ risePct: 0 })).heightMm).toBe(40);
    expect((await addCheck({ multiple: 2.5 })).heightMm).toBe(100);
    expect((await addCheck({ multiple: 1.1 })).heightMm).toBe(44);
    const stored = await t.db.selectFrom('riseCheck').select('heightMm').orderBy('heightMm').execute();
    expect(stored.map((r) => r.heightMm)).toEqual([40, 44, 55, 80, 100]);
  });

  it('takes now as takenAt when it is left out', async () => {
    const before = Date.now();
    const check = await addCheck({ takenAt: undefined, heightMm: 50 });
    expect(Date.parse(check.takenAt)).toBeGreaterThanOrEqual(before - 1000);
  });

  it('refuses % rise or × initial when the feeding has no initial height, naming the field', async () => {
    const pct = expectFieldErrors(await call('POST', checksUrl(noHeight), { risePct: 50 }), ['risePct']);
    expect(pct.details?.[0]?.message).toMatch(/initial height/);
    expectFieldErrors(await call('POST', checksUrl(noHeight), { multiple: 2 }), ['multiple']);
    expect((await addCheck({ heightMm: 70 }, noHeight)).heightMm).toBe(70);
    expect(await checkCount()).toBe(1);
  });

  it('refuses a converted height above the 1000 mm limit, naming the field sent', async () => {
    // 40 mm × 10 = 400 mm is fine; a 200 mm start at 900 % would be 2000 mm.
    const tall = (
      await call('POST', `/api/cultures/${feeding.cultureId}/feedings`, {
        fedAt: FED_AT,
        ratio: '1:1:1',
        totalG: 300,
        initialHeightMm: 200,
      })
    ).json<Feeding>();
    expectFieldErrors(await call('POST', checksUrl(tall), { risePct: 900 }), ['risePct']);
    expectFieldErrors(await call('POST', checksUrl(tall), { multiple: 6 }), ['multiple']);
    expect(await checkCount()).toBe(0);
  });

  it('asks for exactly one way of giving the height', async () => {
    expectFieldErrors(await call('POST', checksUrl(), { takenAt: '2025-03-01T09:00:00Z' }), ['heightMm']);
    expectFieldErrors(await call('POST', checksUrl(), { heightMm: 50, risePct: 25 }), ['heightMm', 'risePct']);
    expectFieldErrors(await call('POST', checksUrl(), { risePct: 25, multiple: 1.25 }), ['risePct', 'multiple']);
    expect(await checkCount()).toBe(0);
  });

  it('refuses invalid values with 400 naming each field, and writes nothing', async () => {
    const cases: Array<[Record<string, unknown>, string[]]> = [
      [{ heightMm: 0 }, ['heightMm']],
      [{ heightMm: 1000.1 }, ['heightMm']],
      [{ heightMm: null }, ['heightMm']],
      [{ risePct: -100 }, ['risePct']],
      [{ multiple: 0 }, ['multiple']],
      [{ multiple: '2' }, ['multiple']],
      [{ heightMm: 50, temperatureC: 51 }, ['temperatureC']],
      [{ heightMm: 50, takenAt: '2025-03-01T06:59:59Z' }, ['takenAt']],
      [{ heightMm: 50, takenAt: new Date(Date.now() + 6 * 60_000).toISOString() }, ['takenAt']],
      [{ heightMm: 50, takenAt: 'yesterday' }, ['takenAt']],
      [{ heightMm: 50, feedingId: noHeight.id }, ['feedingId']],
    ];
    for (const [payload, fields] of cases) {
      expectFieldErrors(await call('POST', checksUrl(), { takenAt: '2025-03-01T09:00:00Z', ...payload }), fields);
    }
    expect(await checkCount()).toBe(0);
  });

  it('accepts a check taken at the very moment of feeding', async () => {
    expect((await addCheck({ takenAt: FED_AT, heightMm: 40 })).takenAt).toBe(FED_AT);
  });
});

describe('GET /api/feedings/:feedingId/rise-checks', () => {
  it("lists the feeding's checks oldest first, with paging and a total", async () => {
    for (const hour of ['11', '09', '10'])
      await addCheck({ takenAt: `2025-03-01T${hour}:00:00Z`, heightMm: Number(hour) * 5 });
    await addCheck({ heightMm: 45 }, noHeight);
    const list = (await call('GET', checksUrl())).json<RiseCheckListResponse>();
    expect(list.items.map((c) => c.takenAt.slice(11, 13))).toEqual(['09', '10', '11']);
    expect(list).toMatchObject({ total: 3, limit: 200, offset: 0 });
    const page = (await call('GET', `${checksUrl()}?limit=1&offset=1`)).json<RiseCheckListResponse>();
    expect(page.items.map((c) => c.heightMm)).toEqual([50]);
    expect(page.total).toBe(3);
  });
});

describe('PATCH /api/rise-checks/:id', () => {
  it('changes the fields sent, converting % rise again', async () => {
    const check = await addCheck({ heightMm: 50, temperatureC: 22 });
    const res = await call('PATCH', `/api/rise-checks/${check.id}`, { risePct: 150 });
    expect(res.statusCode, res.body).toBe(200);
    expect(res.json<RiseCheck>()).toMatchObject({ heightMm: 100, temperatureC: 22, takenAt: check.takenAt });
    const cleared = (await call('PATCH', `/api/rise-checks/${check.id}`, { temperatureC: null })).json<RiseCheck>();
    expect(cleared).toMatchObject({ heightMm: 100, temperatureC: null });
  });

  it('refuses a time before the feeding or two ways of giving the height', async () => {
    const check = await addCheck({ heightMm: 50 });
    expectFieldErrors(await call('PATCH', `/api/rise-checks/${check.id}`, { takenAt: '2025-02-28T07:00:00Z' }), [
      'takenAt',
    ]);
    expectFieldErrors(await call('PATCH', `/api/rise-checks/${check.id}`, { heightMm: 60, multiple: 2 }), [
      'heightMm',
      'multiple',
    ]);
    expectFieldErrors(await call('PATCH', `/api/rise-checks/${check.id}`, { heightMm: null }), ['heightMm']);
    expect((await call('GET', checksUrl())).json<RiseCheckListResponse>().items).toEqual([check]);
  });
});

describe('DELETE /api/rise-checks/:id', () => {
  it('deletes one check and leaves the others', async () => {
    const gone = await addCheck({ heightMm: 50 });
    const kept = await addCheck({ heightMm: 60 });
    expect((await call('DELETE', `/api/rise-checks/${gone.id}`)).statusCode).toBe(204);
    expectError(await call('DELETE', `/api/rise-checks/${gone.id}`), 404);
    expect((await call('GET', checksUrl())).json<RiseCheckListResponse>().items).toEqual([kept]);
  });
});
