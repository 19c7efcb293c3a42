// Which alerts a culture wants, from its summary (the same prediction the Shelf shows). Pure: the
// caller passes "now" and the baker's lead time.
import type { AlertKind } from '../contracts/alert.js';
import type { CultureSummary } from '../contracts/culture-summary.js';
import type { CultureLocation } from '../contracts/culture.js';
import { alertSlotKey } from './slot-key.js';
import type { WantedAlert } from './types.js';

const MS_PER_MINUTE = 60_000;
const MS_PER_HOUR = 3_600_000;

/**
 * Every kind cultureAlerts() produces. A refresh of a culture owns these and no others: an alert
 * of another kind about the culture (a comment on one of its feedings) is never its to cancel.
 */
export const CULTURE_ALERT_KINDS = [
  'feeding-due',
  'culture-ready',
  'past-peak',
] as const satisfies readonly AlertKind[];

/**
 * The feeding routine by location. Cultures carry no routine of their own yet, so it follows where
 * the jar lives: daily on the counter, weekly in the fridge (common practice for a kept starter).
 */
export const FEEDING_ROUTINE_HOURS: Record<CultureLocation, number> = { counter: 24, fridge: 7 * 24 };

/**
 * A past-peak alert older than this is not worth an e-mail: a counter starter this long past its
 * peak has collapsed and gone sour, and the feeding-due alert takes over (common practice).
 */
export const PAST_PEAK_STALE_HOURS = 6;
/** Half a counter day: a "feed it" message half a day late is better replaced by the next one. */
export const FEEDING_DUE_STALE_HOURS = 12;
/** When a forecast gives a window start but no end, the ready alert stays fresh this long. */
export const READY_FALLBACK_STALE_HOURS = 2;

export interface CultureAlertInput {
  accountId: string;
  summary: CultureSummary;
  /** Minutes before the ready window starts that the culture-ready alert comes. */
  leadMinutes: number;
  now: string;
  /** The baker's IANA zone: times in the words are local, e.g. "Wed 14:20". */
  timeZone: string;
}

/** The ready window: from the rise checks when they place it, else the forecast's 80 % interval. */
export function readyWindow(
  summary: CultureSummary,
): { from: number; until: number | null; peak: number | null } | null {
  const { running, forecast } = summary;
  if (running?.readyFrom) {
    return {
      from: Date.parse(running.readyFrom),
      until: running.readyUntil ? Date.parse(running.readyUntil) : null,
      peak: running.peakAt ? Date.parse(running.peakAt) : null,
    };
  }
  if (forecast)
    return { from: Date.parse(forecast.low), until: Date.parse(forecast.high), peak: Date.parse(forecast.peakAt) };
  return null;
}

const iso = (ms: number): string => new Date(ms).toISOString();

/** "Wed 14:20" in the baker's zone (24-hour clock, as the rest of the app shows times). */
export function localTime(ms: number, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'short', hour: '2-digit', minute: '2-digit' }).format(
    ms,
  );
}

/** Alerts the culture wants now; an alert already stale at `now` is left out. */
export function cultureAlerts(input: CultureAlertInput): WantedAlert[] {
  const { summary, accountId } = input;
  const { culture, running } = summary;
  if (culture.archived || !running) return [];
  const now = Date.parse(input.now);
  const feedingId = running.feeding.id;
  const base = {
    subjectType: 'culture' as const,
    subjectId: culture.id,
    feedingId,
    linkPath: `/cultures/${culture.id}`,
  };
  const out: WantedAlert[] = [];

  const fedAt = Date.parse(running.feeding.fedAt);
  const routineHours = FEEDING_ROUTINE_HOURS[culture.location];
  const feedDue = fedAt + routineHours * MS_PER_HOUR;
  out.push({
    ...base,
    slotKey: alertSlotKey(accountId, 'feeding-due', culture.id, feedingId),
    kind: 'feeding-due',
    dueAt: iso(feedDue),
    staleAt: iso(feedDue + FEEDING_DUE_STALE_HOURS * MS_PER_HOUR),
    title: `${culture.name} is due a feeding`,
    body:
      culture.location === 'fridge'
        ? `Last fed a week ago in the fridge (weekly routine).`
        : `Last fed ${routineHours} h ago on the counter (daily routine).`,
  });

  // A jar in the fridge rests between bakes: its rise is not a promise worth an alert.
  const window = culture.location === 'counter' ? readyWindow(summary) : null;
  if (window) {
    const readyStale = window.until ?? window.from + READY_FALLBACK_STALE_HOURS * MS_PER_HOUR;
    out.push({
      ...base,
      slotKey: alertSlotKey(accountId, 'culture-ready', culture.id, feedingId),
      kind: 'culture-ready',
      dueAt: iso(Math.min(window.from - input.leadMinutes * MS_PER_MINUTE, readyStale)),
      staleAt: iso(readyStale),
      title: `${culture.name} will be ready soon`,
      body:
        `Ready from ${localTime(window.from, input.timeZone)}` +
        (window.peak !== null ? `, peak around ${localTime(window.peak, input.timeZone)}` : '') +
        ': plan to mix or feed while it is near its peak.',
    });
    if (window.until !== null) {
      out.push({
        ...base,
        slotKey: alertSlotKey(accountId, 'past-peak', culture.id, feedingId),
        kind: 'past-peak',
        dueAt: iso(window.until),
        staleAt: iso(window.until + PAST_PEAK_STALE_HOURS * MS_PER_HOUR),
        title: `${culture.name} is past its peak`,
        body: `The ready window ended at ${localTime(window.until, input.timeZone)}: use it soon or feed it again.`,
      });
    }
  }
  return out.filter((a) => Date.parse(a.staleAt) > now);
}
