import { instantAtLocal, offsetMinutesAt } from '../fermentation/plan/zone.js';
import type { LoggerDateFormat } from './types.js';

// Timestamps as loggers write them. A stamp with an offset (or Z) is an instant; a naive one is a
// wall-clock time in the zone the baker confirms (the account's zone unless the header says UTC).

const YEAR_FIRST =
  /^(\d{4})-(\d{1,2})-(\d{1,2})(?:[T ](\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d+))?)?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?$/i;
const SLASHED = /^(\d{1,2})[/.-](\d{1,2})[/.-](\d{4}|\d{2}),?(?:\s+(\d{1,2}):(\d{2})(?::(\d{2}))?\s*([AP]\.?M\.?)?)?$/i;
const UNIX = /^\d{9,14}(?:\.\d+)?$/;

interface Wall {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
  ms: number;
}

function valid(w: Wall): boolean {
  if (!Number.isFinite(w.hour)) return false;
  if (w.month < 1 || w.month > 12 || w.day < 1 || w.hour > 23 || w.minute > 59 || w.second > 60) return false;
  const last = new Date(Date.UTC(w.year, w.month, 0)).getUTCDate();
  return w.day <= last;
}

function offsetMinutes(zone: string): number {
  if (zone.toUpperCase() === 'Z') return 0;
  const sign = zone.startsWith('-') ? -1 : 1;
  const digits = zone.slice(1).replace(':', '');
  return sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2, 4) || 0));
}

const HOUR_MS = 3_600_000;
/** (zone, wall-clock hour) → the zone's offset through that hour, or null near a change. */
const hourOffsets = new Map<string, number | null>();

/**
 * The zone's offset for every minute of a wall-clock hour when no change is within 13 h of it
 * (zones change at most twice a year), else null. A year of minute data asks Intl once an hour
 * instead of three times a row, which is what makes a 500k-row file take seconds, not minutes.
 */
function steadyOffset(wallHour: number, timeZone: string): number | null {
  const key = `${timeZone}|${wallHour}`;
  let offset = hourOffsets.get(key);
  if (offset === undefined) {
    const before = offsetMinutesAt(wallHour - 13 * HOUR_MS, timeZone);
    offset = before === offsetMinutesAt(wallHour + 13 * HOUR_MS, timeZone) ? before : null;
    if (hourOffsets.size > 50_000) hourOffsets.clear();
    hourOffsets.set(key, offset);
  }
  return offset;
}

function fromWall(w: Wall, timeZone: string): number {
  const wall = Date.UTC(w.year, w.month - 1, w.day, w.hour, w.minute, w.second, w.ms);
  const steady = steadyOffset(Date.UTC(w.year, w.month - 1, w.day, w.hour), timeZone);
  if (steady !== null) return wall - steady * 60_000;
  // Near a DST change: the gap and overlap rules of instantAtLocal. Seconds are added after the
  // zone lookup, as a change never falls inside a minute.
  return instantAtLocal(w.year, w.month, w.day, w.hour, w.minute, timeZone) + w.second * 1000 + w.ms;
}

function hour12(hour: number, meridiem: string | undefined): number {
  if (!meridiem) return hour;
  if (hour < 1 || hour > 12) return NaN;
  const pm = meridiem.toUpperCase().startsWith('P');
  return (hour % 12) + (pm ? 12 : 0);
}

/** The instant a cell names, in ms since the epoch, or null when it is not written in `format`. */
export function parseLoggerTime(value: string, format: LoggerDateFormat, timeZone: string): number | null {
  const s = value.trim();
  if (format === 'unix-s' || format === 'unix-ms') {
    if (!UNIX.test(s)) return null;
    return Math.round(Number(s) * (format === 'unix-s' ? 1000 : 1));
  }
  if (format === 'iso') {
    const m = YEAR_FIRST.exec(s);
    if (!m) return null;
    const w: Wall = {
      year: Number(m[1]),
      month: Number(m[2]),
      day: Number(m[3]),
      hour: Number(m[4] ?? 0),
      minute: Number(m[5] ?? 0),
      second: Number(m[6] ?? 0),
      ms: m[7] ? Math.round(Number(`0.${m[7]}`) * 1000) : 0,
    };
    if (!valid(w)) return null;
    if (m[8]) {
      const utc = Date.UTC(w.year, w.month - 1, w.day, w.hour, w.minute, w.second, w.ms);
      return utc - offsetMinutes(m[8]) * 60_000;
    }
    return fromWall(w, timeZone);
  }
  const m = SLASHED.exec(s);
  if (!m) return null;
  const [first, second] = [Number(m[1]), Number(m[2])];
  const yearCell = m[3] ?? '';
  const year = yearCell.length === 2 ? 2000 + Number(yearCell) : Number(yearCell);
  const w: Wall = {
    year,
    month: format === 'dmy' ? second : first,
    day: format === 'dmy' ? first : second,
    hour: hour12(Number(m[4] ?? 0), m[7]),
    minute: Number(m[5] ?? 0),
    second: Number(m[6] ?? 0),
    ms: 0,
  };
  return valid(w) ? fromWall(w, timeZone) : null;
}

/**
 * The format that reads every sample, preferring the unambiguous: year first, then Unix time, then
 * day or month first — a day above 12 settles that; undecided, a 12-hour clock (AM/PM) points to
 * month first and a 24-hour clock to day first. Null when no format reads them all.
 */
export function detectDateFormat(samples: readonly string[]): LoggerDateFormat | null {
  const cells = samples.map((s) => s.trim()).filter((s) => s !== '');
  if (cells.length === 0) return null;
  const readsAll = (f: LoggerDateFormat) => cells.every((c) => parseLoggerTime(c, f, 'UTC') !== null);
  if (readsAll('iso')) return 'iso';
  if (cells.every((c) => UNIX.test(c))) {
    // Seconds since 1970 have 10 digits until 2286; milliseconds have 13.
    return cells.every((c) => (c.split('.')[0] ?? '').length <= 11) ? 'unix-s' : 'unix-ms';
  }
  const dmy = readsAll('dmy');
  const mdy = readsAll('mdy');
  if (dmy && !mdy) return 'dmy';
  if (mdy && !dmy) return 'mdy';
  if (!dmy && !mdy) return null;
  return cells.some((c) => /[AP]\.?M\.?$/i.test(c)) ? 'mdy' : 'dmy';
}

/** Whether a cell carries its own offset, so the zone choice does not apply to it. */
export function hasOffset(value: string): boolean {
  return Boolean(YEAR_FIRST.exec(value.trim())?.[8]);
}
