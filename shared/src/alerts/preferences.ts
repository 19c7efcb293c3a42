import {
  ALERT_KINDS,
  ALERT_LEAD_MINUTES_DEFAULT,
  type AlertChannel,
  type AlertKind,
  type AlertPreferences,
  type UpdateAlertPreferencesRequest,
} from '../contracts/alert.js';

/**
 * Until the baker says otherwise: every kind in the app, by e-mail and by push, no quiet hours.
 * Push reaches only devices the baker turned notifications on for, so "on" costs nothing without one.
 */
export function defaultAlertPreferences(): AlertPreferences {
  const channels = Object.fromEntries(
    ALERT_KINDS.map((k) => [k, { email: true, push: true }]),
  ) as AlertPreferences['channels'];
  return { leadMinutes: ALERT_LEAD_MINUTES_DEFAULT, quietHours: null, channels };
}

/** The stored preferences with a PATCH applied (fields left out keep their value). */
export function mergeAlertPreferences(
  current: AlertPreferences,
  patch: UpdateAlertPreferencesRequest,
): AlertPreferences {
  const channels = { ...withEveryKind(current.channels) };
  for (const kind of ALERT_KINDS) {
    const change = patch.channels?.[kind];
    // A request object may carry a field as `undefined` (class instances do): that keeps the value.
    if (change) {
      channels[kind] = {
        email: change.email ?? channels[kind].email,
        push: change.push ?? channels[kind].push,
      };
    }
  }
  return {
    leadMinutes: patch.leadMinutes ?? current.leadMinutes,
    quietHours: patch.quietHours === undefined ? current.quietHours : patch.quietHours,
    channels,
  };
}

/** The channels an alert of `kind` goes to: the app always, then what the baker switched on. */
export function channelsFor(prefs: AlertPreferences, kind: AlertKind): AlertChannel[] {
  const choice = prefs.channels[kind] ?? defaultAlertPreferences().channels[kind];
  return ['in-app', ...(choice.email ? (['email'] as const) : []), ...(choice.push ? (['push'] as const) : [])];
}

/** Stored choices may predate a kind (e.g. `comment`); a kind they lack takes the default. */
export function withEveryKind(channels: Partial<AlertPreferences['channels']>): AlertPreferences['channels'] {
  return { ...defaultAlertPreferences().channels, ...channels };
}
