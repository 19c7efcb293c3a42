import { describe, expect, it } from 'vitest';
import { DOUGH_TIME_CONSTANT_HOURS, doughFromKitchen } from './kitchen.js';
import { type TemperatureSample } from './series.js';

// Checks against the closed-form solutions of Newton's law of cooling, dT/dt = (T_room − T)/τ
// (the lumped-capacitance model of any heat-transfer textbook, e.g. Incropera & DeWitt,
// Fundamentals of Heat and Mass Transfer, ch. 5 — chapter from memory):
//   constant room a:         T(t) = a + (T0 − a)·e^(−t/τ)
//   room rising as a + b·t:  T(t) = a + b(t − τ) + (T0 − a + bτ)·e^(−t/τ)

const MIX = Date.parse('2026-12-05T08:00:00Z');
const MIN = 60_000;
const iso = (ms: number) => new Date(ms).toISOString();

function room(minutes: number, c: (h: number) => number, every = 5): TemperatureSample[] {
  const out: TemperatureSample[] = [];
  for (let m = 0; m <= minutes; m += every) out.push({ at: iso(MIX + m * MIN), c: c(m / 60) });
  return out;
}

const cAt = (series: TemperatureSample[], ms: number) => series.find((s) => Date.parse(s.at) === ms)?.c;

describe('doughFromKitchen', () => {
  it('follows the exponential approach to a constant room exactly (one τ closes 63.2 % of the gap)', () => {
    const tau = DOUGH_TIME_CONSTANT_HOURS;
    const series = doughFromKitchen({ kitchen: room(360, () => 20), dough: [], mixMs: MIX, mixC: 26 });
    for (const hours of [0.5, tau, 3, 6]) {
      const expected = 20 + 6 * Math.exp(-hours / tau);
      expect(cAt(series, MIX + hours * 60 * MIN)).toBeCloseTo(expected, 2);
    }
    // After one τ: 20 + 6·e^(−1) = 22.21 °C.
    expect(cAt(series, MIX + tau * 60 * MIN)).toBeCloseTo(22.21, 2);
  });

  it('tracks a room warming at 1 °C an hour within 0.01 °C of the closed form', () => {
    const tau = 1.5;
    const series = doughFromKitchen({
      kitchen: room(480, (h) => 18 + h),
      dough: [],
      mixMs: MIX,
      mixC: 25,
      tauHours: tau,
    });
    for (const hours of [1, 2, 4, 8]) {
      const expected = 18 + (hours - tau) + (25 - 18 + tau) * Math.exp(-hours / tau);
      expect(Math.abs((cAt(series, MIX + hours * 60 * MIN) ?? NaN) - expected)).toBeLessThan(0.01);
    }
  });

  it('takes a measured dough temperature as the truth and restarts the estimate from it', () => {
    const measuredAt = MIX + 120 * MIN;
    const series = doughFromKitchen({
      kitchen: room(300, () => 20),
      dough: [{ at: iso(measuredAt), c: 24 }],
      mixMs: MIX,
      mixC: 26,
      tauHours: 1.5,
    });
    expect(cAt(series, measuredAt)).toBe(24);
    // One hour after the reading: 20 + 4·e^(−1/1.5), not the value continued from the mix.
    expect(cAt(series, measuredAt + 60 * MIN)).toBeCloseTo(20 + 4 * Math.exp(-1 / 1.5), 2);
  });

  it('keeps settling towards the last room reading after the logger stops', () => {
    const series = doughFromKitchen({ kitchen: room(30, () => 19), dough: [], mixMs: MIX, mixC: 27, tauHours: 1 });
    const last = series[series.length - 1];
    expect(Date.parse(last?.at ?? '')).toBe(MIX + 30 * MIN + 3 * 60 * MIN);
    expect(last?.c).toBeCloseTo(19 + 8 * Math.exp(-3.5), 2);
  });

  it('ignores room readings from before the mix except to know the room at the mix', () => {
    const kitchen = [{ at: iso(MIX - 60 * MIN), c: 30 }, ...room(60, () => 20)];
    const series = doughFromKitchen({ kitchen, dough: [], mixMs: MIX, mixC: 24, tauHours: 1 });
    expect(series.every((s) => Date.parse(s.at) > MIX)).toBe(true);
  });

  it('without room readings gives the measured dough temperatures alone', () => {
    const dough = [{ at: iso(MIX + 30 * MIN), c: 25.5 }];
    const series = doughFromKitchen({ kitchen: [], dough, mixMs: MIX, mixC: 24 });
    expect(series.map((s) => [Date.parse(s.at), s.c])).toEqual([[MIX + 30 * MIN, 25.5]]);
  });
});
