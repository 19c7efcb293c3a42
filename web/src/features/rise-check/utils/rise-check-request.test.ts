import { describe, expect, it } from 'vitest';
import { toRiseCheckRequest } from './rise-check-request';

const us = { unitSystem: 'us', temperatureUnit: 'F' } as const;
const metric = { unitSystem: 'metric', temperatureUnit: 'C' } as const;

describe('toRiseCheckRequest', () => {
  it('sends exactly one of heightMm, risePct, multiple', () => {
    const base = { value: '3', temperature: '', takenAt: '2026-12-01T10:00' };
    expect(toRiseCheckRequest({ ...base, mode: 'height' }, us, false)).toEqual({ heightMm: 76.2 });
    expect(toRiseCheckRequest({ ...base, mode: 'risePct', value: '80' }, metric, false)).toEqual({ risePct: 80 });
    expect(toRiseCheckRequest({ ...base, mode: 'multiple', value: '1,8' }, metric, false)).toEqual({ multiple: 1.8 });
  });

  it('converts the temperature and sends the time only when changed', () => {
    const body = toRiseCheckRequest(
      { mode: 'height', value: '60', temperature: '68', takenAt: '2026-12-01T10:00' },
      us,
      true,
    );
    expect(body?.temperatureC).toBe(20);
    expect(body?.takenAt).toBe(new Date('2026-12-01T10:00').toISOString());
  });

  it('refuses an empty number', () => {
    expect(toRiseCheckRequest({ mode: 'height', value: '', temperature: '', takenAt: '' }, metric, false)).toBeNull();
  });
});
