import {
  fitCultureKinetics,
  fitRise,
  predictNextPeak,
  type Culture,
  type CultureSummary,
  type Feeding,
  type ObservedFeeding,
  type RiseCheck,
} from '@peakwise/shared';
import { describe, expect, it, vi } from 'vitest';
import { SummaryClock } from '../src/culture/culture-summary.service.js';
import {
  created,
  expectError,
  gompertzHeight,
  signUp,
  withSignedInBaker,
  type InjectResponse,
  type SignedUp,
  send,
} from './helpers.js';
import type { TestApp } from './test-app.js';

// Test data is logged through the real routes at times in the past; the summary's "now" is the
// SummaryClock, which a test may move to look at the culture at a chosen moment.

let t: TestApp;
let theo: SignedUp;
withSignedInBaker({}, (app, baker) => {
  t = app;
  theo = baker;
});

const HOUR = 3_600_000;
const H0 = 50;
const ago = (hours: number) => new Date(Date.now() - hours * HOUR).toISOString();
const later = (iso: string, hours: number) => new Date(Date.parse(iso) + hours * HOUR).toISOString();

function call(method: 'GET' | 'POST', url: string, payload?: unknown, cookie = theo.cookie): Promise<InjectResponse> {
  return send(t.app, method, url, cookie, payload);
}

const post = <T>(url: string, payload: unknown): Promise<T> => created<T>(call('POST', url, payload));

const createCulture = (payload: Record<string, unknown> = {}) =>
  post<Culture>('/api/cultures', { name: 'Bramble', ...payload });

function feed(culture: Culture, payload: Record<string, unknown>): Promise<Feeding> {
  return post<Feeding>(`/api/cultures/${culture.id}/feedings`, { starterG: 20, flourG: 40, waterG: 40, ...payload });
}

/** Rise checks of a Gompertz rise (heights rounded to 0.1 mm), `rate` × faster than at 24 °C. */
async function logRise(feeding: Feeding, hours: number[], rate = 1, fall = false): Promise<RiseCheck[]> {
  const height = (h: number) => gompertzHeight(H0, h, rate);
  const points = hours.map((h) => ({ h, mm: height(h) }));
  if (fall) {
    const last = hours.at(-1) ?? 0;
    points.push({ h: last + 1, mm: height(last) - 20 }, { h: last + 2, mm: height(last) - 30 });
  }
  const checks: RiseCheck[] = [];
  for (const p of points) {
    checks.push(
      await post<RiseCheck>(`/api/feedings/${feeding.id}/rise-checks`, {
        takenAt: later(feeding.fedAt, p.h),
        heightMm: p.mm,
      }),
    );
  }
  return checks;
}

async function summary(culture: Culture, at?: Date): Promise<CultureSummary> {
  if (at) vi.spyOn(t.app.get(SummaryClock), 'now').mockReturnValue(at);
  const res = await call('GET', `/api/cultures/${culture.id}/summary`);
  expect(res.statusCode, res.body).toBe(200);
  return res.json<CultureSummary>();
}

const readingsOf = (checks: RiseCheck[]) => checks.map((c) => ({ at: c.takenAt, heightMm: c.heightMm }));

/** Four completed feedings at 20, 22, 24 and 26 °C, each seen to peak and fall. */
async function logHistory(culture: Culture): Promise<ObservedFeeding[]> {
  const history: ObservedFeeding[] = [];
  for (const [i, temperatureC] of [20, 22, 24, 26].entries()) {
    const rate = ((temperatureC - 6) / 18) ** 2;
    const feeding = await feed(culture, { fedAt: ago(24 * (5 - i)), temperatureC, initialHeightMm: H0 });
    const hours = Array.from({ length: Math.ceil(10 / rate) }, (_, k) => k + 1);
    const checks = await logRise(feeding, hours, rate, true);
    const rise = fitRise({ fedAt: feeding.fedAt, initialHeightMm: H0, readings: readingsOf(checks) });
    expect(rise.status).toBe('peaked');
    const { fedAt, starterG, flourG, waterG } = feeding;
    history.push({ fedAt, starterG, flourG, waterG, temperatureC, hoursToPeak: rise.hoursToPeak ?? NaN });
  }
  return history;
}

