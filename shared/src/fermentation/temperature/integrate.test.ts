import { describe, expect, it } from 'vitest';
import { hoursToReach, integrateProgress, prepareModel, timeToReach } from './integrate.js';
import { DEFAULT_Q10, LACTOBACILLI_CARDINALS, q10Factor, relativeRate, type TemperatureModel } from './models.js';
import { compileSeries, constantSeries, temperatureAt, type TemperatureSeries } from './series.js';
import { hoursBetween, parseMs } from './time.js';

const CTMI: TemperatureModel = { kind: 'ctmi', ...LACTOBACILLI_CARDINALS };
const Q10: TemperatureModel = { kind: 'q10', q10: DEFAULT_Q10 };
const RATKOWSKY: TemperatureModel = { kind: 'ratkowsky1983', tMin: 5.8, tMax: 41.3, c: 0.13 };
const FED = '2026-12-05T20:00:00+01:00';

describe('constant temperature', () => {
  it('matches the closed form t = t_ref / relative rate', () => {
    for (const model of [Q10, CTMI, RATKOWSKY]) {
      for (const c of [10, 18, 24, 27, 33]) {
        const at = timeToReach(constantSeries(c), model, FED, 6);
        expect(at).not.toBeNull();
        expect(hoursBetween(FED, at ?? FED)).toBeCloseTo(6 / relativeRate(model, c), 3);
        expect(integrateProgress(constantSeries(c), model, FED, '2026-12-06T04:00:00+01:00')).toBeCloseTo(
          8 * relativeRate(model, c),
          12,
        );
      }
    }
  });

  it('Q10 form: 8 h at 24 °C is 32 h at 4 °C with Q10 = 2 (derived_check_values.csv q10_time_scaling)', () => {
    const at = timeToReach(constantSeries(4), { kind: 'q10', q10: 2 }, FED, 8);
    expect(hoursBetween(FED, at ?? FED)).toBeCloseTo(32, 3);
    expect(8 * q10Factor(24, 4, 2)).toBe(32);
  });

  it('at 4 °C with CTMI Tmin 4 the event is not reached: null, not Infinity', () => {
    expect(timeToReach(constantSeries(4), CTMI, FED, 6)).toBeNull();
    expect(timeToReach(constantSeries(2), CTMI, FED, 6, { horizonHours: 10_000 })).toBeNull();
    expect(integrateProgress(constantSeries(4), CTMI, FED, '2026-12-09T20:00:00+01:00')).toBe(0);
  });

  it('respects the horizon', () => {
    // 6 h at 24 °C takes 6/0.194 ≈ 30.9 h at 12 °C under CTMI: found within 32 h, not within 30 h.
    expect(6 / relativeRate(CTMI, 12)).toBeCloseTo(30.9, 1);
    expect(timeToReach(constantSeries(12), CTMI, FED, 6, { horizonHours: 32 })).not.toBeNull();
    expect(timeToReach(constantSeries(12), CTMI, FED, 6, { horizonHours: 30 })).toBeNull();
  });
});

describe('a fridge retard then a warm counter', () => {
  const series: TemperatureSeries = {
    readings: [{ at: FED, c: 4 }],
    forecast: [{ c: 4, until: '2026-12-06T07:00:00+01:00' }, { c: 24 }],
  };

  it('delays the event by the fridge time when the fridge rate is 0 (CTMI, Tmin 4 °C)', () => {
    const at = timeToReach(series, CTMI, FED, 6);
    // 11 h in the fridge at rate 0, then 6 h at the reference.
    expect(at).toBe('2026-12-06T13:00:00+01:00');
  });

  it('with Q10 the fridge still counts for a small fraction (rate 0.15 at 4 °C)', () => {
    const at = timeToReach(series, Q10, FED, 6);
    const fridgeProgress = 11 * relativeRate(Q10, 4);
    expect(fridgeProgress).toBeGreaterThan(1);
    expect(hoursBetween(FED, at ?? FED)).toBeCloseTo(11 + 6 - fridgeProgress, 3);
  });
});

