import { describe, expect, it } from 'vitest';
import { probit } from 'simple-statistics';
import { studentTCdf, studentTQuantile } from './student-t.js';

describe('Student-t quantile', () => {
  it('matches the closed forms for ν = 1 (Cauchy) and ν = 2', () => {
    for (const p of [0.6, 0.8, 0.9, 0.975]) {
      expect(studentTQuantile(p, 1)).toBeCloseTo(Math.tan(Math.PI * (p - 0.5)), 9);
      expect(studentTQuantile(p, 2)).toBeCloseTo((2 * p - 1) / Math.sqrt(2 * p * (1 - p)), 9);
    }
  });

  it('tends to the normal quantile for large ν (simple-statistics probit)', () => {
    expect(studentTQuantile(0.9, 1e6)).toBeCloseTo(probit(0.9), 3);
  });

  it('agrees with printed t tables (from memory: t0.90 = 1.533 at ν 4, 1.372 at ν 10, 1.310 at ν 30)', () => {
    expect(studentTQuantile(0.9, 4)).toBeCloseTo(1.533, 3);
    expect(studentTQuantile(0.9, 10)).toBeCloseTo(1.372, 3);
    expect(studentTQuantile(0.9, 30)).toBeCloseTo(1.31, 3);
  });

  it('is the inverse of the cdf, also for fractional ν, and symmetric', () => {
    for (const nu of [1.3, 2.7, 5.5, 17.2]) {
      const q = studentTQuantile(0.9, nu);
      expect(studentTCdf(q, nu)).toBeCloseTo(0.9, 10);
      expect(studentTQuantile(0.1, nu)).toBeCloseTo(-q, 10);
    }
  });
});
