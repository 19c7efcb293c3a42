import { describe, expect, it } from 'vitest';
import { feedHydrationWords, formatWhen, hoursAfter, ratioWords, readingTime, risePct } from './feeding-words';

describe('words for one feeding', () => {
  it('states the ratio with the starter as 1', () => {
    expect(ratioWords({ starterG: 30, flourG: 60, waterG: 60 })).toBe('1 : 2 : 2');
    expect(ratioWords({ starterG: 20, flourG: 90, waterG: 80 })).toBe('1 : 4.5 : 4');
    expect(ratioWords({ starterG: 30, flourG: 40, waterG: 35 })).toBe('1 : 1.3 : 1.2');
  });

  it('states the feed’s hydration as water over fresh flour (baker’s percentage, common practice)', () => {
    expect(feedHydrationWords({ flourG: 60, waterG: 60 })).toBe('100 %');
    expect(feedHydrationWords({ flourG: 50, waterG: 40 })).toBe('80 %');
  });

  it('gives the rise above the starting height in %, 100 % being doubled', () => {
    expect(risePct(80, 40)).toBe(100);
    expect(risePct(58, 40)).toBe(45);
    expect(risePct(38, 40)).toBe(-5);
    expect(risePct(80, null)).toBeNull();
  });

  it('writes times in the baker’s zone, with the day only when it differs from the feeding’s', () => {
    expect(formatWhen('2026-12-01T13:05:00Z', 'Europe/Berlin')).toBe('1 Dec 2026, 14:05');
    expect(readingTime('2026-12-01T15:30:00Z', '2026-12-01T13:05:00Z', 'Europe/Berlin')).toBe('16:30');
    expect(readingTime('2026-12-01T23:30:00Z', '2026-12-01T13:05:00Z', 'Europe/Berlin')).toBe('2 Dec, 00:30');
    expect(readingTime('2026-12-01T23:30:00Z', '2026-12-01T13:05:00Z', 'UTC')).toBe('23:30');
  });

  it('measures a reading’s time from the feeding', () => {
    expect(hoursAfter('2026-12-01T13:05:00Z', '2026-12-01T14:35:00Z')).toBe(1.5);
  });
});
