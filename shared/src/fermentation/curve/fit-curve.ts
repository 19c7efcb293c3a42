// fitCurve: a Zwietering growth curve (Gompertz, logistic or Richards) fitted to (t, y) points by
// least squares, with standard errors and a quality measure, or a plain failure instead of
// numbers that would mislead. Never throws for user data.
import {
  type CurveFit,
  type CurveFitFailure,
  type CurveFitOk,
  type CurveModelChoice,
  type FitCurveInput,
} from './curve-fit-types.js';
import { type GrowthModelName, growthModels } from './growth-models.js';
import { type DataPoint, fitLeastSquares } from './least-squares.js';
import { growthStartingValues, steepestRise } from './starting-values.js';

/** An asymptote this many times the highest point is extrapolation, not a fit. */
const ASYMPTOTE_LIMIT = 20;
/** A lag further than this many data spans outside the data is not a lag. */
const LAG_SPAN_LIMIT = 10;
/** Richards shape bounds; ν pinned at one means the data want another model. */
const NU_MIN = 1e-3;
const NU_MAX = 1e3;
/** Per start; a sigmoid that needs more than this is not converging. */
const MAX_ITERATIONS = 2000;
const RICHARDS_SHAPES = [1, 0.3, 3];
/**
 * ml-levenberg-marquardt runs all of its iterations (it has no relative stopping rule), so it is
 * given a short leash here: it only has to stride towards the minimum; the refinement finishes.
 */
const PACKAGE_ITERATIONS = 25;

function fail(
  status: CurveFitFailure['status'],
  reason: string,
  extra: Partial<CurveFitFailure> = {},
): CurveFitFailure {
  return { status, reason, ...extra };
}

function parameterCount(model: GrowthModelName): number {
  return growthModels[model].parameterNames.length;
}

/** Validation of data that may come straight from JSON: every t and y a finite number. */
function checkPoints(points: unknown): CurveFitFailure | null {
  if (!Array.isArray(points)) return fail('invalid-input', 'points must be an array of {t, y}', { field: 'points' });
  for (let i = 0; i < points.length; i++) {
    const p: unknown = points[i];
    if (typeof p !== 'object' || p === null) {
      return fail('invalid-input', `point ${i} is not an object {t, y}`, { field: `points.${i}` });
    }
    for (const key of ['t', 'y'] as const) {
      const v: unknown = (p as Record<string, unknown>)[key];
      if (typeof v !== 'number' || !Number.isFinite(v)) {
        return fail('invalid-input', `point ${i} has a ${key} that is not a finite number`, {
          field: `points.${i}.${key}`,
        });
      }
    }
  }
  return null;
}

function aicc(n: number, rss: number, p: number): number | null {
  const K = p + 1;
  if (n - K - 1 <= 0 || !(rss > 0)) return null;
  return n * Math.log(rss / n) + 2 * K + (2 * K * (K + 1)) / (n - K - 1);
}

