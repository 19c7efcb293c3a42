// Culture kinetics: how a culture's time to peak depends on temperature and on dilution.
//
// Model. A feeding thins the culture D-fold, D = (starter + flour + water)/starter. The culture
// must grow back by ln D (exponential growth from the inoculum) after a lag, so at a constant
// temperature t_peak = λ + ln(D)/μ(T). Taking the lag as a fixed amount of work h0 = λ·μ
// (Baranyi's physiological-state constant: the lag shrinks as the culture speeds up),
//     t_peak(T, D) = β·(h0 + ln D) / r(T),      β = 1/μ at 24 °C,  r(24 °C) = 1,
// and under a changing temperature the peak comes when the progress ∫ r(T(τ)) dτ (hours at 24 °C,
// temperature/integrate.ts) reaches β·(h0 + ln D). Noise is multiplicative (log-normal) on that
// work, so the fit minimises squared log residuals
//     e_i = ln P_i(θ_T) − ln β − ln(h0 + ln D_i),   P_i = progress over the observed hours,
// plus Gaussian priors on ln β, h0 and the temperature parameters θ_T (priors.ts) — penalised
// least squares that falls back on the priors when the history is short. The fit runs twice:
// first with the prior residual spread, then with the spread pooled from the data.
//
// Default temperature model: Ratkowsky 1983 with Tmin and c fitted per culture around the fit to
// Gänzle's lactobacilli table — chosen by bench/model-bench.ts; the rule and the figures are in
// the comment on DEFAULT_KINETICS_MODEL in priors.ts.
import { prepareModel } from '../temperature/integrate.js';
import { REFERENCE_TEMPERATURE_C } from '../temperature/models.js';
import { parseMs } from '../temperature/time.js';
import { prepareFeeding, typicalTemperature, type PreparedFeeding } from './feedings.js';
import { buildProgressGrid, gridProgress, type ProgressGrid } from './progress-grid.js';
import { invertSmall, levenbergMarquardtSmall } from './least-squares.js';
import {
  DEFAULT_HALF_LIFE_FEEDINGS,
  DEFAULT_KINETICS_MODEL,
  PRIOR_H0,
  PRIOR_LN_BETA,
  PRIOR_RESIDUAL_DOF,
  PRIOR_RESIDUAL_SD,
  temperatureSpec,
  type TemperatureParameterSpec,
} from './priors.js';
import { residualTrend } from './trend.js';
import { type CultureKinetics, type ObservedFeeding, type KineticsOptions, type KineticsParameters } from './types.js';

/** ln 3: a 1:1:1 feeding, the dilution `hoursToPeakAtReference` is quoted at. */
const LN_D_ONE_ONE_ONE = Math.log(3);

/** Keeps ln P finite when a parameter guess puts a whole feeding below Tmin. */
const PROGRESS_FLOOR = 1e-6;

interface Weighted {
  feedings: PreparedFeeding[];
  weights: Float64Array;
  grid: ProgressGrid;
}

/** A feeding weighing less than this is left out of the fit: its effect is below rounding. */
const MIN_WEIGHT = 1e-4;

function recencyWeight(age: number, halfLife: number): number {
  return Number.isFinite(halfLife) ? Math.pow(0.5, age / halfLife) : 1;
}

/**
 * Feedings in time order with their recency weights; feedings further than ~13 half-lives from
 * `asOf` (weight < 1e-4) are dropped before their temperatures are even read, which keeps a
 * refit of a long logbook as cheap as one of its last few hundred feedings.
 */
function weightedFeedings(
  history: readonly ObservedFeeding[],
  asOfMs: number | undefined,
  halfLife: number,
  defaultC: number,
): Weighted {
  const order = history.map((f, i) => ({ f, ms: parseMs(f.fedAt), i })).sort((a, b) => a.ms - b.ms || a.i - b.i);
  const n = order.length;
  const before = asOfMs === undefined ? n : order.filter((o) => o.ms < asOfMs).length;
  const feedings: PreparedFeeding[] = [];
  const weights: number[] = [];
  order.forEach((o, i) => {
    const w = recencyWeight(i < before ? before - 1 - i : i - before, halfLife);
    if (w < MIN_WEIGHT) return;
    feedings.push(prepareFeeding(o.f, defaultC));
    weights.push(w);
  });
  return { feedings, weights: Float64Array.from(weights), grid: buildProgressGrid(feedings) };
}

