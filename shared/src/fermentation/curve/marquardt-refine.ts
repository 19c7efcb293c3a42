// Our own Levenberg–Marquardt, used to finish what ml-levenberg-marquardt starts. The package
// (v5) adds a plain λ·I to JᵀJ, applies every step even when it makes the fit worse, and stops
// on an absolute error threshold; that lands near a minimum but rarely to the 6 significant
// digits NIST StRD certifies. This one follows Marquardt's (1963) scaled form as refined by
// Moré (1978): columns scaled by their norms (so a parameter of 5e-4 and one of 240 are damped
// alike), a step is kept only if it lowers the sum of squares, and the damped step is solved
// through an SVD of the scaled Jacobian rather than by forming JᵀJ, which would square the
// condition number (Thurber, MGH10). The fit-curve tests show it matches or beats the package.
import { Matrix, SingularValueDecomposition } from 'ml-matrix';

import { type ModelFunction, type ModelGradient, modelJacobian } from './jacobian.js';

export interface RefineOptions {
  minValues?: readonly number[];
  maxValues?: readonly number[];
  maxIterations?: number;
  gradient?: ModelGradient;
  /** Natural size of each parameter, for finite-difference steps. */
  typical?: readonly number[];
}

export interface RefineResult {
  params: number[];
  rss: number;
  iterations: number;
  converged: boolean;
  stopReason: string;
}

/** cos of the angle between the residual and the Jacobian's columns: 0 at a stationary point. */
const GRADIENT_TOLERANCE = 1e-10;
/** When no step lowers the RSS any more, accept the point if it is this close to stationary. */
const FLOOR_GRADIENT_TOLERANCE = 1e-6;
const MAX_DAMPING = 1e20;
/** Relative effect on the curve below which a parameter counts as having dropped out. */
const SATURATION_TOLERANCE = 1e-10;

function residuals(fn: ModelFunction, ts: readonly number[], ys: readonly number[], p: readonly number[]): number[] {
  return ts.map((t, i) => fn(p, t) - (ys[i] ?? NaN));
}

function sumOfSquares(r: readonly number[]): number {
  let s = 0;
  for (const v of r) s += v * v;
  return s;
}

function clamp(p: readonly number[], lo?: readonly number[], hi?: readonly number[]): number[] {
  return p.map((v, j) => Math.min(Math.max(v, lo?.[j] ?? -Infinity), hi?.[j] ?? Infinity));
}

