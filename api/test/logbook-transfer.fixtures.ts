import type { Culture, Feeding, RiseCheck } from '@peakwise/shared';
import { beforeEach, expect } from 'vitest';
import { send, withSignedInBaker, type InjectResponse, type SignedUp } from './helpers.js';
import type { TestApp } from './test-app.js';

// Shared by the logbook transfer tests (export, import, formula escaping): Theo with two cultures,
// a seeded logbook in the first, and ways to read a culture's logbook back by value. The bindings
// below are live: each test sees the app, baker and cultures of its own beforeEach.

export let t: TestApp;
export let theo: SignedUp;
export let culture: Culture;
export let other: Culture;

/** Registers the hooks: an empty database, Theo, and his cultures "Bramble …" and "Copy" before each test. */
export function withTwoCultures(): void {
  withSignedInBaker({}, (app, baker) => {
    t = app;
    theo = baker;
  });
  beforeEach(async () => {
    culture = (await call('POST', '/api/cultures', { name: 'Bramble "the rye" / №1' })).json<Culture>();
    other = (await call('POST', '/api/cultures', { name: 'Copy' })).json<Culture>();
  });
}

export function call(
  method: 'GET' | 'POST',
  url: string,
  payload?: unknown,
  cookie: string = theo.cookie,
): Promise<InjectResponse> {
  return send(t.app, method, url, cookie, payload);
}

export const HEADER =
  'fed_at,starter_g,flour_g,water_g,flour,temperature_c,water_temperature_c,initial_height_mm,observations,notes,check_taken_at,check_height_mm,check_temperature_c';
export const TRICKY_NOTES = 'Fed late, "very" sour;\nsmelled like "apples, vinegar"';

export async function post(url: string, payload: unknown, status = 201): Promise<unknown> {
  const res = await call('POST', url, payload);
  expect(res.statusCode, res.body).toBe(status);
  return res.json();
}

/** Two feedings with checks and one without, in the first culture. */
export async function seedLogbook(): Promise<void> {
  const a = (await post(`/api/cultures/${culture.id}/feedings`, {
    fedAt: '2025-02-01T07:30:00Z',
    starterG: 20,
    flourG: 100,
    waterG: 90.5,
    flour: 'whole rye, stone-ground',
    temperatureC: 22.5,
    waterTemperatureC: 27,
    initialHeightMm: 40,
    observations: ['bubbles', 'sour-smell'],
    notes: TRICKY_NOTES,
  })) as Feeding;
  await post(`/api/feedings/${a.id}/rise-checks`, { takenAt: '2025-02-01T10:30:00Z', heightMm: 60, temperatureC: 23 });
  await post(`/api/feedings/${a.id}/rise-checks`, { takenAt: '2025-02-01T13:30:00Z', heightMm: 82.5 });
  await post(`/api/feedings/${a.id}/temperatures`, {
    readings: [{ takenAt: '2025-02-01T08:00:00Z', temperatureC: 21 }],
  });
  const b = (await post(`/api/cultures/${culture.id}/feedings`, {
    fedAt: '2025-02-02T07:30:00Z',
    starterG: 10,
    flourG: 50,
    waterG: 50,
  })) as Feeding;
  await post(`/api/feedings/${b.id}/rise-checks`, { takenAt: '2025-02-02T12:00:00Z', heightMm: 70 });
  await post(`/api/cultures/${culture.id}/feedings`, {
    fedAt: '2025-02-03T07:30:00Z',
    starterG: 5,
    flourG: 25,
    waterG: 25,
  });
}

export async function exportCsv(id = culture.id): Promise<string> {
  const res = await call('GET', `/api/cultures/${id}/export.csv`);
  expect(res.statusCode, res.body).toBe(200);
  return res.body;
}

export const importUrl = (id = other.id) => `/api/cultures/${id}/import`;

/** The logbook of a culture without ids and timestamps, to compare two cultures by value. */
export async function logbook(id: string) {
  const feedings = (await call('GET', `/api/cultures/${id}/feedings?order=asc`)).json<{ items: Feeding[] }>().items;
  return Promise.all(
    feedings.map(async ({ id: feedingId, cultureId: _c, createdAt: _a, updatedAt: _u, ...feeding }) => {
      const checks = (await call('GET', `/api/feedings/${feedingId}/rise-checks`)).json<{ items: RiseCheck[] }>();
      return {
        ...feeding,
        checks: checks.items.map(({ takenAt, heightMm, temperatureC }) => ({ takenAt, heightMm, temperatureC })),
      };
    }),
  );
}

export const counts = async () => ({
  feedings: (await t.db.selectFrom('feeding').select('id').execute()).length,
  checks: (await t.db.selectFrom('riseCheck').select('id').execute()).length,
});
