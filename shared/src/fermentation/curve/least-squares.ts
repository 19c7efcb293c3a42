// Nonlinear least squares for any model y = f(params, t): ml-levenberg-marquardt takes the first
// strides from the starting values, our scaled Marquardt refinement (marquardt-refine.ts) finishes
// to the precision NIST StRD certifies, and the Jacobian at the solution gives the standard
// errors. Pure: no clock, no randomness.
import { levenbergMarquardt } from 'ml-levenberg-marquardt';

import { type ModelFunction, type ModelGradient, modelJacobian, parameterUncertainty } from './jacobian.js';
import { refineLeastSquares } from './marquardt-refine.js';

export type { ModelFunction, ModelGradient } from './jacobian.js';

export interface DataPoint {
  t: number;
  y: number;
}

export interface LeastSquaresOptions {
  /** Lower bounds per parameter (the search is clamped to them). */
  minValues?: readonly number[];
  /** Upper bounds per parameter. */
  maxValues?: readonly number[];
  /** Iterations of the ml-levenberg-marquardt stage; 0 skips it. Default 100. */
  packageIterations?: number;
  /** Iterations of each refinement. Default 10000 (MGH10 from Start 1 needs about 5000). */
  maxIterations?: number;
  /** Analytic ∂f/∂params; central differences otherwise. */
  gradient?: ModelGradient;
}

export interface LeastSquaresResult {
  params: number[];
  /** Residual sum of squares Σ(y − f)². */
  rss: number;
  /** True when the refinement reached a stationary point (see stopReason). */
  converged: boolean;
  stopReason: string;
  /** Which route produced the answer: package then refinement, or refinement alone. */
  route: 'package+refine' | 'refine';
  /** Iterations of every stage together. */
  iterations: number;
  /** n − k. */
  degreesOfFreedom: number;
  /** sqrt(RSS/(n − k)). */
  residualStdDev: number;
  /** sqrt(diag((JᵀJ)⁻¹)·RSS/(n − k)); null when the Jacobian is singular at the solution. */
  standardErrors: number[] | null;
  covariance: number[][] | null;
}

function sumOfSquares(fn: ModelFunction, points: readonly DataPoint[], p: readonly number[]): number {
  let s = 0;
  for (const { t, y } of points) s += (fn(p, t) - y) ** 2;
  return s;
}

function typicalSizes(initial: readonly number[]): number[] {
  return initial.map((v) => (v === 0 || !Number.isFinite(v) ? 1 : Math.abs(v)));
}

/**
 * ml-levenberg-marquardt alone, on parameters divided by their starting sizes: the package damps
 * with a plain λ·I, so without that rescaling a parameter of 5e-4 next to one of 500 barely moves.
 * Exported so the tests can compare the package with the full fitter on the same references.
 */
export function fitWithPackageOnly(
  fn: ModelFunction,
  points: readonly DataPoint[],
  initial: readonly number[],
  options: Pick<LeastSquaresOptions, 'minValues' | 'maxValues' | 'packageIterations'> = {},
): { params: number[]; rss: number; iterations: number } {
  const scale = typicalSizes(initial);
  const unscale = (u: readonly number[]): number[] => u.map((v, j) => v * (scale[j] ?? 1));
  const fallback = { params: initial.slice(), rss: sumOfSquares(fn, points, initial), iterations: 0 };
  try {
    const result = levenbergMarquardt(
      { x: points.map((p) => p.t), y: points.map((p) => p.y) },
      (u: number[]) => {
        const p = unscale(u);
        return (t: number) => fn(p, t);
      },
      {
        initialValues: initial.map((v, j) => v / (scale[j] ?? 1)),
        damping: 1e-2,
        gradientDifference: 1e-6,
        centralDifference: true,
        maxIterations: options.packageIterations ?? 100,
        // 0: keep every strict improvement and never stop early on an absolute threshold.
        errorTolerance: 0,
        ...(options.minValues ? { minValues: options.minValues.map((v, j) => v / (scale[j] ?? 1)) } : {}),
        ...(options.maxValues ? { maxValues: options.maxValues.map((v, j) => v / (scale[j] ?? 1)) } : {}),
      },
    );
    const params = unscale(result.parameterValues);
    const rss = sumOfSquares(fn, points, params);
    return Number.isFinite(rss) ? { params, rss, iterations: result.iterations } : fallback;
  } catch {
    // The package throws on options it dislikes (e.g. fewer than 2 points); the refinement
    // copes on its own.
    return fallback;
  }
}

/**
 * Least-squares fit of `fn` to `points` from `initial`. Never throws for finite input: a fit that
 * cannot be completed comes back with converged = false and a stopReason.
 */
export function fitLeastSquares(
  fn: ModelFunction,
  points: readonly DataPoint[],
  initial: readonly number[],
  options: LeastSquaresOptions = {},
): LeastSquaresResult {
  const ts = points.map((p) => p.t);
  const ys = points.map((p) => p.y);
  const k = initial.length;
  const typical = typicalSizes(initial);
  const refineOptions = {
    ...(options.minValues ? { minValues: options.minValues } : {}),
    ...(options.maxValues ? { maxValues: options.maxValues } : {}),
    ...(options.gradient ? { gradient: options.gradient } : {}),
    maxIterations: options.maxIterations ?? 10000,
    typical,
  };

  // Two routes, both always taken (they are cheap at these sizes): the package's strides then
  // our refinement, and our refinement straight from the caller's start. From NIST's Start 1 the
  // package sometimes strides into a saturated corner (Rat42, Rat43, Thurber, Eckerle4) that the
  // direct route avoids; a converged route beats one that is not, then the lower sum of squares.
  const initialRss = sumOfSquares(fn, points, initial);
  const packageIterations = options.packageIterations ?? 100;
  const first = packageIterations > 0 ? fitWithPackageOnly(fn, points, initial, options) : null;
  const routes: { result: ReturnType<typeof refineLeastSquares>; route: LeastSquaresResult['route'] }[] = [];
  if (first && Number.isFinite(first.rss) && !(first.rss > initialRss)) {
    routes.push({ result: refineLeastSquares(fn, ts, ys, first.params, refineOptions), route: 'package+refine' });
  }
  routes.push({ result: refineLeastSquares(fn, ts, ys, initial, refineOptions), route: 'refine' });
  const iterations = (first?.iterations ?? 0) + routes.reduce((a, r) => a + r.result.iterations, 0);
  const ranked = routes.slice().sort((a, b) => {
    if (a.result.converged !== b.result.converged) return a.result.converged ? -1 : 1;
    return a.result.rss - b.result.rss;
  });
  const winner = ranked[0] ?? { result: refineLeastSquares(fn, ts, ys, initial, refineOptions), route: 'refine' };
  const best = winner.result;

  const n = points.length;
  const dof = n - k;
  const J = modelJacobian(fn, ts, best.params, typical, options.gradient);
  const uncertainty = dof > 0 ? parameterUncertainty(J, best.rss) : null;
  return {
    params: best.params,
    rss: best.rss,
    converged: best.converged,
    stopReason: best.stopReason,
    route: winner.route,
    iterations,
    degreesOfFreedom: dof,
    residualStdDev: dof > 0 ? Math.sqrt(best.rss / dof) : NaN,
    standardErrors: uncertainty?.standardErrors ?? null,
    covariance: uncertainty?.covariance ?? null,
  };
}
