import type { Culture, Feeding, RiseCheck } from '@peakwise/shared';
import Papa from 'papaparse';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { expectError, signUp, type InjectResponse, type SignedUp, send } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

let theo: SignedUp;
let culture: Culture;
let other: Culture;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
  culture = (await call('POST', '/api/cultures', { name: 'Bramble "the rye" / №1' })).json<Culture>();
  other = (await call('POST', '/api/cultures', { name: 'Copy' })).json<Culture>();
});

function call(
  method: 'GET' | 'POST',
  url: string,
  payload?: unknown,
  cookie: string = theo.cookie,
): Promise<InjectResponse> {
  return send(t.app, method, url, cookie, payload);
}

const HEADER =
  'fed_at,starter_g,flour_g,water_g,flour,temperature_c,water_temperature_c,initial_height_mm,observations,notes,check_taken_at,check_height_mm,check_temperature_c';
const TRICKY_NOTES = 'Fed late, "very" sour;\nsmelled like "apples, vinegar"';

async function post(url: string, payload: unknown, status = 201): Promise<unknown> {
  const res = await call('POST', url, payload);
  expect(res.statusCode, res.body).toBe(status);
  return res.json();
}

/** Two feedings with checks and one without, in the first culture. */
async function seedLogbook(): Promise<void> {
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

async function exportCsv(id = culture.id): Promise<string> {
  const res = await call('GET', `/api/cultures/${id}/export.csv`);
  expect(res.statusCode, res.body).toBe(200);
  return res.body;
}

const importUrl = (id = other.id) => `/api/cultures/${id}/import`;

/** The logbook of a culture without ids and timestamps, to compare two cultures by value. */
async function logbook(id: string) {
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

const counts = async () => ({
  feedings: (await t.db.selectFrom('feeding').select('id').execute()).length,
  checks: (await t.db.selectFrom('riseCheck').select('id').execute()).length,
});

describe('GET /api/cultures/:id/export.csv', () => {
  it('answers one row per rise check with a header, as an attachment with a safe name', async () => {
    await seedLogbook();
    const res = await call('GET', `/api/cultures/${culture.id}/export.csv`);
    expect(res.statusCode, res.body).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename="Bramble-the-rye-No1-feedings.csv"');
    const parsed = Papa.parse<Record<string, string>>(res.body, { header: true, skipEmptyLines: true });
    expect(parsed.meta.fields).toEqual(HEADER.split(','));
    expect(parsed.data).toHaveLength(4);
    expect(parsed.data[0]).toMatchObject({
      fed_at: '2025-02-01T07:30:00.000Z',
      flour: 'whole rye, stone-ground',
      observations: 'bubbles;sour-smell',
      notes: TRICKY_NOTES,
      check_taken_at: '2025-02-01T10:30:00.000Z',
      check_height_mm: '60',
      check_temperature_c: '23',
    });
    expect(parsed.data[3]).toMatchObject({
      fed_at: '2025-02-03T07:30:00.000Z',
      check_taken_at: '',
      check_height_mm: '',
    });
  });

  it("answers 404 for another account's culture", async () => {
    const sam = await signUp(t.app, { displayName: 'Sam' });
    expectError(await call('GET', `/api/cultures/${culture.id}/export.csv`, undefined, sam.cookie), 404);
  });
});

describe('POST /api/cultures/:id/import', () => {
  it('re-imports an export into another culture with the same values, and a second time as duplicates', async () => {
    await seedLogbook();
    const csv = await exportCsv();
    const res = await call('POST', importUrl(), { csv });
    expect(res.statusCode, res.body).toBe(200);
    expect(res.json()).toMatchObject({
      dryRun: false,
      feedings: { new: 3, duplicate: 0 },
      riseChecks: { new: 3, duplicate: 0 },
      errors: [],
    });
    expect(res.json<{ preview: unknown[] }>().preview).toHaveLength(4);
    const copied = await logbook(other.id);
    expect(copied).toEqual(await logbook(culture.id));
    expect(copied[0]!.notes).toBe(TRICKY_NOTES);

    const before = await counts();
    const again = await call('POST', importUrl(), { csv });
    expect(again.statusCode, again.body).toBe(200);
    expect(again.json()).toMatchObject({ feedings: { new: 0, duplicate: 3 }, riseChecks: { new: 0, duplicate: 3 } });
    expect(await counts()).toEqual(before);
    // The exported culture itself, too: everything in it is already there.
    const self = await call('POST', importUrl(culture.id), { csv });
    expect(self.json()).toMatchObject({ feedings: { new: 0, duplicate: 3 }, riseChecks: { new: 0, duplicate: 3 } });
    expect(await counts()).toEqual(before);
  });

  it('refuses a file with bad rows, naming line and column, and writes nothing', async () => {
    const csv = [
      HEADER,
      '2025-03-01T07:00:00Z,20,100,100,,,,40,,,2025-03-01T09:00:00Z,50,',
      '2025-03-01T07:00:00Z,20,100,100,,,,40,,,2025-03-01T10:00:00Z,60,',
      '2025-03-02T07:00:00Z,20,100,100,,80,,,,,,,',
      '2025-03-03T07:00:00Z,20,100,100,,,,,,"two\nlines",,,',
      'yesterday,20,100,100,,,,,,,,,',
    ].join('\n');
    const before = await counts();
    const res = await call('POST', importUrl(), { csv });
    const body = expectError(res, 400);
    expect(body.details).toEqual([
      { field: 'line 4: temperature_c', message: expect.stringContaining('temperature') as string },
      { field: 'line 7: fed_at', message: expect.stringContaining('ISO 8601') as string },
    ]);
    expect(await counts()).toEqual(before);

    const dry = await call('POST', importUrl(), { csv, dryRun: true });
    expect(dry.statusCode, dry.body).toBe(200);
    expect(dry.json()).toMatchObject({
      dryRun: true,
      feedings: { new: 2, duplicate: 0 },
      riseChecks: { new: 2, duplicate: 0 },
      errors: [
        { line: 4, field: 'temperature_c' },
        { line: 7, field: 'fed_at' },
      ],
    });
    expect(await counts()).toEqual(before);
  });

  it('applies the feeding and rise-check rules: weights, observations, checks before the feeding', async () => {
    const csv = [
      HEADER,
      '2025-03-01T07:00:00Z,,100,abc,,,,,bubbles;fizz,,,,',
      '2025-03-02T07:00:00Z,20,100,100,,,,,,,2025-03-02T06:00:00Z,50,',
      '2025-03-03T07:00:00Z,20,100,100,,,,,,,2025-03-03T08:00:00Z,,',
    ].join('\r\n');
    const res = await call('POST', importUrl(), { csv, dryRun: true });
    expect(res.statusCode, res.body).toBe(200);
    expect(
      res.json<{ errors: Array<{ line: number; field: string }> }>().errors.map((e) => `${e.line} ${e.field}`),
    ).toEqual(['2 starter_g', '2 water_g', '2 observations', '3 check_taken_at', '4 check_height_mm']);
  });

  it('a dry run counts and previews but writes nothing', async () => {
    await seedLogbook();
    const csv = await exportCsv();
    const before = await counts();
    const res = await call('POST', importUrl(), { csv, dryRun: true });
    expect(res.statusCode, res.body).toBe(200);
    expect(res.json()).toMatchObject({ dryRun: true, feedings: { new: 3 }, riseChecks: { new: 3 }, errors: [] });
    expect(await counts()).toEqual(before);
  });

  it('reads renamed headers through a mapping', async () => {
    const csv = [
      'When,Starter,Flour g,Water g,Note,Checked,Height',
      '2025-03-01T08:00:00+01:00,20,100,100,"a, b",2025-03-01T09:00:00Z,55',
      '2025-03-01T08:00:00+01:00,20,100,100,"a, b",2025-03-01T10:00:00Z,70',
    ].join('\n');
    const mapping = {
      fed_at: 'When',
      starter_g: 'Starter',
      flour_g: 'Flour g',
      water_g: 'Water g',
      notes: 'Note',
      check_taken_at: 'Checked',
      check_height_mm: 'Height',
    };
    const res = await call('POST', importUrl(), { csv, mapping });
    expect(res.statusCode, res.body).toBe(200);
    expect(res.json()).toMatchObject({ feedings: { new: 1, duplicate: 0 }, riseChecks: { new: 2, duplicate: 0 } });
    const [feeding] = await logbook(other.id);
    expect(feeding).toMatchObject({ fedAt: '2025-03-01T07:00:00.000Z', starterG: 20, notes: 'a, b' });
    expect(feeding!.checks.map((c) => c.heightMm)).toEqual([55, 70]);

    expectError(await call('POST', importUrl(), { csv, mapping: { ...mapping, fed_at: 'Date' } }), 400);
    expectError(await call('POST', importUrl(), { csv, mapping: { colour: 'x' } }), 400);
  });

  it('refuses more than 5,000 rows', async () => {
    const row = '2025-03-01T07:00:00Z,20,100,100,,,,,,,,,';
    const csv = [HEADER, ...Array<string>(5001).fill(row)].join('\n');
    const body = expectError(await call('POST', importUrl(), { csv }), 400);
    expect(body.details?.[0]?.field).toBe('csv');
  });

  it('refuses a body over 1 MB', async () => {
    const res = await call('POST', importUrl(), { csv: `${HEADER}\n${'x'.repeat(1024 * 1024)}` });
    expect(res.statusCode).toBe(413);
    expect(await counts()).toEqual({ feedings: 0, checks: 0 });
  });

  it("answers 404 for another account's culture and 400 for a body without csv", async () => {
    const sam = await signUp(t.app, { displayName: 'Sam' });
    expectError(await call('POST', importUrl(), { csv: HEADER }, sam.cookie), 404);
    expectError(await call('POST', importUrl(), {}), 400);
  });
});

describe('spreadsheet formula injection', () => {
  // Text a spreadsheet would run as a formula: OWASP's "CSV Injection" triggers (= + - @), escaped
  // with a leading quote as it recommends (common practice).
  const RISKY_NOTES = ['=SUM(A1)', '-ish smell', '@home'];

  /** Three feedings with risky notes, a cold kitchen (−3 °C) and a check at −2.5 °C. */
  async function seedRisky(): Promise<void> {
    for (const [day, notes] of RISKY_NOTES.entries()) {
      const feeding = (await post(`/api/cultures/${culture.id}/feedings`, {
        fedAt: `2025-01-0${day + 1}T07:30:00Z`,
        starterG: 20,
        flourG: 100,
        waterG: 100,
        flour: '+10% spelt',
        temperatureC: -3,
        notes,
      })) as Feeding;
      await post(`/api/feedings/${feeding.id}/rise-checks`, {
        takenAt: `2025-01-0${day + 1}T12:00:00Z`,
        heightMm: 55,
        temperatureC: -2.5,
      });
    }
  }

  it('exports risky text cells with a leading quote and negative numbers as they are', async () => {
    await seedRisky();
    const csv = await exportCsv();
    const rows = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true }).data;
    expect(rows.map((row) => row.notes)).toEqual(["'=SUM(A1)", "'-ish smell", "'@home"]);
    expect(rows.map((row) => row.flour)).toEqual(["'+10% spelt", "'+10% spelt", "'+10% spelt"]);
    expect(rows.map((row) => row.temperature_c)).toEqual(['-3', '-3', '-3']);
    expect(rows.map((row) => row.check_temperature_c)).toEqual(['-2.5', '-2.5', '-2.5']);
    // No cell of the file starts a formula: every cell beginning with a trigger is a plain number.
    for (const row of rows) {
      for (const cell of Object.values(row)) {
        if (/^[=+\-@\t\r]/.test(cell)) expect(cell).toMatch(/^-\d+(\.\d+)?$/);
      }
    }
  });

  it('re-imports the escaped cells as the original text and the numbers as numbers', async () => {
    await seedRisky();
    const csv = await exportCsv();
    const res = await call('POST', importUrl(), { csv });
    expect(res.statusCode, res.body).toBe(200);
    const body = res.json<{ errors: unknown[]; preview: Array<Record<string, string>> }>();
    expect(body.errors).toEqual([]);
    expect(body.preview.map((row) => row.notes)).toEqual(RISKY_NOTES);

    const copied = await logbook(other.id);
    expect(copied).toEqual(await logbook(culture.id));
    expect(copied.map((f) => f.notes)).toEqual(RISKY_NOTES);
    expect(copied.map((f) => f.flour)).toEqual(['+10% spelt', '+10% spelt', '+10% spelt']);
    expect(copied.map((f) => f.temperatureC)).toEqual([-3, -3, -3]);
    expect(copied.flatMap((f) => f.checks.map((c) => c.temperatureC))).toEqual([-2.5, -2.5, -2.5]);
  });

  it("keeps a third-party cell's own leading quote unless a trigger follows it", async () => {
    const csv = [
      'fed_at,starter_g,flour_g,water_g,temperature_c,notes',
      `2025-03-01T07:00:00Z,20,100,100,'-4,'tis ripe`,
      `2025-03-02T07:00:00Z,20,100,100,,'=A1`,
    ].join('\n');
    const res = await call('POST', importUrl(), { csv });
    expect(res.statusCode, res.body).toBe(200);
    const copied = await logbook(other.id);
    expect(copied.map((f) => [f.temperatureC, f.notes])).toEqual([
      [-4, "'tis ripe"],
      [null, '=A1'],
    ]);
  });
});

describe('GET /api/account/export.json', () => {
  it('holds the whole account and no password hash', async () => {
    await seedLogbook();
    const res = await call('GET', '/api/account/export.json');
    expect(res.statusCode, res.body).toBe(200);
    expect(res.body).not.toMatch(/password/i);
    const body = res.json<Record<string, unknown[]> & { account: { email: string } }>();
    expect(body).toMatchObject({ format: 'peakwise-export', version: 1, exportedAt: expect.any(String) as string });
    expect(body.account.email).toBe(theo.email);
    expect(body.cultures).toHaveLength(2);
    expect(body.feedings).toHaveLength(3);
    expect(body.riseChecks).toHaveLength(3);
    expect(body.temperatureReadings).toHaveLength(1);

    const sam = await signUp(t.app, { displayName: 'Sam' });
    const empty = (await call('GET', '/api/account/export.json', undefined, sam.cookie)).json<
      Record<string, unknown[]>
    >();
    expect(empty.cultures).toEqual([]);
    expect(empty.feedings).toEqual([]);
  });
});
