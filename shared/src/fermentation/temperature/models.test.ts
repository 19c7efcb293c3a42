import { describe, expect, it } from 'vitest';
import { derivedChecks, ganzleRelativeRates, parseInputs } from '../../bench/reference-data.js';
import {
  DEFAULT_Q10,
  LACTOBACILLI_CARDINALS,
  YEAST_CARDINALS,
  ctmiRate,
  impliedQ10,
  q10Factor,
  ratkowsky1982Rate,
  ratkowsky1983Rate,
  relativeRate,
} from './models.js';

describe('CTMI (Rosso, Lobry & Flandrois 1993, J Theor Biol 162:447)', () => {
  // Source: test-fixtures/reference/models/derived_check_values.csv, rows ctmi_relative_rate,
  // worked out from the formula in SOURCES.md §1c.
  const rows = derivedChecks('ctmi_relative_rate');
  it('has the spot values of derived_check_values.csv', () => {
    expect(rows.length).toBe(16);
    for (const row of rows) {
      const p = parseInputs(row.inputs);
      const value = ctmiRate(p.T ?? NaN, { tMin: p.Tmin ?? NaN, tOpt: p.Topt ?? NaN, tMax: p.Tmax ?? NaN });
      expect(value, row.inputs).toBeCloseTo(row.value, 12);
    }
  });

  it('is 0 at and below Tmin, 0 at and above Tmax, and μopt at Topt', () => {
    const c = LACTOBACILLI_CARDINALS;
    for (const t of [c.tMin, c.tMin - 0.001, -20, c.tMax, c.tMax + 0.001, 60]) expect(ctmiRate(t, c, 0.7)).toBe(0);
    expect(ctmiRate(c.tOpt, c, 0.7)).toBeCloseTo(0.7, 14);
    // Just inside the range the rate is positive and below the optimum.
    expect(ctmiRate(c.tMin + 0.01, c, 0.7)).toBeGreaterThan(0);
    expect(ctmiRate(c.tMax - 0.01, c, 0.7)).toBeLessThan(0.7);
  });

  it('has its maximum at Topt', () => {
    const c = YEAST_CARDINALS;
    let best = -1;
    let bestT = NaN;
    for (let t = 8; t <= 35; t += 0.01) {
      const r = ctmiRate(t, c);
      if (r > best) [best, bestT] = [r, t];
    }
    expect(bestT).toBeCloseTo(28, 1);
  });
});

describe("Gänzle's relative growth rates of sourdough microbes (SOURCES.md §1a, datasets/ganzle_…csv)", () => {
  const table = ganzleRelativeRates();
  const lab = table.filter((r) => r.organism === 'Lactobacillus sanfranciscensis');
  const yeast = table.filter((r) => r.organism === 'Candida milleri');
  const at = (rows: typeof table, t: number): number =>
    rows.find((r) => r.temperatureC === t)?.relativeGrowthRate ?? NaN;

  it('CTMI with lactobacilli cardinals 4/32.5/41 gives ≈0.49 at 20 °C and ≈0.25 at 15 °C (table: ½ and ¼)', () => {
    // Derived values 0.489 and 0.249 (SOURCES.md §1a consistency check); within 0.015 of the table.
    expect(ctmiRate(20, LACTOBACILLI_CARDINALS)).toBeCloseTo(0.489, 3);
    expect(ctmiRate(15, LACTOBACILLI_CARDINALS)).toBeCloseTo(0.249, 3);
    expect(Math.abs(ctmiRate(20, LACTOBACILLI_CARDINALS) - at(lab, 20))).toBeLessThan(0.015);
    expect(Math.abs(ctmiRate(15, LACTOBACILLI_CARDINALS) - at(lab, 15))).toBeLessThan(0.015);
    // No growth at 4 and 41 °C in the table; CTMI is 0 there by construction.
    expect(ctmiRate(4, LACTOBACILLI_CARDINALS)).toBe(at(lab, 4));
    expect(ctmiRate(41, LACTOBACILLI_CARDINALS)).toBe(at(lab, 41));
  });

  it('known mismatch above the optimum: the table falls faster than CTMI (documented in SOURCES.md §1a)', () => {
    // CTMI 0.80 at 37 °C and 0.51 at 39 °C against ½ and ¼: CTMI overestimates by 0.26–0.30.
    expect(ctmiRate(37, LACTOBACILLI_CARDINALS)).toBeCloseTo(0.802, 3);
    expect(ctmiRate(39, LACTOBACILLI_CARDINALS)).toBeCloseTo(0.513, 3);
    expect(ctmiRate(37, LACTOBACILLI_CARDINALS) - at(lab, 37)).toBeGreaterThan(0.25);
    expect(ctmiRate(39, LACTOBACILLI_CARDINALS) - at(lab, 39)).toBeGreaterThan(0.25);
  });

  it('CTMI with yeast cardinals 8/28/35: 0.57 at 20, 0.17 at 14, 0.74 at 32, 0.33 at 34 °C', () => {
    // Derived values, SOURCES.md §1a; the table says ½, ¼, ½, ¼.
    expect(ctmiRate(20, YEAST_CARDINALS)).toBeCloseTo(0.574, 3);
    expect(ctmiRate(14, YEAST_CARDINALS)).toBeCloseTo(0.169, 3);
    expect(ctmiRate(32, YEAST_CARDINALS)).toBeCloseTo(0.745, 3);
    expect(ctmiRate(34, YEAST_CARDINALS)).toBeCloseTo(0.325, 3);
    for (const t of [20, 14]) expect(Math.abs(ctmiRate(t, YEAST_CARDINALS) - at(yeast, t))).toBeLessThan(0.1);
    // Same direction of mismatch above the optimum as for the lactobacilli.
    expect(ctmiRate(32, YEAST_CARDINALS)).toBeGreaterThan(at(yeast, 32) + 0.2);
  });

  it('the Q10 implied by the table is not constant (SOURCES.md §1e derived: 4, 1.74, 3.17, 2.38)', () => {
    const q = (rows: typeof table, t1: number, t2: number): number => impliedQ10(t1, at(rows, t1), t2, at(rows, t2));
    expect(q(lab, 15, 20)).toBeCloseTo(4, 10);
    expect(q(lab, 20, 32.5)).toBeCloseTo(1.741, 3);
    expect(q(yeast, 14, 20)).toBeCloseTo(3.175, 3);
    expect(q(yeast, 20, 28)).toBeCloseTo(2.378, 3);
    // More than a factor of two between the coolest and the warmest interval of one organism.
    expect(q(lab, 15, 20) / q(lab, 20, 32.5)).toBeGreaterThan(2);
  });
});

