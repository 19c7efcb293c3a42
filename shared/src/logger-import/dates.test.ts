import { describe, expect, it } from 'vitest';
import { instantAtLocal } from '../fermentation/plan/zone.js';
import { detectDateFormat, hasOffset, parseLoggerTime } from './dates.js';

const at = (iso: string) => Date.parse(iso);

describe('parseLoggerTime', () => {
  it('reads ISO 8601 with an offset as that instant, whatever zone is chosen', () => {
    expect(parseLoggerTime('2026-11-28T07:15:00+01:00', 'iso', 'America/New_York')).toBe(at('2026-11-28T06:15:00Z'));
    expect(parseLoggerTime('2026-11-28T07:15:00.500Z', 'iso', 'Asia/Tokyo')).toBe(at('2026-11-28T07:15:00.500Z'));
    expect(parseLoggerTime('2026-11-28 07:15:00-0500', 'iso', 'UTC')).toBe(at('2026-11-28T12:15:00Z'));
  });

  it('reads a naive stamp as wall-clock time in the chosen zone', () => {
    // Berlin is UTC+1 in November and UTC+2 in July (EU summer time rules, common knowledge).
    expect(parseLoggerTime('2026-11-28 07:15:00', 'iso', 'Europe/Berlin')).toBe(at('2026-11-28T06:15:00Z'));
    expect(parseLoggerTime('2026-07-01 07:15', 'iso', 'Europe/Berlin')).toBe(at('2026-07-01T05:15:00Z'));
    expect(parseLoggerTime('28/11/2026 07:15', 'dmy', 'UTC')).toBe(at('2026-11-28T07:15:00Z'));
    expect(parseLoggerTime('28.11.2026 07:15:30', 'dmy', 'UTC')).toBe(at('2026-11-28T07:15:30Z'));
  });

  it('reads 12-hour clocks: 12 AM is midnight, 12 PM is noon', () => {
    expect(parseLoggerTime('11/28/2026 7:15 AM', 'mdy', 'UTC')).toBe(at('2026-11-28T07:15:00Z'));
    expect(parseLoggerTime('11/28/2026 7:15 PM', 'mdy', 'UTC')).toBe(at('2026-11-28T19:15:00Z'));
    expect(parseLoggerTime('11/28/2026 12:05 AM', 'mdy', 'UTC')).toBe(at('2026-11-28T00:05:00Z'));
    expect(parseLoggerTime('11/28/2026 12:05 PM', 'mdy', 'UTC')).toBe(at('2026-11-28T12:05:00Z'));
    expect(parseLoggerTime('11/28/2026 13:05 PM', 'mdy', 'UTC')).toBeNull();
  });

  it('reads Unix seconds and milliseconds (seconds since 1970-01-01 UTC, POSIX)', () => {
    expect(parseLoggerTime('1795849200', 'unix-s', 'Europe/Berlin')).toBe(at('2026-11-28T07:00:00Z'));
    expect(parseLoggerTime('1795849200500', 'unix-ms', 'UTC')).toBe(at('2026-11-28T07:00:00.500Z'));
  });

  it('refuses what is not a date in the format, including impossible days', () => {
    expect(parseLoggerTime('31/11/2026 07:15', 'dmy', 'UTC')).toBeNull();
    expect(parseLoggerTime('28/11/2026 07:15', 'mdy', 'UTC')).toBeNull();
    expect(parseLoggerTime('ERR', 'iso', 'UTC')).toBeNull();
    expect(parseLoggerTime('2026-02-29 07:15', 'iso', 'UTC')).toBeNull();
  });
});

describe('naive times across daylight-saving changes', () => {
  it('gives the same instants as the zone rules of instantAtLocal, every 10 minutes for two days around each change', () => {
    // EU summer time 2026: 29 March 02:00 → 03:00, 25 October 03:00 → 02:00 (EU directive 2000/84/EC, from memory).
    const pad = (n: number) => String(n).padStart(2, '0');
    for (const [month, day] of [
      [3, 28],
      [10, 24],
    ] as const) {
      for (let minutes = 0; minutes < 48 * 60; minutes += 10) {
        const d = new Date(Date.UTC(2026, month - 1, day, 0, minutes));
        const [y, m, dd, h, mm] = [
          d.getUTCFullYear(),
          d.getUTCMonth() + 1,
          d.getUTCDate(),
          d.getUTCHours(),
          d.getUTCMinutes(),
        ];
        const cell = `${y}-${pad(m)}-${pad(dd)} ${pad(h)}:${pad(mm)}`;
        expect(parseLoggerTime(cell, 'iso', 'Europe/Berlin'), cell).toBe(
          instantAtLocal(y, m, dd, h, mm, 'Europe/Berlin'),
        );
      }
    }
    expect(parseLoggerTime('2026-03-29 01:59', 'iso', 'Europe/Berlin')).toBe(at('2026-03-29T00:59:00Z'));
    expect(parseLoggerTime('2026-03-29 03:00', 'iso', 'Europe/Berlin')).toBe(at('2026-03-29T01:00:00Z'));
  });
});

describe('detectDateFormat', () => {
  it('prefers year first, then Unix time', () => {
    expect(detectDateFormat(['2026-11-28 07:15:00', '2026-11-28T07:25:00Z'])).toBe('iso');
    expect(detectDateFormat(['1795849200', '1795849260'])).toBe('unix-s');
    expect(detectDateFormat(['1795849200000'])).toBe('unix-ms');
  });

  it('tells day first from month first by a part above 12, else by the clock', () => {
    expect(detectDateFormat(['01/11/2026 07:15', '28/11/2026 07:15'])).toBe('dmy');
    expect(detectDateFormat(['11/01/2026 7:15 AM', '11/28/2026 7:15 AM'])).toBe('mdy');
    expect(detectDateFormat(['01/02/2026 7:15 AM'])).toBe('mdy');
    expect(detectDateFormat(['01/02/2026 07:15'])).toBe('dmy');
    expect(detectDateFormat(['temperature', '21.5'])).toBeNull();
    expect(detectDateFormat([])).toBeNull();
  });
});

describe('hasOffset', () => {
  it('is true only for stamps that carry an offset', () => {
    expect(hasOffset('2026-11-28T07:15:00Z')).toBe(true);
    expect(hasOffset('2026-11-28T07:15:00+01:00')).toBe(true);
    expect(hasOffset('2026-11-28 07:15:00')).toBe(false);
    expect(hasOffset('2026-11-28')).toBe(false);
  });
});
