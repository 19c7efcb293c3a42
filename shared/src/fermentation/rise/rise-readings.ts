// From what a baker typed to points a curve can be fitted to: hours since feeding and heights,
// sorted, one per moment, each doubtful reading dropped with a note saying why. Then the search
// for the fall that marks a starter past its peak.
import { MS_PER_HOUR, parseIsoWithOffset } from './iso-time.js';

export interface RiseReading {
  /** ISO 8601 with offset, e.g. "2025-03-01T09:30:00+01:00". */
  at: string;
  heightMm: number;
}

/** A reading on the fit's clock. */
export interface TimedHeight {
  /** Hours since feeding. */
  hours: number;
  heightMm: number;
  /** Epoch milliseconds, for reporting. */
  ms: number;
}

export interface CleanReadings {
  fedMs: number;
  initialHeightMm: number;
  readings: TimedHeight[];
  warnings: string[];
}

export interface InputProblem {
  field: string;
  reason: string;
}

/**
 * A drop counts as the fall after the peak when it exceeds the larger of FALL_MIN_MM (about what
 * one reads reliably off a jar by eye) and FALL_FRACTION_OF_RISE of the rise so far. Our choice,
 * in line with common practice: a baker calls a starter past peak once the dome has visibly sunk,
 * not at the first millimetre.
 */
export const FALL_MIN_MM = 2;
export const FALL_FRACTION_OF_RISE = 0.1;
/**
 * Below this rise (fraction of the initial height, and at least FALL_MIN_MM) nothing has
 * happened yet that a curve or a fall could be read from.
 */
export const MIN_RISE_FRACTION = 0.05;

export function fallThresholdMm(highestMm: number, initialHeightMm: number): number {
  return Math.max(FALL_MIN_MM, FALL_FRACTION_OF_RISE * (highestMm - initialHeightMm));
}

export function minimumRiseMm(initialHeightMm: number): number {
  return Math.max(FALL_MIN_MM, MIN_RISE_FRACTION * initialHeightMm);
}

/** Validates and tidies the input; a problem with fedAt or the initial height stops everything. */
export function cleanReadings(
  fedAt: unknown,
  initialHeightMm: unknown,
  readings: unknown,
): CleanReadings | InputProblem {
  const fedMs = parseIsoWithOffset(fedAt);
  if (fedMs === null) {
    return {
      field: 'fedAt',
      reason: 'fedAt must be an ISO 8601 date-time with an offset, e.g. 2025-03-01T08:00:00+01:00',
    };
  }
  if (typeof initialHeightMm !== 'number' || !Number.isFinite(initialHeightMm) || initialHeightMm <= 0) {
    return { field: 'initialHeightMm', reason: 'initialHeightMm must be a positive number of millimetres' };
  }
  if (!Array.isArray(readings)) return { field: 'readings', reason: 'readings must be an array of {at, heightMm}' };

  const warnings: string[] = [];
  const byTime = new Map<number, number[]>();
  readings.forEach((raw: unknown, i) => {
    const r = (typeof raw === 'object' && raw !== null ? raw : {}) as Record<string, unknown>;
    const ms = parseIsoWithOffset(r.at);
    const height = r.heightMm;
    if (ms === null) {
      warnings.push(`readings.${i} ignored: at is not an ISO 8601 date-time with an offset`);
    } else if (typeof height !== 'number' || !Number.isFinite(height) || height <= 0) {
      warnings.push(`readings.${i} ignored: heightMm must be a positive number`);
    } else if (ms <= fedMs) {
      // At or before feeding the jar holds the old culture or the fresh mix already given as
      // initialHeightMm; either way it is not part of this rise.
      warnings.push(`readings.${i} ignored: taken ${ms < fedMs ? 'before' : 'at'} feeding`);
    } else {
      const same = byTime.get(ms);
      if (same) {
        same.push(height);
        warnings.push(`readings.${i} has the same time as an earlier reading; the heights are averaged`);
      } else {
        byTime.set(ms, [height]);
      }
    }
  });
  const cleaned = [...byTime.entries()]
    .sort((a, b) => a[0] - b[0])
    .map(([ms, heights]) => ({
      ms,
      hours: (ms - fedMs) / MS_PER_HOUR,
      heightMm: heights.reduce((s, h) => s + h, 0) / heights.length,
    }));
  return { fedMs, initialHeightMm, readings: cleaned, warnings };
}

export interface FallSearch {
  /** Index of the highest reading before the fall (or overall, when there is no fall). */
  highestIndex: number;
  /** Index of the first reading that shows the fall; null while none does. */
  fallIndex: number | null;
  /** Threshold the fall was judged by, mm below the highest reading. */
  thresholdMm: number;
}

/**
 * Walks the readings in time order keeping the highest so far; the first reading more than the
 * threshold below it is the fall. Only a starter that has risen by minimumRiseMm can fall: noise
 * in the lag phase is not a peak. Readings after the fall are not looked at, so a later
 * "recovery" (a misread, a second wind) cannot move the peak.
 */
export function findFall(readings: readonly TimedHeight[], initialHeightMm: number): FallSearch | null {
  if (readings.length === 0) return null;
  let highestIndex = 0;
  for (let i = 0; i < readings.length; i++) {
    const r = readings[i];
    const highest = readings[highestIndex];
    if (!r || !highest) continue;
    if (r.heightMm > highest.heightMm) {
      highestIndex = i;
      continue;
    }
    const threshold = fallThresholdMm(highest.heightMm, initialHeightMm);
    const hasRisen = highest.heightMm - initialHeightMm >= minimumRiseMm(initialHeightMm);
    if (hasRisen && highest.heightMm - r.heightMm > threshold) {
      return { highestIndex, fallIndex: i, thresholdMm: threshold };
    }
  }
  const highest = readings[highestIndex];
  return {
    highestIndex,
    fallIndex: null,
    thresholdMm: fallThresholdMm(highest?.heightMm ?? initialHeightMm, initialHeightMm),
  };
}

/**
 * When the height first sank the threshold below the highest reading, by linear interpolation
 * between the last reading before the fall and the first one showing it (hours since feeding).
 */
export function fallCrossingHours(readings: readonly TimedHeight[], fall: FallSearch): number | null {
  if (fall.fallIndex === null) return null;
  const before = readings[fall.fallIndex - 1];
  const after = readings[fall.fallIndex];
  const highest = readings[fall.highestIndex];
  if (!before || !after || !highest) return null;
  const level = highest.heightMm - fall.thresholdMm;
  if (before.heightMm <= level) return before.hours;
  const share = (before.heightMm - level) / (before.heightMm - after.heightMm);
  return before.hours + share * (after.hours - before.hours);
}
