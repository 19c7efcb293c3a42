import type { Culture, CultureListResponse } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { expectError, expectFieldErrors, signUp, type InjectResponse, type SignedUp, send } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

let theo: SignedUp;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
});

function call(method: 'GET' | 'POST' | 'PATCH' | 'DELETE', url: string, payload?: unknown): Promise<InjectResponse> {
  return send(t.app, method, url, theo.cookie, payload);
}

async function create(payload: Record<string, unknown>): Promise<Culture> {
  const res = await call('POST', '/api/cultures', payload);
  expect(res.statusCode, res.body).toBe(201);
  return res.json<Culture>();
}

async function list(query = ''): Promise<CultureListResponse> {
  const res = await call('GET', `/api/cultures${query}`);
  expect(res.statusCode, res.body).toBe(200);
  return res.json<CultureListResponse>();
}

const cultureCount = async () => (await t.db.selectFrom('culture').select('id').execute()).length;

async function feed(cultureId: string, fedAt: string): Promise<void> {
  const res = await call('POST', `/api/cultures/${cultureId}/feedings`, {
    fedAt,
    starterG: 10,
    flourG: 50,
    waterG: 50,
  });
  expect(res.statusCode, res.body).toBe(201);
}

describe('POST /api/cultures', () => {
  it('creates a culture with defaults and answers the Culture shape', async () => {
    const culture = await create({ name: '  Old Copper ' });
    expect(culture).toEqual({
      id: expect.stringMatching(/^[0-9a-f-]{36}$/) as string,
      name: 'Old Copper',
      notes: null,
      defaultFlour: null,
      defaultHydrationPct: null,
      location: 'counter',
      startedOn: null,
      parentCultureId: null,
      archived: false,
      archivedAt: null,
      lastFedAt: null,
      createdAt: expect.stringMatching(/Z$/) as string,
      updatedAt: expect.stringMatching(/Z$/) as string,
    });
    expect((await call('GET', `/api/cultures/${culture.id}`)).json()).toEqual(culture);
  });

  it('stores every field, the date as a plain calendar date', async () => {
    const culture = await create({
      name: 'Pip',
      notes: 'From the class, week one.',
      defaultFlour: '80 % bread flour, 20 % whole rye',
      defaultHydrationPct: 100,
      location: 'fridge',
      startedOn: '2024-09-14',
    });
    expect(culture).toMatchObject({
      notes: 'From the class, week one.',
      defaultFlour: '80 % bread flour, 20 % whole rye',
      defaultHydrationPct: 100,
      location: 'fridge',
      startedOn: '2024-09-14',
    });
  });

  it('refuses invalid fields with 400 naming each, and writes nothing', async () => {
    const cases: Array<[Record<string, unknown>, string[]]> = [
      [{}, ['name']],
      [{ name: '   ' }, ['name']],
      [{ name: 'x'.repeat(81) }, ['name']],
      [{ name: null }, ['name']],
      [{ name: 'A', location: 'cellar' }, ['location']],
      [{ name: 'A', location: null }, ['location']],
      [{ name: 'A', defaultHydrationPct: 0 }, ['defaultHydrationPct']],
      [{ name: 'A', defaultHydrationPct: 1000.5 }, ['defaultHydrationPct']],
      [{ name: 'A', defaultHydrationPct: '100' }, ['defaultHydrationPct']],
      [{ name: 'A', startedOn: '2024-02-30' }, ['startedOn']],
      [{ name: 'A', startedOn: '3024-01-01' }, ['startedOn']],
      [{ name: 'A', parentCultureId: 'mother' }, ['parentCultureId']],
      [{ name: 'A', defaultFlour: 'f'.repeat(121) }, ['defaultFlour']],
      [{ name: 'A', owner: 'someone' }, ['owner']],
      [{ name: 'A', archived: true }, ['archived']],
    ];
    for (const [payload, fields] of cases) {
      expectFieldErrors(await call('POST', '/api/cultures', payload), fields);
    }
    expect(await cultureCount()).toBe(0);
  });

  it('counts name length in characters, as the database does', async () => {
    expect((await create({ name: '🍞'.repeat(80) })).name).toHaveLength(160);
    expectFieldErrors(await call('POST', '/api/cultures', { name: '🍞'.repeat(81) }), ['name']);
  });

  it("accepts one of the baker's cultures as parent, but not another baker's", async () => {
    const mother = await create({ name: 'Larkspur Mother' });
    expect((await create({ name: 'Bramble', parentCultureId: mother.id })).parentCultureId).toBe(mother.id);
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    const res = await t.app.inject({
      method: 'POST',
      url: '/api/cultures',
      payload: { name: 'Copy', parentCultureId: mother.id },
      headers: { cookie: amara.cookie },
    });
    expectFieldErrors(res, ['parentCultureId']);
    expect(await cultureCount()).toBe(2);
  });
});

