import { describe, expect, it } from 'vitest';
import { clockStyleFor, formatRange, formatTime, formatWhen } from './clock';

const berlin24 = { timeZone: 'Europe/Berlin', style: '24h' as const };
const ny12 = { timeZone: 'America/New_York', style: '12h' as const };

describe('formatTime', () => {
  it('shows the baker’s zone in their clock', () => {
    expect(formatTime('2026-12-03T13:05:00Z', berlin24)).toBe('14:05');
    expect(formatTime('2026-12-03T13:05:00Z', ny12)).toBe('8:05 AM');
    expect(clockStyleFor('us')).toBe('12h');
    expect(clockStyleFor('metric')).toBe('24h');
  });
});

describe('formatWhen', () => {
  it('leaves the day out only for today in the zone', () => {
    const now = new Date('2026-12-03T10:00:00Z');
    expect(formatWhen('2026-12-03T15:00:00Z', now, berlin24)).toBe('16:00');
    expect(formatWhen('2026-12-03T23:30:00Z', now, berlin24)).toBe('Fri 4 Dec 00:30');
  });
});

describe('formatRange', () => {
  it('shows the interval around the central time', () => {
    expect(formatRange('2026-12-03T14:00:00Z', '2026-12-03T13:20:00Z', '2026-12-03T15:10:00Z', berlin24)).toBe(
      '15:00 (14:20 – 16:10)',
    );
  });

  it('names the day of an end that falls on another day', () => {
    expect(formatRange('2026-12-03T21:30:00Z', '2026-12-03T21:00:00Z', '2026-12-03T23:30:00Z', berlin24)).toBe(
      '22:30 (22:00 – Fri 4 Dec 00:30)',
    );
  });
});
