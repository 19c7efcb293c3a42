// Fermentation progress under a changing temperature: progress(t) = ∫ rate(T(τ))/rate(T_ref) dτ,
// in "hours at the reference temperature". An event that takes H hours at 24 °C (a peak, the end
// of bulk) happens when progress reaches H. The temperature is piecewise linear in time, so each
// piece is integrated on its own: in closed form for Q10 (an exponential of a linear function)
// and by 5-point Gauss–Legendre for the cardinal models, split where T crosses Tmin or Tmax so
// that each sub-piece is smooth and the rule is accurate to rounding for kitchen-sized ramps.
import { REFERENCE_TEMPERATURE_C, modelBreakpoints, relativeRateFunction, type TemperatureModel } from './models.js';
import { compileSeries, type CompiledSeries, type TemperatureSeries } from './series.js';
import { MS_PER_HOUR, formatInstant, parseInstant, parseMs } from './time.js';

/** A model ready for repeated integration. */
export interface PreparedModel {
  rate(c: number): number;
  breakpoints: readonly number[];
  /** ln(Q10)/10 for the Q10 model, whose pieces integrate in closed form. */
  q10k?: number;
  tRef: number;
}

export function prepareModel(model: TemperatureModel, tRef = REFERENCE_TEMPERATURE_C): PreparedModel {
  const rate = relativeRateFunction(model, tRef);
  if (model.kind === 'q10') return { rate, breakpoints: [], q10k: Math.log(model.q10) / 10, tRef };
  return { rate, breakpoints: modelBreakpoints(model), tRef };
}

// Gauss–Legendre 5-point nodes and weights on [0, 1].
const GL_X = [0.046910077030668, 0.2307653449471585, 0.5, 0.7692346550528415, 0.953089922969332];
const GL_W = [0.1184634425280945, 0.2393143352496832, 0.2844444444444444, 0.2393143352496832, 0.1184634425280945];

/** (e^x − 1)/x, accurate near 0. */
function expm1OverX(x: number): number {
  return Math.abs(x) < 1e-8 ? 1 + x / 2 : Math.expm1(x) / x;
}

/** ∫ over `hours` of the relative rate while T goes linearly from c0 to c1. */
export function rampIntegral(pm: PreparedModel, c0: number, c1: number, hours: number): number {
  if (!(hours > 0)) return 0;
  if (c0 === c1) return hours * pm.rate(c0);
  if (pm.q10k !== undefined) {
    return hours * Math.exp(pm.q10k * (c0 - pm.tRef)) * expm1OverX(pm.q10k * (c1 - c0));
  }
  // Split at the breakpoints the ramp crosses (as fractions of the piece, in increasing order).
  // At most a few breakpoints: insertion into a small fixed buffer, no allocation per call.
  const cuts = pm.breakpoints.length <= CUTS.length ? CUTS : new Float64Array(pm.breakpoints.length);
  let count = 0;
  for (const b of pm.breakpoints) {
    const s = (b - c0) / (c1 - c0);
    if (s > 0 && s < 1) {
      let k = count++;
      while (k > 0 && (cuts[k - 1] ?? 0) > s) {
        cuts[k] = cuts[k - 1] ?? 0;
        k--;
      }
      cuts[k] = s;
    }
  }
  let sum = 0;
  let s0 = 0;
  for (let k = 0; k <= count; k++) {
    const s1 = k < count ? (cuts[k] ?? 1) : 1;
    const span = s1 - s0;
    const base = c0 + (c1 - c0) * s0;
    const slope = (c1 - c0) * span;
    let part = 0;
    for (let j = 0; j < 5; j++) part += (GL_W[j] ?? 0) * pm.rate(base + slope * (GL_X[j] ?? 0));
    sum += part * span;
    s0 = s1;
  }
  return sum * hours;
}

const CUTS = new Float64Array(8);

/** The series between a and b as linear pieces: a flat array of (c0, c1, hours) triples. */
export function piecesBetween(series: CompiledSeries, a: number, b: number): Float64Array {
  const out: number[] = [];
  walk(series, a, b, (t0, t1, c0, c1) => {
    out.push(c0, c1, t1 - t0);
    return false;
  });
  return Float64Array.from(out);
}

/** Progress over pieces from `piecesBetween`: the fits integrate the same span many times. */
export function piecesProgress(pieces: Float64Array, pm: PreparedModel): number {
  let sum = 0;
  for (let i = 0; i + 2 < pieces.length; i += 3) {
    sum += rampIntegral(pm, pieces[i] ?? 0, pieces[i + 1] ?? 0, pieces[i + 2] ?? 0);
  }
  return sum;
}

/**
 * Fraction s ∈ [0, 1] of a ramp piece at which its partial integral reaches `need`
 * (0 < need ≤ the piece's integral). Closed form where there is one, else bisection
 * polished by Newton steps on the monotone partial integral.
 */
