import { describe, expect, it } from 'vitest';
import { timeZoneLabel, timeZoneOffset, timeZoneOptions } from './time-zones';

describe('timeZoneOptions', () => {
  it('adds the account and device zones when the browser list lacks them, once each', () => {
    expect(timeZoneOptions(['Europe/London', 'America/Chicago'], 'UTC', 'Europe/London')).toEqual([
      'America/Chicago',
      'Europe/London',
      'UTC',
    ]);
  });

  it('ignores an empty zone', () => {
    expect(timeZoneOptions(['Asia/Tokyo'], '')).toEqual(['Asia/Tokyo']);
  });
});

describe('timeZoneLabel', () => {
  it('shows underscores as spaces', () => {
    expect(timeZoneLabel('America/Argentina/Buenos_Aires')).toBe('America/Argentina/Buenos Aires');
  });
});

describe('timeZoneOffset', () => {
  it('gives the offset at that moment, with summer time', () => {
    expect(timeZoneOffset('Europe/Berlin', new Date('2026-01-15T12:00:00Z'))).toBe('GMT+1');
    expect(timeZoneOffset('Europe/Berlin', new Date('2026-07-15T12:00:00Z'))).toBe('GMT+2');
  });

  it('is empty for a zone it does not know', () => {
    expect(timeZoneOffset('Not/AZone', new Date())).toBe('');
  });
});
