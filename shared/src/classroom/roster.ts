// The instructor's roster, as pure rules: one row per student culture, its flags, its trend, and
// the orders the table can take. The API gathers each culture's recent feedings and passes "now".
import { FEEDING_ROUTINE_HOURS } from '../alerts/culture-rules.js';
import type { RosterFlag, RosterQuery, RosterRow, RosterSort } from '../contracts/classroom.js';
import type { CultureLocation, FeedingObservation } from '../contracts/culture.js';
import type { SortOrder } from '../contracts/paging.js';

const MS_PER_HOUR = 3_600_000;

/** Feedings the caution and no-rise-checks flags look at: about the last three days on the counter. */
export const RECENT_FEEDINGS = 3;
/** The trend compares the mean of the latest completed feedings … */
export const TREND_RECENT_FEEDINGS = 3;
/** … with the mean of up to this many completed feedings before them … */
export const TREND_BASELINE_FEEDINGS = 5;
/** … and says nothing with fewer than this many in the baseline (two points are not a habit). */
export const TREND_MIN_BASELINE_FEEDINGS = 2;
/**
 * "slower" when the recent normalised time to peak is at least 25 % above the baseline ("faster"
 * when at least 25 % below). Common practice, not a published threshold: the model assumes a
 * day-to-day spread of about ±20 % per feeding (PRIOR_RESIDUAL_SD, itself from memory), so a
 * quarter on the mean of three against the mean of up to five is more than noise.
 */
export const SLOWER_BY = 0.25;
/**
 * The rise multiple is "falling" when the recent mean is at least 20 % below the baseline (a jar
 * that doubled and a half now barely doubles). Common practice, not a published threshold.
 */
export const RISE_FALLING_BY = 0.2;

/** One feeding as the roster reads it. */
export interface RosterFeedingInput {
  fedAt: string;
  riseCheckCount: number;
  observations: readonly FeedingObservation[];
  /** Peak height ÷ initial height from its rise checks; null without a fit. */
  riseMultiple: number | null;
  /** Observed hours to peak restated at 1:1:1 and 24 °C (normalisedHoursToPeak); null unless it peaked. */
  normalisedHoursToPeak: number | null;
}

/** A student culture (or a student without one: culture null). */
export interface RosterCultureInput {
  studentId: string;
  studentName: string;
  culture: { id: string; name: string; location: CultureLocation } | null;
  /** Newest first. */
  feedings: readonly RosterFeedingInput[];
  /** From the culture's own fitted kinetics; null while it has no completed feeding of its own. */
  hoursToPeakAtReference: number | null;
}

/**
 * The roster's time to peak: the LATEST completed feeding's, normalised to 1:1:1 at 24 °C (the class
 * chart's last point), so a culture slowing down shows it now rather than averaged into its fit;
 * the fitted value while no feeding has finished.
 */
export function latestHoursToPeak(input: RosterCultureInput): number | null {
  const latest = input.feedings.find((f) => f.normalisedHoursToPeak !== null);
  return latest?.normalisedHoursToPeak ?? input.hoursToPeakAtReference;
}

export interface RosterTrend {
  trend: RosterRow['trend'];
  /** Recent ÷ baseline mean normalised time to peak (> 1: slower); null with too few feedings. */
  peakRatio: number | null;
  /** Recent ÷ baseline mean rise multiple (< 1: weaker); null with too few feedings. */
  riseRatio: number | null;
  sluggish: boolean;
}

const mean = (xs: number[]): number => xs.reduce((s, x) => s + x, 0) / xs.length;

function ratio(newestFirst: number[]): number | null {
  const recent = newestFirst.slice(0, TREND_RECENT_FEEDINGS);
  const baseline = newestFirst.slice(TREND_RECENT_FEEDINGS, TREND_RECENT_FEEDINGS + TREND_BASELINE_FEEDINGS);
  if (recent.length < TREND_RECENT_FEEDINGS || baseline.length < TREND_MIN_BASELINE_FEEDINGS) return null;
  return mean(recent) / mean(baseline);
}

/** Faster, slower or steady from completed feedings; sluggish = slower, or rise multiple falling. */
export function rosterTrend(feedings: readonly RosterFeedingInput[]): RosterTrend {
  const completed = feedings.filter((f) => f.normalisedHoursToPeak !== null);
  const peakRatio = ratio(completed.map((f) => f.normalisedHoursToPeak ?? 0));
  const multiples = completed.flatMap((f) => (f.riseMultiple === null ? [] : [f.riseMultiple]));
  const riseRatio = ratio(multiples);
  const trend =
    peakRatio === null
      ? null
      : peakRatio >= 1 + SLOWER_BY
        ? 'slower'
        : peakRatio <= 1 / (1 + SLOWER_BY)
          ? 'faster'
          : 'steady';
  const sluggish = trend === 'slower' || (riseRatio !== null && riseRatio <= 1 - RISE_FALLING_BY);
  return { trend, peakRatio, riseRatio, sluggish };
}

