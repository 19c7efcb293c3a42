import type { Culture, Feeding } from '@peakwise/shared';
import { toLocalInput as toLocal } from '@/lib/format/local-input';
import { describe, expect, it } from 'vitest';
import { defaultsFrom, feedingChanges, gramsText, presetOf, toFeedingRequest, valuesFromFeeding } from './feeding-form';

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

  const recorded = {
    ...last,
    fedAt: '2026-12-01T08:00:30.000Z',
    temperatureC: 24.01,
    initialHeightMm: 40,
    notes: 'smelled of apples',
    observations: ['bubbles'],
  } as Feeding;

  it('opens a recorded feeding in the baker’s units', () => {
    const values = valuesFromFeeding(recorded, us);
    // 24.01 °C = 75.218 °F, shown to 0.1 °F; 40 mm = 1.5748 in, shown to 0.01 in (1 in = 25.4 mm, NIST SP 811).
    expect(values).toMatchObject({ starterG: '20', flourG: '40', waterG: '40', ratio: '1:2:2', totalG: '100' });
    expect(values).toMatchObject({ temperature: '75.2', initialHeight: '1.57', notes: 'smelled of apples' });
    expect(values.fedAt).toBe(toLocal(new Date(recorded.fedAt)));
  });

  it('sends back only what changed, so rounding for display never rewrites a value', () => {
    const before = valuesFromFeeding(recorded, us);
    expect(feedingChanges(before, before, us)).toEqual({});
    // 77 °F = 25 °C (NIST SP 811 B.9: t/°C = (t/°F − 32) / 1.8).
    const after = { ...before, starterG: '25', temperature: '77', notes: '', observations: [] };
    expect(feedingChanges(after, before, us)).toEqual({
      starterG: 25,
      temperatureC: 25,
      notes: null,
      observations: [],
    });
  });

  it('sends the time only when it was changed', () => {
    const before = valuesFromFeeding(recorded, metric);
    const after = { ...before, fedAt: '2026-12-01T07:30', initialHeight: '' };
    expect(feedingChanges(after, before, metric)).toEqual({
      fedAt: new Date('2026-12-01T07:30').toISOString(),
      initialHeightMm: null,
    });
  });
});
