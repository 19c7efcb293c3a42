import { describe, expect, it } from 'vitest';
import { formatAgo, formatCountdown, formatDuration } from './duration';

const now = new Date('2026-12-01T12:00:00Z');
const at = (minutes: number) => new Date(now.getTime() + minutes * 60_000).toISOString();

describe('formatDuration', () => {
  it.each([
    [0, '0 min'],
    [0.75, '45 min'],
    [1, '1 h'],
    [2 + 10 / 60, '2 h 10 min'],
    [5 + 59.6 / 60, '6 h'],
    [27, '1 d 3 h'],
    [-1, '0 min'],
  ])('%s h reads "%s"', (hours, words) => {
    expect(formatDuration(hours)).toBe(words);
  });
});

describe('formatCountdown', () => {
  it('counts to the best guess and gives the interval', () => {
    expect(formatCountdown({ at: at(130), low: at(100), high: at(170) }, now)).toBe(
      'ready in about 2 h 10 min (1 h 40 min – 2 h 50 min)',
    );
  });

  it('inside the interval it says ready now', () => {
    expect(formatCountdown({ at: at(10), low: at(-20), high: at(40) }, now)).toBe('ready now or within 40 min');
  });

  it('inside the ready window it counts to the peak', () => {
    expect(formatCountdown({ at: at(50), low: at(48), high: at(54) }, now, 'peak')).toBe(
      'peaks in about 50 min (48 min – 54 min)',
    );
  });

  it('after the interval there is nothing to count to', () => {
    expect(formatCountdown({ at: at(-90), low: at(-120), high: at(-30) }, now)).toBeNull();
  });
});

describe('formatAgo', () => {
  it('reads hours and minutes ago, and just now', () => {
    expect(formatAgo(at(-180), now)).toBe('3 h ago');
    expect(formatAgo(at(-0.5), now)).toBe('just now');
  });
});