function priorVectors(spec: TemperatureParameterSpec, fitTemperature: boolean) {
  const mean = [PRIOR_LN_BETA.mean, PRIOR_H0.mean, ...(fitTemperature ? spec.mean : [])];
  const sd = [PRIOR_LN_BETA.sd, PRIOR_H0.sd, ...(fitTemperature ? spec.sd : [])];
  const lower = [Math.log(0.05), 0, ...(fitTemperature ? spec.lower : [])];
  const upper = [Math.log(200), 10, ...(fitTemperature ? spec.upper : [])];
  return { mean, sd, lower, upper };
}

/** One penalised fit at a fixed residual spread σ. */
function fitOnce(
  data: Weighted,
  spec: TemperatureParameterSpec,
  fitTemperature: boolean,
  sigma: number,
  start: readonly number[],
) {
  const { feedings, weights } = data;
  const n = feedings.length;
  const prior = priorVectors(spec, fitTemperature);
  const p = prior.mean.length;
  const sqrtW = weights.map((w) => Math.sqrt(w) / sigma);
  const lnD = Float64Array.from(feedings, (f) => f.lnD);
  const hours = Float64Array.from(feedings, (f) => f.hours);
  const progress = new Float64Array(n);
  const lnP = new Float64Array(n);
  let cachedKey = '';
  const temperatureTheta = (theta: Float64Array): number[] =>
    fitTemperature ? [...theta.slice(2)] : spec.mean.slice();
  const updateProgress = (theta: Float64Array): void => {
    const tt = temperatureTheta(theta);
    const key = tt.join(',');
    if (key === cachedKey) return;
    cachedKey = key;
    gridProgress(data.grid, prepareModel(spec.build(tt)), progress);
    for (let i = 0; i < n; i++) lnP[i] = Math.log((progress[i] ?? 0) + PROGRESS_FLOOR * (hours[i] ?? 0));
  };
  const result = levenbergMarquardtSmall(
    {
      n: n + p,
      residuals(theta, out) {
        updateProgress(theta);
        const lnBeta = theta[0] ?? 0;
        const h0 = theta[1] ?? 0;
        for (let i = 0; i < n; i++) {
          out[i] = (sqrtW[i] ?? 0) * ((lnP[i] ?? 0) - lnBeta - Math.log(h0 + (lnD[i] ?? 1)));
        }
        for (let j = 0; j < p; j++) out[n + j] = ((theta[j] ?? 0) - (prior.mean[j] ?? 0)) / (prior.sd[j] ?? 1);
      },
      jacobian(theta, _r, jac) {
        const h0 = theta[1] ?? 0;
        jac.fill(0);
        for (let i = 0; i < n; i++) {
          jac[i * p] = -(sqrtW[i] ?? 0);
          jac[i * p + 1] = -(sqrtW[i] ?? 0) / (h0 + (lnD[i] ?? 1));
        }
        for (let j = 0; j < p; j++) jac[(n + j) * p + j] = 1 / (prior.sd[j] ?? 1);
      },
      numericColumns: fitTemperature ? [...Array(p - 2).keys()].map((k) => k + 2) : [],
      lower: prior.lower,
      upper: prior.upper,
    },
    start,
    { maxIterations: 60 },
  );
  // Unscaled log residuals at the optimum, for the spread and the trend.
  updateProgress(result.theta);
  const lnBeta = result.theta[0] ?? 0;
  const h0 = result.theta[1] ?? 0;
  const residuals = Float64Array.from(feedings, (f, i) => (lnP[i] ?? 0) - lnBeta - Math.log(h0 + f.lnD));
  return { result, residuals, prior, p };
}

function pooledSpread(
  weights: Float64Array,
  residuals: Float64Array,
  covariance: Float64Array,
  prior: { sd: number[] },
  p: number,
) {
  let sw = 0;
  let sw2 = 0;
  let swe2 = 0;
  for (let i = 0; i < weights.length; i++) {
    const w = weights[i] ?? 0;
    sw += w;
    sw2 += w * w;
    swe2 += w * (residuals[i] ?? 0) ** 2;
  }
  const nEff = sw > 0 ? (sw * sw) / sw2 : 0;
  // Effective number of parameters the data determine: p − trace(Λ_prior · C).
  let shrunk = 0;
  for (let j = 0; j < p; j++) shrunk += (covariance[j * p + j] ?? 0) / (prior.sd[j] ?? 1) ** 2;
  const pEff = Math.max(0, p - shrunk);
  const dataDof = Math.max(0, nEff - pEff);
  const meanSquare = sw > 0 ? swe2 / sw : 0;
  // Σw·e²/Σw is a mean over nEff effective rows; rescale to an unbiased variance.
  const dataVariance = dataDof > 0.5 ? (meanSquare * nEff) / dataDof : meanSquare;
  const variance =
    (PRIOR_RESIDUAL_DOF * PRIOR_RESIDUAL_SD ** 2 + dataDof * dataVariance) / (PRIOR_RESIDUAL_DOF + dataDof);
  return {
    sd: Math.sqrt(variance),
    dof: PRIOR_RESIDUAL_DOF + dataDof,
    observedSd: nEff >= 3 && dataDof > 0.5 ? Math.sqrt(dataVariance) : null,
  };
}

