import { formatAgo } from '@/lib/format/duration';

const DAY = 86_400_000;

/**
 * When a comment was written, as a reader of a conversation wants it: "just now", "25 min ago",
 * "3 h 5 min ago" within the day, then the date and time in the viewer's zone.
 */
export function commentTime(iso: string, now: Date, timeZone: string): string {
  const ms = now.getTime() - Date.parse(iso);
  // A clock a little ahead of ours still reads "just now", not a time in the future.
  if (ms < DAY) return formatAgo(iso, new Date(Math.max(now.getTime(), Date.parse(iso))));
  return new Intl.DateTimeFormat('en-GB', {
    timeZone,
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    hour: '2-digit',
    minute: '2-digit',
    ...(new Date(iso).getUTCFullYear() === now.getUTCFullYear() ? {} : { year: 'numeric' }),
  }).format(new Date(iso));
}

/** The exact time, for the tooltip on a relative one. */
export function commentTimeExact(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, dateStyle: 'full', timeStyle: 'short' }).format(new Date(iso));
}
