import { describe, expect, it } from 'vitest';
import { classWeek, classWeekWords, formatClassDates, todayIn } from './class-dates';

// Weeks are counted the common-practice way: days 1–7 of the class are week 1, both end dates count.
describe('where today falls in a class', () => {
  // Saturday 5 Dec 2026 to Friday 15 Jan 2027: 42 days, six weeks.
  const start = '2026-12-05';
  const end = '2027-01-15';

  it('counts weeks from the start day, six for a six-week class', () => {
    expect(classWeek(start, end, '2026-12-05')).toEqual({ status: 'running', week: 1, weeks: 6 });
    expect(classWeek(start, end, '2026-12-11')).toEqual({ status: 'running', week: 1, weeks: 6 });
    expect(classWeek(start, end, '2026-12-12')).toEqual({ status: 'running', week: 2, weeks: 6 });
    expect(classWeek(start, end, '2027-01-15')).toEqual({ status: 'running', week: 6, weeks: 6 });
  });

  it('says when it starts and that it ended, across a year end', () => {
    expect(classWeek(start, end, '2026-12-04')).toMatchObject({ status: 'upcoming', daysToStart: 1 });
    expect(classWeek(start, end, '2026-11-30')).toMatchObject({ status: 'upcoming', daysToStart: 5 });
    expect(classWeek(start, end, '2027-01-16')).toEqual({ status: 'ended', weeks: 6 });
  });

  it('puts it in words', () => {
    expect(classWeekWords(classWeek(start, end, '2026-12-20'))).toBe('Week 3 of 6');
    expect(classWeekWords(classWeek(start, end, '2026-12-04'))).toBe('Starts tomorrow · 6 weeks');
    expect(classWeekWords(classWeek(start, end, '2026-12-01'))).toBe('Starts in 4 days · 6 weeks');
    expect(classWeekWords(classWeek(start, start, '2027-02-01'))).toBe('Ended · ran 1 week');
  });

  it('takes today in the viewer’s zone: 23:30 UTC is already tomorrow in Auckland', () => {
    const now = new Date('2026-12-04T23:30:00Z');
    expect(todayIn('Europe/London', now)).toBe('2026-12-04');
    expect(todayIn('Pacific/Auckland', now)).toBe('2026-12-05');
  });

  it('shows calendar dates as written, whatever the zone', () => {
    expect(formatClassDates(start, end)).toBe('5 Dec 2026 – 15 Jan 2027');
  });
});
