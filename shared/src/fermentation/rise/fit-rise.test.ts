import { describe, expect, it } from 'vitest';

import { fitCurve } from '../curve/fit-curve.js';
import { gompertz, gompertzTAtFraction } from '../curve/growth-models.js';
import { fitRise } from './fit-rise.js';
import { type RiseReading } from './rise-types.js';

// Synthetic feedings drawn from the modified Gompertz of Zwietering et al. (1990, Appl Environ
// Microbiol 56:1875) with known parameters. The numbers are invented but in the range a baker
// sees (common practice: a fed starter doubles to triples in roughly 4–12 h at room temperature).
const FED_AT = '2025-03-01T08:00:00+01:00';
const FED_MS = Date.parse(FED_AT);
const H0 = 50; // mm in the jar after feeding
const TRUE = { A: 1.5, muMax: 0.35, lag: 1.5 }; // rises to 2.5×, 35 %/h at its fastest, 1.5 h lag

/** Mulberry32: a small seeded PRNG, so the "noisy" readings are the same on every run. */
function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates by Box–Muller from the seeded uniform source. */
function seededNormal(seed: number): () => number {
  const uniform = seededRandom(seed);
  return () => {
    const u = Math.max(uniform(), Number.MIN_VALUE);
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniform());
  };
}

const isoAfter = (hours: number): string => new Date(FED_MS + hours * 3_600_000).toISOString();
const hoursOf = (iso: string | null): number => (iso === null ? NaN : (Date.parse(iso) - FED_MS) / 3_600_000);

/** Heights on the true curve every `step` hours up to `until`, plus N(0, noiseMm²) noise. */
function riseReadings(until: number, step = 0.5, noiseMm = 0, seed = 1): RiseReading[] {
  const noise = seededNormal(seed);
  const readings: RiseReading[] = [];
  for (let t = step; t <= until + 1e-9; t += step) {
    const height = H0 * (1 + gompertz(t, TRUE.A, TRUE.muMax, TRUE.lag)) + noiseMm * noise();
    readings.push({ at: isoAfter(t), heightMm: height });
  }
  return readings;
}

const trueT95 = gompertzTAtFraction(0.95, TRUE.A, TRUE.muMax, TRUE.lag); // ≈ 7.76 h

describe('recovering a known rise (synthetic Gompertz readings)', () => {
  it('exact readings give back A, μm and λ, and the peak at the curve’s 95 % time', () => {
    const result = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings: riseReadings(14) });
    // Not to the last digit: the feeding point (0, 0) is fitted too, and the Gompertz curve is
    // not exactly 0 at t = 0 (here 1.8e-5), so recovery stops at a few parts in 1e5.
    expect(result.fit?.A).toBeCloseTo(TRUE.A, 3);
    expect(result.fit?.muMax).toBeCloseTo(TRUE.muMax, 3);
    expect(result.lagHours).toBeCloseTo(TRUE.lag, 3);
    // Units: μm is a fraction of the initial height per hour; % and mm per hour follow from it.
    expect(result.maxRisePercentPerHour).toBeCloseTo(100 * (result.fit?.muMax ?? NaN), 10);
    expect(result.maxRisePercentPerHour).toBeCloseTo(35, 1);
    expect(result.maxRiseMmPerHour).toBeCloseTo(H0 * (result.fit?.muMax ?? NaN), 10);
    expect(result.maxRiseMmPerHour).toBeCloseTo(17.5, 1);
    expect(hoursOf(result.peakAt)).toBeCloseTo(trueT95, 3);
    // Readings run to 14 h, well past the 95 % point: the top has been reached.
    expect(result.status).toBe('peaked');
    expect(result.readyFrom && result.peakAt && result.readyUntil).toBeTruthy();
    expect(hoursOf(result.readyFrom)).toBeLessThan(hoursOf(result.peakAt));
    expect(hoursOf(result.readyUntil)).toBeGreaterThan(hoursOf(result.peakAt));
  });

  it.each([11, 12, 13])('noisy readings (σ = 0.7 mm, seed %i) recover the parameters within 3 SE and 6 %', (seed) => {
    const result = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings: riseReadings(14, 0.5, 0.7, seed) });
    const fit = result.fit;
    if (!fit) throw new Error(result.reason);
    for (const [name, truth] of [
      ['A', TRUE.A],
      ['muMax', TRUE.muMax],
      ['lag', TRUE.lag],
    ] as const) {
      expect(Math.abs(fit[name] - truth)).toBeLessThan(3 * fit.se[name]);
      expect(Math.abs(fit[name] - truth) / truth).toBeLessThan(0.06);
    }
    expect(Math.abs(hoursOf(result.peakAt) - trueT95)).toBeLessThan(0.5);
    expect(fit.residualStdDevMm).toBeGreaterThan(0.35);
    expect(fit.residualStdDevMm).toBeLessThan(1.2);
  });
});

