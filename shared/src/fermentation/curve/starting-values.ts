// Starting values for the Zwietering curves, read off the data the way one would by eye (the
// graphical definitions of Zwietering et al. 1990): the asymptote from the highest point, the
// maximum rate from the steepest rise between readings, and the lag from where that steepest
// tangent crosses zero. A few variants are returned because the steepest pair of noisy readings
// can mislead; the fitter tries each and keeps the best.
import { type DataPoint } from './least-squares.js';

export interface GrowthStart {
  A: number;
  muMax: number;
  lag: number;
}

interface Tangent {
  slope: number;
  /** The midpoint of the steepest secant, which the tangent passes through. */
  t: number;
  y: number;
}

/** Where a line through (t, y) with this slope crosses y = 0: the graphical lag. */
function lagOf(tangent: Tangent, slope = tangent.slope): number {
  return tangent.t - tangent.y / slope;
}

/** Points with the same t averaged into one, sorted by t: slopes need distinct times. */
function distinctTimes(points: readonly DataPoint[]): DataPoint[] {
  const byTime = new Map<number, { sum: number; count: number }>();
  for (const { t, y } of points) {
    const entry = byTime.get(t) ?? { sum: 0, count: 0 };
    entry.sum += y;
    entry.count += 1;
    byTime.set(t, entry);
  }
  return [...byTime.entries()].sort((a, b) => a[0] - b[0]).map(([t, e]) => ({ t, y: e.sum / e.count }));
}

/** Steepest secant between readings `gap` apart, and where its line crosses y = 0. */
function steepestTangent(points: readonly DataPoint[], gap: number): Tangent | null {
  let best: Tangent | null = null;
  for (let i = 0; i + gap < points.length; i++) {
    const a = points[i];
    const b = points[i + gap];
    if (!a || !b) continue;
    const slope = (b.y - a.y) / (b.t - a.t);
    if (!(slope > 0) || (best && slope <= best.slope)) continue;
    best = { slope, t: (a.t + b.t) / 2, y: (a.y + b.y) / 2 };
  }
  return best;
}

/** The steepest rise seen in the data (y units per t unit), or 0 when nothing rises. */
export function steepestRise(points: readonly DataPoint[]): number {
  return steepestTangent(distinctTimes(points), 1)?.slope ?? 0;
}

/** Candidate starts, most plausible first; empty when the data never rise. */
export function growthStartingValues(points: readonly DataPoint[]): GrowthStart[] {
  const distinct = distinctTimes(points);
  const yMax = Math.max(...distinct.map((p) => p.y));
  if (!(yMax > 0)) return [];
  const tangents = [steepestTangent(distinct, 1), steepestTangent(distinct, 2)].filter((t): t is Tangent => t !== null);
  const starts: GrowthStart[] = [];
  for (const tangent of tangents) {
    // The highest point is a lower bound for A when the plateau is not yet reached, hence 1.25.
    for (const A of [yMax, 1.25 * yMax]) starts.push({ A, muMax: tangent.slope, lag: lagOf(tangent) });
  }
  // The two-interval secant is less swayed by one noisy reading; the halved slope covers a single
  // jump between two readings that overstates μm.
  const first = tangents[0];
  if (first) starts.push({ A: yMax, muMax: first.slope / 2, lag: lagOf(first, first.slope / 2) });
  return starts;
}