export function refineLeastSquares(
  fn: ModelFunction,
  ts: readonly number[],
  ys: readonly number[],
  start: readonly number[],
  options: RefineOptions = {},
): RefineResult {
  const k = start.length;
  const maxIterations = options.maxIterations ?? 10000;
  const typical = options.typical ?? start.map((v) => (v === 0 ? 1 : Math.abs(v)));
  let p = clamp(start, options.minValues, options.maxValues);
  let r = residuals(fn, ts, ys, p);
  let rss = sumOfSquares(r);
  if (!Number.isFinite(rss)) {
    return { params: p, rss, iterations: 0, converged: false, stopReason: 'model is not finite at the start' };
  }
  const colScale = new Array<number>(k).fill(0);
  const yNorm = Math.max(Math.sqrt(ys.reduce((a, v) => a + v * v, 0)), Number.MIN_VALUE);
  let damping = 1e-3;
  let growth = 2;
  let tinyProgress = 0;

  const finish = (iterations: number, converged: boolean, stopReason: string): RefineResult => {
    if (converged) {
      // A curve driven into saturation (BoxBOD's exp(−b2·x) → 0, a logistic pushed off the
      // data) has a vanishing gradient because a parameter no longer moves the curve at all,
      // not because the fit is best. Such a point is reported as not converged.
      const flat = colScale.findIndex(
        (norm, j) => (norm * Math.max(Math.abs(p[j] ?? 0), typical[j] ?? 0)) / yNorm < SATURATION_TOLERANCE,
      );
      if (flat >= 0) {
        return {
          params: p,
          rss,
          iterations,
          converged: false,
          stopReason: `parameter ${flat} no longer moves the curve`,
        };
      }
    }
    return { params: p, rss, iterations, converged, stopReason };
  };

  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    if (rss === 0) return finish(iteration - 1, true, 'exact fit');
    const J = modelJacobian(fn, ts, p, typical, options.gradient);
    const n = J.rows;
    for (let j = 0; j < k; j++) {
      let sum = 0;
      for (let i = 0; i < n; i++) sum += J.get(i, j) ** 2;
      const norm = Math.sqrt(sum);
      if (!Number.isFinite(norm)) return finish(iteration, false, 'Jacobian is not finite');
      // Scale by today's column norms (Marquardt 1963). Moré's grow-only scales were tried and
      // crawl on MGH10 from NIST's Start 1, where the columns change by dozens of orders.
      colScale[j] = norm;
    }
    const D = colScale.map((d) => (d > 0 ? d : 1));
    const Js = new Matrix(n, k);
    for (let i = 0; i < n; i++) for (let j = 0; j < k; j++) Js.set(i, j, J.get(i, j) / (D[j] ?? 1));

    const svd = new SingularValueDecomposition(Js, { autoTranspose: true });
    const s = svd.diagonal;
    const U = svd.leftSingularVectors;
    const V = svd.rightSingularVectors;
    const g = s.map((_, l) => {
      let sum = 0;
      for (let i = 0; i < n; i++) sum += U.get(i, l) * (r[i] ?? 0);
      return sum;
    });

    // Stationarity: |column_jᵀ r| / (|column_j|·|r|), with Jsᵀr = V·S·g.
    const rNorm = Math.sqrt(rss);
    let cosine = 0;
    for (let j = 0; j < k; j++) {
      let dot = 0;
      for (let l = 0; l < s.length; l++) dot += V.get(j, l) * (s[l] ?? 0) * (g[l] ?? 0);
      const colNorm = Math.sqrt(Js.getColumn(j).reduce((a, v) => a + v * v, 0));
      if (colNorm > 0) cosine = Math.max(cosine, Math.abs(dot) / (colNorm * rNorm));
    }
    if (cosine <= GRADIENT_TOLERANCE) return finish(iteration - 1, true, 'gradient vanished');

    let accepted = false;
    while (damping <= MAX_DAMPING) {
      const stepScaled = new Array<number>(k).fill(0);
      // Reduction the linear model predicts: Σ g²·(1 − (λ/(s² + λ))²).
      let predicted = 0;
      for (let l = 0; l < s.length; l++) {
        const sl = s[l] ?? 0;
        const gl = g[l] ?? 0;
        const coef = (sl * gl) / (sl * sl + damping);
        const kept = damping / (sl * sl + damping);
        predicted += gl * gl * (1 - kept * kept);
        for (let j = 0; j < k; j++) stepScaled[j] = (stepScaled[j] ?? 0) - V.get(j, l) * coef;
      }
      const trial = clamp(
        p.map((v, j) => v + (stepScaled[j] ?? 0) / (D[j] ?? 1)),
        options.minValues,
        options.maxValues,
      );
      const rTrial = residuals(fn, ts, ys, trial);
      const rssTrial = sumOfSquares(rTrial);
      if (Number.isFinite(rssTrial) && rssTrial < rss) {
        tinyProgress = (rss - rssTrial) / rss < 1e-15 ? tinyProgress + 1 : 0;
        // Nielsen's (1999) update: relax the damping as far as the gain ratio ρ (actual over
        // predicted reduction) says the linear model can be trusted.
        const rho = predicted > 0 ? (rss - rssTrial) / predicted : 1;
        damping = Math.max(damping * Math.max(1 / 3, 1 - (2 * rho - 1) ** 3), 1e-15);
        growth = 2;
        p = trial;
        r = rTrial;
        rss = rssTrial;
        accepted = true;
        break;
      }
      damping *= growth;
      growth *= 2;
    }
    if (!accepted) {
      // Even a vanishing step no longer helps: the fit is at the floor of double precision.
      const atFloor = cosine <= FLOOR_GRADIENT_TOLERANCE;
      return finish(iteration, atFloor, atFloor ? 'no further decrease (precision floor)' : 'stalled off a minimum');
    }
    if (tinyProgress >= 3) {
      const atFloor = cosine <= FLOOR_GRADIENT_TOLERANCE;
      return finish(iteration, atFloor, atFloor ? 'no further progress' : 'crawling off a minimum');
    }
  }
  return finish(maxIterations, false, 'iteration limit');
}
