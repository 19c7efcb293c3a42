import type { Culture, Feeding } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { defaultsFrom, gramsText, presetOf, toFeedingRequest } from './feeding-form';

const culture = { defaultFlour: 'whole rye' } as Culture;
const us = { unitSystem: 'us', temperatureUnit: 'F' } as const;
const metric = { unitSystem: 'metric', temperatureUnit: 'C' } as const;
const last = { starterG: 20, flourG: 40, waterG: 40, flour: 'bread flour', temperatureC: 24 } as Feeding;

describe('the feeding form', () => {
  it('recognises a preset from the grams', () => {
    expect(presetOf(last)).toBe('1:2:2');
    expect(presetOf({ starterG: 10, flourG: 50, waterG: 50 })).toBe('1:5:5');
    expect(presetOf({ starterG: 10, flourG: 30, waterG: 25 })).toBe('custom');
  });

  it('starts from the last feeding, temperature in the baker’s unit', () => {
    const values = defaultsFrom(last, culture, us, new Date(2026, 11, 1, 14, 5));
    expect(values).toMatchObject({ ratio: '1:2:2', totalG: '100', starterG: '20', flour: 'bread flour' });
    expect(values.temperature).toBe('75.2');
    expect(values.fedAt).toBe('2026-12-01T14:05');
  });

  it('a preset and a total fill the grams, adding up to the total', () => {
    expect(gramsText('1:2:2', '150')).toEqual({ starterG: '30', flourG: '60', waterG: '60' });
    expect(gramsText('1:1:1', '100')).toEqual({ starterG: '33.4', flourG: '33.3', waterG: '33.3' });
    expect(gramsText('custom', '100')).toBeNull();
  });

  it('sends SI: °F and inches become °C and mm; "now" sends no time', () => {
    const values = { ...defaultsFrom(last, culture, us, new Date()), temperature: '77', initialHeight: '2' };
    const body = toFeedingRequest(values, us, false);
    expect(body).toMatchObject({ starterG: 20, flourG: 40, waterG: 40, temperatureC: 25, initialHeightMm: 50.8 });
    expect(body.fedAt).toBeUndefined();
    const metricBody = toFeedingRequest({ ...values, temperature: '', initialHeight: '' }, metric, true);
    expect(metricBody.temperatureC).toBeNull();
    expect(metricBody.initialHeightMm).toBeNull();
    expect(metricBody.fedAt).toBe(new Date(values.fedAt).toISOString());
  });
});
