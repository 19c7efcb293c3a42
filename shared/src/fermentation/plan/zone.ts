// Wall-clock time in the baker's IANA zone. Quiet hours are local clock times ("23:00–06:30"),
// so each night is turned into its own pair of instants: on a night with a DST change the quiet
// stretch is an hour shorter or longer, and a fixed UTC offset would put it in the wrong place.
// Intl (ICU's zone data) is the only source of offsets; it is deterministic for given inputs.
import { BakersMathError } from '../units/bakers-math-error.js';
import { formatInstant } from '../temperature/time.js';

const MS_PER_MINUTE = 60_000;
const MS_PER_DAY = 86_400_000;

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
      second: 'numeric',
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/** Throws a BakersMathError at `path` unless `timeZone` is an IANA zone this runtime knows. */
export function checkTimeZone(timeZone: unknown, path: string): string {
  if (typeof timeZone !== 'string' || timeZone.length === 0) {
    throw new BakersMathError(path, `${path} must be an IANA time zone such as Europe/Berlin`);
  }
  try {
    formatter(timeZone);
  } catch {
    throw new BakersMathError(path, `${path}: unknown time zone ${JSON.stringify(timeZone)}`);
  }
  return timeZone;
}

export interface LocalParts {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
}

/** The local calendar date and clock time of instant `ms` in `timeZone`. */
export function localParts(ms: number, timeZone: string): LocalParts & { second: number } {
  const parts: Record<string, number> = {};
  for (const p of formatter(timeZone).formatToParts(new Date(ms))) {
    if (p.type !== 'literal') parts[p.type] = Number(p.value);
  }
  return {
    year: parts.year ?? NaN,
    month: parts.month ?? NaN,
    day: parts.day ?? NaN,
    hour: parts.hour ?? NaN,
    minute: parts.minute ?? NaN,
    second: parts.second ?? NaN,
  };
}

/** Offset of `timeZone` from UTC at instant `ms`, minutes east. */
export function offsetMinutesAt(ms: number, timeZone: string): number {
  const p = localParts(ms, timeZone);
  const asUtc = Date.UTC(p.year, p.month - 1, p.day, p.hour, p.minute, p.second);
  return Math.round((asUtc - Math.floor(ms / 1000) * 1000) / MS_PER_MINUTE);
}

/** `ms` as ISO 8601 in the zone's own offset at that instant (so a DST change shows in the string). */
export function formatInZone(ms: number, timeZone: string): string {
  return formatInstant(ms, offsetMinutesAt(ms, timeZone));
}

/**
 * The instant at which the local clock in `timeZone` shows the given date and time. In the spring
 * gap (02:30 that never happens) it is the instant the clock jumps past, shifted forward by the
 * gap; in the autumn overlap (02:30 twice) the earlier one — a baker's "from 02:30" starts there.
 */
export function instantAtLocal(
  year: number,
  month: number,
  day: number,
  hour: number,
  minute: number,
  timeZone: string,
): number {
  const wall = Date.UTC(year, month - 1, day, hour, minute);
  const before = wall - offsetMinutesAt(wall - MS_PER_DAY / 2, timeZone) * MS_PER_MINUTE;
  const after = wall - offsetMinutesAt(wall + MS_PER_DAY / 2, timeZone) * MS_PER_MINUTE;
  const candidates = [before, after].filter((t) => wall - offsetMinutesAt(t, timeZone) * MS_PER_MINUTE === t);
  if (candidates.length > 0) return Math.min(...candidates);
  // In the gap: the wall time read with the offset from before the change lands after it.
  return Math.max(before, after);
}

export interface ClockTime {
  hour: number;
  minute: number;
}

const CLOCK = /^([01]\d|2[0-3]):([0-5]\d)$/;

/** "06:30" → { hour: 6, minute: 30 }; anything else is a BakersMathError at `path`. */
export function parseClockTime(value: unknown, path: string): ClockTime {
  const m = typeof value === 'string' ? CLOCK.exec(value) : null;
  if (!m) throw new BakersMathError(path, `${path} must be a local clock time HH:MM, e.g. 23:00`);
  return { hour: Number(m[1]), minute: Number(m[2]) };
}

/** Half-open interval of instants, ms. */
export interface Interval {
  start: number;
  end: number;
}

/**
 * Every quiet stretch that touches [fromMs, toMs], as instants, in time order. A stretch starts
 * on the local date it begins and ends at `until` on the same date (until after from) or the
 * next date (a night).
 */
export function quietIntervals(
  quiet: { from: ClockTime; until: ClockTime },
  timeZone: string,
  fromMs: number,
  toMs: number,
): Interval[] {
  const overnight = quiet.until.hour * 60 + quiet.until.minute <= quiet.from.hour * 60 + quiet.from.minute ? 1 : 0;
  const out: Interval[] = [];
  const first = localParts(fromMs - MS_PER_DAY, timeZone);
  // Walk local dates through a UTC calendar, which has no DST of its own.
  for (let d = Date.UTC(first.year, first.month - 1, first.day); d <= toMs + MS_PER_DAY; d += MS_PER_DAY) {
    const day = new Date(d);
    const next = new Date(d + overnight * MS_PER_DAY);
    const start = instantAtLocal(
      day.getUTCFullYear(),
      day.getUTCMonth() + 1,
      day.getUTCDate(),
      quiet.from.hour,
      quiet.from.minute,
      timeZone,
    );
    const end = instantAtLocal(
      next.getUTCFullYear(),
      next.getUTCMonth() + 1,
      next.getUTCDate(),
      quiet.until.hour,
      quiet.until.minute,
      timeZone,
    );
    if (end > fromMs && start <= toMs && end > start) out.push({ start, end });
  }
  return out;
}

/** True when [start, end] touches a quiet interval (a zero-length step counts at its instant). */
export function overlapsQuiet(start: number, end: number, quiet: readonly Interval[]): boolean {
  for (const q of quiet) {
    if (end === start ? start >= q.start && start < q.end : start < q.end && end > q.start) return true;
  }
  return false;
}
