import type { UnitSystem } from '@peakwise/shared';
import { isoToWallTime } from './zoned-time';

// The account has no clock setting; bakers on US units read a 12-hour clock, everyone else 24 h.
export type ClockStyle = '12h' | '24h';

export function clockStyleFor(unitSystem: UnitSystem): ClockStyle {
  return unitSystem === 'us' ? '12h' : '24h';
}

export interface ClockOptions {
  timeZone: string;
  style: ClockStyle;
}

/** "14:05" or "2:05 PM" in the baker's zone. */
export function formatTime(iso: string, { timeZone, style }: ClockOptions): string {
  return new Date(iso).toLocaleTimeString(style === '12h' ? 'en-US' : 'en-GB', {
    timeZone,
    hour: style === '12h' ? 'numeric' : '2-digit',
    minute: '2-digit',
    hour12: style === '12h',
  });
}

/** "Thu 3 Dec" in the baker's zone. */
export function formatDay(iso: string, timeZone: string): string {
  return new Date(iso).toLocaleDateString('en-GB', { timeZone, weekday: 'short', day: 'numeric', month: 'short' });
}

/** The calendar day in the zone, "2026-12-03", to group and compare steps by day. */
export function dayKey(iso: string | Date, timeZone: string): string {
  return isoToWallTime(iso, timeZone).slice(0, 10);
}

/** "14:05" on the same day as `now`, else "Thu 3 Dec 14:05". */
export function formatWhen(iso: string, now: Date, clock: ClockOptions): string {
  const time = formatTime(iso, clock);
  return dayKey(iso, clock.timeZone) === dayKey(now, clock.timeZone)
    ? time
    : `${formatDay(iso, clock.timeZone)} ${time}`;
}

/**
 * A predicted time with its interval: "14:05 (13:20 – 15:10)". The ends take the day only when
 * it differs from the central time's, so a range across midnight still reads right.
 */
export function formatRange(iso: string, low: string, high: string, clock: ClockOptions): string {
  const day = dayKey(iso, clock.timeZone);
  const end = (t: string) =>
    dayKey(t, clock.timeZone) === day
      ? formatTime(t, clock)
      : `${formatDay(t, clock.timeZone)} ${formatTime(t, clock)}`;
  return `${formatTime(iso, clock)} (${end(low)} – ${end(high)})`;
}
