// The temperature lever: a warmer or cooler spot for the bulk. At a constant dough temperature
// T the bulk takes work / r(T) hours, so the temperature that ends it at a wanted time is found
// by bisection on the model itself (predictBulkEnd), within a sane range for dough (18–30 °C,
// common practice) and below the culture's optimum, where time falls steadily with warmth.
import { predictBulkEnd } from '../bulk/bulk-end.js';
import { type AliquotReading, type BulkInput } from '../bulk/types.js';
import { defaultKinetics } from '../kinetics/fit-kinetics.js';
import { type CultureKinetics } from '../kinetics/types.js';
import { relativeRate } from '../temperature/models.js';
import { type TemperatureSample } from '../temperature/series.js';
import { MS_PER_HOUR, formatInstant, parseInstant, parseMs } from '../temperature/time.js';
import { BakersMathError } from '../units/bakers-math-error.js';
import { DEFAULTS } from './defaults.js';
import { type PlanDough } from './types.js';

export interface DoughTemperatureRequest {
  dough: PlanDough;
  /** When the levain went in, ISO 8601 with offset. */
  mixedAt: string;
  /** When bulk should end, ISO 8601 with offset. */
  wantedEndAt: string;
  kinetics?: CultureKinetics;
  /** Range to search, °C; default 18–30 [common practice for dough]. */
  minC?: number;
  maxC?: number;
  /**
   * Live: the dough moves to the new spot at `changeAt` (default: at mixing). Before it, the
   * logged `temperatures` (or the dough's planned temperature) apply, and `readings` from the
   * aliquot jar set the dough's pace, as in predictBulkEnd.
   */
  changeAt?: string;
  temperatures?: readonly TemperatureSample[];
  readings?: readonly AliquotReading[];
}

export interface DoughTemperatureAnswer {
  /** The temperature that ends bulk at the wanted time, or the nearest end of the range. */
  temperatureC: number;
  reachable: boolean;
  /** Bulk end at `temperatureC`, in the offset of `mixedAt`. */
  bulkEndAt: string;
  hoursFromMix: number;
  /** Why it is out of reach, or null. */
  reason: string | null;
}

/** Bulk hours at a constant temperature (the forecast, if any, set aside). */
export function bulkHoursAt(dough: PlanDough, mixedAt: string, c: number, kinetics?: CultureKinetics): number {
  const input = { ...dough, mixedAt, temperatureC: c };
  delete input.forecast;
  return predictBulkEnd(input, kinetics ? { kinetics } : {}).hoursFromMix ?? Infinity;
}

/** Bulk hours when the dough goes to `c` at `req.changeAt`, after what was logged before it. */
export function bulkHoursAfterChange(req: DoughTemperatureRequest, c: number, kinetics: CultureKinetics): number {
  if (!req.changeAt) return bulkHoursAt(req.dough, req.mixedAt, c, kinetics);
  const input: BulkInput = { ...req.dough, mixedAt: req.mixedAt };
  delete input.temperatureC;
  const logged = req.temperatures?.length
    ? req.temperatures
    : [{ at: req.mixedAt, c: req.dough.temperatureC ?? req.dough.forecast?.[0]?.c ?? c }];
  const lastMs = Math.max(...logged.map((t) => parseMs(t.at)));
  const from = parseMs(req.changeAt) > lastMs ? req.changeAt : undefined;
  input.temperatures = logged;
  input.forecast = [{ c, ...(from ? { from } : {}) }];
  if (req.readings?.length) input.readings = req.readings;
  return predictBulkEnd(input, { kinetics }).hoursFromMix ?? Infinity;
}

/** Warmest temperature in [lo, hi] up to which the model's rate still rises (0.1 °C steps). */
export function warmestUsefulC(kinetics: CultureKinetics, lo: number, hi: number): number {
  let best = lo;
  let bestRate = -Infinity;
  for (let c = lo; c <= hi + 1e-9; c += 0.1) {
    const r = relativeRate(kinetics.temperatureModel, c, kinetics.referenceC);
    if (r <= bestRate) break;
    [best, bestRate] = [Math.min(c, hi), r];
  }
  return best;
}

export function doughTemperatureForBulkEnd(req: DoughTemperatureRequest): DoughTemperatureAnswer {
  const kinetics = req.kinetics ?? defaultKinetics();
  const read = (v: string, path: string) => {
    try {
      return parseInstant(v);
    } catch {
      throw new BakersMathError(path, `${path} must be an ISO 8601 time with an offset`);
    }
  };
  const mixed = read(req.mixedAt, 'mixedAt');
  if (req.changeAt !== undefined) read(req.changeAt, 'changeAt');
  const wantedHours = (read(req.wantedEndAt, 'wantedEndAt').ms - mixed.ms) / MS_PER_HOUR;
  if (!(wantedHours > 0)) throw new BakersMathError('wantedEndAt', 'wantedEndAt must be after mixedAt');
  const lo = req.minC ?? DEFAULTS.leverMinC;
  const hiAsked = req.maxC ?? DEFAULTS.leverMaxC;
  if (!(hiAsked > lo)) throw new BakersMathError('maxC', 'maxC must be above minC');
  const hi = warmestUsefulC(kinetics, lo, hiAsked);
  const hours = (c: number): number => bulkHoursAfterChange(req, c, kinetics);
  const answer = (c: number, reason: string | null): DoughTemperatureAnswer => {
    const h = hours(c);
    return {
      temperatureC: c,
      reachable: reason === null,
      bulkEndAt: formatInstant(mixed.ms + h * MS_PER_HOUR, mixed.offsetMinutes),
      hoursFromMix: h,
      reason,
    };
  };
  const fastest = hours(hi);
  if (fastest > wantedHours) {
    return answer(
      hi,
      `even at ${hi.toFixed(1)} °C bulk takes ${fastest.toFixed(1)} h, longer than the ${wantedHours.toFixed(1)} h wanted`,
    );
  }
  const slowest = hours(lo);
  if (slowest < wantedHours) {
    return answer(
      lo,
      `even at ${lo.toFixed(1)} °C bulk takes only ${slowest.toFixed(1)} h, shorter than the ${wantedHours.toFixed(1)} h wanted`,
    );
  }
  // Hours fall as the temperature rises on [lo, hi]: bisection to well under a minute.
  let a = lo;
  let b = hi;
  for (let i = 0; i < 40 && b - a > 1e-4; i++) {
    const c = (a + b) / 2;
    if (hours(c) > wantedHours) a = c;
    else b = c;
  }
  return answer((a + b) / 2, null);
}
