// A student culture's stored history → what the roster and the class chart need. The numbers come
// from the same readings as the owner's culture page (riseOf / observedFeeding: each feeding's rise
// and observed peak; fitCultureKinetics as computeSummary calls it); the roster rules themselves
// are pure and shared (shared/src/classroom).
import {
  TREND_BASELINE_FEEDINGS,
  TREND_RECENT_FEEDINGS,
  fitCultureKinetics,
  normalisedHoursToPeak,
  type ClassProgressSeries,
  type Culture,
  type ObservedFeeding,
  type RosterCultureInput,
  type RosterFeedingInput,
} from '@peakwise/shared';
import { observedFeeding, riseOf, type FeedingHistory } from '../culture/culture-summary.compute.js';
import type { ClassStudent } from './class-logs.repository.js';

export interface StudentCulture {
  student: ClassStudent;
  culture: Culture;
  /** Newest feeding first (toHistory). */
  history: FeedingHistory[];
}

export interface CultureReading {
  roster: RosterCultureInput;
  /** Completed feedings since the class began, restated at 1:1:1 and 24 °C, oldest first. */
  points: ClassProgressSeries['points'];
}

const mean = (xs: number[]): number | undefined =>
  xs.length === 0 ? undefined : xs.reduce((s, x) => s + x, 0) / xs.length;

/** Feedings the roster reads closely: its trend window, and those since the class began (the chart). */
function wanted(history: FeedingHistory[], observed: (ObservedFeeding | null)[], since: number): Set<number> {
  const keep = new Set<number>();
  let completed = 0;
  for (const [i, h] of history.entries()) {
    const recent = completed < TREND_RECENT_FEEDINGS + TREND_BASELINE_FEEDINGS;
    if (recent || Date.parse(h.feeding.fedAt) >= since) keep.add(i);
    if (recent && observed[i]) completed += 1;
  }
  return keep;
}

/**
 * The roster's view of one culture at `now`, with normalised times to peak for the feedings it
 * shows (`since`: the class's first day, ms). The kinetics are fitted exactly as computeSummary
 * fits them (the earlier feedings, as of the latest), so the roster's time to peak at 24 °C is the
 * culture page's; class-logs-roster.api.test.ts holds the two equal. Fitting once, not twice, keeps
 * a roster of a few dozen cultures quick.
 */
export function readCulture({ student, culture, history }: StudentCulture, now: Date, since: number): CultureReading {
  const observed = history.map(observedFeeding);
  const keep = wanted(history, observed, since);
  const past = observed.slice(1).flatMap((o) => (o ? [o] : []));
  const kinetics = fitCultureKinetics(past, { asOf: history[0]?.feeding.fedAt ?? now.toISOString() });
  // A feeding that logged no temperature is read at the culture's typical one, as on its chart.
  const typicalC = mean(past.flatMap((o) => (o.temperatureC === undefined ? [] : [o.temperatureC])));
  const feedings: RosterFeedingInput[] = history.map((h, i) => {
    const o = keep.has(i) ? observed[i] : null;
    return {
      fedAt: h.feeding.fedAt,
      riseCheckCount: h.riseChecks.length,
      observations: h.feeding.observations,
      riseMultiple: keep.has(i) || i === 0 ? (riseOf(h)?.riseMultiple ?? null) : null,
      normalisedHoursToPeak: o ? normalisedHoursToPeak(kinetics, o, typicalC) : null,
    };
  });
  const points = feedings
    .flatMap((f) =>
      f.normalisedHoursToPeak === null || Date.parse(f.fedAt) < since
        ? []
        : [{ fedAt: f.fedAt, hoursToPeakAtReference: f.normalisedHoursToPeak }],
    )
    .reverse();
  return {
    roster: {
      studentId: student.id,
      studentName: student.displayName,
      culture: { id: culture.id, name: culture.name, location: culture.location },
      feedings,
      // The published defaults say nothing about this student's culture: no number rather than theirs.
      hoursToPeakAtReference: kinetics.basis === 'culture' ? kinetics.hoursToPeakAtReference : null,
    },
    points,
  };
}
