import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { expectError, signUp } from './helpers.js';
import {
  call,
  culture,
  HEADER,
  seedLogbook,
  t,
  theo,
  TRICKY_NOTES,
  withTwoCultures,
} from './logbook-transfer.fixtures.js';

withTwoCultures();

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
