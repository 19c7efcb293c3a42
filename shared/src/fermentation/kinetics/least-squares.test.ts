import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { describe, expect, it } from 'vitest';
import { readReferenceText } from '../../bench/reference-data.js';
import { levenbergMarquardtSmall, invertSmall, solveSmall } from './least-squares.js';

// NIST StRD nonlinear regression, Rat42 (test-fixtures/reference/nist-strd/Rat42.dat):
// y = b1/(1 + exp(b2 − b3·x)), certified b1 = 72.462237576, b2 = 2.6180768402, b3 = 0.067359200066,
// RSS 8.0565229338 (SOURCES.md §3).
const rat42 = readReferenceText('nist-strd/Rat42.dat')
  .split('\n')
  .slice(60, 69)
  .map((line) => line.trim().split(/\s+/).map(Number));
const xs = rat42.map((r) => r[1] ?? NaN);
const ys = rat42.map((r) => r[0] ?? NaN);
const model = (b: ArrayLike<number>, x: number): number => (b[0] ?? 0) / (1 + Math.exp((b[1] ?? 0) - (b[2] ?? 0) * x));

describe('levenbergMarquardtSmall', () => {
  it('reaches the NIST certified Rat42 values from Start 1 and Start 2 (6 significant digits, central differences)', () => {
    for (const start of [
      [100, 1, 0.1],
      [75, 2.5, 0.07],
    ]) {
      const fit = levenbergMarquardtSmall(
        {
          n: xs.length,
          residuals: (b, out) => xs.forEach((x, i) => (out[i] = model(b, x) - (ys[i] ?? 0))),
          centralDifferences: true,
        },
        start,
        { tolerance: 1e-15, absoluteTolerance: 0, maxIterations: 500 },
      );
      expect(fit.theta[0]).toBeCloseTo(72.462237576, 4);
      expect((fit.theta[1] ?? 0) / 2.6180768402).toBeCloseTo(1, 6);
      expect((fit.theta[2] ?? 0) / 0.067359200066).toBeCloseTo(1, 6);
      expect(fit.cost / 8.0565229338).toBeCloseTo(1, 8);
    }
  });

  it('finds the same optimum as ml-levenberg-marquardt on the same problem', () => {
    const pkg = levenbergMarquardt({ x: xs, y: ys }, (b) => (x) => model(b, x), {
      initialValues: [75, 2.5, 0.07],
      gradientDifference: 1e-6,
      centralDifference: true,
      maxIterations: 1000,
      errorTolerance: 1e-12,
    });
    const own = levenbergMarquardtSmall(
      { n: xs.length, residuals: (b, out) => xs.forEach((x, i) => (out[i] = model(b, x) - (ys[i] ?? 0))) },
      [75, 2.5, 0.07],
      { tolerance: 1e-15, absoluteTolerance: 0, maxIterations: 500 },
    );
    const rss = (b: ArrayLike<number>): number => xs.reduce((s, x, i) => s + (model(b, x) - (ys[i] ?? 0)) ** 2, 0);
    // Same minimum: parameters to 5 significant digits, own RSS no worse than the package's.
    for (let k = 0; k < 3; k++) expect((own.theta[k] ?? 0) / (pkg.parameterValues[k] ?? 1)).toBeCloseTo(1, 5);
    expect(rss(own.theta)).toBeLessThanOrEqual(rss(pkg.parameterValues) * (1 + 1e-9));
  });

  it('standard errors from (JᵀJ)⁻¹·RSS/(n − p) match the certified Rat42 ones', () => {
    const fit = levenbergMarquardtSmall(
      { n: xs.length, residuals: (b, out) => xs.forEach((x, i) => (out[i] = model(b, x) - (ys[i] ?? 0))) },
      [75, 2.5, 0.07],
      { tolerance: 1e-15, absoluteTolerance: 0, maxIterations: 500 },
    );
    const cov = invertSmall(fit.jtj, 3);
    if (!cov) throw new Error('singular');
    const s2 = fit.cost / (xs.length - 3);
    // Certified SDs 1.7340283401, 0.088295217536, 0.0034465663377; forward-difference Jacobian,
    // so 4 significant digits.
    expect(Math.sqrt((cov[0] ?? 0) * s2) / 1.7340283401).toBeCloseTo(1, 4);
    expect(Math.sqrt((cov[4] ?? 0) * s2) / 0.088295217536).toBeCloseTo(1, 4);
    expect(Math.sqrt((cov[8] ?? 0) * s2) / 0.0034465663377).toBeCloseTo(1, 4);
  });

  it('keeps parameters inside their bounds', () => {
    const fit = levenbergMarquardtSmall(
      {
        n: xs.length,
        residuals: (b, out) => xs.forEach((x, i) => (out[i] = model(b, x) - (ys[i] ?? 0))),
        upper: [70, 10, 1],
      },
      [60, 2.5, 0.07],
    );
    expect(fit.theta[0]).toBeLessThanOrEqual(70);
  });

  it('solves and inverts small systems', () => {
    const a = Float64Array.from([4, 1, 0, 1, 3, 1, 0, 1, 2]);
    const x = solveSmall(a, Float64Array.from([1, 2, 3]), 3);
    if (!x) throw new Error('singular');
    for (let i = 0; i < 3; i++) {
      const ax = (a[3 * i] ?? 0) * (x[0] ?? 0) + (a[3 * i + 1] ?? 0) * (x[1] ?? 0) + (a[3 * i + 2] ?? 0) * (x[2] ?? 0);
      expect(ax).toBeCloseTo(i + 1, 12);
    }
    const inv = invertSmall(a, 3);
    expect((inv?.[0] ?? 0) * 4 + (inv?.[1] ?? 0) * 1).toBeCloseTo(1, 12);
    expect(solveSmall(Float64Array.from([1, 2, 2, 4]), Float64Array.from([1, 1]), 2)).toBeNull();
  });
});
