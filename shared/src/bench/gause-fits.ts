// Gompertz fits of Gause's (1932) yeast curves, one per temperature and experiment, for the
// temperature-model checks and the benchmark: the project's curve fitter (curve/fitCurve,
// modified Gompertz of Zwietering et al. 1990), cross-checked against a minimal direct
// ml-levenberg-marquardt fit (fitGompertzLocal) in temperature/fit.test.ts.
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { fitCurve } from '../fermentation/curve/fit-curve.js';
import { gompertz, gompertzTAtFraction } from '../fermentation/curve/growth-models.js';
import { gauseCurves } from './reference-data.js';

export interface GauseFit {
  temperatureC: number;
  experiment: number;
  /** Plateau of "amount of yeast" (Gause's index). */
  A: number;
  /** Maximum production rate, amount per hour (tangent at the inflection). */
  muMax: number;
  lag: number;
  /** Time to 95 % of the plateau, hours (Gompertz closed form). */
  t95: number;
  rss: number;
}

export function fitGompertzLocal(
  t: readonly number[],
  y: readonly number[],
): { A: number; muMax: number; lag: number; rss: number } {
  const A0 = Math.max(...y);
  const span = Math.max(...t);
  let best: { A: number; muMax: number; lag: number; rss: number } | undefined;
  // Several starting slopes: the curves span 40 h (39 °C) to 850 h (5.7 °C).
  for (const k of [2, 4, 8]) {
    const result = levenbergMarquardt(
      { x: t, y },
      ([A = 1, mu = 1, lag = 0]) =>
        (x) =>
          gompertz(x, A, mu, lag),
      {
        initialValues: [A0, (A0 * k) / span, span / 20],
        minValues: [1e-6, 1e-9, -span],
        maxValues: [10 * A0, 100 * A0, span],
        gradientDifference: 1e-6,
        centralDifference: true,
        maxIterations: 1000,
        errorTolerance: 1e-12,
      },
    );
    const [A = NaN, muMax = NaN, lag = NaN] = result.parameterValues;
    const rss = t.reduce((s, x, i) => s + (gompertz(x, A, muMax, lag) - (y[i] ?? 0)) ** 2, 0);
    if (!best || rss < best.rss) best = { A, muMax, lag, rss };
  }
  if (!best) throw new Error('Gompertz fit failed');
  return best;
}

export function gauseFits(): GauseFit[] {
  return gauseCurves().map((curve) => {
    const fit = fitCurve({ model: 'gompertz', points: curve.points.map((p) => ({ t: p.timeH, y: p.amount })) });
    if (fit.status !== 'ok') throw new Error(`Gause ${curve.temperatureC} °C: ${fit.reason}`);
    return {
      temperatureC: curve.temperatureC,
      experiment: curve.experiment,
      A: fit.A,
      muMax: fit.muMax,
      lag: fit.lag,
      rss: fit.rss,
      t95: gompertzTAtFraction(0.95, fit.A, fit.muMax, fit.lag),
    };
  });
}
