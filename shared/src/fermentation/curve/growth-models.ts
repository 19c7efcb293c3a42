// The three sigmoid growth curves of Zwietering et al. (1990), "Modeling of the bacterial growth
// curve", Appl Environ Microbiol 56:1875–1881, written in the parameters a baker can read off a jar:
//   A      the asymptote: how far the rise goes (y at t → ∞)
//   muMax  the maximum rate: slope of the tangent at the inflection point (y units per hour)
//   lag    the lag time: where that tangent crosses y = 0 (hours)
//   nu     (Richards only) the shape: nu → 0 approaches Gompertz, nu = 1 is the logistic
// Each model also has closed forms for the time at which y reaches a fraction p of A and for its
// inflection point, so "time to peak" never needs a numeric root search.

export type GrowthModelName = 'gompertz' | 'logistic' | 'richards';

/** Parameters in the order the fitter uses: [A, muMax, lag] or [A, muMax, lag, nu]. */
export interface GrowthParameters {
  A: number;
  muMax: number;
  lag: number;
  /** Richards shape; ignored by Gompertz and logistic. */
  nu?: number;
}

export interface GrowthModel {
  name: GrowthModelName;
  /** Parameter names in fitting order. */
  parameterNames: readonly string[];
  /** y(t) for a parameter vector in fitting order. */
  value: (params: readonly number[], t: number) => number;
  /** Time at which y reaches p·A (0 < p < 1). */
  tAtFraction: (params: readonly number[], p: number) => number;
  /** The inflection point, where the slope is muMax. */
  inflection: (params: readonly number[]) => { t: number; y: number };
}

/** ln(1 + e^z) without overflow: past z ≈ 30 the 1 is lost below double precision anyway. */
function softplus(z: number): number {
  return z > 30 ? z + Math.log1p(Math.exp(-z)) : Math.log1p(Math.exp(z));
}

function unpack(params: readonly number[]): [number, number, number, number] {
  return [params[0] ?? NaN, params[1] ?? NaN, params[2] ?? NaN, params[3] ?? NaN];
}

/** Modified Gompertz: y = A·exp(−exp(μm·e/A·(λ − t) + 1)). */
export function gompertz(t: number, A: number, muMax: number, lag: number): number {
  return A * Math.exp(-Math.exp(((muMax * Math.E) / A) * (lag - t) + 1));
}

/** Modified logistic: y = A / (1 + exp(4μm/A·(λ − t) + 2)). */
export function logistic(t: number, A: number, muMax: number, lag: number): number {
  // Written as A·exp(−softplus(z)) so a steep curve far from the inflection cannot overflow.
  return A * Math.exp(-softplus(((4 * muMax) / A) * (lag - t) + 2));
}

/**
 * Modified Richards: y = A·{1 + ν·exp(1 + ν)·exp(μm/A·(1 + ν)^(1 + 1/ν)·(λ − t))}^(−1/ν).
 * Only nu > 0 is accepted (NaN otherwise): for nu < 0 the bracket can go negative and the curve
 * stops being a rise.
 */
export function richards(t: number, A: number, muMax: number, lag: number, nu: number): number {
  if (!(nu > 0)) return NaN;
  // ν·e^(1+ν)·e^(k(λ−t)) = e^z with z = k(λ−t) + 1 + ν + ln ν: one exponent, no overflow.
  const k = (muMax / A) * Math.pow(1 + nu, 1 + 1 / nu);
  const z = k * (lag - t) + 1 + nu + Math.log(nu);
  return A * Math.exp(-softplus(z) / nu);
}

/** Gompertz: t_p = λ + A/(μm·e)·(1 − ln(−ln p)). */
export function gompertzTAtFraction(p: number, A: number, muMax: number, lag: number): number {
  return lag + (A / (muMax * Math.E)) * (1 - Math.log(-Math.log(p)));
}

/** Logistic: t_p = λ + A/(4μm)·(2 − ln(1/p − 1)). */
export function logisticTAtFraction(p: number, A: number, muMax: number, lag: number): number {
  return lag + (A / (4 * muMax)) * (2 - Math.log(1 / p - 1));
}

/** Richards: t_p = λ − A/(μm(1+ν)^(1+1/ν))·(ln(p^(−ν) − 1) − (1 + ν) − ln ν). */
export function richardsTAtFraction(p: number, A: number, muMax: number, lag: number, nu: number): number {
  if (!(nu > 0)) return NaN;
  const k = (muMax / A) * Math.pow(1 + nu, 1 + 1 / nu);
  return lag - (Math.log(Math.pow(p, -nu) - 1) - (1 + nu) - Math.log(nu)) / k;
}

/** Fraction of A at which each curve turns from speeding up to slowing down. */
export function inflectionFraction(model: GrowthModelName, nu = 1): number {
  if (model === 'gompertz') return 1 / Math.E;
  if (model === 'logistic') return 0.5;
  return Math.pow(1 + nu, -1 / nu);
}

export const gompertzModel: GrowthModel = {
  name: 'gompertz',
  parameterNames: ['A', 'muMax', 'lag'],
  value(params, t) {
    const [A, mu, lag] = unpack(params);
    return gompertz(t, A, mu, lag);
  },
  tAtFraction(params, p) {
    const [A, mu, lag] = unpack(params);
    return gompertzTAtFraction(p, A, mu, lag);
  },
  inflection(params) {
    // t_i = λ + A/(μm·e), y(t_i) = A/e.
    const [A, mu, lag] = unpack(params);
    return { t: lag + A / (mu * Math.E), y: A / Math.E };
  },
};

export const logisticModel: GrowthModel = {
  name: 'logistic',
  parameterNames: ['A', 'muMax', 'lag'],
  value(params, t) {
    const [A, mu, lag] = unpack(params);
    return logistic(t, A, mu, lag);
  },
  tAtFraction(params, p) {
    const [A, mu, lag] = unpack(params);
    return logisticTAtFraction(p, A, mu, lag);
  },
  inflection(params) {
    // t_i = λ + A/(2μm), y(t_i) = A/2.
    const [A, mu, lag] = unpack(params);
    return { t: lag + A / (2 * mu), y: A / 2 };
  },
};

export const richardsModel: GrowthModel = {
  name: 'richards',
  parameterNames: ['A', 'muMax', 'lag', 'nu'],
  value(params, t) {
    const [A, mu, lag, nu] = unpack(params);
    return richards(t, A, mu, lag, nu);
  },
  tAtFraction(params, p) {
    const [A, mu, lag, nu] = unpack(params);
    return richardsTAtFraction(p, A, mu, lag, nu);
  },
  inflection(params) {
    // y_i = A(1+ν)^(−1/ν); from the closed form, t_i = λ + A/(μm(1+ν)^(1/ν)).
    const [A, mu, lag, nu] = unpack(params);
    return { t: lag + A / (mu * Math.pow(1 + nu, 1 / nu)), y: A * inflectionFraction('richards', nu) };
  },
};

export const growthModels: Readonly<Record<GrowthModelName, GrowthModel>> = {
  gompertz: gompertzModel,
  logistic: logisticModel,
  richards: richardsModel,
};

/** Parameter vector in fitting order from named parameters. */
export function toParameterVector(model: GrowthModelName, p: GrowthParameters): number[] {
  return model === 'richards' ? [p.A, p.muMax, p.lag, p.nu ?? 1] : [p.A, p.muMax, p.lag];
}
