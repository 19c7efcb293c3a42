// fitRise: one feeding's rise, from the height right after feeding and the rise checks after it.
//
// The rise is y = h/h0 − 1, the fraction of the initial height gained (1.0 = doubled), on hours
// since feeding; the feeding itself is the point (0, 0). A Zwietering curve (Gompertz unless
// asked otherwise) is fitted to it, giving lag, maximum rise rate and the rise the starter is
// heading for. Peak and ready window are defined in peak-window.ts.
//
// A starter collapses after its peak, and a sigmoid cannot: fitted to the fall, it would lower
// the rise and smear the peak late. So the readings are searched for the fall first
// (rise-readings.ts: a drop of more than max(2 mm, 10 % of the rise) below the highest reading so
// far), and only the readings before it are fitted. The collapse still counts as evidence: it
// makes the status 'peaked' and caps the peak and the ready window.
import { fitCurve } from '../curve/fit-curve.js';
import { MS_PER_HOUR, toIso } from './iso-time.js';
import { peakInterval, PEAK_INTERVAL_LEVEL, peakTimesFromFit, peakTimesFromReadings } from './peak-window.js';
import { cleanReadings, fallCrossingHours, findFall, minimumRiseMm } from './rise-readings.js';
import { type FitRiseInput, type RiseResult, type RiseStatus } from './rise-types.js';

/** Rise checks needed after feeding: with the feeding itself, 4 points for a 3-parameter curve. */
export const MIN_READINGS = 3;

/**
 * While rising, a prediction needs the top of the rise pinned down: a fitted A whose standard
 * error is over 35 % of it is a guess at a plateau the readings have not begun to show (our
 * threshold; on synthetic feedings A is known to within ~15 % once the inflection has passed).
 */
export const MAX_RELATIVE_SE_OF_RISE = 0.35;

const MODELS = ['gompertz', 'logistic', 'auto'] as const;

function emptyResult(status: RiseStatus, reason: string, warnings: string[] = []): RiseResult {
  return {
    status,
    reason,
    riseMultiple: null,
    observedRiseMultiple: null,
    lagHours: null,
    maxRisePercentPerHour: null,
    maxRiseMmPerHour: null,
    peakAt: null,
    hoursToPeak: null,
    peakInterval: null,
    readyFrom: null,
    readyUntil: null,
    highestReading: null,
    fallSeenAt: null,
    fit: null,
    warnings,
  };
}

function fmt(value: number, digits = 1): string {
  return value.toFixed(digits);
}

