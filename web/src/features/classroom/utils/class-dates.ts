// A class runs between two calendar dates (YYYY-MM-DD). Which week it is depends on the viewer's
// own calendar day, so "today" is taken in their time zone, not the server's.

const DAY_MS = 86_400_000;

/** Days since 1970-01-01 for a calendar date; UTC arithmetic, so no daylight-saving hour slips in. */
export function dayNumber(date: string): number {
  return Math.round(Date.parse(`${date}T00:00:00Z`) / DAY_MS);
}

/** The calendar date it is now in `timeZone`, as YYYY-MM-DD. */
export function todayIn(timeZone: string, now: Date): string {
  // en-CA writes dates as YYYY-MM-DD.
  return now.toLocaleDateString('en-CA', { timeZone });
}

export type ClassWeek =
  | { status: 'upcoming'; daysToStart: number; weeks: number }
  | { status: 'running'; week: number; weeks: number }
  | { status: 'ended'; weeks: number };

/** Where today falls in the class: before it, in week N of M (weeks counted from the start day), or after. */
export function classWeek(startsOn: string, endsOn: string, today: string): ClassWeek {
  const start = dayNumber(startsOn);
  const end = dayNumber(endsOn);
  const day = dayNumber(today);
  // Both dates count: a class from Saturday to the Friday five weeks later is six weeks.
  const weeks = Math.max(1, Math.ceil((end - start + 1) / 7));
  if (day < start) return { status: 'upcoming', daysToStart: start - day, weeks };
  if (day > end) return { status: 'ended', weeks };
  return { status: 'running', week: Math.min(weeks, Math.floor((day - start) / 7) + 1), weeks };
}

/** "Week 3 of 6", "Starts tomorrow · 6 weeks", "Starts in 5 days · 6 weeks", "Ended · ran 6 weeks". */
export function classWeekWords(week: ClassWeek): string {
  const length = week.weeks === 1 ? '1 week' : `${week.weeks} weeks`;
  switch (week.status) {
    case 'running':
      return `Week ${week.week} of ${week.weeks}`;
    case 'upcoming':
      return `${week.daysToStart === 1 ? 'Starts tomorrow' : `Starts in ${week.daysToStart} days`} · ${length}`;
    case 'ended':
      return `Ended · ran ${length}`;
  }
}

/** "6 Dec 2026", a calendar date read as such (never shifted by a time zone). */
export function formatDay(date: string): string {
  return new Date(`${date}T00:00:00Z`).toLocaleDateString('en-GB', {
    timeZone: 'UTC',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
  });
}

/** "6 Dec 2026 – 17 Jan 2027". */
export function formatClassDates(startsOn: string, endsOn: string): string {
  return `${formatDay(startsOn)} – ${formatDay(endsOn)}`;
}
