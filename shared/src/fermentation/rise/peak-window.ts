// The peak and the ready window of one feeding, from the fitted rise curve and what the readings
// show. Hours since feeding throughout.
//
// Peak: the time the fitted rise reaches PEAK_FRACTION (95 %) of its asymptote A. A sigmoid only
// approaches A, so some fraction has to stand for "at the top"; 95 % is the usual choice for
// "time to plateau" in growth-curve work (common practice), and on a jar it is within a
// millimetre or two of the dome. When a fall has been seen, the peak cannot be later than the
// moment the starter sank past the fall threshold, so it is capped there.
//
// Ready window: from READY_FROM_FRACTION (85 %) of A, when the starter is nearly at full height and
// domed, to the observed fall when there is one. Without a fall it is assumed to end as long after
// the peak as it began before it (a window symmetric about the peak). Bakers use a starter "at or
// just before its peak" (common practice); the 85 % mark and the symmetric end are our own
// definitions of that, not published constants.
import { probit } from 'simple-statistics';

import { type CurveFitOk } from '../curve/curve-fit-types.js';
import { growthModels } from '../curve/growth-models.js';

export const PEAK_FRACTION = 0.95;
export const READY_FROM_FRACTION = 0.85;
/** Two-sided level of the predicted peak interval, the level used for predictions app-wide. */
export const PEAK_INTERVAL_LEVEL = 0.8;

export interface PeakTimes {
  peakHours: number;
  readyFromHours: number;
  readyUntilHours: number;
}

/** Peak and window from a fit, capped by an observed fall (hours), if any. */
export function peakTimesFromFit(fit: CurveFitOk, fallCrossing: number | null): PeakTimes {
  const t95 = fit.tAtFraction(PEAK_FRACTION);
  const t85 = fit.tAtFraction(READY_FROM_FRACTION);
  const peakHours = fallCrossing === null ? t95 : Math.min(t95, fallCrossing);
  const readyFromHours = Math.min(t85, peakHours);
  const readyUntilHours = fallCrossing ?? peakHours + (peakHours - readyFromHours);
  return { peakHours, readyFromHours, readyUntilHours };
}

/**
 * Peak and window from the readings alone, for a fall seen before there were enough readings to
 * fit a curve: the peak at the highest reading, the window from when the linearly interpolated
 * readings first reached 85 % of the highest rise to the fall.
 */
export function peakTimesFromReadings(
  points: readonly { hours: number; rise: number }[],
  highestIndex: number,
  fallCrossing: number,
): PeakTimes {
  const highest = points[highestIndex];
  const peakHours = highest?.hours ?? 0;
  const target = READY_FROM_FRACTION * (highest?.rise ?? 0);
  let readyFromHours = peakHours;
  for (let i = 1; i <= highestIndex; i++) {
    const a = points[i - 1];
    const b = points[i];
    if (!a || !b || b.rise < target) continue;
    readyFromHours =
      b.rise === a.rise ? b.hours : a.hours + ((target - a.rise) / (b.rise - a.rise)) * (b.hours - a.hours);
    break;
  }
  return { peakHours, readyFromHours: Math.min(readyFromHours, peakHours), readyUntilHours: fallCrossing };
}

/**
 * An interval for the predicted peak by the delta method: var(t95) ≈ gᵀ·C·g with g the gradient
 * of t95 in the fitted parameters (central differences) and C their covariance, then a normal
 * quantile (z from simple-statistics' probit). A linear approximation: with few readings, or
 * far from the plateau, the true uncertainty is larger and skewed late. Null if it cannot be
 * computed.
 */
export function peakInterval(fit: CurveFitOk): { lowHours: number; highHours: number } | null {
  const spec = growthModels[fit.model];
  const params = fit.model === 'richards' ? [fit.A, fit.muMax, fit.lag, fit.nu ?? 1] : [fit.A, fit.muMax, fit.lag];
  const t95 = spec.tAtFraction(params, PEAK_FRACTION);
  const gradient = params.map((v, j) => {
    const h = 1e-6 * Math.max(Math.abs(v), 1e-3);
    const up = params.slice();
    const down = params.slice();
    up[j] = v + h;
    down[j] = v - h;
    return (spec.tAtFraction(up, PEAK_FRACTION) - spec.tAtFraction(down, PEAK_FRACTION)) / (2 * h);
  });
  let variance = 0;
  for (let a = 0; a < params.length; a++) {
    for (let b = 0; b < params.length; b++) {
      variance += (gradient[a] ?? NaN) * (fit.covariance[a]?.[b] ?? NaN) * (gradient[b] ?? NaN);
    }
  }
  if (!Number.isFinite(variance) || variance < 0 || !Number.isFinite(t95)) return null;
  const z = probit(1 - (1 - PEAK_INTERVAL_LEVEL) / 2);
  const half = z * Math.sqrt(variance);
  return { lowHours: t95 - half, highHours: t95 + half };
}
