// Derivatives and parameter uncertainty for least squares. The Jacobian is by central
// differences unless the caller supplies an analytic gradient: central differences are
// accurate to O(h²), about 1e-11 relative with h ≈ 6e-6·|p|, which is what reaching the NIST
// StRD certified values to 6+ digits needs (forward differences stall near 1e-5).
import { Matrix, SingularValueDecomposition } from 'ml-matrix';

/** y = f(params, t) for one observation. */
export type ModelFunction = (params: readonly number[], t: number) => number;
/** ∂f/∂params at one observation, in parameter order. */
export type ModelGradient = (params: readonly number[], t: number) => number[];

/** Relative step for central differences: cube root of machine epsilon. */
const CENTRAL_STEP = Math.cbrt(Number.EPSILON);

/**
 * n × k Jacobian of the model at `params`. `typical` gives each parameter's natural size so a
 * parameter that passes near zero still gets a usable step.
 */
export function modelJacobian(
  fn: ModelFunction,
  ts: readonly number[],
  params: readonly number[],
  typical: readonly number[],
  gradient?: ModelGradient,
): Matrix {
  const n = ts.length;
  const k = params.length;
  const J = new Matrix(n, k);
  if (gradient) {
    for (let i = 0; i < n; i++) {
      const row = gradient(params, ts[i] ?? NaN);
      for (let j = 0; j < k; j++) J.set(i, j, row[j] ?? NaN);
    }
    return J;
  }
  for (let j = 0; j < k; j++) {
    const pj = params[j] ?? NaN;
    const h = CENTRAL_STEP * Math.max(Math.abs(pj), Math.abs(typical[j] ?? 0), 1e-12);
    const up = params.slice();
    const down = params.slice();
    up[j] = pj + h;
    down[j] = pj - h;
    // The actual difference of the two representable values, not 2h, keeps the quotient exact.
    const width = (up[j] ?? 0) - (down[j] ?? 0);
    for (let i = 0; i < n; i++) {
      const t = ts[i] ?? NaN;
      J.set(i, j, (fn(up, t) - fn(down, t)) / width);
    }
  }
  return J;
}

export interface ParameterUncertainty {
  /** (JᵀJ)⁻¹·RSS/(n − k): the asymptotic covariance of the estimates. */
  covariance: number[][];
  /** sqrt of the covariance diagonal. */
  standardErrors: number[];
}

/**
 * Covariance and standard errors se = sqrt(diag((JᵀJ)⁻¹)·RSS/(n − k)), the linearised
 * (asymptotic) errors NIST StRD certifies. The inverse goes through an SVD of the
 * column-scaled Jacobian, so ill-conditioned problems (Thurber, MGH10) keep their digits; a
 * numerically singular Jacobian (a parameter the data cannot pin down) gives null.
 */
export function parameterUncertainty(J: Matrix, rss: number): ParameterUncertainty | null {
  const n = J.rows;
  const k = J.columns;
  if (n <= k || !Number.isFinite(rss)) return null;
  const scale: number[] = [];
  for (let j = 0; j < k; j++) {
    let sum = 0;
    for (let i = 0; i < n; i++) sum += J.get(i, j) ** 2;
    scale.push(Math.sqrt(sum));
  }
  if (scale.some((s) => !(s > 0) || !Number.isFinite(s))) return null;
  const scaled = new Matrix(n, k);
  for (let i = 0; i < n; i++) for (let j = 0; j < k; j++) scaled.set(i, j, J.get(i, j) / (scale[j] ?? 1));
  const svd = new SingularValueDecomposition(scaled, { autoTranspose: true });
  const s = svd.diagonal;
  const V = svd.rightSingularVectors;
  const sMax = Math.max(...s);
  if (!(sMax > 0) || s.some((v) => !(v > sMax * 1e-13))) return null;
  const sigma2 = rss / (n - k);
  const covariance: number[][] = [];
  for (let a = 0; a < k; a++) {
    const row: number[] = [];
    for (let b = 0; b < k; b++) {
      let sum = 0;
      for (let l = 0; l < k; l++) sum += (V.get(a, l) * V.get(b, l)) / (s[l] ?? 1) ** 2;
      row.push((sum * sigma2) / ((scale[a] ?? 1) * (scale[b] ?? 1)));
    }
    covariance.push(row);
  }
  const standardErrors = covariance.map((row, j) => Math.sqrt(row[j] ?? NaN));
  if (standardErrors.some((v) => !Number.isFinite(v))) return null;
  return { covariance, standardErrors };
}