describe('a collapse after the peak', () => {
  // The true curve to 9 h (past the 95 % point at ≈ 7.8 h), then the dome sinks 8 mm an hour.
  const rising = riseReadings(9, 0.5, 0.5, 7);
  const topHeight = H0 * (1 + gompertz(9, TRUE.A, TRUE.muMax, TRUE.lag));
  const collapse = [1, 2, 3, 4, 5].map((h) => ({ at: isoAfter(9 + h), heightMm: topHeight - 8 * h }));
  const withCollapse = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings: [...rising, ...collapse] });
  const withoutCollapse = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings: rising });
  const highestMultiple = Math.max(...rising.map((r) => r.heightMm)) / H0;

  it('is seen as the fall: status peaked, with the first fallen reading named', () => {
    expect(withCollapse.status).toBe('peaked');
    expect(hoursOf(withCollapse.fallSeenAt)).toBeGreaterThan(9);
  });

  it('does not lower the rise multiple below the highest reading', () => {
    expect(withCollapse.riseMultiple).toBeGreaterThanOrEqual(highestMultiple - 1e-12);
    expect(withCollapse.observedRiseMultiple).toBeCloseTo(highestMultiple, 12);
  });

  it('does not move the peak later than the same readings without the collapse', () => {
    expect(hoursOf(withCollapse.peakAt)).toBeLessThanOrEqual(hoursOf(withoutCollapse.peakAt) + 1e-9);
    expect(Math.abs(hoursOf(withCollapse.peakAt) - trueT95)).toBeLessThan(0.5);
    expect(withCollapse.fit?.A).toBeCloseTo(withoutCollapse.fit?.A ?? NaN, 10);
  });

  it('ends the ready window at the fall, between the last high reading and the first fallen one', () => {
    const until = hoursOf(withCollapse.readyUntil);
    expect(until).toBeGreaterThan(9);
    expect(until).toBeLessThanOrEqual(hoursOf(withCollapse.fallSeenAt));
  });

  it('would have dragged the fit down had the collapse been fitted (why the fall is cut off)', () => {
    // The naive fit of every reading: the sigmoid settles below the top that was actually reached.
    const points = [
      { t: 0, y: 0 },
      ...[...rising, ...collapse].map((r) => ({ t: hoursOf(r.at), y: r.heightMm / H0 - 1 })),
    ];
    const naive = fitCurve({ model: 'gompertz', points });
    if (naive.status !== 'ok') throw new Error(naive.reason);
    expect(1 + naive.A).toBeLessThan(highestMultiple - 0.1);
  });
});

