import { describe, expect, it } from 'vitest';
import { simulateCulture, trueRateModel } from '../../bench/simulate.js';
import { addHours, hoursBetween } from '../temperature/time.js';
import { relativeRate } from '../temperature/models.js';
import { fitCultureKinetics } from './fit-kinetics.js';
import { predictNextPeak } from './predict.js';
import { type ObservedFeeding, type NextFeeding } from './types.js';

const START = '2026-03-01T08:00:00+01:00';

/** Exact feedings from t = β(h0 + ln D)/r(T) under a Q10 model (no noise unless given). */
function q10Culture(q10: number, count: number, noise: (i: number) => number = () => 0): ObservedFeeding[] {
  const temps = [18, 20, 22, 24, 26, 19, 23, 25, 21, 27];
  const ratios = [1, 2, 5, 1, 10, 2, 1, 5, 3, 1];
  return Array.from({ length: count }, (_, i) => {
    const c = temps[i % temps.length] ?? 22;
    const ratio = ratios[(i * 3) % ratios.length] ?? 1;
    const work = 3 * (0.4 + Math.log(1 + 2 * ratio)) * Math.exp(noise(i));
    return {
      fedAt: addHours(START, 24 * i),
      starterG: 25,
      flourG: 25 * ratio,
      waterG: 25 * ratio,
      temperatureC: c,
      hoursToPeak: work / Math.pow(q10, (c - 24) / 10),
    };
  });
}

const next = (over: Partial<NextFeeding> = {}): NextFeeding => ({
  fedAt: '2026-06-01T08:00:00+02:00',
  starterG: 50,
  flourG: 50,
  waterG: 50,
  temperatureC: 22,
  ...over,
});

describe('fitCultureKinetics', () => {
  it('recovers β, h0 and Q10 from exact Q10 data', () => {
    const k = fitCultureKinetics(q10Culture(3, 40), { model: 'q10', halfLifeFeedings: Infinity });
    expect(k.params.q10).toBeCloseTo(3, 2);
    expect(k.params.betaHours).toBeCloseTo(3, 2);
    expect(k.params.h0).toBeCloseTo(0.4, 2);
    expect(k.hoursToPeakAtReference).toBeCloseTo(3 * (0.4 + Math.log(3)), 2);
    expect(k.basis).toBe('culture');
    expect(k.feedingsUsed).toBe(40);
  });

  it('with two feedings stays near the published Q10 prior (BAKE magazine 1.1^10 ≈ 2.59)', () => {
    const k = fitCultureKinetics(q10Culture(5, 2), { model: 'q10' });
    expect(k.params.q10).toBeGreaterThan(2.2);
    expect(k.params.q10).toBeLessThan(3.6);
    // ...while 40 feedings of the same culture move it most of the way to 5.
    const many = fitCultureKinetics(q10Culture(5, 40), { model: 'q10' });
    expect(many.params.q10).toBeGreaterThan(4.5);
  });

  it('recovers a SIMULATED culture (CTMI mixture of Gänzle cardinals, bench/simulate.ts)', () => {
    // The first seed whose simulated culture does not drift (a drifting one has no single truth).
    const seed = [7, 8, 9, 10, 11, 12].find((s) => simulateCulture(0, 10, s).truth.drift === 0) ?? 0;
    const culture = simulateCulture(0, 300, seed);
    expect(culture.truth.drift).toBe(0);
    const k = fitCultureKinetics(culture.feedings, { model: 'ctmi', halfLifeFeedings: Infinity });
    const truth = trueRateModel(culture.truth);
    // The fitted model's temperature response within 10 % of the simulated one over 16–27 °C.
    for (const c of [16, 18, 21, 27]) {
      expect(relativeRate(k.temperatureModel, c) / truth.rate(c)).toBeGreaterThan(0.9);
      expect(relativeRate(k.temperatureModel, c) / truth.rate(c)).toBeLessThan(1.1);
    }
    // Work to peak for a 1:1:1 feeding within 10 %; residual spread near the simulated σ.
    const work = culture.truth.beta * (culture.truth.h0 + Math.log(3));
    expect(k.hoursToPeakAtReference / work).toBeGreaterThan(0.9);
    expect(k.hoursToPeakAtReference / work).toBeLessThan(1.1);
    expect(k.observedResidualSd).not.toBeNull();
    expect(Math.abs((k.observedResidualSd ?? 0) - culture.truth.sigma)).toBeLessThan(0.05);
  });

  it('gives the same fit whether a constant temperature is logged as one value or as readings', () => {
    const constant = q10Culture(2.5, 8, (i) => 0.1 * Math.sin(i));
    const asSeries = constant.map(({ temperatureC, ...f }) => ({
      ...f,
      temperatures: [
        { at: f.fedAt, c: temperatureC ?? 0 },
        { at: addHours(f.fedAt, f.hoursToPeak + 1), c: temperatureC ?? 0 },
      ],
    }));
    const a = fitCultureKinetics(constant, { model: 'ctmi' });
    const b = fitCultureKinetics(asSeries, { model: 'ctmi' });
    for (let j = 0; j < a.theta.length; j++) expect(b.theta[j]).toBeCloseTo(a.theta[j] ?? NaN, 8);
  });

  it('labels the trend: faster, slower, steady', () => {
    const drift = (rate: number) => q10Culture(2.6, 30, (i) => rate * i + 0.02 * Math.sin(7 * i));
    expect(fitCultureKinetics(drift(-0.03), { model: 'q10' }).trend.label).toBe('faster');
    expect(fitCultureKinetics(drift(0.03), { model: 'q10' }).trend.label).toBe('slower');
    const steady = fitCultureKinetics(drift(0), { model: 'q10' }).trend;
    expect(steady.label).toBe('steady');
    expect(fitCultureKinetics(drift(0.03), { model: 'q10' }).trend.slopePerFeeding).toBeGreaterThan(0);
  });

  it('counts feedings fitted at an assumed temperature (the median of the logged ones)', () => {
    const logged = q10Culture(2.6, 6);
    const unlogged = logged.map(({ temperatureC: _t, ...f }, i) => (i < 2 ? f : (logged[i] ?? f)));
    const k = fitCultureKinetics(unlogged, { model: 'q10' });
    expect(k.feedingsWithAssumedTemperature).toBe(2);
    expect(k.feedingsUsed).toBe(6);
  });

  it('rejects impossible feedings', () => {
    const [f] = q10Culture(2, 1);
    if (!f) throw new Error('no feeding');
    expect(() => fitCultureKinetics([{ ...f, starterG: 0 }])).toThrow(RangeError);
    expect(() => fitCultureKinetics([{ ...f, hoursToPeak: -1 }])).toThrow(RangeError);
    expect(() => fitCultureKinetics([{ ...f, fedAt: '2026-03-01 08:00' }])).toThrow(RangeError);
  });
});