describe('PATCH /api/cultures/:id', () => {
  it('changes only the fields sent and clears nullable ones with null or blank text', async () => {
    const culture = await create({ name: 'Pip', notes: 'warm spot', defaultHydrationPct: 80, startedOn: '2024-01-02' });
    const res = await call('PATCH', `/api/cultures/${culture.id}`, { notes: '  ', defaultHydrationPct: null });
    expect(res.statusCode, res.body).toBe(200);
    const changed = res.json<Culture>();
    expect(changed).toMatchObject({ name: 'Pip', notes: null, defaultHydrationPct: null, startedOn: '2024-01-02' });
    expect(Date.parse(changed.updatedAt)).toBeGreaterThanOrEqual(Date.parse(culture.updatedAt));
  });

  it('refuses null for name and location, and unknown fields', async () => {
    const culture = await create({ name: 'Pip' });
    expectFieldErrors(await call('PATCH', `/api/cultures/${culture.id}`, { name: null }), ['name']);
    expectFieldErrors(await call('PATCH', `/api/cultures/${culture.id}`, { location: null }), ['location']);
    expectFieldErrors(await call('PATCH', `/api/cultures/${culture.id}`, { accountId: theo.account.id }), [
      'accountId',
    ]);
    expectFieldErrors(await call('PATCH', `/api/cultures/${culture.id}`, { archived: 'yes' }), ['archived']);
    expect((await call('GET', `/api/cultures/${culture.id}`)).json<Culture>().name).toBe('Pip');
  });

  it('archives and unarchives, keeping the first archive time', async () => {
    const culture = await create({ name: 'Pip' });
    const archived = (await call('PATCH', `/api/cultures/${culture.id}`, { archived: true })).json<Culture>();
    expect(archived.archived).toBe(true);
    expect(archived.archivedAt).toMatch(/Z$/);
    const again = (await call('PATCH', `/api/cultures/${culture.id}`, { archived: true })).json<Culture>();
    expect(again.archivedAt).toBe(archived.archivedAt);
    const back = (await call('PATCH', `/api/cultures/${culture.id}`, { archived: false })).json<Culture>();
    expect(back).toMatchObject({ archived: false, archivedAt: null });
  });
});

describe('GET /api/cultures', () => {
  it("lists only the baker's own cultures, by name A→Z by default", async () => {
    for (const name of ['pip', 'Bramble', 'Old Copper']) await create({ name });
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    await t.app.inject({
      method: 'POST',
      url: '/api/cultures',
      payload: { name: 'Aardvark' },
      headers: { cookie: amara.cookie },
    });
    const page = await list();
    expect(page.items.map((c) => c.name)).toEqual(['Bramble', 'Old Copper', 'pip']);
    expect(page).toMatchObject({ total: 3, limit: 50, offset: 0 });
    expect((await list('?order=desc')).items.map((c) => c.name)).toEqual(['pip', 'Old Copper', 'Bramble']);
  });

  it('filters by archived', async () => {
    const old = await create({ name: 'Old' });
    await create({ name: 'Active' });
    await call('PATCH', `/api/cultures/${old.id}`, { archived: true });
    expect((await list('?archived=true')).items.map((c) => c.name)).toEqual(['Old']);
    expect((await list('?archived=false')).items.map((c) => c.name)).toEqual(['Active']);
    expect((await list()).total).toBe(2);
    expectFieldErrors(await call('GET', '/api/cultures?archived=yes'), ['archived']);
  });

  it('pages with a total of every match', async () => {
    for (const name of ['A', 'B', 'C', 'D', 'E']) await create({ name });
    const page = await list('?limit=2&offset=2');
    expect(page.items.map((c) => c.name)).toEqual(['C', 'D']);
    expect(page).toMatchObject({ total: 5, limit: 2, offset: 2 });
    expect((await list('?limit=2&offset=4')).items.map((c) => c.name)).toEqual(['E']);
    expect((await list('?offset=10')).items).toEqual([]);
  });

  it('sorts by last fed, newest first by default, never-fed cultures last either way', async () => {
    const early = await create({ name: 'Early' });
    const late = await create({ name: 'Late' });
    await create({ name: 'Never' });
    await feed(early.id, '2025-01-01T08:00:00Z');
    await feed(late.id, '2025-01-01T07:00:00Z');
    await feed(late.id, '2025-01-02T07:00:00Z');
    const newest = await list('?sort=lastFedAt');
    expect(newest.items.map((c) => c.name)).toEqual(['Late', 'Early', 'Never']);
    expect(newest.items[0]!.lastFedAt).toBe('2025-01-02T07:00:00.000Z');
    expect((await list('?sort=lastFedAt&order=asc')).items.map((c) => c.name)).toEqual(['Early', 'Late', 'Never']);
  });

  it('refuses bad query parameters with 400 naming each', async () => {
    expectFieldErrors(await call('GET', '/api/cultures?limit=0'), ['limit']);
    expectFieldErrors(await call('GET', '/api/cultures?limit=201'), ['limit']);
    expectFieldErrors(await call('GET', '/api/cultures?offset=-1'), ['offset']);
    expectFieldErrors(await call('GET', '/api/cultures?sort=age&order=up'), ['sort', 'order']);
    expectFieldErrors(await call('GET', '/api/cultures?owner=x'), ['owner']);
  });
});

describe('DELETE /api/cultures/:id', () => {
  it('deletes the culture with its feedings, rise checks and temperatures', async () => {
    const culture = await create({ name: 'Pip' });
    const feeding = await call('POST', `/api/cultures/${culture.id}/feedings`, {
      fedAt: '2025-01-01T08:00:00Z',
      ratio: '1:2:2',
      totalG: 100,
      initialHeightMm: 40,
    });
    const feedingId = feeding.json<{ id: string }>().id;
    await call('POST', `/api/feedings/${feedingId}/rise-checks`, { takenAt: '2025-01-01T09:00:00Z', heightMm: 50 });
    await call('POST', `/api/feedings/${feedingId}/temperatures`, {
      readings: [{ takenAt: '2025-01-01T09:00:00Z', temperatureC: 21 }],
    });
    expect((await call('DELETE', `/api/cultures/${culture.id}`)).statusCode).toBe(204);
    expectError(await call('GET', `/api/cultures/${culture.id}`), 404);
    expectError(await call('GET', `/api/feedings/${feedingId}`), 404);
    for (const table of ['culture', 'feeding', 'riseCheck', 'temperatureReading'] as const) {
      expect(await t.db.selectFrom(table).select('id').execute(), table).toEqual([]);
    }
    expectError(await call('DELETE', `/api/cultures/${culture.id}`), 404);
  });
});
