// A small Levenberg–Marquardt solver for the kinetics fit: a handful of parameters (≤ 4) and up
// to thousands of residual rows. It works on flat typed arrays and stops on relative
// improvement, which ml-levenberg-marquardt does not (that package stops only on an absolute
// error threshold or after maxIterations, and rebuilds ml-matrix objects every step) — the
// difference that keeps a 1,000-feeding refit within its time budget. least-squares.test.ts
// shows both reach the same optimum on the same problem.

export interface LeastSquaresProblem {
  /** Number of residual rows. */
  n: number;
  /** Fills `out` (length n) with the residuals at `theta`. */
  residuals(theta: Float64Array, out: Float64Array): void;
  /**
   * Fills `jac` (row-major n × p) with ∂r/∂θ at `theta`, where `r` holds the residuals there.
   * Columns it cannot do analytically may be left to `numericColumns`.
   */
  jacobian?(theta: Float64Array, r: Float64Array, jac: Float64Array): void;
  /** Columns to differentiate numerically; default all when no jacobian. */
  numericColumns?: readonly number[];
  /** Central instead of forward differences: twice the evaluations, about twice the digits. */
  centralDifferences?: boolean;
  lower?: readonly number[];
  upper?: readonly number[];
}

export interface LeastSquaresResult {
  theta: Float64Array;
  /** Sum of squared residuals at the optimum. */
  cost: number;
  iterations: number;
  converged: boolean;
  /** JᵀJ at the optimum (row-major p × p): the inverse is the parameters' covariance. */
  jtj: Float64Array;
}

function clamp(theta: Float64Array, lower?: readonly number[], upper?: readonly number[]): void {
  for (let k = 0; k < theta.length; k++) {
    const lo = lower?.[k] ?? -Infinity;
    const hi = upper?.[k] ?? Infinity;
    const v = theta[k] ?? 0;
    theta[k] = v < lo ? lo : v > hi ? hi : v;
  }
}

function sumSquares(r: Float64Array): number {
  let s = 0;
  for (let i = 0; i < r.length; i++) s += (r[i] ?? 0) ** 2;
  return s;
}

/** Solves the p × p system A x = b in place by Gaussian elimination with partial pivoting. */
export function solveSmall(a: Float64Array, b: Float64Array, p: number): Float64Array | null {
  const m = Float64Array.from(a);
  const x = Float64Array.from(b);
  for (let col = 0; col < p; col++) {
    let pivot = col;
    for (let row = col + 1; row < p; row++) {
      if (Math.abs(m[row * p + col] ?? 0) > Math.abs(m[pivot * p + col] ?? 0)) pivot = row;
    }
    const pv = m[pivot * p + col] ?? 0;
    if (Math.abs(pv) < 1e-300) return null;
    if (pivot !== col) {
      for (let k = 0; k < p; k++) {
        const t = m[col * p + k] ?? 0;
        m[col * p + k] = m[pivot * p + k] ?? 0;
        m[pivot * p + k] = t;
      }
      const t = x[col] ?? 0;
      x[col] = x[pivot] ?? 0;
      x[pivot] = t;
    }
    for (let row = col + 1; row < p; row++) {
      const f = (m[row * p + col] ?? 0) / pv;
      if (f === 0) continue;
      for (let k = col; k < p; k++) m[row * p + k] = (m[row * p + k] ?? 0) - f * (m[col * p + k] ?? 0);
      x[row] = (x[row] ?? 0) - f * (x[col] ?? 0);
    }
  }
  for (let row = p - 1; row >= 0; row--) {
    let s = x[row] ?? 0;
    for (let k = row + 1; k < p; k++) s -= (m[row * p + k] ?? 0) * (x[k] ?? 0);
    x[row] = s / (m[row * p + row] ?? 1);
  }
  return x;
}

/** Inverse of a p × p matrix (row-major), or null when singular. */
export function invertSmall(a: Float64Array, p: number): Float64Array | null {
  const inv = new Float64Array(p * p);
  for (let j = 0; j < p; j++) {
    const e = new Float64Array(p);
    e[j] = 1;
    const col = solveSmall(a, e, p);
    if (!col) return null;
    for (let i = 0; i < p; i++) inv[i * p + j] = col[i] ?? 0;
  }
  return inv;
}

