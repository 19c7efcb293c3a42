import { describe, expect, it } from 'vitest';
import { compileSeries, temperatureAt, type TemperatureSeries } from './series.js';
import { formatInstant, parseInstant, parseMs } from './time.js';

const origin = parseMs('2026-12-05T21:00:00+01:00');

describe('temperature series', () => {
  it('interpolates readings and then follows the forecast: "fridge 4 °C until 07:00, then 22 °C counter"', () => {
    const series: TemperatureSeries = {
      readings: [
        { at: '2026-12-05T21:00:00+01:00', c: 20 },
        { at: '2026-12-05T22:00:00+01:00', c: 18 },
      ],
      forecast: [{ c: 4, until: '2026-12-06T07:00:00+01:00' }, { c: 22 }],
    };
    const s = compileSeries(series, origin);
    expect(temperatureAt(s, -5)).toBe(20);
    expect(temperatureAt(s, 0.5)).toBeCloseTo(19, 12);
    expect(temperatureAt(s, 0.999)).toBeCloseTo(18, 2);
    expect(temperatureAt(s, 1.5)).toBe(4);
    expect(temperatureAt(s, 9.9)).toBe(4);
    expect(temperatureAt(s, 10)).toBe(22);
    expect(temperatureAt(s, 100)).toBe(22);
  });

  it('holds the last reading until a forecast segment that starts later', () => {
    const series: TemperatureSeries = {
      readings: [{ at: '2026-12-05T21:00:00+01:00', c: 21 }],
      forecast: [{ c: 5, from: '2026-12-05T23:00:00+01:00', until: '2026-12-06T05:00:00+01:00' }, { c: 24 }],
    };
    const s = compileSeries(series, origin);
    expect(temperatureAt(s, 1.9)).toBe(21);
    expect(temperatureAt(s, 2.5)).toBe(5);
    expect(temperatureAt(s, 8.5)).toBe(24);
  });

  it('sorts readings by time', () => {
    const s = compileSeries(
      {
        readings: [
          { at: '2026-12-05T23:00:00+01:00', c: 16 },
          { at: '2026-12-05T21:00:00+01:00', c: 20 },
        ],
      },
      origin,
    );
    expect(temperatureAt(s, 1)).toBeCloseTo(18, 12);
  });

  it('rejects a forecast that starts before the readings end, an open middle segment and an empty series', () => {
    const readings = [{ at: '2026-12-05T22:00:00+01:00', c: 20 }];
    expect(() => compileSeries({ readings, forecast: [{ c: 4, from: '2026-12-05T21:00:00+01:00' }] }, origin)).toThrow(
      RangeError,
    );
    expect(() => compileSeries({ readings, forecast: [{ c: 4 }, { c: 20 }] }, origin)).toThrow(RangeError);
    expect(() => compileSeries({ readings: [] }, origin)).toThrow(RangeError);
    expect(() => compileSeries({ readings: [{ at: '2026-12-05T22:00:00+01:00', c: NaN }] }, origin)).toThrow(
      RangeError,
    );
  });
});

describe('instants', () => {
  it('need an explicit offset, so the answer does not depend on the machine zone', () => {
    expect(() => parseInstant('2026-12-05T21:00:00')).toThrow(RangeError);
    expect(parseInstant('2026-12-05T21:00:00+05:30')).toEqual({
      ms: Date.UTC(2026, 11, 5, 15, 30),
      offsetMinutes: 330,
    });
    expect(formatInstant(Date.UTC(2026, 11, 5, 15, 30, 0, 400), 330)).toBe('2026-12-05T21:00:00+05:30');
    expect(formatInstant(Date.UTC(2026, 11, 5, 15, 30), -270)).toBe('2026-12-05T11:00:00-04:30');
  });
});

describe('instant parsing edge cases', () => {
  it('reads seconds, fractions and offsets, and rejects impossible dates', () => {
    expect(parseInstant('2026-12-05T21:00Z').ms).toBe(Date.UTC(2026, 11, 5, 21));
    expect(parseInstant('2026-12-05T21:00:07.25-01:30').ms).toBe(Date.UTC(2026, 11, 5, 22, 30, 7, 250));
    expect(parseInstant('2028-02-29T00:00:00Z').ms).toBe(Date.UTC(2028, 1, 29));
    expect(() => parseInstant('2026-02-29T00:00:00Z')).toThrow(RangeError);
    expect(() => parseInstant('2026-02-10T24:00:00Z')).toThrow(RangeError);
    expect(() => parseInstant('2026-13-10T10:00:00Z')).toThrow(RangeError);
    expect(() => parseInstant('2026-12-05T21:00:00+0100')).toThrow(RangeError);
  });

  it('agrees with Date.parse on well-formed input', () => {
    for (const s of ['2026-01-01T00:00:00Z', '2026-07-15T13:45:10+02:00', '2025-12-31T23:59:59.999-08:00']) {
      expect(parseInstant(s).ms).toBe(Date.parse(s));
    }
  });
});

describe('instant format', () => {
  it('rejects malformed strings', () => {
    for (const s of [
      '2026-12-05 21:00:00Z',
      '2026-12-05T21:00:00',
      '2026-12-05T21:00:00+01',
      '2026-12-05T21:00:00+01:00x',
      '2026-12-05T2a:00:00Z',
      '2026-12-05T21:00:00.Z',
      '26-12-05T21:00Z',
      '',
    ]) {
      expect(() => parseInstant(s), s).toThrow(RangeError);
    }
  });
});
