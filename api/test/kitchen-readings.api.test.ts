import { readFileSync } from 'node:fs';
import {
  batches,
  guessLoggerMapping,
  LoggerCollector,
  TEMPERATURE_READINGS_MAX_PER_REQUEST,
  type BakePlanView,
  type KitchenReadingListResponse,
  type KitchenReadingsAdded,
} from '@peakwise/shared';
import Papa from 'papaparse';
import { beforeEach, describe, expect, it } from 'vitest';
import {
  HOUR,
  caller,
  created,
  createFormula,
  getPlan,
  iso,
  mockClock,
  planBody,
  step,
  type Clock,
} from './bake-plan.fixtures.js';
import { expectError, expectFieldErrors, signUp, withSignedInBaker, type SignedUp } from './helpers.js';
import type { TestApp } from './test-app.js';

// A kitchen logger's file onto a bake, as the web page does it: papaparse and the shared
// logger-import functions read test-fixtures/logger/kitchen-fahrenheit-mdy.csv (an invented
// sample: "Date Time" / "Temp (°F)", m/d/y 12-hour times, about 80 °F from 06:00 UTC on 28 Nov
// 2026), and the readings go to the plan in batches. The bulk forecast must move with the room.

let t: TestApp;
let theo: SignedUp;
let clock: Clock;
withSignedInBaker({}, (app, baker) => {
  t = app;
  theo = baker;
});
beforeEach(() => {
  clock = mockClock(t);
});
const call: ReturnType<typeof caller> = (...args) => caller(t, () => theo)(...args);

const MIX = Date.parse('2026-11-28T08:00:00Z');

function fixtureReadings(): { takenAt: string; temperatureC: number }[] {
  const text = readFileSync(new URL('../../test-fixtures/logger/kitchen-fahrenheit-mdy.csv', import.meta.url), 'utf8');
  const { data } = Papa.parse<string[]>(text, { skipEmptyLines: 'greedy' });
  const guess = guessLoggerMapping(data.slice(0, 200), 'UTC');
  if (!guess.mapping) throw new Error('The sample file should be recognised');
  expect(guess.mapping.unit).toBe('F');
  // The bake's window as the page sets it: from an hour before the mix, for a day.
  const collector = new LoggerCollector(guess.mapping, { startMs: MIX - HOUR, hours: 24, nowMs: Date.now() });
  data.slice(guess.headerRow + 1).forEach((cells, i) => collector.add(cells, guess.headerRow + 2 + i));
  return collector.result().readings.map((r) => ({ takenAt: iso(r.ms), temperatureC: r.c }));
}

async function mixedPlan(): Promise<BakePlanView> {
  clock.set(MIX);
  const formula = await createFormula(call);
  // A dough planned at 24 °C; the room turns out to be about 80 °F (26.7 °C).
  const view = await created<BakePlanView>(
    call('POST', '/api/plans', planBody(formula.id, { starter: { skipFeeding: true }, doughTemperatureC: 24 })),
  );
  await created(call('POST', `/api/plans/${view.id}/steps/mix/done`, { startedAt: iso(MIX) }));
  clock.set(MIX + HOUR);
  return getPlan(call, view.id);
}

async function send(planId: string, readings: { takenAt: string; temperatureC: number }[]) {
  let last: KitchenReadingsAdded = { added: 0, total: 0 };
  let added = 0;
  for (const part of batches(readings, TEMPERATURE_READINGS_MAX_PER_REQUEST)) {
    last = await created<KitchenReadingsAdded>(
      call('POST', `/api/plans/${planId}/kitchen-temperatures`, { readings: part }),
    );
    added += last.added;
  }
  return { added, total: last.total };
}

const bulkEnd = (view: BakePlanView) => Date.parse(step(view.live, 'bulk-end').startAt);

describe('a kitchen logger file on a bake', () => {
  it('stores the °F file in °C once, and the warmer room brings the bulk end forward', async () => {
    const before = await mixedPlan();
    expect(before.kitchen).toBeNull();
    const readings = fixtureReadings();
    // 24 h at one reading per 5 min (the file has one a minute), first at the window's start.
    expect(readings.length).toBeGreaterThan(250);
    // °F → °C (NIST SP 811: t/°C = (t/°F − 32)/1.8): the file's 07:00 row reads 80.5 °F.
    expect(readings[0]).toEqual({
      takenAt: iso(MIX - HOUR),
      temperatureC: Math.round(((80.5 - 32) / 1.8) * 100) / 100,
    });

    expect(await send(before.id, readings)).toEqual({ added: readings.length, total: readings.length });
    const after = await getPlan(call, before.id);
    expect(after.kitchen).toEqual({
      count: readings.length,
      firstAt: readings[0]?.takenAt,
      lastAt: readings[readings.length - 1]?.takenAt,
    });
    expect(bulkEnd(after)).toBeLessThan(bulkEnd(before) - 20 * 60_000);

    // The same file again adds nothing and changes nothing.
    expect(await send(before.id, readings)).toEqual({ added: 0, total: readings.length });
    expect(bulkEnd(await getPlan(call, before.id))).toBe(bulkEnd(after));

    const list = await created<KitchenReadingListResponse>(
      call('GET', `/api/plans/${before.id}/kitchen-temperatures`),
      200,
    );
    expect(list.items).toHaveLength(readings.length);
    expect(list.items[0]).toEqual({
      takenAt: new Date(readings[0]?.takenAt ?? '').toISOString(),
      temperatureC: readings[0]?.temperatureC,
    });

    // Removing the series puts the forecast back.
    expect((await call('DELETE', `/api/plans/${before.id}/kitchen-temperatures`)).statusCode).toBe(204);
    const cleared = await getPlan(call, before.id);
    expect(cleared.kitchen).toBeNull();
    expect(bulkEnd(cleared)).toBe(bulkEnd(before));
  });

  it('refuses bad readings by field and stores none of the batch', async () => {
    const view = await mixedPlan();
    const url = `/api/plans/${view.id}/kitchen-temperatures`;
    const good = { takenAt: iso(MIX), temperatureC: 22 };
    expectFieldErrors(
      await call('POST', url, { readings: [good, { takenAt: iso(MIX - 25 * HOUR), temperatureC: 22 }] }),
      ['readings.1.takenAt'],
    );
    expectFieldErrors(await call('POST', url, { readings: [good, { takenAt: iso(MIX), temperatureC: 80 }] }), [
      'readings.1.temperatureC',
    ]);
    expectFieldErrors(
      await call('POST', url, { readings: [{ takenAt: iso(Date.now() + 2 * HOUR), temperatureC: 20 }] }),
      ['readings.0.takenAt'],
    );
    expectFieldErrors(await call('POST', url, { readings: [] }), ['readings']);
    expect((await getPlan(call, view.id)).kitchen).toBeNull();
  });

  it('is private: another baker gets 404 for every kitchen route and changes nothing', async () => {
    const view = await mixedPlan();
    await send(view.id, [{ takenAt: iso(MIX), temperatureC: 21 }]);
    const mallory = await signUp(t.app);
    const url = `/api/plans/${view.id}/kitchen-temperatures`;
    expectError(await call('GET', url, undefined, mallory), 404);
    expectError(await call('POST', url, { readings: [{ takenAt: iso(MIX + HOUR), temperatureC: 30 }] }, mallory), 404);
    expectError(await call('DELETE', url, undefined, mallory), 404);
    expect((await getPlan(call, view.id)).kitchen?.count).toBe(1);
  });
});