/** One model, several starts, the best converged result; or why none is usable. */
function fitOneModel(model: GrowthModelName, points: readonly DataPoint[]): CurveFitOk | CurveFitFailure {
  const spec = growthModels[model];
  const k = parameterCount(model);
  if (points.length < k + 1) {
    return fail('insufficient-data', `${model} has ${k} parameters and needs at least ${k + 1} points`, { model });
  }
  const ys = points.map((p) => p.y);
  const ts = points.map((p) => p.t);
  const yMax = Math.max(...ys);
  const yMin = Math.min(...ys);
  if (!(yMax > 0) || !(yMax - yMin > 1e-12 * Math.max(Math.abs(yMax), Math.abs(yMin))) || !(steepestRise(points) > 0)) {
    return fail('insufficient-data', 'the points show no rise to fit a growth curve to', { model });
  }
  const tMin = Math.min(...ts);
  const tMax = Math.max(...ts);
  const span = Math.max(tMax - tMin, Number.MIN_VALUE);

  const starts = growthStartingValues(points).flatMap((s) =>
    model === 'richards' ? RICHARDS_SHAPES.map((nu) => [s.A, s.muMax, s.lag, nu]) : [[s.A, s.muMax, s.lag]],
  );
  // A and μm must stay positive for the curve to be a rise; ν stays in (0, ∞) for Richards.
  const minValues = [yMax * 1e-9, Number.MIN_VALUE, -Infinity, NU_MIN].slice(0, k);
  // A capped a little above the plausibility limit, so data without a plateau stop quickly at
  // the cap instead of chasing A → ∞ for thousands of iterations.
  const aCap = 1.5 * ASYMPTOTE_LIMIT * yMax;
  const maxValues = [aCap, Infinity, Infinity, NU_MAX].slice(0, k);
  let best: ReturnType<typeof fitLeastSquares> | null = null;
  let lastReason = 'no usable starting values';
  let ranToCap = false;
  for (const start of starts) {
    const result = fitLeastSquares(spec.value, points, start, {
      minValues,
      maxValues,
      maxIterations: MAX_ITERATIONS,
      packageIterations: PACKAGE_ITERATIONS,
    });
    if (!result.converged) {
      lastReason = result.stopReason;
      ranToCap ||= (result.params[0] ?? 0) > ASYMPTOTE_LIMIT * yMax;
      continue;
    }
    // Two starts landing on the same minimum is answer enough; the rest would only repeat it.
    const agrees = best !== null && Math.abs(result.rss - best.rss) <= 1e-8 * Math.max(best.rss, Number.MIN_VALUE);
    if (!best || result.rss < best.rss) best = result;
    if (agrees) break;
  }
  if (!best && ranToCap) {
    return fail('did-not-converge', 'the fitted asymptote runs away upwards: the plateau is not in the data yet', {
      model,
    });
  }
  if (!best) return fail('did-not-converge', `no start converged (${lastReason})`, { model });

  const [A = NaN, muMax = NaN, lag = NaN, nu] = best.params;
  if (![A, muMax, lag].every(Number.isFinite) || (model === 'richards' && !Number.isFinite(nu))) {
    return fail('did-not-converge', 'the fit ended at non-finite parameters', { model });
  }
  if (A > ASYMPTOTE_LIMIT * yMax) {
    return fail(
      'did-not-converge',
      `the fitted asymptote (${A.toPrecision(3)}) is over ${ASYMPTOTE_LIMIT}× the highest point: ` +
        'the plateau is not in the data yet',
      { model },
    );
  }
  if (lag < tMin - LAG_SPAN_LIMIT * span || lag > tMax + LAG_SPAN_LIMIT * span) {
    return fail('did-not-converge', `the fitted lag (${lag.toPrecision(3)}) lies far outside the data`, { model });
  }
  if (model === 'richards' && nu !== undefined && (nu <= NU_MIN * 1.01 || nu >= NU_MAX / 1.01)) {
    return fail('did-not-converge', `the Richards shape ν ran to its bound (${nu}); fit gompertz or logistic`, {
      model,
    });
  }
  if (!best.standardErrors || !best.covariance) {
    return fail('did-not-converge', 'the points do not pin down every parameter (singular Jacobian)', { model });
  }
  const params = best.params.slice();
  const meanY = ys.reduce((a, v) => a + v, 0) / ys.length;
  const tss = ys.reduce((a, v) => a + (v - meanY) ** 2, 0);
  const [seA = NaN, seMu = NaN, seLag = NaN, seNu] = best.standardErrors;
  const result: CurveFitOk = {
    status: 'ok',
    model,
    A,
    muMax,
    lag,
    se: { A: seA, muMax: seMu, lag: seLag, ...(model === 'richards' && seNu !== undefined ? { nu: seNu } : {}) },
    covariance: best.covariance,
    parameterNames: spec.parameterNames,
    rss: best.rss,
    r2: tss > 0 ? 1 - best.rss / tss : NaN,
    residualStdDev: best.residualStdDev,
    aicc: aicc(points.length, best.rss, k),
    n: points.length,
    converged: true,
    iterations: best.iterations,
    tAtFraction: (p: number) => (p > 0 && p < 1 ? spec.tAtFraction(params, p) : NaN),
    valueAt: (t: number) => spec.value(params, t),
    inflection: spec.inflection(params),
  };
  if (model === 'richards' && nu !== undefined) result.nu = nu;
  return result;
}

/**
 * 'auto' fits Gompertz, logistic and Richards and keeps the lowest AICc (Akaike's criterion with
 * the small-sample correction, Hurvich & Tsai 1989 [from memory]), which charges Richards for its
 * fourth parameter. Models whose AICc is undefined for this many points are left out; with
 * fewer than 6 points only Gompertz and logistic remain and, having the same number of
 * parameters, are compared by RSS (the same ordering AIC would give).
 */
function fitAuto(points: readonly DataPoint[]): CurveFit {
  const names: GrowthModelName[] = ['gompertz', 'logistic', 'richards'];
  const fits = names.map((model) => ({ model, fit: fitOneModel(model, points) }));
  const compared = fits.map(({ model, fit }) => ({
    model,
    status: fit.status,
    aicc: fit.status === 'ok' ? fit.aicc : null,
    rss: fit.status === 'ok' ? fit.rss : null,
  }));
  const ok = fits.flatMap(({ fit }) => (fit.status === 'ok' ? [fit] : []));
  const scored = ok.filter((f) => f.aicc !== null);
  const pool = scored.length > 0 ? scored : ok.filter((f) => f.model !== 'richards');
  const key = (f: CurveFitOk): number => (scored.length > 0 ? (f.aicc ?? Infinity) : f.rss);
  const winner = pool.slice().sort((a, b) => key(a) - key(b))[0];
  if (winner) return { ...winner, compared };
  const first = fits.find(({ fit }) => fit.status === 'insufficient-data')?.fit ?? fits[0]?.fit;
  return first && first.status !== 'ok'
    ? { ...first, model: 'auto' }
    : fail('did-not-converge', 'no model could be fitted', { model: 'auto' });
}

export function fitCurve(input: FitCurveInput): CurveFit {
  try {
    const model: unknown = (input as { model?: unknown } | null)?.model;
    const choices: readonly CurveModelChoice[] = ['gompertz', 'logistic', 'richards', 'auto'];
    if (!choices.includes(model as CurveModelChoice)) {
      return fail('invalid-input', `model must be one of ${choices.join(', ')}`, { field: 'model' });
    }
    const problem = checkPoints(input.points);
    if (problem) return problem;
    const points = input.points.map(({ t, y }) => ({ t, y })).sort((a, b) => a.t - b.t);
    return model === 'auto' ? fitAuto(points) : fitOneModel(model as GrowthModelName, points);
  } catch (error) {
    // Defensive only: the numerics are meant not to throw, but a baker's log must never crash.
    return fail('did-not-converge', `the fit failed: ${error instanceof Error ? error.message : String(error)}`);
  }
}
