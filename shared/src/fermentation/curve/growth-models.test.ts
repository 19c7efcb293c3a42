import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

import {
  type GrowthModelName,
  gompertz,
  gompertzTAtFraction,
  growthModels,
  inflectionFraction,
  logistic,
  richards,
} from './growth-models.js';

// Check values derived in test-fixtures/reference/models/derived_check_values.csv (provenance in
// test-fixtures/reference/SOURCES.md §2: derived from the Zwietering formulas and NIST's certified
// Rat42/Rat43 parameters).
const csvUrl = new URL('../../../../test-fixtures/reference/models/derived_check_values.csv', import.meta.url);

function derivedValue(check: string, inputs: string, output: string): number {
  const lines = readFileSync(csvUrl, 'utf8').trim().split(/\r?\n/).slice(1);
  for (const line of lines) {
    // Fields may be quoted and contain commas: check,inputs,output,value,derivation.
    const fields = [...line.matchAll(/("([^"]*)"|[^,]*)(,|$)/g)].map((m) => m[2] ?? m[1] ?? '');
    if (fields[0] === check && fields[1] === inputs && fields[2] === output) return Number(fields[3]);
  }
  throw new Error(`no row ${check} / ${inputs} / ${output}`);
}

/** Root of f on [lo, hi] by bisection: slow, but independent of every closed form under test. */
function bisect(f: (t: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  for (let i = 0; i < 200; i++) {
    const m = (a + b) / 2;
    if (Math.sign(f(m)) === Math.sign(f(a))) a = m;
    else b = m;
  }
  return (a + b) / 2;
}

function slope(f: (t: number) => number, t: number, h = 1e-4): number {
  return (f(t + h) - f(t - h)) / (2 * h);
}

const cases: { model: GrowthModelName; params: number[] }[] = [
  { model: 'gompertz', params: [10, 2, 3] },
  { model: 'logistic', params: [10, 2, 3] },
  { model: 'richards', params: [10, 2, 3, 0.5] },
  { model: 'richards', params: [10, 2, 3, 2.5] },
  { model: 'gompertz', params: [1.6, 0.45, 2.2] },
  { model: 'logistic', params: [1.6, 0.45, 2.2] },
];

describe('time to a fraction of A (closed forms vs a numeric root of y(t) = pA)', () => {
  // Zwietering et al. 1990 (Appl Environ Microbiol 56:1875) define the curves; the closed forms are
  // derived in growth-models.ts. Bisection does not use them, so a wrong closed form fails here.
  it.each(cases)('$model $params', ({ model, params }) => {
    const spec = growthModels[model];
    const A = params[0] ?? NaN;
    for (const p of [0.05, 0.5, 0.85, 0.95, 0.99]) {
      const root = bisect((t) => spec.value(params, t) - p * A, -100, 200);
      expect(spec.tAtFraction(params, p)).toBeCloseTo(root, 8);
    }
  });

  it('matches the Gompertz spot values in derived_check_values.csv', () => {
    // derived_check_values.csv, rows gompertz_time_to_fraction (A=10, μm=2, λ=3).
    for (const p of [0.5, 0.9, 0.95, 0.99]) {
      const expected = derivedValue('gompertz_time_to_fraction', `A=10 mu_m=2 lambda=3 p=${p}`, 't');
      expect(gompertzTAtFraction(p, 10, 2, 3)).toBeCloseTo(expected, 10);
    }
  });
});

describe('inflection point and the meaning of μm and λ (Zwietering et al. 1990)', () => {
  it.each(cases)('$model $params: slope μm at the inflection, tangent crossing 0 at λ', ({ model, params }) => {
    const spec = growthModels[model];
    const [A = NaN, mu = NaN, lag = NaN, nu = 1] = params;
    const f = (t: number) => spec.value(params, t);
    const { t: ti, y: yi } = spec.inflection(params);
    expect(f(ti)).toBeCloseTo(yi, 10);
    expect(yi / A).toBeCloseTo(inflectionFraction(model, nu), 12);
    // The inflection is where the slope peaks: second derivative ≈ 0 and the slope there is μm.
    expect(slope((t) => slope(f, t), ti)).toBeCloseTo(0, 4);
    expect(slope(f, ti)).toBeCloseTo(mu, 6);
    // No point on a fine grid is steeper than the inflection.
    for (let t = lag - 5; t < lag + 30; t += 0.01) expect(slope(f, t)).toBeLessThanOrEqual(mu + 1e-6);
    // Zwietering's λ: the tangent at the inflection crosses y = 0 at t = λ.
    expect(ti - yi / slope(f, ti)).toBeCloseTo(lag, 5);
  });

  it('puts y at A/e for Gompertz and A/2 for the logistic', () => {
    expect(growthModels.gompertz.inflection([10, 2, 3]).y).toBeCloseTo(10 / Math.E, 12);
    expect(growthModels.logistic.inflection([10, 2, 3]).y).toBeCloseTo(5, 12);
    // derived_check_values.csv, row gompertz_inflection: t_i = λ + A/(μm e).
    expect(growthModels.gompertz.inflection([10, 2, 3]).t).toBeCloseTo(
      derivedValue('gompertz_inflection', 'A=10 mu_m=2 lambda=3', 't_i'),
      10,
    );
  });
});

describe('the Zwietering forms reproduce NIST Rat42 and Rat43 (SOURCES.md §2 mapping)', () => {
  // NIST StRD Rat42: y = b1/(1 + exp(b2 − b3 x)); Rat43: y = b1/(1 + exp(b2 − b3 x))^(1/b4),
  // certified b from nist-strd/Rat42.dat and Rat43.dat; (A, μm, λ, ν) from derived_check_values.csv.
  const xs = [1, 5, 9, 14, 21, 28, 42, 57, 63, 70, 79];

  it('logistic(A, μm, λ) equals the Rat42 curve', () => {
    const [b1, b2, b3] = [72.462237576, 2.6180768402, 0.067359200066];
    const A = derivedValue('rat42_as_zwietering_logistic', 'NIST Rat42 certified b1,b2,b3', 'A');
    const mu = derivedValue('rat42_as_zwietering_logistic', 'NIST Rat42 certified b1,b2,b3', 'mu_m');
    const lag = derivedValue('rat42_as_zwietering_logistic', 'NIST Rat42 certified b1,b2,b3', 'lambda');
    for (const x of xs) expect(logistic(x, A, mu, lag)).toBeCloseTo(b1 / (1 + Math.exp(b2 - b3 * x)), 8);
    const ti = derivedValue('rat42_as_zwietering_logistic', 'NIST Rat42 certified b1,b2,b3', 't_inflection');
    expect(growthModels.logistic.inflection([A, mu, lag]).t).toBeCloseTo(ti, 8);
  });

  it('richards(A, μm, λ, ν) equals the Rat43 curve', () => {
    const [b1, b2, b3, b4] = [699.6415127, 5.2771253025, 0.75962938329, 1.2792483859];
    const row = 'rat43_as_zwietering_richards';
    const inputs = 'NIST Rat43 certified b1..b4';
    const A = derivedValue(row, inputs, 'A');
    const mu = derivedValue(row, inputs, 'mu_m');
    const lag = derivedValue(row, inputs, 'lambda');
    const nu = derivedValue(row, inputs, 'v');
    for (const x of [1, 3, 5, 7, 9, 11, 13, 15]) {
      expect(richards(x, A, mu, lag, nu)).toBeCloseTo(b1 / (1 + Math.exp(b2 - b3 * x)) ** (1 / b4), 6);
    }
  });
});

describe('Richards contains the other two', () => {
  it('is the logistic at ν = 1 and tends to Gompertz as ν → 0', () => {
    for (const t of [0, 2, 4, 6, 8, 12]) {
      expect(richards(t, 10, 2, 3, 1)).toBeCloseTo(logistic(t, 10, 2, 3), 12);
      expect(richards(t, 10, 2, 3, 1e-7)).toBeCloseTo(gompertz(t, 10, 2, 3), 5);
    }
  });

  it('rejects a non-positive shape rather than returning a curve that is not a rise', () => {
    expect(richards(4, 10, 2, 3, 0)).toBeNaN();
    expect(richards(4, 10, 2, 3, -0.5)).toBeNaN();
  });

  it('stays finite far from the inflection (no overflow in the exponentials)', () => {
    for (const t of [-1e6, 1e6]) {
      for (const y of [gompertz(t, 10, 2, 3), logistic(t, 10, 2, 3), richards(t, 10, 2, 3, 0.5)]) {
        expect(Number.isFinite(y)).toBe(true);
      }
    }
  });
});