describe('predictNextPeak', () => {
  it('with no history uses the priors; common practice: 1:1:1 near 21–24 °C peaks in roughly 3–8 h', () => {
    for (const c of [21, 22, 24]) {
      const p = predictNextPeak([], next({ temperatureC: c }));
      expect(p.basis).toBe('default');
      expect(p.feedingsUsed).toBe(0);
      expect(p.hoursToPeak).toBeGreaterThan(3);
      expect(p.hoursToPeak).toBeLessThan(8);
      expect(p.peakAt).toBe(addHours('2026-06-01T08:00:00+02:00', p.hoursToPeak ?? NaN));
    }
  });

  it('common practice: 1:5:5 takes clearly longer than 1:1:1 (and 1:10:10 longer still)', () => {
    const one = predictNextPeak([], next()).hoursToPeak ?? NaN;
    const five = predictNextPeak([], next({ starterG: 10, flourG: 50, waterG: 50 })).hoursToPeak ?? NaN;
    const ten = predictNextPeak([], next({ starterG: 10, flourG: 100, waterG: 100 })).hoursToPeak ?? NaN;
    expect(five).toBeGreaterThan(1.5 * one);
    expect(ten).toBeGreaterThan(five);
  });

  it('gives an 80 % interval around the peak that narrows with history', () => {
    const none = predictNextPeak([], next());
    const some = predictNextPeak(
      q10Culture(2.6, 30, (i) => 0.1 * Math.sin(3 * i)),
      next(),
      { model: 'q10' },
    );
    for (const p of [none, some]) {
      expect(p.lowHours).toBeLessThan(p.hoursToPeak ?? NaN);
      expect(p.highHours).toBeGreaterThan(p.hoursToPeak ?? NaN);
    }
    const width = (p: typeof none): number => Math.log((p.highHours ?? NaN) / (p.lowHours ?? NaN));
    expect(width(some)).toBeLessThan(width(none) / 2);
    expect(some.basis).toBe('culture');
    expect(some.q10).toBeDefined();
  });

  it('follows a forecast: fridge at 4 °C until 07:00, then a 22 °C counter', () => {
    const history = q10Culture(2.6, 20);
    const counterOnly = predictNextPeak(history, next({ fedAt: '2026-06-01T07:00:00+02:00' }), { model: 'ctmi' });
    const retarded = predictNextPeak(
      history,
      next({
        fedAt: '2026-05-31T21:00:00+02:00',
        temperatureC: undefined,
        forecast: [{ c: 4, until: '2026-06-01T07:00:00+02:00' }, { c: 22 }],
      }),
      { model: 'ctmi' },
    );
    // CTMI's Tmin is fitted near 4 °C, so the fridge adds little: the peak lands about as long
    // after 07:00 as a feeding made at 07:00 (within 10 %).
    const afterFridge = hoursBetween('2026-06-01T07:00:00+02:00', retarded.peakAt ?? '');
    expect(afterFridge / (counterOnly.hoursToPeak ?? NaN)).toBeGreaterThan(0.9);
    expect(afterFridge / (counterOnly.hoursToPeak ?? NaN)).toBeLessThanOrEqual(1.0);
  });

  it("says 'not reached' (null) for a jar kept at 3 °C under CTMI, never Infinity", () => {
    const p = predictNextPeak([], next({ temperatureC: 3 }), { model: 'ctmi', fitTemperature: false });
    expect(p.peakAt).toBeNull();
    expect(p.hoursToPeak).toBeNull();
  });

  it('needs a temperature for the next feeding', () => {
    expect(() => predictNextPeak([], next({ temperatureC: undefined }))).toThrow(RangeError);
  });

  it('is warmer → sooner below the optimum', () => {
    const h = [18, 21, 24, 27].map((c) => predictNextPeak([], next({ temperatureC: c })).hoursToPeak ?? NaN);
    for (let i = 1; i < h.length; i++) expect(h[i]).toBeLessThan(h[i - 1] ?? NaN);
  });
});
