import { readFileSync } from 'node:fs';
import {
  batches,
  guessLoggerMapping,
  LoggerCollector,
  TEMPERATURE_READINGS_MAX_PER_REQUEST,
  type Culture,
  type CultureSummary,
  type Feeding,
  type TemperatureReadingListResponse,
} from '@peakwise/shared';
import Papa from 'papaparse';
import { describe, expect, it, vi } from 'vitest';
import { SummaryClock } from '../src/culture/culture-summary.service.js';
import { created, send, withSignedInBaker, type InjectResponse, type SignedUp } from './helpers.js';
import type { TestApp } from './test-app.js';

// A logger file is parsed in the browser (papaparse + the shared logger-import functions) and its
// readings posted to the feeding in batches. This test does the same with the invented sample
// test-fixtures/logger/kitchen-fahrenheit-mdy.csv ("Date Time" / "Temp (°F)", about 80 °F) and
// checks that the culture's forecast uses the series.

let t: TestApp;
let theo: SignedUp;
withSignedInBaker({}, (app, baker) => {
  t = app;
  theo = baker;
});

const HOUR = 3_600_000;
const FED_AT = '2026-11-28T12:00:00.000Z';

const call = (method: 'GET' | 'POST', url: string, payload?: unknown): Promise<InjectResponse> =>
  send(t.app, method, url, theo.cookie, payload);

async function forecastPeak(culture: Culture): Promise<number> {
  // The summary's "now" an hour into the feeding, so it is the running one with a forecast.
  vi.spyOn(t.app.get(SummaryClock), 'now').mockReturnValue(new Date(Date.parse(FED_AT) + HOUR));
  const res = await call('GET', `/api/cultures/${culture.id}/summary`);
  expect(res.statusCode, res.body).toBe(200);
  const peakAt = res.json<CultureSummary>().forecast?.peakAt;
  expect(peakAt).toBeTruthy();
  return Date.parse(peakAt ?? '');
}

function readFixture() {
  const text = readFileSync(new URL('../../test-fixtures/logger/kitchen-fahrenheit-mdy.csv', import.meta.url), 'utf8');
  const { data } = Papa.parse<string[]>(text, { skipEmptyLines: 'greedy' });
  const guess = guessLoggerMapping(data.slice(0, 200), 'UTC');
  if (!guess.mapping) throw new Error('The sample file should be recognised');
  const collector = new LoggerCollector(guess.mapping, { startMs: Date.parse(FED_AT), nowMs: Date.now() });
  data.slice(guess.headerRow + 1).forEach((cells, i) => collector.add(cells, guess.headerRow + 2 + i));
  return { guess, result: collector.result() };
}

describe('importing a logger file into a feeding', () => {
  it('stores a °F series with an unusual header in °C, and a warmer series brings the forecast peak earlier', async () => {
    const culture = await created<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }));
    // Logged at a cool 18 °C; the logger says the kitchen was about 80 °F (26.7 °C) all along.
    const feeding = await created<Feeding>(
      call('POST', `/api/cultures/${culture.id}/feedings`, {
        fedAt: FED_AT,
        starterG: 20,
        flourG: 100,
        waterG: 100,
        temperatureC: 18,
      }),
    );
    const before = await forecastPeak(culture);

    const { guess, result } = readFixture();
    expect(guess.headers).toEqual(['Date Time', 'Temp (°F)']);
    expect(guess.mapping).toMatchObject({ unit: 'F', dateFormat: 'mdy' });
    // 36 h of minute data from 06:00; fed at 12:00: 6 h before the feeding are left out.
    expect(result.outside).toBe(6 * 60);
    for (const readings of batches(result.readings, TEMPERATURE_READINGS_MAX_PER_REQUEST)) {
      const res = await call('POST', `/api/feedings/${feeding.id}/temperatures`, {
        readings: readings.map((r) => ({ takenAt: new Date(r.ms).toISOString(), temperatureC: r.c })),
      });
      expect(res.statusCode, res.body).toBe(201);
    }

    const stored = (
      await call('GET', `/api/feedings/${feeding.id}/temperatures?limit=1000`)
    ).json<TemperatureReadingListResponse>();
    expect(stored.total).toBe(result.readings.length);
    expect(stored.items[0]?.takenAt).toBe(FED_AT);
    // The first row at 12:00 is 80 + 1.5·sin(360/180) = 81.4 °F, i.e. (81.4 − 32)/1.8 = 27.44 °C
    // (NIST SP 811 B.9; the sample's own formula, test-fixtures/logger/README.md).
    expect(stored.items[0]?.temperatureC).toBeCloseTo(27.44, 2);

    const after = await forecastPeak(culture);
    // Warmer than the logged 18 °C, so the starter peaks sooner (the model's temperature response).
    expect(after).toBeLessThan(before - HOUR);
  });
});