describe('still rising', () => {
  // Readings to 4.5 h: past the inflection (≈ 3.1 h) but well before the 95 % point (≈ 7.8 h).
  it('is rising, with the predicted peak after the last reading and inside its own interval', () => {
    const result = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings: riseReadings(4.5, 0.25, 0.4, 3) });
    expect(result.status).toBe('rising');
    const peak = hoursOf(result.peakAt);
    expect(peak).toBeGreaterThan(4.5);
    const interval = result.peakInterval;
    if (!interval) throw new Error('no interval');
    expect(interval.level).toBe(0.8);
    expect(hoursOf(interval.low)).toBeLessThanOrEqual(peak);
    expect(hoursOf(interval.high)).toBeGreaterThanOrEqual(peak);
    expect(hoursOf(interval.low)).toBeGreaterThanOrEqual(4.5);
    expect(result.riseMultiple).toBeGreaterThanOrEqual(result.observedRiseMultiple ?? Infinity);
  });

  it('the 80 % peak interval covers the true peak in roughly 80 % of 60 seeded feedings', () => {
    // Delta-method intervals are approximate; this checks they are neither far too narrow nor
    // far too wide on data the model itself generated.
    let covered = 0;
    let predicted = 0;
    for (let seed = 100; seed < 160; seed++) {
      const result = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings: riseReadings(5, 0.25, 0.8, seed) });
      if (result.status !== 'rising' || !result.peakInterval) continue;
      predicted++;
      const low = hoursOf(result.peakInterval.low);
      const high = hoursOf(result.peakInterval.high);
      if (low <= trueT95 && trueT95 <= high) covered++;
    }
    expect(predicted).toBeGreaterThanOrEqual(55);
    expect(covered / predicted).toBeGreaterThan(0.6);
    expect(covered / predicted).toBeLessThan(0.95);
  });

  it('is rising without a prediction when the readings show no plateau to fit yet', () => {
    // A steady exponential climb to 4.5×: any sigmoid top fitted to it is a guess.
    const readings = [1, 2, 3, 4, 5].map((t) => ({ at: isoAfter(t), heightMm: H0 * Math.exp(0.3 * t) }));
    const result = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings });
    expect(result.status).toBe('rising');
    expect(result.peakAt).toBeNull();
    expect(result.riseMultiple).toBeNull();
    expect(result.reason).toMatch(/too early/);
  });

  it('a gentler exponential climb gets a prediction only with a wide interval', () => {
    const readings = [1, 2, 3, 4, 5].map((t) => ({ at: isoAfter(t), heightMm: H0 * Math.exp(0.12 * t) }));
    const result = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings });
    expect(result.status).toBe('rising');
    if (result.peakInterval) {
      expect(hoursOf(result.peakInterval.high) - hoursOf(result.peakInterval.low)).toBeGreaterThan(4);
    } else {
      expect(result.peakAt).toBeNull();
    }
  });
});

describe('insufficient data', () => {
  it.each([0, 1, 2])('%i reading(s) after feeding → insufficient-data', (n) => {
    const result = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings: riseReadings(14).slice(4, 4 + n) });
    expect(result.status).toBe('insufficient-data');
    expect(result.peakAt).toBeNull();
    expect(result.riseMultiple).toBeNull();
  });

  it('a jar that has not moved → insufficient-data, not a peak', () => {
    const readings = [1, 2, 3, 4, 5].map((t, i) => ({ at: isoAfter(t), heightMm: H0 + (i % 2 === 0 ? 0.5 : -0.5) }));
    const result = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings });
    expect(result.status).toBe('insufficient-data');
    expect(result.reason).toMatch(/no rise/);
  });
});

describe('a fall seen before a curve can be fitted', () => {
  it('is peaked from the readings alone, with fit null', () => {
    const readings = [
      { at: isoAfter(4), heightMm: 90 },
      { at: isoAfter(6), heightMm: 115 },
      { at: isoAfter(9), heightMm: 96 },
    ];
    const result = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings });
    expect(result.status).toBe('peaked');
    expect(result.riseMultiple).toBeCloseTo(115 / H0, 12);
    expect(hoursOf(result.peakAt)).toBeCloseTo(6, 9);
    expect(hoursOf(result.readyUntil)).toBeGreaterThan(6);
    expect(hoursOf(result.readyUntil)).toBeLessThan(9);
    expect(result.fit).toBeNull();
  });
});

describe('lag-phase wobble is not a fall', () => {
  it('a 1.5 mm dip before the starter has risen does not make it peaked', () => {
    const readings = riseReadings(5, 0.5);
    readings.splice(1, 1, { at: isoAfter(1), heightMm: H0 - 1.5 });
    const result = fitRise({ fedAt: FED_AT, initialHeightMm: H0, readings });
    expect(result.status).toBe('rising');
    expect(result.fallSeenAt).toBeNull();
  });
});