describe('GET /api/cultures/:id/summary', () => {
  it("answers 404 for another account's culture and 400 for a malformed id", async () => {
    const culture = await createCulture();
    const mira = await signUp(t.app, { displayName: 'Mira Sol' });
    const res = await call('GET', `/api/cultures/${culture.id}/summary`, undefined, mira.cookie);
    expectError(res, 404);
    expectError(await call('GET', '/api/cultures/not-a-uuid/summary'), 400);
    expectError(await call('GET', '/api/cultures/00000000-0000-4000-8000-000000000000/summary'), 404);
    expect((await t.app.inject({ method: 'GET', url: `/api/cultures/${culture.id}/summary` })).statusCode).toBe(401);
  });

  it('says not-fed-yet for a culture without feedings, with the default kinetics', async () => {
    const culture = await createCulture();
    const s = await summary(culture);
    expect(s).toMatchObject({ culture, state: 'not-fed-yet', lastFedAt: null, running: null, forecast: null });
    expect(s.caution).toBeNull();
    expect(s.kinetics).toMatchObject({
      basis: 'default',
      feedingsUsed: 0,
      observations: [],
      referenceTemperatureC: 24,
    });
    expect(s.kinetics.hoursToPeakAtReference).toBe(fitCultureKinetics([]).hoursToPeakAtReference);
    expect(s.kinetics.hoursToPeakAt.map((p) => p.temperatureC)).toEqual([18, 21, 24, 27]);
    const hours = s.kinetics.hoursToPeakAt.map((p) => p.hours);
    expect([...hours].sort((a, b) => b - a)).toEqual(hours); // warmer is faster
  });

  it("fits the running feeding's five rise checks exactly as fitRise does", async () => {
    const culture = await createCulture();
    const feeding = await feed(culture, { fedAt: ago(5.5), temperatureC: 24, initialHeightMm: H0 });
    const checks = await logRise(feeding, [1, 2, 3, 4, 5]);
    const expected = fitRise({ fedAt: feeding.fedAt, initialHeightMm: H0, readings: readingsOf(checks) });
    expect(expected.status).toBe('rising');
    expect(expected.peakInterval).not.toBeNull();

    const s = await summary(culture, new Date(later(feeding.fedAt, 5.5)));
    expect(s.lastFedAt).toBe(feeding.fedAt);
    expect(s.running).toMatchObject({
      feeding,
      riseStatus: expected.status,
      riseMultiple: expected.riseMultiple,
      peakAt: expected.peakAt,
      readyFrom: expected.readyFrom,
      readyUntil: expected.readyUntil,
    });
    expect(s.running?.readings).toEqual(checks.map((c, i) => ({ hours: i + 1, multiple: c.heightMm / H0 })));
    const curve = s.running?.fittedCurve ?? [];
    expect(curve).toHaveLength(40);
    expect(curve[0]?.hours).toBe(0);
    expect(curve.at(-1)?.hours).toBeCloseTo(1.3 * (expected.hoursToPeak ?? NaN), 9);
    expect(s.forecast).toEqual({
      peakAt: expected.peakAt,
      low: expected.peakInterval?.low,
      high: expected.peakInterval?.high,
      level: 0.8,
      hoursToPeak: expected.hoursToPeak,
      basis: 'readings',
    });
    expect(s.state).toBe('rising');
    expect(s.caution).toBeNull();

    const readyFrom = Date.parse(expected.readyFrom ?? '');
    const readyUntil = Date.parse(expected.readyUntil ?? '');
    expect((await summary(culture, new Date((readyFrom + readyUntil) / 2))).state).toBe('ready');
    expect((await summary(culture, new Date(readyUntil + HOUR))).state).toBe('past-peak');
  });

  it('learns the kinetics from four completed feedings as fitCultureKinetics does', async () => {
    const culture = await createCulture();
    const history = await logHistory(culture);
    const running = await feed(culture, { fedAt: ago(1), temperatureC: 23, initialHeightMm: H0 });
    const kinetics = fitCultureKinetics(history, { asOf: running.fedAt });

    const s = await summary(culture, new Date(later(running.fedAt, 0.5)));
    expect(s.kinetics).toMatchObject({
      basis: 'culture',
      feedingsUsed: 4,
      model: kinetics.model,
      hoursToPeakAtReference: kinetics.hoursToPeakAtReference,
      referenceTemperatureC: 24,
      trend: kinetics.trend.label,
    });
    expect(s.kinetics.observations.map((o) => [o.temperatureC, o.hoursToPeak, o.dilution])).toEqual(
      [...history].reverse().map((f) => [f.temperatureC, f.hoursToPeak, 5]),
    );
    const at21 = predictNextPeak(kinetics, {
      fedAt: running.fedAt,
      starterG: 1,
      flourG: 1,
      waterG: 1,
      temperatureC: 21,
    });
    expect(s.kinetics.hoursToPeakAt.find((p) => p.temperatureC === 21)?.hours).toBe(at21.hoursToPeak);

    // No rise checks on the running feeding yet: the forecast is the culture's, from predictNextPeak.
    const { fedAt, starterG, flourG, waterG } = running;
    const expected = predictNextPeak(kinetics, { fedAt, starterG, flourG, waterG, temperatureC: 23, temperatures: [] });
    expect(s.forecast).toEqual({
      peakAt: expected.peakAt,
      low: expected.low,
      high: expected.high,
      level: 0.8,
      hoursToPeak: expected.hoursToPeak,
      basis: 'culture',
    });
    expect(s.running).toMatchObject({ riseStatus: 'insufficient-data', readings: [], fittedCurve: null });
    expect(s.state).toBe('waiting');
    expect((await summary(culture, new Date(Date.parse(expected.high ?? '') + HOUR))).state).toBe('past-peak');
  });

  it('has no forecast once the running feeding is seen to peak and fall', async () => {
    const culture = await createCulture();
    const feeding = await feed(culture, { fedAt: ago(14), temperatureC: 24, initialHeightMm: H0 });
    const checks = await logRise(feeding, [1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 1, true);
    const expected = fitRise({ fedAt: feeding.fedAt, initialHeightMm: H0, readings: readingsOf(checks) });
    const s = await summary(culture, new Date(later(feeding.fedAt, 13)));
    expect(s.running).toMatchObject({ riseStatus: 'peaked', peakAt: expected.peakAt });
    expect(s.forecast).toBeNull();
    expect(s.state).toBe('past-peak');
    // A peaked feeding is the running one, not history: the kinetics have nothing to learn from.
    expect(s.kinetics).toMatchObject({ basis: 'default', observations: [] });
  });

  it('forecasts a feeding with no temperature at the last one the culture logged', async () => {
    const culture = await createCulture();
    await feed(culture, { fedAt: ago(30), temperatureC: 19.5 });
    const running = await feed(culture, { fedAt: ago(2) });
    const { fedAt, starterG, flourG, waterG } = running;
    const expected = predictNextPeak(fitCultureKinetics([], { asOf: fedAt }), {
      fedAt,
      starterG,
      flourG,
      waterG,
      temperatureC: 19.5,
      temperatures: [],
    });
    const s = await summary(culture);
    expect(s.forecast).toMatchObject({ peakAt: expected.peakAt, basis: 'default' });
    expect(s.kinetics).toMatchObject({ basis: 'default', feedingsUsed: 0 });
  });

  it('shows the caution for discolouration on the running feeding', async () => {
    const culture = await createCulture();
    await feed(culture, { fedAt: ago(3), observations: ['bubbles', 'discolouration'] });
    const s = await summary(culture);
    expect(s.caution).toBe(
      "Pink, orange or fuzzy growth means the culture is spoiled: discard it, don't rescue it. " +
        'When in doubt, follow local food-safety advice.',
    );
  });

  it('says in-fridge for a culture kept in the fridge', async () => {
    const culture = await createCulture({ location: 'fridge' });
    await feed(culture, { fedAt: ago(3), temperatureC: 4 });
    expect((await summary(culture)).state).toBe('in-fridge');
    expect((await summary(await createCulture({ location: 'fridge' }))).state).toBe('in-fridge');
  });
});