function parametersFrom(
  theta: readonly number[],
  spec: TemperatureParameterSpec,
  fitTemperature: boolean,
): KineticsParameters {
  const beta = Math.exp(theta[0] ?? PRIOR_LN_BETA.mean);
  const h0 = theta[1] ?? PRIOR_H0.mean;
  const tm = spec.build(fitTemperature ? theta.slice(2) : spec.mean);
  const params: KineticsParameters = { betaHours: beta, h0, lagHoursAtRef: beta * h0, muPerHourAtRef: 1 / beta };
  if (tm.kind === 'q10') params.q10 = tm.q10;
  if (tm.kind === 'ctmi') Object.assign(params, { tMin: tm.tMin, tOpt: tm.tOpt, tMax: tm.tMax });
  if (tm.kind === 'ratkowsky1983') Object.assign(params, { tMin: tm.tMin, tMax: tm.tMax, c: tm.c });
  return params;
}

function toRows(m: Float64Array, p: number): number[][] {
  return [...Array(p).keys()].map((i) => [...m.slice(i * p, i * p + p)]);
}

/** The kinetics a culture with no usable history gets: the priors themselves. */
export function defaultKinetics(options: KineticsOptions = {}): CultureKinetics {
  return fitCultureKinetics([], options);
}

export function fitCultureKinetics(
  history: readonly ObservedFeeding[],
  options: KineticsOptions = {},
): CultureKinetics {
  const model = options.model ?? DEFAULT_KINETICS_MODEL;
  const fitTemperature = options.fitTemperature ?? true;
  const spec = temperatureSpec(model);
  const defaultC = options.defaultTemperatureC ?? typicalTemperature(history, REFERENCE_TEMPERATURE_C);
  const asOfMs = options.asOf !== undefined ? parseMs(options.asOf) : undefined;
  const halfLife = options.halfLifeFeedings ?? DEFAULT_HALF_LIFE_FEEDINGS;
  const data = weightedFeedings(history, asOfMs, halfLife, defaultC);
  const { feedings, weights } = data;

  const prior = priorVectors(spec, fitTemperature);
  const p = prior.mean.length;
  let theta: number[] = prior.mean.slice();
  let covariance: Float64Array = Float64Array.from({ length: p * p }, (_, k) =>
    k % (p + 1) === 0 ? (prior.sd[Math.floor(k / p)] ?? 1) ** 2 : 0,
  );
  let residuals: Float64Array = new Float64Array(0);
  let spread: { sd: number; dof: number; observedSd: number | null } = {
    sd: PRIOR_RESIDUAL_SD,
    dof: PRIOR_RESIDUAL_DOF,
    observedSd: null,
  };

  if (feedings.length > 0) {
    let sigma = PRIOR_RESIDUAL_SD;
    for (let pass = 0; pass < 2; pass++) {
      const fit = fitOnce(data, spec, fitTemperature, sigma, theta);
      theta = [...fit.result.theta];
      residuals = fit.residuals;
      // The solver's JᵀJ is on residuals scaled by σ and prior sds: its inverse is the
      // posterior covariance of θ in θ's own units.
      covariance = invertSmall(fit.result.jtj, p) ?? covariance;
      spread = pooledSpread(weights, residuals, covariance, fit.prior, p);
      sigma = spread.sd;
    }
  }

  const params = parametersFrom(theta, spec, fitTemperature);
  return {
    model,
    temperatureModel: spec.build(fitTemperature ? theta.slice(2) : spec.mean),
    referenceC: REFERENCE_TEMPERATURE_C,
    params,
    hoursToPeakAtReference: params.betaHours * (params.h0 + LN_D_ONE_ONE_ONE),
    residualSd: spread.sd,
    observedResidualSd: spread.observedSd,
    dof: spread.dof,
    trend: residualTrend(feedings, residuals, asOfMs),
    feedingsUsed: feedings.length,
    feedingsWithAssumedTemperature: feedings.filter((f) => f.assumedTemperature).length,
    basis: feedings.length > 0 ? 'culture' : 'default',
    theta,
    thetaNames: ['lnBeta', 'h0', ...(fitTemperature ? spec.names : [])],
    covariance: toRows(covariance, p),
  };
}
