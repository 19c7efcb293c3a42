import { describe, expect, it } from 'vitest';
import { expectError, signUp } from './helpers.js';
import {
  call,
  counts,
  culture,
  exportCsv,
  HEADER,
  importUrl,
  logbook,
  other,
  seedLogbook,
  t,
  TRICKY_NOTES,
  withTwoCultures,
} from './logbook-transfer.fixtures.js';
withTwoCultures();

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