export function levenbergMarquardtSmall(
  problem: LeastSquaresProblem,
  start: readonly number[],
  options: { maxIterations?: number; tolerance?: number; absoluteTolerance?: number } = {},
): LeastSquaresResult {
  const p = start.length;
  const n = problem.n;
  const maxIterations = options.maxIterations ?? 100;
  const tolerance = options.tolerance ?? 1e-10;
  // Residuals are scaled to unit variance, so a drop in cost below 1e-6 is far inside the
  // parameters' own uncertainty (a change of 1 is one standard error).
  const absoluteTolerance = options.absoluteTolerance ?? 1e-6;
  const numeric = problem.numericColumns ?? (problem.jacobian ? [] : [...Array(p).keys()]);

  const theta = Float64Array.from(start);
  clamp(theta, problem.lower, problem.upper);
  const r = new Float64Array(n);
  const rTrial = new Float64Array(n);
  const rBack = problem.centralDifferences ? new Float64Array(n) : rTrial;
  const jac = new Float64Array(n * p);
  const jtj = new Float64Array(p * p);
  const jtr = new Float64Array(p);
  const trial = new Float64Array(p);

  const fillJacobian = (): void => {
    problem.jacobian?.(theta, r, jac);
    for (const k of numeric) {
      const v = theta[k] ?? 0;
      if (problem.centralDifferences) {
        const h = 1e-5 * Math.max(1, Math.abs(v));
        theta[k] = v + h;
        problem.residuals(theta, rTrial);
        theta[k] = v - h;
        problem.residuals(theta, rBack);
        theta[k] = v;
        for (let i = 0; i < n; i++) jac[i * p + k] = ((rTrial[i] ?? 0) - (rBack[i] ?? 0)) / (2 * h);
      } else {
        const h = 1e-6 * Math.max(1, Math.abs(v));
        theta[k] = v + h;
        problem.residuals(theta, rTrial);
        theta[k] = v;
        for (let i = 0; i < n; i++) jac[i * p + k] = ((rTrial[i] ?? 0) - (r[i] ?? 0)) / h;
      }
    }
    jtj.fill(0);
    jtr.fill(0);
    for (let i = 0; i < n; i++) {
      const ri = r[i] ?? 0;
      const row = i * p;
      for (let a = 0; a < p; a++) {
        const ja = jac[row + a] ?? 0;
        if (ja === 0) continue;
        jtr[a] = (jtr[a] ?? 0) + ja * ri;
        for (let b = a; b < p; b++) jtj[a * p + b] = (jtj[a * p + b] ?? 0) + ja * (jac[row + b] ?? 0);
      }
    }
    for (let a = 0; a < p; a++) for (let b = 0; b < a; b++) jtj[a * p + b] = jtj[b * p + a] ?? 0;
  };

  problem.residuals(theta, r);
  let cost = sumSquares(r);
  let lambda = 1e-3;
  let iterations = 0;
  let converged = false;
  fillJacobian();
  while (iterations < maxIterations) {
    iterations++;
    const damped = Float64Array.from(jtj);
    for (let a = 0; a < p; a++) damped[a * p + a] = (jtj[a * p + a] ?? 0) * (1 + lambda) + 1e-12;
    const minusG = jtr.map((g) => -g);
    const delta = solveSmall(damped, minusG, p);
    if (!delta) break;
    for (let a = 0; a < p; a++) trial[a] = (theta[a] ?? 0) + (delta[a] ?? 0);
    clamp(trial, problem.lower, problem.upper);
    problem.residuals(trial, rTrial);
    const trialCost = sumSquares(rTrial);
    if (Number.isFinite(trialCost) && trialCost <= cost) {
      const drop = cost - trialCost;
      const gain = drop / Math.max(cost, 1e-300);
      theta.set(trial);
      r.set(rTrial);
      cost = trialCost;
      lambda = Math.max(lambda / 3, 1e-12);
      fillJacobian();
      if (gain < tolerance || drop < absoluteTolerance) {
        converged = true;
        break;
      }
    } else {
      lambda *= 4;
      if (lambda > 1e12) {
        // No downhill step left at any damping: at a (possibly bounded) minimum.
        converged = true;
        break;
      }
    }
  }
  return { theta, cost, iterations, converged, jtj };
}