describe('piecewise-linear series', () => {
  // Readings an irregular kitchen might log, including a ramp through CTMI's Tmin (2 → 10 °C) and
  // steps from the forecast.
  const series: TemperatureSeries = {
    readings: [
      { at: '2026-12-05T20:00:00+01:00', c: 22 },
      { at: '2026-12-05T21:10:00+01:00', c: 19.5 },
      { at: '2026-12-05T23:45:00+01:00', c: 17 },
      { at: '2026-12-06T01:00:00+01:00', c: 2 },
      { at: '2026-12-06T03:30:00+01:00', c: 10 },
      { at: '2026-12-06T04:00:00+01:00', c: 26 },
    ],
    forecast: [{ c: 4, until: '2026-12-06T09:00:00+01:00' }, { c: 21 }],
  };
  const to = '2026-12-06T14:00:00+01:00';

  function midpoint(model: TemperatureModel, steps: number): number {
    const origin = parseMs(FED);
    const compiled = compileSeries(series, origin);
    const total = hoursBetween(FED, to);
    const h = total / steps;
    let sum = 0;
    for (let i = 0; i < steps; i++) sum += relativeRate(model, temperatureAt(compiled, (i + 0.5) * h)) * h;
    return sum;
  }

  // 180,000 steps of 0.36 s put the forecast's steps (8 h and 13 h after the start) on cell
  // boundaries, so the midpoint rule stays second-order accurate across them.
  it('matches fine-step numeric quadrature (midpoint rule, 180,000 steps) for every model', () => {
    for (const model of [Q10, CTMI, RATKOWSKY, { kind: 'ratkowsky1982', tMin: 3 } as const]) {
      const exact = integrateProgress(series, model, FED, to);
      const numeric = midpoint(model, 180_000);
      expect(Math.abs(exact - numeric) / exact, model.kind).toBeLessThan(1e-6);
    }
  });

  it('Q10 over a linear ramp has the closed form Δt·(r1 − r0)/ln(r1/r0)', () => {
    const ramp: TemperatureSeries = {
      readings: [
        { at: FED, c: 14 },
        { at: '2026-12-06T06:00:00+01:00', c: 24 },
      ],
    };
    const q = 2.3;
    const r0 = Math.pow(q, (14 - 24) / 10);
    const closed = (10 * (1 - r0)) / Math.log(1 / r0);
    expect(integrateProgress(ramp, { kind: 'q10', q10: q }, FED, '2026-12-06T06:00:00+01:00')).toBeCloseTo(closed, 12);
  });

  it('timeToReach inverts integrateProgress', () => {
    for (const model of [Q10, CTMI, RATKOWSKY]) {
      for (const target of [0.3, 1, 2.5, 4, 6]) {
        const at = timeToReach(series, model, FED, target);
        expect(at).not.toBeNull();
        // Answers are rounded to the second: 1/3600 h of progress at most a rate ≤ 1.5 away.
        expect(integrateProgress(series, model, FED, at ?? FED)).toBeCloseTo(target, 3);
      }
    }
  });

  it('hoursToReach from a later start counts only what comes after it', () => {
    const compiled = compileSeries(series, parseMs(FED));
    const pm = prepareModel(CTMI);
    const h = hoursToReach(compiled, pm, 5, 1, 100);
    expect(h).not.toBeNull();
    expect(integrateProgress(series, CTMI, '2026-12-06T01:00:00+01:00', '2026-12-06T01:00:00+01:00')).toBe(0);
  });

  it('writes the answer in the offset of `from`', () => {
    expect(timeToReach(constantSeries(24), CTMI, '2026-07-01T08:00:00-04:00', 2)).toBe('2026-07-01T10:00:00-04:00');
    expect(timeToReach(constantSeries(24), CTMI, '2026-07-01T08:00:00Z', 2)).toBe('2026-07-01T10:00:00Z');
  });
});
