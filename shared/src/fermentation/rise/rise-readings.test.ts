import { describe, expect, it } from 'vitest';

import { gompertz } from '../curve/growth-models.js';
import { fitRise } from './fit-rise.js';
import { parseIsoWithOffset } from './iso-time.js';
import { cleanReadings, fallCrossingHours, findFall } from './rise-readings.js';
import { type FitRiseInput, type RiseReading } from './rise-types.js';

const FED_AT = '2025-03-01T08:00:00+01:00';
const FED_MS = Date.parse(FED_AT);
const isoAfter = (hours: number): string => new Date(FED_MS + hours * 3_600_000).toISOString();

/** A clean, invented feeding: 50 mm rising to 2.3× (Zwietering Gompertz, A 1.3, μm 0.3/h, λ 1 h). */
const readings: RiseReading[] = Array.from({ length: 20 }, (_, i) => {
  const t = 0.5 * (i + 1);
  return { at: isoAfter(t), heightMm: 50 * (1 + gompertz(t, 1.3, 0.3, 1)) };
});
const base: FitRiseInput = { fedAt: FED_AT, initialHeightMm: 50, readings };

describe('ISO times', () => {
  it('accepts Z and ±hh:mm offsets, with or without seconds and fractions', () => {
    expect(parseIsoWithOffset('2025-03-01T07:00:00Z')).toBe(FED_MS);
    expect(parseIsoWithOffset('2025-03-01T09:00+02:00')).toBe(FED_MS);
    expect(parseIsoWithOffset('2025-03-01T02:00:00.000-05:00')).toBe(FED_MS);
  });

  it('refuses a time without an offset (it would be read in the machine’s own zone)', () => {
    expect(parseIsoWithOffset('2025-03-01T08:00:00')).toBeNull();
    expect(parseIsoWithOffset('yesterday at 8')).toBeNull();
    expect(parseIsoWithOffset(1740812400000)).toBeNull();
  });
});

describe('tidying the readings', () => {
  it('drops readings before or at feeding, and non-positive or missing heights, saying why', () => {
    const messy = [
      { at: isoAfter(-1), heightMm: 80 },
      { at: FED_AT, heightMm: 50 },
      { at: isoAfter(1), heightMm: 0 },
      { at: isoAfter(1.5), heightMm: -3 },
      { at: 'soon', heightMm: 60 },
      ...readings,
    ];
    const clean = cleanReadings(FED_AT, 50, messy);
    if ('field' in clean) throw new Error(clean.reason);
    expect(clean.readings.length).toBe(readings.length);
    expect(clean.warnings.length).toBe(5);
    expect(clean.warnings.join(' ')).toMatch(/before feeding/);
    expect(clean.warnings.join(' ')).toMatch(/at feeding/);
    expect(clean.warnings.join(' ')).toMatch(/positive/);
    expect(clean.readings.every((r) => r.hours > 0)).toBe(true);
  });

  it('averages readings taken at the same moment', () => {
    const clean = cleanReadings(FED_AT, 50, [
      { at: isoAfter(2), heightMm: 60 },
      { at: isoAfter(2), heightMm: 64 },
      { at: isoAfter(3), heightMm: 70 },
    ]);
    if ('field' in clean) throw new Error(clean.reason);
    expect(clean.readings.map((r) => r.heightMm)).toEqual([62, 70]);
    expect(clean.warnings).toHaveLength(1);
  });

  it('gives the same answer for readings in any order and any time-zone offset', () => {
    const sorted = fitRise(base);
    const shuffled = fitRise({ ...base, readings: [...readings].reverse() });
    const shifted = fitRise({
      ...base,
      fedAt: '2025-03-01T07:00:00Z',
      // Same instants written in UTC−03:00.
      readings: readings.map((r) => ({
        ...r,
        at: new Date(Date.parse(r.at) - 3 * 3_600_000).toISOString().replace('Z', '-03:00'),
      })),
    });
    expect(shuffled).toEqual(sorted);
    expect(shifted.peakAt).toBe(sorted.peakAt);
    expect(shifted.fit?.A).toBe(sorted.fit?.A);
  });
});

describe('bad input never throws; it says which field', () => {
  it.each([
    ['fedAt', { ...base, fedAt: '2025-03-01 08:00' }],
    ['fedAt', { ...base, fedAt: '2025-03-01T08:00:00' }],
    ['initialHeightMm', { ...base, initialHeightMm: 0 }],
    ['initialHeightMm', { ...base, initialHeightMm: Number.NaN }],
    ['readings', { ...base, readings: null }],
    ['model', { ...base, model: 'baranyi' }],
  ])('%s', (field, input) => {
    const result = fitRise(input as unknown as FitRiseInput);
    expect(result.status).toBe('invalid-input');
    expect(result.field).toBe(field);
    expect(result.reason.length).toBeGreaterThan(10);
  });

  it('survives junk inside the readings array', () => {
    const junk = [null, 7, 'x', { at: 5 }, { heightMm: 60 }, ...readings] as unknown as RiseReading[];
    const result = fitRise({ ...base, readings: junk });
    expect(result.status).not.toBe('invalid-input');
    expect(result.warnings).toHaveLength(5);
  });

  it('survives a missing input altogether', () => {
    expect(fitRise(null as unknown as FitRiseInput).status).toBe('invalid-input');
  });
});

describe('finding the fall', () => {
  const timed = (pairs: [number, number][]) => pairs.map(([hours, heightMm]) => ({ hours, heightMm, ms: 0 }));

  it('needs more than max(2 mm, 10 % of the rise) below the highest reading', () => {
    // Rise so far 60 mm → threshold 6 mm: a 5 mm dip is not a fall, a 7 mm one is.
    expect(
      findFall(
        timed([
          [2, 80],
          [4, 110],
          [5, 105],
        ]),
        50,
      )?.fallIndex,
    ).toBeNull();
    expect(
      findFall(
        timed([
          [2, 80],
          [4, 110],
          [5, 103],
        ]),
        50,
      )?.fallIndex,
    ).toBe(2);
  });

  it('puts the crossing between the last high reading and the first fallen one', () => {
    const readings = timed([
      [2, 80],
      [4, 110],
      [5, 108],
      [7, 96],
    ]);
    const fall = findFall(readings, 50);
    if (!fall) throw new Error('no search');
    expect(fall.fallIndex).toBe(3);
    // Level 110 − 6 = 104 mm, crossed 4/12 of the way from 5 h (108 mm) to 7 h (96 mm).
    expect(fallCrossingHours(readings, fall)).toBeCloseTo(5 + (2 * 4) / 12, 12);
  });
});
