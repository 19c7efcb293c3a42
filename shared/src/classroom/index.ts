export { normalisedHoursToPeak } from './normalise.js';
export {
  queryRoster,
  rosterEntry,
  rosterTrend,
  sluggishScore,
  RECENT_FEEDINGS,
  RISE_FALLING_BY,
  ROSTER_DEFAULT_ORDER,
  SLOWER_BY,
  TREND_BASELINE_FEEDINGS,
  TREND_MIN_BASELINE_FEEDINGS,
  TREND_RECENT_FEEDINGS,
  type RosterCultureInput,
  type RosterEntry,
  type RosterFeedingInput,
  type RosterTrend,
  type RosterView,
} from './roster.js';