describe('Ratkowsky square-root models', () => {
  it('1983 model has the spot values of derived_check_values.csv (b 0.03, Tmin 4, c 0.3, Tmax 41)', () => {
    const rows = derivedChecks('ratkowsky1983_rate');
    expect(rows.length).toBe(4);
    for (const row of rows) {
      const p = parseInputs(row.inputs);
      const r = ratkowsky1983Rate(p.T ?? NaN, p.Tmin ?? NaN, p.Tmax ?? NaN, p.c ?? NaN, p.b ?? NaN);
      expect(r, row.inputs).toBeCloseTo(row.value, 12);
    }
    expect(ratkowsky1983Rate(4, 4, 41, 0.3, 0.03)).toBe(0);
    expect(ratkowsky1983Rate(41, 4, 41, 0.3, 0.03)).toBe(0);
  });

  it('1982 model: √r is linear in T above Tmin and 0 below (Ratkowsky et al. 1982, J Bacteriol 149:1)', () => {
    expect(ratkowsky1982Rate(3, 4, 0.03)).toBe(0);
    expect(Math.sqrt(ratkowsky1982Rate(14, 4, 0.03))).toBeCloseTo(0.3, 12);
    expect(Math.sqrt(ratkowsky1982Rate(24, 4, 0.03))).toBeCloseTo(0.6, 12);
  });
});

describe('Q10 (standard definition, SOURCES.md §1e)', () => {
  it('time scaling matches derived_check_values.csv (t_ref 8 h at 24 °C, Q10 = 2)', () => {
    const rows = derivedChecks('q10_time_scaling');
    expect(rows.map((r) => r.value)).toEqual([32, 5.656854249492381]);
    expect(8 * q10Factor(24, 4, 2)).toBeCloseTo(32, 12);
    expect(8 * q10Factor(24, 29, 2)).toBeCloseTo(5.656854249492381, 12);
  });

  it('the default Q10 is 1.1^10 from "1 °C ≈ 10 %" (BAKE magazine, derived 2.59)', () => {
    const [row] = derivedChecks('q10_from_per_degree');
    expect(DEFAULT_Q10).toBeCloseTo(row?.value ?? NaN, 12);
    // Rate doubling per 7 °F = 35/9 °C (rec.food.sourdough FAQ item 37) implies Q10 ≈ 5.944.
    const [doubling] = derivedChecks('q10_from_doubling_interval');
    expect(impliedQ10(0, 1, 35 / 9, 2)).toBeCloseTo(doubling?.value ?? NaN, 4);
  });

  it('relative rates are 1 at the reference and undefined for a model with no growth there', () => {
    expect(relativeRate({ kind: 'q10', q10: 2 }, 24)).toBe(1);
    expect(relativeRate({ kind: 'q10', q10: 2 }, 14)).toBeCloseTo(0.5, 14);
    expect(relativeRate({ kind: 'ctmi', ...LACTOBACILLI_CARDINALS }, 24)).toBe(1);
    expect(relativeRate({ kind: 'ratkowsky1983', tMin: 4, tMax: 41, c: 0.3 }, 24)).toBe(1);
    expect(() => relativeRate({ kind: 'ctmi', tMin: 25, tOpt: 30, tMax: 35 }, 20)).toThrow(RangeError);
  });
});
