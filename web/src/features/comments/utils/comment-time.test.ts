import { describe, expect, it } from 'vitest';
import { commentTime } from './comment-time';

const now = new Date('2026-12-02T12:00:00Z');

describe('commentTime', () => {
  it('says "just now" under a minute, and for a server clock slightly ahead', () => {
    expect(commentTime('2026-12-02T11:59:30Z', now, 'UTC')).toBe('just now');
    expect(commentTime('2026-12-02T12:00:05Z', now, 'UTC')).toBe('just now');
  });

  it('counts minutes and hours within the day', () => {
    expect(commentTime('2026-12-02T11:35:00Z', now, 'UTC')).toBe('25 min ago');
    expect(commentTime('2026-12-02T08:55:00Z', now, 'UTC')).toBe('3 h 5 min ago');
  });

  it('gives the date and time in the viewer’s zone after a day', () => {
    // 30 Nov 23:30 UTC is 1 Dec 00:30 in Paris (UTC+1 in winter).
    const text = commentTime('2026-11-30T23:30:00Z', now, 'Europe/Paris');
    expect(text).toContain('1 Dec');
    expect(text).toContain('00:30');
    expect(text).not.toContain('2026');
  });

  it('adds the year for a comment from another year', () => {
    expect(commentTime('2025-11-30T10:00:00Z', now, 'UTC')).toContain('2025');
  });
});
