import { describe, expect, it } from 'vitest';
import { greetingFor } from './greeting';

describe('greetingFor', () => {
  const noonUtc = new Date('2026-12-01T12:00:00Z');

  it('reads the hour in the baker’s own time zone', () => {
    expect(greetingFor(noonUtc, 'UTC')).toBe('Good afternoon');
    expect(greetingFor(noonUtc, 'America/New_York')).toBe('Good morning'); // 07:00
    expect(greetingFor(noonUtc, 'America/Los_Angeles')).toBe('Hello'); // 04:00
  });

  it('says hello in the small hours and for an unknown zone', () => {
    expect(greetingFor(new Date('2026-12-01T03:30:00Z'), 'UTC')).toBe('Hello');
    expect(greetingFor(noonUtc, 'Not/AZone')).toBe('Hello');
  });

  it('says good evening after six', () => {
    expect(greetingFor(noonUtc, 'Asia/Tokyo')).toBe('Good evening'); // 21:00
  });
});
