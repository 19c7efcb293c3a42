import type { RiseCheck } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { toLocalInput } from '@/lib/format/local-input';
import { riseCheckChanges, riseCheckValues } from './rise-check-edit';

const us = { unitSystem: 'us', temperatureUnit: 'F' } as const;
const metric = { unitSystem: 'metric', temperatureUnit: 'C' } as const;
const check = { heightMm: 76.2, temperatureC: 24, takenAt: '2026-12-01T10:00:20.000Z' } as RiseCheck;

describe('editing a rise check', () => {
  it('opens in the baker’s units', () => {
    // 76.2 mm = 3 in and 24 °C = 75.2 °F (NIST SP 811: 1 in = 25.4 mm; t/°F = 1.8 t/°C + 32).
    expect(riseCheckValues(check, us)).toEqual({
      height: '3',
      temperature: '75.2',
      takenAt: toLocalInput(new Date(check.takenAt)),
    });
    expect(riseCheckValues({ ...check, temperatureC: null }, metric)).toMatchObject({
      height: '76.2',
      temperature: '',
    });
  });

  it('sends only what changed, in mm and °C', () => {
    const before = riseCheckValues(check, us);
    expect(riseCheckChanges(before, before, us)).toEqual({});
    expect(riseCheckChanges({ ...before, height: '3.5' }, before, us)).toEqual({ heightMm: 88.9 });
    expect(riseCheckChanges({ ...before, temperature: '' }, before, us)).toEqual({ temperatureC: null });
    // 68 °F = 20 °C.
    expect(riseCheckChanges({ ...before, temperature: '68' }, before, us)).toEqual({ temperatureC: 20 });
    const takenAt = '2026-12-01T09:45';
    expect(riseCheckChanges({ ...before, takenAt }, before, us)).toEqual({ takenAt: new Date(takenAt).toISOString() });
  });

  it('refuses a height that is not a number', () => {
    const before = riseCheckValues(check, metric);
    expect(riseCheckChanges({ ...before, height: '' }, before, metric)).toBeNull();
    expect(riseCheckChanges({ ...before, height: 'high' }, before, metric)).toBeNull();
  });
});
