import type { Feeding } from '@peakwise/shared';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import {
  call,
  culture,
  exportCsv,
  importUrl,
  logbook,
  other,
  post,
  withTwoCultures,
} from './logbook-transfer.fixtures.js';

withTwoCultures();

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
