import { describe, expect, it } from 'vitest';
import { gramsFromRatio, heightFromMultiple, heightFromRisePct, parseRatio } from './culture-amounts.js';

// The ratio convention starter:flour:water is common practice among bakers (1:1:1, 1:2:2, 1:5:5);
// expected values are worked by hand.

describe('parseRatio', () => {
  it('reads three parts, allowing spaces and decimals', () => {
    expect(parseRatio('1:2:2')).toEqual([1, 2, 2]);
    expect(parseRatio(' 1 : 5 : 5 ')).toEqual([1, 5, 5]);
    expect(parseRatio('1:0.8:1.2')).toEqual([1, 0.8, 1.2]);
  });

  it('refuses anything but three parts above 0', () => {
    for (const bad of ['', '1:2', '1:2:2:2', '0:1:1', '1:-1:1', 'a:b:c', '1/2/2', '1:2:2x', '1::2']) {
      expect(parseRatio(bad), bad).toBeNull();
    }
  });
});

describe('gramsFromRatio', () => {
  it('splits a total that divides evenly', () => {
    expect(gramsFromRatio('1:1:1', 150)).toEqual({ starterG: 50, flourG: 50, waterG: 50 });
    expect(gramsFromRatio('1:2:2', 100)).toEqual({ starterG: 20, flourG: 40, waterG: 40 });
    expect(gramsFromRatio('1:5:5', 110)).toEqual({ starterG: 10, flourG: 50, waterG: 50 });
  });

  it('rounds to 0.1 g and still adds up to the total', () => {
    // 100 / 3 = 33.33…: one tenth is left over and goes to the first part.
    expect(gramsFromRatio('1:1:1', 100)).toEqual({ starterG: 33.4, flourG: 33.3, waterG: 33.3 });
    // 100 / 11 = 9.09…, 100 × 5 / 11 = 45.45… (twice): two tenths are left over; the starter's
    // remainder is largest, and flour wins the tie with water by coming first.
    const grams = gramsFromRatio('1:5:5', 100)!;
    expect(grams).toEqual({ starterG: 9.1, flourG: 45.5, waterG: 45.4 });
    expect(Math.round((grams.starterG + grams.flourG + grams.waterG) * 10) / 10).toBe(100);
  });

  it('handles a stiff levain ratio with decimals', () => {
    // 1:2:1.2 over 84 g: 84 / 4.2 = 20 per part.
    expect(gramsFromRatio('1:2:1.2', 84)).toEqual({ starterG: 20, flourG: 40, waterG: 24 });
  });

  it('gives null for a bad ratio or a total not above 0', () => {
    expect(gramsFromRatio('1:2', 100)).toBeNull();
    expect(gramsFromRatio('1:2:2', 0)).toBeNull();
    expect(gramsFromRatio('1:2:2', -5)).toBeNull();
    expect(gramsFromRatio('1:2:2', Number.NaN)).toBeNull();
  });
});

describe('rise conversions', () => {
  it('turns % rise over the initial height into mm', () => {
    expect(heightFromRisePct(40, 100)).toBe(80); // doubled
    expect(heightFromRisePct(40, 50)).toBe(60);
    expect(heightFromRisePct(42, 0)).toBe(42);
    expect(heightFromRisePct(33, 10)).toBe(36.3); // 36.300000000000004 before rounding
  });

  it('turns × initial into mm', () => {
    expect(heightFromMultiple(40, 2)).toBe(80);
    expect(heightFromMultiple(40, 2.5)).toBe(100);
    expect(heightFromMultiple(35, 1.1)).toBe(38.5);
  });
});
