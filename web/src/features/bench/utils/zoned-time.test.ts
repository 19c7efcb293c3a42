import { describe, expect, it } from 'vitest';
import { isoToWallTime, tomorrowAt, wallTimeToIso, zoneOffsetMinutes } from './zoned-time';

// Offsets from the IANA tz database (Europe/Berlin CET +01:00 / CEST +02:00; America/New_York
// EST −05:00; EU change on 2027-03-28 at 02:00 local, US on 2027-03-14) — from memory.
describe('wallTimeToIso', () => {
  it('reads the wall clock in the given zone, not the browser’s', () => {
    expect(wallTimeToIso('2026-12-03T09:00', 'Europe/Berlin')).toBe('2026-12-03T09:00:00+01:00');
    expect(wallTimeToIso('2026-12-03T09:00', 'America/New_York')).toBe('2026-12-03T09:00:00-05:00');
    expect(wallTimeToIso('2026-12-03T09:00', 'UTC')).toBe('2026-12-03T09:00:00+00:00');
  });

  it('takes summer time on the far side of a change', () => {
    expect(wallTimeToIso('2027-03-28T09:00', 'Europe/Berlin')).toBe('2027-03-28T09:00:00+02:00');
    expect(wallTimeToIso('2027-03-27T09:00', 'Europe/Berlin')).toBe('2027-03-27T09:00:00+01:00');
  });

  it('refuses what is not a wall time', () => {
    expect(wallTimeToIso('', 'UTC')).toBeNull();
    expect(wallTimeToIso('tomorrow at nine', 'UTC')).toBeNull();
  });
});

describe('isoToWallTime and tomorrowAt', () => {
  it('round-trips through the zone', () => {
    expect(isoToWallTime('2026-12-03T08:00:00Z', 'Europe/Berlin')).toBe('2026-12-03T09:00');
    expect(zoneOffsetMinutes(new Date('2026-07-01T12:00:00Z'), 'Europe/Berlin')).toBe(120);
  });

  it('is tomorrow in the baker’s zone even when UTC is already on the next day', () => {
    // 23:30 in New York on 2 Dec is 04:30 UTC on 3 Dec: tomorrow there is still 3 Dec.
    expect(tomorrowAt(new Date('2026-12-03T04:30:00Z'), 'America/New_York')).toBe('2026-12-03T09:00');
    expect(tomorrowAt(new Date('2026-12-31T10:00:00Z'), 'Europe/Berlin')).toBe('2027-01-01T09:00');
  });
});