function solveWithinRamp(pm: PreparedModel, c0: number, c1: number, hours: number, need: number): number {
  if (c0 === c1) return need / (hours * pm.rate(c0));
  if (pm.q10k !== undefined) {
    const r0 = Math.exp(pm.q10k * (c0 - pm.tRef));
    const x = pm.q10k * (c1 - c0);
    return Math.log1p((need * x) / (hours * r0)) / x;
  }
  let lo = 0;
  let hi = 1;
  let s = 0.5;
  for (let iter = 0; iter < 80 && hi - lo > 1e-13; iter++) {
    const cs = c0 + (c1 - c0) * s;
    const f = rampIntegral(pm, c0, cs, hours * s) - need;
    if (f > 0) hi = s;
    else lo = s;
    const slope = hours * pm.rate(cs);
    const newton = slope > 0 ? s - f / slope : NaN;
    s = newton > lo && newton < hi ? newton : (lo + hi) / 2;
  }
  return s;
}

/**
 * Calls `visit(t0, t1, c0, c1)` for each linear piece of the series inside [a, b] (hours from
 * the series' origin), in time order, until `visit` returns true.
 */
function walk(
  series: CompiledSeries,
  a: number,
  b: number,
  visit: (t0: number, t1: number, c0: number, c1: number) => boolean,
): void {
  const { hours, c } = series;
  const n = hours.length;
  const first = hours[0] ?? 0;
  const last = hours[n - 1] ?? 0;
  let t = a;
  if (t < first) {
    const end = Math.min(b, first);
    const c0 = c[0] ?? NaN;
    if (end > t && visit(t, end, c0, c0)) return;
    t = end;
  }
  // Binary search for the piece containing t.
  let i = 0;
  let hiIdx = n - 1;
  while (i < hiIdx) {
    const mid = (i + hiIdx + 1) >> 1;
    if ((hours[mid] ?? 0) <= t) i = mid;
    else hiIdx = mid - 1;
  }
  for (; i + 1 < n && t < b; i++) {
    const h0 = hours[i] ?? 0;
    const h1 = hours[i + 1] ?? 0;
    if (h1 <= t || h1 === h0) continue;
    const ca = c[i] ?? NaN;
    const cb = c[i + 1] ?? NaN;
    const end = Math.min(b, h1);
    const c0 = ca + ((cb - ca) * (t - h0)) / (h1 - h0);
    const c1 = ca + ((cb - ca) * (end - h0)) / (h1 - h0);
    if (visit(t, end, c0, c1)) return;
    t = end;
  }
  if (t < b) {
    const cl = c[n - 1] ?? NaN;
    if (t < last) return;
    visit(t, b, cl, cl);
  }
}

/** Progress (hours at the reference) between a and b, hours from the series' origin. */
export function progressBetween(series: CompiledSeries, pm: PreparedModel, a: number, b: number): number {
  if (!(b > a)) return 0;
  let sum = 0;
  walk(series, a, b, (t0, t1, c0, c1) => {
    sum += rampIntegral(pm, c0, c1, t1 - t0);
    return false;
  });
  return sum;
}

/**
 * Hours after `a` at which progress reaches `target` hours at the reference, or null when it is
 * not reached within `horizonHours` (e.g. a culture held at or below its Tmin never gets there).
 */
export function hoursToReach(
  series: CompiledSeries,
  pm: PreparedModel,
  a: number,
  target: number,
  horizonHours: number,
): number | null {
  if (!(target > 0)) return 0;
  let acc = 0;
  let found: number | null = null;
  walk(series, a, a + horizonHours, (t0, t1, c0, c1) => {
    const piece = rampIntegral(pm, c0, c1, t1 - t0);
    if (acc + piece >= target) {
      const s = solveWithinRamp(pm, c0, c1, t1 - t0, target - acc);
      found = t0 + Math.min(Math.max(s, 0), 1) * (t1 - t0) - a;
      return true;
    }
    acc += piece;
    return false;
  });
  return found;
}

/** Default search horizon: two weeks, longer than any feeding or bulk a baker would wait out. */
export const DEFAULT_HORIZON_HOURS = 14 * 24;

/** Progress in hours at the reference temperature accumulated between two instants. */
export function integrateProgress(
  series: TemperatureSeries,
  model: TemperatureModel,
  from: string,
  to: string,
  tRef = REFERENCE_TEMPERATURE_C,
): number {
  const fromMs = parseMs(from);
  const compiled = compileSeries(series, fromMs);
  return progressBetween(compiled, prepareModel(model, tRef), 0, (parseMs(to) - fromMs) / MS_PER_HOUR);
}

export interface TimeToReachOptions {
  horizonHours?: number;
  tRef?: number;
}

/**
 * The instant at which progress from `from` reaches `targetHoursAtRef`, written in the offset of
 * `from`; null when it is not reached within the horizon.
 */
export function timeToReach(
  series: TemperatureSeries,
  model: TemperatureModel,
  from: string,
  targetHoursAtRef: number,
  options: TimeToReachOptions = {},
): string | null {
  const start = parseInstant(from);
  const compiled = compileSeries(series, start.ms);
  const pm = prepareModel(model, options.tRef ?? REFERENCE_TEMPERATURE_C);
  const h = hoursToReach(compiled, pm, 0, targetHoursAtRef, options.horizonHours ?? DEFAULT_HORIZON_HOURS);
  return h === null ? null : formatInstant(start.ms + h * MS_PER_HOUR, start.offsetMinutes);
}