function analyse(input: FitRiseInput): RiseResult {
  const model = input.model ?? 'gompertz';
  if (!MODELS.includes(model)) {
    return { ...emptyResult('invalid-input', `model must be one of ${MODELS.join(', ')}`), field: 'model' };
  }
  const clean = cleanReadings(input.fedAt, input.initialHeightMm, input.readings);
  if ('field' in clean) return { ...emptyResult('invalid-input', clean.reason), field: clean.field };
  const { fedMs, readings, warnings, initialHeightMm: h0 } = clean;
  const at = (hours: number): string => toIso(fedMs + Math.round(Math.max(hours, 0) * MS_PER_HOUR));

  const fall = findFall(readings, h0);
  const highest = fall ? readings[fall.highestIndex] : undefined;
  if (!fall || !highest || readings.length < MIN_READINGS) {
    const n = readings.length;
    return emptyResult(
      'insufficient-data',
      `${n} usable reading${n === 1 ? '' : 's'} after feeding; at least ${MIN_READINGS} are needed`,
      warnings,
    );
  }
  const observed = {
    observedRiseMultiple: highest.heightMm / h0,
    highestReading: { at: toIso(highest.ms), heightMm: highest.heightMm },
    fallSeenAt: fall.fallIndex === null ? null : toIso(readings[fall.fallIndex]?.ms ?? NaN),
  };
  if (highest.heightMm - h0 < minimumRiseMm(h0)) {
    return {
      ...emptyResult(
        'insufficient-data',
        `no rise yet: the highest reading (${fmt(highest.heightMm)} mm) is less than ` +
          `${fmt(minimumRiseMm(h0))} mm above the height after feeding`,
        warnings,
      ),
      ...observed,
    };
  }

  const beforeFall = fall.fallIndex === null ? readings : readings.slice(0, fall.fallIndex);
  const points = [{ hours: 0, rise: 0 }, ...beforeFall.map((r) => ({ hours: r.hours, rise: r.heightMm / h0 - 1 }))];
  const lastHours = beforeFall.at(-1)?.hours ?? 0;
  const fallCrossing = fallCrossingHours(readings, fall);
  const curve = fitCurve({ model, points: points.map((p) => ({ t: p.hours, y: p.rise })) });
  const fallReason =
    `it fell more than ${fmt(fall.thresholdMm)} mm below its highest reading ` + `(${fmt(highest.heightMm)} mm)`;

  if (curve.status !== 'ok') {
    if (fallCrossing === null) {
      return {
        ...emptyResult('rising', `still rising; too early to predict the peak (${curve.reason})`, warnings),
        ...observed,
      };
    }
    // The fall is seen but the readings before it cannot carry a curve: report what was seen.
    const times = peakTimesFromReadings(points, fall.highestIndex + 1, fallCrossing);
    return {
      ...emptyResult('peaked', `peaked: ${fallReason}; too few readings before the fall to fit a curve`, warnings),
      ...observed,
      riseMultiple: observed.observedRiseMultiple,
      peakAt: at(times.peakHours),
      hoursToPeak: times.peakHours,
      readyFrom: at(times.readyFromHours),
      readyUntil: at(times.readyUntilHours),
    };
  }

  const times = peakTimesFromFit(curve, fallCrossing);
  const plateauReached = times.peakHours <= lastHours;
  const status: RiseStatus = fallCrossing !== null || plateauReached ? 'peaked' : 'rising';
  const fitSummary = {
    model: curve.model,
    A: curve.A,
    muMax: curve.muMax,
    lag: curve.lag,
    se: curve.se,
    r2: curve.r2,
    residualStdDevMm: curve.residualStdDev * h0,
    pointsUsed: curve.n,
  };
  if (status === 'rising' && !(curve.se.A <= MAX_RELATIVE_SE_OF_RISE * curve.A)) {
    const share = Math.round((100 * curve.se.A) / curve.A);
    return {
      ...emptyResult(
        'rising',
        `still rising; too early to predict the peak (the top of the rise is only known to ±${share} %)`,
        warnings,
      ),
      ...observed,
      fit: fitSummary,
    };
  }
  const reason =
    fallCrossing !== null
      ? `peaked: ${fallReason}`
      : plateauReached
        ? 'peaked: the fitted rise reached 95 % of its top by the last reading'
        : 'still rising: the peak is predicted from the fitted curve';
  const interval = status === 'rising' ? peakInterval(curve) : null;
  return {
    status,
    reason,
    ...observed,
    // Peaked: what the jar showed. Rising: where the curve is heading, never below what it showed.
    riseMultiple:
      status === 'peaked' ? observed.observedRiseMultiple : Math.max(1 + curve.A, observed.observedRiseMultiple),
    lagHours: curve.lag,
    maxRisePercentPerHour: 100 * curve.muMax,
    maxRiseMmPerHour: curve.muMax * h0,
    peakAt: at(times.peakHours),
    hoursToPeak: Math.max(times.peakHours, 0),
    // The starter had not peaked by the last reading, so the interval cannot start before it.
    peakInterval: interval
      ? {
          low: at(Math.max(interval.lowHours, lastHours)),
          high: at(interval.highHours),
          level: PEAK_INTERVAL_LEVEL,
        }
      : null,
    readyFrom: at(times.readyFromHours),
    readyUntil: at(times.readyUntilHours),
    fit: fitSummary,
    warnings,
  };
}

/** Never throws for user data: every problem comes back as a status with a reason. */
export function fitRise(input: FitRiseInput): RiseResult {
  try {
    if (typeof input !== 'object' || input === null) {
      return { ...emptyResult('invalid-input', 'input must be an object'), field: '' };
    }
    return analyse(input);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    return emptyResult('insufficient-data', `the rise could not be analysed: ${message}`);
  }
}
