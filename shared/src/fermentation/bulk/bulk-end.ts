// End of bulk fermentation for a dough: the culture's own kinetics (β, h0 and temperature model
// from kinetics/), the dough's inoculation in place of a feeding's dilution, salt and enrichment
// as rate factors, the dough temperature run through temperature/integrate.ts, and — as aliquot
// readings come in — a rate scale fitted to the rise so far, so a dough running ahead of the model
// finishes earlier and one running behind finishes later.
import { defaultKinetics } from '../kinetics/fit-kinetics.js';
import { studentTQuantile } from '../kinetics/student-t.js';
import { type CultureKinetics } from '../kinetics/types.js';
import { DEFAULT_HORIZON_HOURS, hoursToReach, prepareModel, progressBetween } from '../temperature/integrate.js';
import { compileSeries, type TemperatureSeries } from '../temperature/series.js';
import { MS_PER_HOUR, formatInstant, parseInstant, parseMs } from '../temperature/time.js';
import { defaultTargetRisePct, inoculation, rateFactors } from './dough.js';
import { fitRateScale, growthForRise, riseForGrowth } from './rise-model.js';
import { type BulkEstimate, type BulkInput, type BulkOptions } from './types.js';

/** Rise of the culture at its peak when the caller has no measured one: 150 %, the middle of "doubling to tripling" [common practice, SOURCES.md §6c]. */
export const DEFAULT_PEAK_RISE_PCT = 150;
/**
 * Extra spread of ln(rate) for carrying a starter's kinetics over to a dough (salt, hydration,
 * the peak-rise assumption): ±25 % [assumption, no published figure].
 */
export const DOUGH_TRANSFER_SD = 0.25;
/** Reading error of an aliquot jar by eye, percentage points of rise (±3 mm on ~60 mm) [assumption]. */
export const READING_SD_PCT = 5;

function doughSeries(input: BulkInput): TemperatureSeries {
  const readings = input.temperatures ?? [];
  const forecast = input.forecast ?? (input.temperatureC !== undefined ? [{ c: input.temperatureC }] : undefined);
  if (readings.length === 0 && (!forecast || forecast.length === 0)) {
    throw new RangeError('the dough needs temperatureC, temperatures or forecast');
  }
  return forecast ? { readings, forecast } : { readings };
}

function priorSd(k: CultureKinetics): number {
  const lnBetaVariance = k.covariance[0]?.[0] ?? 0;
  return Math.sqrt(k.residualSd ** 2 + lnBetaVariance + DOUGH_TRANSFER_SD ** 2);
}

export function predictBulkEnd(input: BulkInput, options: BulkOptions = {}): BulkEstimate {
  const kinetics = options.kinetics ?? defaultKinetics();
  const inoc = inoculation(input);
  const factors = rateFactors(input);
  const gamma = factors.salt * factors.enrichment;
  const target = input.targetRisePct ?? defaultTargetRisePct(input.flourProteinPct);
  if (!(target > 0 && target <= 400)) throw new RangeError('targetRisePct must be in (0, 400]');
  const peakRise = options.peakRisePct ?? DEFAULT_PEAK_RISE_PCT;
  if (!(peakRise > 0)) throw new RangeError('peakRisePct must be greater than 0');
  const horizon = options.horizonHours ?? DEFAULT_HORIZON_HOURS;

  const mixed = parseInstant(input.mixedAt);
  const series = compileSeries(doughSeries(input), mixed.ms);
  const pm = prepareModel(kinetics.temperatureModel, kinetics.referenceC);
  const { betaHours: beta, h0 } = kinetics.params;
  const D = inoc.dilution;
  const at = (h: number | null): string | null =>
    h === null ? null : formatInstant(mixed.ms + h * MS_PER_HOUR, mixed.offsetMinutes);

  const readings = (input.readings ?? [])
    .map((r, i) => {
      if (!Number.isFinite(r.risePct)) throw new RangeError(`readings.${i}.risePct must be a finite number`);
      return { h: (parseMs(r.at) - mixed.ms) / MS_PER_HOUR, risePct: Math.max(0, r.risePct) };
    })
    .filter((r) => r.h > 0)
    .sort((a, b) => a.h - b.h);

  const base = {
    targetRisePct: target,
    inoculation: inoc,
    factors,
    readingsUsed: readings.length,
    model: kinetics.model,
    basis: kinetics.basis,
  };

  // Already there: the end is when the jar crossed the target, between two readings.
  const crossing = readings.findIndex((r) => r.risePct >= target);
  if (crossing >= 0) {
    const r = readings[crossing] ?? { h: 0, risePct: target };
    const prev = crossing > 0 ? (readings[crossing - 1] ?? { h: 0, risePct: 0 }) : { h: 0, risePct: 0 };
    const f = r.risePct > prev.risePct ? (target - prev.risePct) / (r.risePct - prev.risePct) : 1;
    const h = prev.h + f * (r.h - prev.h);
    return {
      ...base,
      status: 'done',
      endAt: at(h),
      low: at(prev.h),
      high: at(r.h),
      hoursFromMix: h,
      lowHours: prev.h,
      highHours: r.h,
      hoursAtReference: progressBetween(series, pm, 0, h),
      rateScale: 1,
      expectedRiseAtLastReadingPct: null,
    };
  }

  const sd0 = priorSd(kinetics);
  const points = readings.map((r) => ({ a: (gamma * progressBetween(series, pm, 0, r.h)) / beta, risePct: r.risePct }));
  const fit = points.length > 0 ? fitRateScale(points, h0, peakRise, D, READING_SD_PCT, sd0) : { lnK: 0, sd: sd0 };
  const k = Math.exp(fit.lnK);
  const last = points[points.length - 1];
  const expectedRiseAtLastReadingPct = last ? riseForGrowth(last.a - h0, peakRise, D) : null;

  const x = growthForRise(target, peakRise, D);
  const work = gamma > 0 ? (beta * (h0 + x)) / (k * gamma) : Infinity;
  const q = studentTQuantile(0.9, kinetics.dof);
  const reach = (w: number): number | null => (Number.isFinite(w) ? hoursToReach(series, pm, 0, w, horizon) : null);
  const hours = reach(work);
  const lastH = readings[readings.length - 1]?.h ?? 0;
  // The jar has not reached the target yet, so the end cannot lie before the latest reading.
  const clampToNow = (h: number | null): number | null => (h === null ? null : Math.max(h, lastH));
  const lowHours = clampToNow(reach(work * Math.exp(-q * fit.sd)));
  const highHours = clampToNow(reach(work * Math.exp(q * fit.sd)));
  const hoursFromMix = clampToNow(hours);

  return {
    ...base,
    status: hoursFromMix === null ? 'not-reached' : 'fermenting',
    endAt: at(hoursFromMix),
    low: at(lowHours),
    high: at(highHours),
    hoursFromMix,
    lowHours,
    highHours,
    hoursAtReference: work,
    rateScale: k,
    expectedRiseAtLastReadingPct,
  };
}
