import type { Paged } from './paging.js';

// Alerts: reminders the API schedules from a culture's prediction and a bake plan's live steps, and
// delivers once per channel. In the app an alert shows once it is due; e-mail and push obey the
// baker's quiet hours. Times are ISO 8601, answered in UTC.

/**
 * - `culture-ready`: the ready window starts (minus the baker's lead time).
 * - `past-peak`: the ready window has ended; use or feed soon.
 * - `feeding-due`: the culture's routine says it wants feeding (counter daily, fridge weekly).
 * - `plan-step`: a hands-on step of a live bake plan (folds, bulk end, take out, preheat, bake done).
 * - `comment`: someone wrote on a feeding or bake of yours, or of a student in your class.
 */
export const ALERT_KINDS = ['culture-ready', 'past-peak', 'feeding-due', 'plan-step', 'comment'] as const;
export type AlertKind = (typeof ALERT_KINDS)[number];

/** `push` goes to every device (browser) the baker turned notifications on for. */
export const ALERT_CHANNELS = ['in-app', 'email', 'push'] as const;
export type AlertChannel = (typeof ALERT_CHANNELS)[number];
/** Channels the baker may switch per kind; in the app is always on. */
export const OPTIONAL_ALERT_CHANNELS = ['email', 'push'] as const;
export type OptionalAlertChannel = (typeof OPTIONAL_ALERT_CHANNELS)[number];

export const ALERT_SUBJECT_TYPES = ['culture', 'bake-plan'] as const;
export type AlertSubjectType = (typeof ALERT_SUBJECT_TYPES)[number];

export const ALERT_LEAD_MINUTES_MIN = 0;
export const ALERT_LEAD_MINUTES_MAX = 240;
export const ALERT_LEAD_MINUTES_DEFAULT = 15;

export interface Alert {
  id: string;
  kind: AlertKind;
  subjectType: AlertSubjectType;
  /** The culture's or the bake plan's id. */
  subjectId: string;
  title: string;
  body: string;
  /** Where the alert leads in the web app, e.g. `/cultures/…` or `/bench/…`. */
  linkPath: string;
  dueAt: string;
  /** When it reached the app (it is listed from then on). */
  deliveredAt: string;
  readAt: string | null;
}

/** Unread first, then newest due first. */
export type AlertListResponse = Paged<Alert>;

export interface AlertListQuery {
  limit?: number;
  offset?: number;
}

export interface UnreadAlertCount {
  unread: number;
}

export interface ReadAllAlertsResponse {
  /** How many alerts this call marked read. */
  marked: number;
}

/** Local clock times "HH:MM" in the account's time zone; `until` at or before `from` spans midnight. */
export interface AlertQuietHours {
  from: string;
  until: string;
}

export type AlertChannelChoice = Record<OptionalAlertChannel, boolean>;

export interface AlertPreferences {
  /** How long before the ready window starts the culture-ready alert comes, minutes (0–240). */
  leadMinutes: number;
  /** No e-mail or push inside these hours (held until they end, or dropped when stale); null = none. */
  quietHours: AlertQuietHours | null;
  /** Per kind, the channels besides the app. */
  channels: Record<AlertKind, AlertChannelChoice>;
}

/** Only the fields sent change; `quietHours: null` clears them; `channels` may name some kinds only. */
export interface UpdateAlertPreferencesRequest {
  leadMinutes?: number;
  quietHours?: AlertQuietHours | null;
  channels?: Partial<Record<AlertKind, Partial<AlertChannelChoice>>>;
}
