import { describe, expect, it } from 'vitest';
import { toNewReading } from './temperature-entry';

const now = new Date('2026-12-01T12:00:00.000Z');

describe('a manual temperature reading', () => {
  it('converts °F to °C (NIST SP 811 B.9: 71.6 °F = 22 °C)', () => {
    expect(toNewReading({ takenAt: '', temperature: '71.6' }, { temperatureUnit: 'F' }, false, now)).toEqual({
      takenAt: now.toISOString(),
      temperatureC: 22,
    });
  });

  it('takes "now" at saving unless the time was changed', () => {
    const values = { takenAt: '2026-12-01T09:30', temperature: '21,5' };
    expect(toNewReading(values, { temperatureUnit: 'C' }, false, now)?.takenAt).toBe(now.toISOString());
    expect(toNewReading(values, { temperatureUnit: 'C' }, true, now)).toEqual({
      takenAt: new Date('2026-12-01T09:30').toISOString(),
      temperatureC: 21.5,
    });
  });

  it('needs a number', () => {
    expect(toNewReading({ takenAt: '', temperature: '' }, { temperatureUnit: 'C' }, false, now)).toBeNull();
    expect(toNewReading({ takenAt: '', temperature: 'warm' }, { temperatureUnit: 'C' }, false, now)).toBeNull();
  });
});
