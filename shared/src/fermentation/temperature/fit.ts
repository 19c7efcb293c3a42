// Fitting a temperature model to measured (T, rate) pairs by Levenberg–Marquardt
// (ml-levenberg-marquardt). Used to check the models against published data (Gänzle's table,
// Gause's yeast) and to derive priors. Cardinal models have flat regions (zero rate outside
// [Tmin, Tmax]) where the gradient vanishes, so the fit runs from several starting points and
// keeps the best.
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import {
  REFERENCE_TEMPERATURE_C,
  ctmiRate,
  ratkowsky1982Rate,
  ratkowsky1983Rate,
  type TemperatureModel,
  type TemperatureModelKind,
} from './models.js';

export interface RatePoint {
  /** Temperature, °C. */
  t: number;
  /** Growth rate (any unit, e.g. h⁻¹, or relative to an optimum). */
  rate: number;
}

export interface TemperatureFitOptions {
  /** Fit the rates themselves (default) or their square roots (nlsMicrobio's convention). */
  scale?: 'rate' | 'sqrt';
  /** Reference temperature of the Q10 model's scale parameter. */
  tRef?: number;
}

export interface TemperatureFit {
  model: TemperatureModel;
  /** μopt (CTMI), b (Ratkowsky) or the rate at tRef (Q10): the model's own scale. */
  scale: number;
  /** Residual sum of squares on the fitted scale. */
  rss: number;
  n: number;
  /** The fitted rate at `t` on the data's scale. */
  rateAt(t: number): number;
}

type Curve = (p: readonly number[], t: number) => number;

interface Spec {
  curve: Curve;
  starts: number[][];
  min: number[];
  max: number[];
  build(p: readonly number[]): { model: TemperatureModel; scale: number };
}

const at = (p: readonly number[], i: number): number => p[i] ?? NaN;

function specFor(kind: TemperatureModelKind, points: readonly RatePoint[], tRef: number): Spec {
  const ts = points.map((p) => p.t);
  const lo = Math.min(...ts);
  const hi = Math.max(...ts);
  const best = points.reduce((a, b) => (b.rate > a.rate ? b : a));
  const peak = best.rate > 0 ? best.rate : 1;
  switch (kind) {
    case 'q10':
      return {
        curve: (p, t) => at(p, 0) * Math.pow(at(p, 1), (t - tRef) / 10),
        starts: [1.5, 2, 3, 5].map((q) => [peak / 2, q]),
        min: [1e-12, 1.0001],
        max: [1e12, 100],
        build: (p) => ({ model: { kind: 'q10', q10: at(p, 1) }, scale: at(p, 0) }),
      };
    case 'ctmi': {
      const starts: number[][] = [];
      for (const dMin of [1, 5, 10]) {
        for (const dMax of [0.5, 3, 8]) {
          starts.push([peak, lo - dMin, best.t, Math.max(hi, best.t) + dMax]);
        }
      }
      return {
        curve: (p, t) => ctmiRate(t, { tMin: at(p, 1), tOpt: at(p, 2), tMax: at(p, 3) }, at(p, 0)),
        starts,
        min: [1e-12, -30, lo - 20, best.t],
        max: [1e12, best.t, hi + 20, hi + 40],
        build: (p) => ({ model: { kind: 'ctmi', tMin: at(p, 1), tOpt: at(p, 2), tMax: at(p, 3) }, scale: at(p, 0) }),
      };
    }
    case 'ratkowsky1982':
      return {
        curve: (p, t) => ratkowsky1982Rate(t, at(p, 1), at(p, 0)),
        starts: [1, 5, 10].map((d) => [Math.sqrt(peak) / (best.t - lo + d), lo - d]),
        min: [1e-12, -60],
        max: [1e6, lo],
        build: (p) => ({ model: { kind: 'ratkowsky1982', tMin: at(p, 1) }, scale: at(p, 0) }),
      };
    case 'ratkowsky1983': {
      const starts: number[][] = [];
      for (const d of [1, 5, 10]) {
        for (const c of [0.1, 0.3, 1]) starts.push([Math.sqrt(peak) / (best.t - lo + d), lo - d, hi + 1, c]);
      }
      return {
        curve: (p, t) => ratkowsky1983Rate(t, at(p, 1), at(p, 2), at(p, 3), at(p, 0)),
        starts,
        min: [1e-12, -60, best.t, 1e-3],
        max: [1e6, best.t, hi + 40, 20],
        build: (p) => ({
          model: { kind: 'ratkowsky1983', tMin: at(p, 1), tMax: at(p, 2), c: at(p, 3) },
          scale: at(p, 0),
        }),
      };
    }
  }
}

/**
 * Least-squares fit of a temperature model of the given kind to (T, rate) points. Needs at least
 * as many points as the model has parameters; throws otherwise rather than return an
 * underdetermined fit.
 */
export function fitTemperatureModel(
  points: readonly RatePoint[],
  kind: TemperatureModelKind,
  options: TemperatureFitOptions = {},
): TemperatureFit {
  const tRef = options.tRef ?? REFERENCE_TEMPERATURE_C;
  const sqrt = options.scale === 'sqrt';
  const spec = specFor(kind, points, tRef);
  const nParams = spec.min.length;
  if (points.length < nParams) {
    throw new RangeError(`a ${kind} fit needs at least ${nParams} points, got ${points.length}`);
  }
  const x = points.map((p) => p.t);
  const y = points.map((p) => (sqrt ? Math.sqrt(Math.max(p.rate, 0)) : p.rate));
  const f = (p: readonly number[], t: number): number => {
    const r = spec.curve(p, t);
    return sqrt ? Math.sqrt(Math.max(r, 0)) : r;
  };
  const rssOf = (p: readonly number[]): number => x.reduce((s, t, i) => s + (f(p, t) - (y[i] ?? 0)) ** 2, 0);

  let bestParams: number[] | undefined;
  let bestRss = Infinity;
  for (const start of spec.starts) {
    const initialValues = start.map((v, i) => Math.min(Math.max(v, at(spec.min, i)), at(spec.max, i)));
    const result = levenbergMarquardt({ x, y }, (p) => (t) => f(p, t), {
      initialValues,
      minValues: spec.min,
      maxValues: spec.max,
      // Parameters span 1e-3 (c) to 1e2 (°C): a small absolute step keeps the
      // finite-difference Jacobian meaningful for all of them.
      gradientDifference: 1e-6,
      centralDifference: true,
      damping: 1e-2,
      maxIterations: 500,
      errorTolerance: 1e-14,
    });
    const rss = rssOf(result.parameterValues);
    if (Number.isFinite(rss) && rss < bestRss) {
      bestRss = rss;
      bestParams = result.parameterValues;
    }
  }
  if (!bestParams) throw new RangeError(`${kind} fit failed from every starting point`);
  const params = bestParams;
  const { model, scale } = spec.build(params);
  return { model, scale, rss: bestRss, n: points.length, rateAt: (t) => spec.curve(params, t) };
}