/** How far behind its own baseline a culture is: 0 for none, larger is worse (sorts "sluggish"). */
export function sluggishScore(t: RosterTrend): number {
  return Math.max(0, (t.peakRatio ?? 1) - 1, 1 - (t.riseRatio ?? 1));
}

export interface RosterEntry {
  row: RosterRow;
  /** sluggishScore of the culture, kept for sorting. */
  score: number;
}

/** The row for one student culture at `now`. */
export function rosterEntry(input: RosterCultureInput, now: string): RosterEntry {
  const base = { studentId: input.studentId, studentName: input.studentName };
  if (!input.culture) {
    const row: RosterRow = {
      ...base,
      cultureId: null,
      cultureName: null,
      lastFedAt: null,
      hoursSinceFed: null,
      hoursToPeakAtReference: null,
      riseMultiple: null,
      trend: null,
      flags: ['no-culture'],
    };
    return { row, score: 0 };
  }
  const { feedings, culture } = input;
  const latest = feedings[0];
  const hoursSinceFed = latest ? (Date.parse(now) - Date.parse(latest.fedAt)) / MS_PER_HOUR : null;
  const trend = rosterTrend(feedings);
  const recent = feedings.slice(0, RECENT_FEEDINGS);
  const flags = new Set<RosterFlag>();
  // The same routine the feeding-due alert holds a culture to (counter daily, fridge weekly).
  if (hoursSinceFed !== null && hoursSinceFed > FEEDING_ROUTINE_HOURS[culture.location]) flags.add('overdue');
  if (trend.sluggish) flags.add('sluggish');
  if (recent.some((f) => f.observations.includes('discolouration'))) flags.add('caution');
  if (recent.length > 0 && recent.every((f) => f.riseCheckCount === 0)) flags.add('no-rise-checks');
  const withChecks = feedings.find((f) => f.riseCheckCount > 0 && f.riseMultiple !== null);
  const row: RosterRow = {
    ...base,
    cultureId: culture.id,
    cultureName: culture.name,
    lastFedAt: latest?.fedAt ?? null,
    hoursSinceFed,
    hoursToPeakAtReference: latestHoursToPeak(input),
    riseMultiple: withChecks?.riseMultiple ?? null,
    trend: trend.trend,
    // In ROSTER_FLAGS order, so every client lists them alike.
    flags: (['overdue', 'sluggish', 'caution', 'no-rise-checks'] as const).filter((f) => flags.has(f)),
  };
  return { row, score: sluggishScore(trend) };
}

/** Each sort's usual direction: names A→Z; otherwise the row wanting attention first. */
export const ROSTER_DEFAULT_ORDER: Record<RosterSort, SortOrder> = {
  student: 'asc',
  lastFed: 'asc',
  hoursToPeak: 'desc',
  riseMultiple: 'asc',
  flags: 'desc',
  sluggish: 'desc',
};

type Key = (e: RosterEntry) => number | string | null;

const byName = (e: RosterEntry): string => `${e.row.studentName}\u0000${e.row.cultureName ?? ''}`.toLowerCase();

/** What each sort compares, ascending; null always sorts last. */
const SORT_KEYS: Record<RosterSort, Key[]> = {
  student: [byName],
  lastFed: [(e) => (e.row.lastFedAt === null ? null : Date.parse(e.row.lastFedAt))],
  hoursToPeak: [(e) => e.row.hoursToPeakAtReference],
  riseMultiple: [(e) => e.row.riseMultiple],
  flags: [(e) => e.row.flags.length],
  // Sluggish rows first, then the other flagged rows, each worst first.
  sluggish: [(e) => (e.row.flags.includes('sluggish') ? 1 : 0), (e) => e.row.flags.length, (e) => e.score],
};

function compare(a: number | string | null, b: number | string | null, order: SortOrder): number {
  if (a === b) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  const c = a < b ? -1 : 1;
  return order === 'asc' ? c : -c;
}

export interface RosterView {
  rows: RosterRow[];
  total: number;
}

/** Filters (flag, q), sorts and pages the entries; limit undefined returns every row (the CSV). */
export function queryRoster(entries: readonly RosterEntry[], query: RosterQuery): RosterView {
  const sort = query.sort ?? 'sluggish';
  const order = query.order ?? ROSTER_DEFAULT_ORDER[sort];
  const q = query.q?.trim().toLowerCase();
  const kept = entries.filter(
    (e) =>
      (query.flag === undefined || e.row.flags.includes(query.flag)) &&
      (!q || e.row.studentName.toLowerCase().includes(q) || (e.row.cultureName ?? '').toLowerCase().includes(q)),
  );
  const sorted = [...kept].sort((a, b) => {
    for (const key of SORT_KEYS[sort]) {
      const c = compare(key(a), key(b), order);
      if (c !== 0) return c;
    }
    // Ties read A→Z whatever the order, so a page never shuffles.
    return compare(byName(a), byName(b), 'asc') || compare(a.row.cultureId, b.row.cultureId, 'asc');
  });
  const offset = query.offset ?? 0;
  const rows = query.limit === undefined ? sorted.slice(offset) : sorted.slice(offset, offset + query.limit);
  return { rows: rows.map((e) => e.row), total: kept.length };
}
