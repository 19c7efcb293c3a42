// Shapes of a growth-curve fit: what fitCurve takes and what it gives back. A fit either succeeds
// with every number a caller needs, or says plainly why it could not, so a caller never shows a
// baker parameters from a fit that did not work.
import { type GrowthModelName } from './growth-models.js';
import { type DataPoint } from './least-squares.js';

export type CurveModelChoice = GrowthModelName | 'auto';

export interface FitCurveInput {
  /** 'auto' fits all three and keeps the lowest AICc (see fit-curve.ts). */
  model: CurveModelChoice;
  /** Observations (t, y); y must start near 0 (Zwietering's y = ln(N/N0), or a relative rise). */
  points: readonly DataPoint[];
}

export interface CurveStandardErrors {
  A: number;
  muMax: number;
  lag: number;
  nu?: number;
}

export interface CurveFitOk {
  status: 'ok';
  model: GrowthModelName;
  /** Asymptote, in y units. */
  A: number;
  /** Maximum rate, in y units per t unit. */
  muMax: number;
  /** Lag, in t units. */
  lag: number;
  /** Richards shape (only for model 'richards'). */
  nu?: number;
  /** Asymptotic standard errors sqrt(diag((JᵀJ)⁻¹)·RSS/(n − p)). */
  se: CurveStandardErrors;
  /** Covariance of the parameters, in the order of `parameterNames`. */
  covariance: number[][];
  parameterNames: readonly string[];
  /** Residual sum of squares. */
  rss: number;
  /** Quality: coefficient of determination 1 − RSS/TSS (TSS about the mean of y). */
  r2: number;
  /** sqrt(RSS/(n − p)), in y units. */
  residualStdDev: number;
  /**
   * Small-sample Akaike criterion n·ln(RSS/n) + 2K + 2K(K+1)/(n − K − 1) with K = p + 1 (the
   * parameters plus the error variance); null when n ≤ K + 1 leaves it undefined.
   */
  aicc: number | null;
  /** Number of points fitted. */
  n: number;
  converged: true;
  iterations: number;
  /** Time at which the fitted curve reaches p·A (0 < p < 1); NaN outside that range. */
  tAtFraction(p: number): number;
  /** The fitted curve at t. */
  valueAt(t: number): number;
  /** Where the fitted curve is steepest (slope muMax). */
  inflection: { t: number; y: number };
  /** For model 'auto': every model tried and how it scored. */
  compared?: { model: GrowthModelName; status: CurveFitStatus; aicc: number | null; rss: number | null }[];
}

export type CurveFitFailureStatus = 'insufficient-data' | 'did-not-converge' | 'invalid-input';
export type CurveFitStatus = 'ok' | CurveFitFailureStatus;

export interface CurveFitFailure {
  status: CurveFitFailureStatus;
  /** A sentence for the log and the screen. */
  reason: string;
  /** For 'invalid-input': the offending field, e.g. "points.3.y" (the project's dotted style). */
  field?: string;
  model?: CurveModelChoice;
}

export type CurveFit = CurveFitOk | CurveFitFailure;
