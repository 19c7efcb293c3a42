// Rate-versus-temperature models for a sourdough culture. Every model here is used through
// `relativeRate`: the rate at T divided by the rate at the reference temperature (24 °C), because
// the culture's own speed is fitted separately (kinetics/) and only the *shape* over temperature
// is needed to move a duration from one temperature to another.

/** The temperature every duration is quoted at ("hours at 24 °C"): a mid-range kitchen. */
export const REFERENCE_TEMPERATURE_C = 24;

/**
 * Cardinal temperatures of the two main sourdough organisms, from Gänzle's summary in the
 * rec.food.sourdough FAQ (item 39) and Gänzle, Ehmann & Hammes 1998 (AEM 64:2616):
 * lactobacilli optimum 32–33 °C (midpoint 32.5), no growth at 4 °C or 41 °C; yeast
 * (C. milleri) optimum 28 °C, no growth at 8 °C or 35 °C (test-fixtures SOURCES.md §1a).
 */
export const LACTOBACILLI_CARDINALS = { tMin: 4, tOpt: 32.5, tMax: 41 } as const;
export const YEAST_CARDINALS = { tMin: 8, tOpt: 28, tMax: 35 } as const;

/**
 * Q10 ≈ 2.59 from "a 1 °C rise accelerates yeast activity by about 10 percent" (BAKE magazine,
 * "The science of fermentation"; 1.1^10, SOURCES.md §1e). Used as the prior centre for per-culture
 * Q10 fits: it is the one quoted figure tied to dough rather than to biology in general.
 */
export const DEFAULT_Q10 = 2.5937424601000023;

export interface CardinalTemperatures {
  tMin: number;
  tOpt: number;
  tMax: number;
}

/** A temperature model, by shape only: its scale (μopt, b) cancels in a relative rate. */
export type TemperatureModel =
  | { kind: 'q10'; q10: number }
  | ({ kind: 'ctmi' } & CardinalTemperatures)
  | { kind: 'ratkowsky1982'; tMin: number }
  | { kind: 'ratkowsky1983'; tMin: number; tMax: number; c: number };

export type TemperatureModelKind = TemperatureModel['kind'];

/**
 * Q10 time scaling t(T) = t_ref·Q10^((T_ref − T)/10) (SOURCES.md §1e): the factor that turns a
 * duration at `tRef` into the duration at `t`. Below the reference it is above 1 (slower).
 */
export function q10Factor(tRef: number, t: number, q10: number): number {
  return Math.pow(q10, (tRef - t) / 10);
}

/** Rate at `t` relative to the rate at `tRef` under a constant Q10: the inverse of `q10Factor`. */
export function q10RelativeRate(t: number, tRef: number, q10: number): number {
  return Math.pow(q10, (t - tRef) / 10);
}

/** The Q10 implied by two rates: Q10 = (r2/r1)^(10/(T2 − T1)) (standard definition, §1e). */
export function impliedQ10(t1: number, rate1: number, t2: number, rate2: number): number {
  return Math.pow(rate2 / rate1, 10 / (t2 - t1));
}

/**
 * Cardinal temperature model with inflection, Rosso, Lobry & Flandrois 1993 (J Theor Biol
 * 162:447), in the form given in SOURCES.md §1c. Zero at and outside [Tmin, Tmax]; μopt at Topt.
 */
export function ctmiRate(t: number, c: CardinalTemperatures, muOpt = 1): number {
  const { tMin, tOpt, tMax } = c;
  if (!(t > tMin && t < tMax)) return 0;
  const num = (t - tMax) * (t - tMin) ** 2;
  const den = (tOpt - tMin) * ((tOpt - tMin) * (t - tOpt) - (tOpt - tMax) * (tOpt + tMin - 2 * t));
  const value = (muOpt * num) / den;
  // With Topt outside (Tmin, Tmax) the denominator can change sign: such a model is not a
  // rate curve, and a negative rate would run fermentation backwards.
  return value > 0 ? value : 0;
}

/** Ratkowsky et al. 1982 (J Bacteriol 149:1): √r = b(T − Tmin), valid below the optimum only. */
export function ratkowsky1982Rate(t: number, tMin: number, b = 1): number {
  return t > tMin ? (b * (t - tMin)) ** 2 : 0;
}

/** Ratkowsky et al. 1983 (J Bacteriol 154:1222): √r = b(T − Tmin)(1 − e^(c(T − Tmax))). */
export function ratkowsky1983Rate(t: number, tMin: number, tMax: number, c: number, b = 1): number {
  if (!(t > tMin && t < tMax)) return 0;
  return (b * (t - tMin) * (1 - Math.exp(c * (t - tMax)))) ** 2;
}

/** Rate of `model` at `t` on its own (unnormalised) scale. */
export function absoluteRate(model: TemperatureModel, t: number): number {
  switch (model.kind) {
    case 'q10':
      return Math.pow(model.q10, t / 10);
    case 'ctmi':
      return ctmiRate(t, model);
    case 'ratkowsky1982':
      return ratkowsky1982Rate(t, model.tMin);
    case 'ratkowsky1983':
      return ratkowsky1983Rate(t, model.tMin, model.tMax, model.c);
  }
}

/**
 * Rate at `t` relative to the rate at `tRef`: 1 at the reference, 0 where the model says growth
 * stops. Throws when the model has no growth at the reference, because then no duration can be
 * quoted "at the reference" at all.
 */
export function relativeRate(model: TemperatureModel, t: number, tRef = REFERENCE_TEMPERATURE_C): number {
  if (model.kind === 'q10') return q10RelativeRate(t, tRef, model.q10);
  const ref = absoluteRate(model, tRef);
  if (!(ref > 0)) throw new RangeError(`temperature model has no growth at the reference ${tRef} °C`);
  return absoluteRate(model, t) / ref;
}

/**
 * A fast evaluator of `relativeRate` for one model: the reference rate is computed once. The
 * integrators call it thousands of times per fit.
 */
export function relativeRateFunction(model: TemperatureModel, tRef = REFERENCE_TEMPERATURE_C): (t: number) => number {
  if (model.kind === 'q10') {
    const k = Math.log(model.q10) / 10;
    return (t) => Math.exp(k * (t - tRef));
  }
  const ref = absoluteRate(model, tRef);
  if (!(ref > 0)) throw new RangeError(`temperature model has no growth at the reference ${tRef} °C`);
  const inv = 1 / ref;
  if (model.kind === 'ctmi') {
    // ctmiRate with its constants hoisted: this closure is the innermost loop of every fit.
    const { tMin, tOpt, tMax } = model;
    const a = tOpt - tMin;
    const b = tOpt - tMax;
    const s = tOpt + tMin;
    return (t) => {
      if (!(t > tMin && t < tMax)) return 0;
      const v = ((t - tMax) * (t - tMin) * (t - tMin)) / (a * (a * (t - tOpt) - b * (s - 2 * t)));
      return v > 0 ? v * inv : 0;
    };
  }
  return (t) => absoluteRate(model, t) * inv;
}

/** The temperatures where a model's rate has a kink or its growth stops (for quadrature splits). */
export function modelBreakpoints(model: TemperatureModel): number[] {
  switch (model.kind) {
    case 'q10':
      return [];
    case 'ctmi':
      return [model.tMin, model.tMax];
    case 'ratkowsky1982':
      return [model.tMin];
    case 'ratkowsky1983':
      return [model.tMin, model.tMax];
  }
}
