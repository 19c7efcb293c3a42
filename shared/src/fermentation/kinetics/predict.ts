// The next peak: the culture's work for this dilution, β·(h0 + ln D) hours at 24 °C, run through
// the feeding's temperature history and forecast (temperature/integrate.ts). The 80 % interval
// is on the log of that work — residual spread plus parameter uncertainty by the delta method,
// with a Student-t quantile on the pooled degrees of freedom — and mapped to clock times the same
// way, so a fridge stretch in the forecast widens or shifts it correctly.
import { DEFAULT_HORIZON_HOURS, hoursToReach, prepareModel, progressBetween } from '../temperature/integrate.js';
import { compileSeries, type CompiledSeries, type TemperatureSeries } from '../temperature/series.js';
import { MS_PER_HOUR, formatInstant, parseInstant } from '../temperature/time.js';
import { dilution } from './feedings.js';
import { fitCultureKinetics } from './fit-kinetics.js';
import { temperatureSpec } from './priors.js';
import { studentTQuantile } from './student-t.js';
import {
  type CultureKinetics,
  type ObservedFeeding,
  type KineticsOptions,
  type NextFeeding,
  type PeakPrediction,
} from './types.js';

export interface PredictOptions extends KineticsOptions {
  horizonHours?: number;
  /** Central coverage of the interval; default 0.8. */
  coverage?: number;
}

/** The next feeding's temperature as a series: readings so far, then forecast or temperatureC. */
export function nextFeedingSeries(next: NextFeeding): TemperatureSeries {
  const readings = next.temperatures ?? [];
  const forecast = next.forecast ?? (next.temperatureC !== undefined ? [{ c: next.temperatureC }] : undefined);
  if (readings.length === 0 && (!forecast || forecast.length === 0)) {
    throw new RangeError('the next feeding needs temperatureC, temperatures or forecast');
  }
  return forecast ? { readings, forecast } : { readings };
}

function isKinetics(x: CultureKinetics | readonly ObservedFeeding[]): x is CultureKinetics {
  return !Array.isArray(x);
}

/**
 * Variance of ln(work) for the prediction: residual spread plus gᵀCg, where g holds the
 * derivatives of ln(required work) − ln(progress made by the predicted time) by each parameter.
 */
function predictionVariance(k: CultureKinetics, lnD: number, series: CompiledSeries, hours: number | null): number {
  const theta = k.theta;
  const p = theta.length;
  const h0 = theta[1] ?? 0;
  const g = new Array<number>(p).fill(0);
  g[0] = 1;
  g[1] = 1 / (h0 + lnD);
  if (p > 2 && hours !== null && hours > 0) {
    const spec = temperatureSpec(k.model);
    const base = theta.slice(2);
    const lnProgress = (tt: number[]): number =>
      Math.log(progressBetween(series, prepareModel(spec.build(tt)), 0, hours));
    const at = lnProgress(base);
    for (let j = 2; j < p; j++) {
      const step = 1e-5 * Math.max(1, Math.abs(theta[j] ?? 0));
      const moved = base.slice();
      moved[j - 2] = (moved[j - 2] ?? 0) + step;
      const d = (lnProgress(moved) - at) / step;
      g[j] = Number.isFinite(d) ? -d : 0;
    }
  }
  let quad = 0;
  for (let a = 0; a < p; a++)
    for (let b = 0; b < p; b++) quad += (g[a] ?? 0) * (k.covariance[a]?.[b] ?? 0) * (g[b] ?? 0);
  return k.residualSd ** 2 + quad;
}

export function predictNextPeak(
  kineticsOrHistory: CultureKinetics | readonly ObservedFeeding[],
  next: NextFeeding,
  options: PredictOptions = {},
): PeakPrediction {
  const kinetics = isKinetics(kineticsOrHistory)
    ? kineticsOrHistory
    : fitCultureKinetics(kineticsOrHistory, { asOf: next.fedAt, ...options });
  const fed = parseInstant(next.fedAt);
  const series = compileSeries(nextFeedingSeries(next), fed.ms);
  const pm = prepareModel(kinetics.temperatureModel, kinetics.referenceC);
  const horizon = options.horizonHours ?? DEFAULT_HORIZON_HOURS;
  const d = dilution(next);
  const lnD = Math.log(d);
  const work = kinetics.params.betaHours * (kinetics.params.h0 + lnD);

  const hours = hoursToReach(series, pm, 0, work, horizon);
  const sd = Math.sqrt(predictionVariance(kinetics, lnD, series, hours));
  const q = studentTQuantile(0.5 + (options.coverage ?? 0.8) / 2, kinetics.dof);
  const lowHours = hoursToReach(series, pm, 0, work * Math.exp(-q * sd), horizon);
  const highHours = hoursToReach(series, pm, 0, work * Math.exp(q * sd), horizon);
  const at = (h: number | null): string | null =>
    h === null ? null : formatInstant(fed.ms + h * MS_PER_HOUR, fed.offsetMinutes);

  const prediction: PeakPrediction = {
    peakAt: at(hours),
    low: at(lowHours),
    high: at(highHours),
    hoursToPeak: hours,
    lowHours,
    highHours,
    hoursAtReference: work,
    dilution: d,
    model: kinetics.model,
    basis: kinetics.basis,
    feedingsUsed: kinetics.feedingsUsed,
  };
  if (kinetics.params.q10 !== undefined) prediction.q10 = kinetics.params.q10;
  return prediction;
}
