// Times in the words a baker reads at a glance: "2 h 10 min", "fed 3 h ago", "ready in about …".

const MINUTE = 60_000;

/** 2.1667 h → "2 h 10 min"; under an hour "45 min"; a day or more "1 d 3 h". Rounded to the minute. */
export function formatDuration(hours: number): string {
  const minutes = Math.max(0, Math.round(hours * 60));
  if (minutes < 60) return `${minutes} min`;
  const days = Math.floor(minutes / 1440);
  if (days >= 1) {
    const h = Math.round((minutes - days * 1440) / 60);
    return h === 0 ? `${days} d` : `${days} d ${h} h`;
  }
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

function hoursBetween(from: Date, to: string): number {
  return (new Date(to).getTime() - from.getTime()) / 3_600_000;
}

/** "fed 3 h ago", "fed just now". */
export function formatAgo(iso: string, now: Date): string {
  const ms = now.getTime() - new Date(iso).getTime();
  if (ms < MINUTE) return 'just now';
  return `${formatDuration(ms / 3_600_000)} ago`;
}

export interface ReadyWindow {
  /** Best guess of the moment it is ready (the peak, or the start of the ready window). */
  at: string;
  low: string;
  high: string;
}

/**
 * "ready in about 2 h 10 min (1 h 40 min – 2 h 50 min)"; inside the interval "ready now or within
 * 40 min"; after it, null (the state chip says "past peak"). Already in its ready window, the
 * culture counts to its peak instead: "peaks in about 50 min (…)".
 */
export function formatCountdown(window: ReadyWindow, now: Date, what: 'ready' | 'peak' = 'ready'): string | null {
  const toAt = hoursBetween(now, window.at);
  const toLow = hoursBetween(now, window.low);
  const toHigh = hoursBetween(now, window.high);
  if (toHigh <= 0) return null;
  if (toLow <= 0) return `${what === 'ready' ? 'ready' : 'peaking'} now or within ${formatDuration(toHigh)}`;
  const best = Math.max(toAt, toLow);
  const lead = what === 'ready' ? 'ready in about' : 'peaks in about';
  return `${lead} ${formatDuration(best)} (${formatDuration(toLow)} – ${formatDuration(toHigh)})`;
}

/** A clock time in the baker's zone: "14:05" today, "Wed 14:05" on another day. */
export function formatClock(iso: string, timeZone: string, now: Date): string {
  const date = new Date(iso);
  const day = (d: Date) => d.toLocaleDateString('en-CA', { timeZone });
  const time = date.toLocaleTimeString('en-GB', { timeZone, hour: '2-digit', minute: '2-digit' });
  if (day(date) === day(now)) return time;
  return `${date.toLocaleDateString('en-GB', { timeZone, weekday: 'short', day: 'numeric', month: 'short' })} ${time}`;
}
