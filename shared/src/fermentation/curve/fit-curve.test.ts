import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

import { type CurveFit, type CurveFitOk } from './curve-fit-types.js';
import { fitCurve } from './fit-curve.js';
import { gompertz } from './growth-models.js';
import { type DataPoint } from './least-squares.js';

const reference = new URL('../../../../test-fixtures/reference/', import.meta.url);

function csvRows(path: string): string[][] {
  return readFileSync(new URL(path, reference), 'utf8')
    .trim()
    .split(/\r?\n/)
    .slice(1)
    .map((line) => line.split(','));
}

/** Data block of a NIST StRD file (columns y, x), per the line numbers in its header. */
function nistPoints(name: string): DataPoint[] {
  const text = readFileSync(new URL(`nist-strd/${name}.dat`, reference), 'utf8');
  const m = /Data\s+\(lines\s+(\d+)\s+to\s+(\d+)\)/.exec(text);
  if (!m) throw new Error(`${name}.dat: no data line numbers`);
  return text
    .split(/\r?\n/)
    .slice(Number(m[1]) - 1, Number(m[2]))
    .map((line) => {
      const [y, x] = line.trim().split(/\s+/).map(Number);
      return { t: x ?? NaN, y: y ?? NaN };
    });
}

/** A value from models/derived_check_values.csv (check, "inputs", output, value, derivation). */
function derived(check: string, output: string): number {
  const lines = readFileSync(new URL('models/derived_check_values.csv', reference), 'utf8').trim().split(/\r?\n/);
  for (const line of lines) {
    const fields = [...line.matchAll(/("([^"]*)"|[^,]*)(,|$)/g)].map((m) => m[2] ?? m[1] ?? '');
    if (fields[0] === check && fields[2] === output) return Number(fields[3]);
  }
  throw new Error(`no ${check} ${output}`);
}

function expectOk(fit: CurveFit): CurveFitOk {
  if (fit.status !== 'ok') throw new Error(`expected a fit, got ${fit.status}: ${fit.reason}`);
  return fit;
}

/** Agreement to `digits` significant digits. */
function expectDigits(value: number, expected: number, digits: number): void {
  expect(Math.abs(value - expected) / Math.abs(expected)).toBeLessThan(0.5 * 10 ** -digits);
}

describe('Rat42 and Rat43 fitted in Zwietering form (derived_check_values.csv; NIST StRD)', () => {
  it('the logistic fit to the Rat42 data gives A, μm, λ mapped from the certified b', () => {
    const fit = expectOk(fitCurve({ model: 'logistic', points: nistPoints('Rat42') }));
    expectDigits(fit.A, derived('rat42_as_zwietering_logistic', 'A'), 6);
    expectDigits(fit.muMax, derived('rat42_as_zwietering_logistic', 'mu_m'), 6);
    expectDigits(fit.lag, derived('rat42_as_zwietering_logistic', 'lambda'), 6);
    expectDigits(fit.inflection.t, derived('rat42_as_zwietering_logistic', 't_inflection'), 6);
    // NIST Rat42.dat: certified RSS 8.0565229338E+00 and sd(b1) 1.7340283401E+00; A is b1
    // itself, so its linearised standard error is the same number.
    expectDigits(fit.rss, 8.0565229338, 6);
    expectDigits(fit.se.A, 1.7340283401, 3);
  });

  it('the Richards fit to the Rat43 data gives A, μm, λ, ν mapped from the certified b', () => {
    const fit = expectOk(fitCurve({ model: 'richards', points: nistPoints('Rat43') }));
    expectDigits(fit.A, derived('rat43_as_zwietering_richards', 'A'), 6);
    expectDigits(fit.muMax, derived('rat43_as_zwietering_richards', 'mu_m'), 6);
    expectDigits(fit.lag, derived('rat43_as_zwietering_richards', 'lambda'), 6);
    expectDigits(fit.nu ?? NaN, derived('rat43_as_zwietering_richards', 'v'), 6);
    // NIST Rat43.dat: RSS 8.7864049080E+03; sd(b1) 1.6302297817E+01 and sd(b4) 6.8761936385E-01
    // carry over to A and ν unchanged.
    expectDigits(fit.rss, 8786.404908, 6);
    expectDigits(fit.se.A, 16.302297817, 3);
    expectDigits(fit.se.nu ?? NaN, 0.68761936385, 3);
  });

  it("'auto' keeps the lowest AICc and says what it compared", () => {
    const fit = expectOk(fitCurve({ model: 'auto', points: nistPoints('Rat42') }));
    const scored = (fit.compared ?? []).filter((c) => c.aicc !== null);
    expect(scored.length).toBe(3);
    const lowest = Math.min(...scored.map((c) => c.aicc ?? Infinity));
    expect(fit.aicc).toBe(lowest);
    // Rat42 was generated from the logistic (Ratkowsky 1983 via NIST): Richards lowers the RSS a
    // little but not by enough to pay for its fourth parameter.
    expect(fit.model).toBe('logistic');
  });
});

describe('Gause (1932) yeast growth at 5.7–39 °C (datasets/gause1932_…csv, via gauseR 1.2)', () => {
  const rows = csvRows('datasets/gause1932_yeast_growth_vs_temperature.csv').map((r) => r.map(Number));
  const series = [...new Set(rows.map((r) => `${r[1]}/${r[2]}`))].map((key) => {
    const [experiment, temperature] = key.split('/').map(Number);
    const points = rows
      .filter((r) => r[1] === experiment && r[2] === temperature)
      .map((r) => ({ t: r[3] ?? NaN, y: r[4] ?? NaN }));
    return { experiment, temperature, points };
  });

  it('has the series SOURCES.md describes (two experiments; the file holds 5.7, 15, 28 and 39 °C)', () => {
    expect(series.length).toBe(8);
  });

  it.each(series)('experiment $experiment at $temperature °C is fitted by Gompertz', ({ points }) => {
    const fit = fitCurve({ model: 'gompertz', points });
    // Every series has 7–10 points, enough for 3 parameters; so 'ok' is the honest outcome.
    const ok = expectOk(fit);
    expect(ok.r2).toBeGreaterThan(0.8);
    expect(ok.A).toBeGreaterThan(0);
    expect(ok.A).toBeLessThan(2 * Math.max(...points.map((p) => p.y)));
  });

  it('grows fastest at 28 °C, far faster than at 5.7 °C and 15 °C (Gause 1932, Table 5)', () => {
    const mu = (experiment: number, temperature: number): number => {
      const s = series.find((x) => x.experiment === experiment && x.temperature === temperature);
      return expectOk(fitCurve({ model: 'gompertz', points: s?.points ?? [] })).muMax;
    };
    for (const experiment of [1, 2]) {
      expect(mu(experiment, 28)).toBeGreaterThan(2 * mu(experiment, 15));
      expect(mu(experiment, 15)).toBeGreaterThan(2 * mu(experiment, 5.7));
    }
  });
});

describe('nlsMicrobio growth curves (datasets/nlsmicrobio_growthcurves_log10N.csv)', () => {
  const rows = csvRows('datasets/nlsmicrobio_growthcurves_log10N.csv');
  const names = [...new Set(rows.map((r) => r[0] ?? ''))];
  it.each(names)('%s: Gompertz on y = ln(N/N0) converges with r² > 0.95 (smoke)', (name) => {
    // Zwietering et al. 1990 fit y = ln(N/N0); the file gives log10 N, so y = ln 10·(log10 N − log10 N0).
    const raw = rows.filter((r) => r[0] === name).map((r) => ({ t: Number(r[1]), y: Number(r[2]) }));
    const n0 = raw[0]?.y ?? NaN;
    const fit = expectOk(
      fitCurve({ model: 'gompertz', points: raw.map((p) => ({ t: p.t, y: Math.LN10 * (p.y - n0) })) }),
    );
    expect(fit.converged).toBe(true);
    expect(fit.r2).toBeGreaterThan(0.95);
  });
});

describe('recovering known parameters from a synthetic Gompertz curve', () => {
  it('returns the generating A, μm, λ from exact points, with tAtFraction and valueAt to match', () => {
    const points = Array.from({ length: 13 }, (_, i) => ({ t: i, y: gompertz(i, 1.8, 0.5, 2) }));
    const fit = expectOk(fitCurve({ model: 'gompertz', points }));
    expect(fit.A).toBeCloseTo(1.8, 6);
    expect(fit.muMax).toBeCloseTo(0.5, 6);
    expect(fit.lag).toBeCloseTo(2, 6);
    expect(fit.valueAt(fit.tAtFraction(0.95))).toBeCloseTo(0.95 * fit.A, 9);
    expect(fit.tAtFraction(1.2)).toBeNaN();
  });
});

describe('failure modes: a clear status, never an exception', () => {
  it('2 points → insufficient-data', () => {
    const fit = fitCurve({
      model: 'gompertz',
      points: [
        { t: 0, y: 0 },
        { t: 1, y: 1 },
      ],
    });
    expect(fit.status).toBe('insufficient-data');
  });

  it('3 points are too few for Richards but 4 are enough for Gompertz', () => {
    const points = [0, 2, 4, 6].map((t) => ({ t, y: gompertz(t, 2, 0.8, 1) }));
    expect(fitCurve({ model: 'richards', points }).status).toBe('insufficient-data');
    expect(fitCurve({ model: 'gompertz', points }).status).toBe('ok');
  });

  it('flat data → insufficient-data (no rise), for every model and auto', () => {
    const points = [0, 1, 2, 3, 4, 5, 6, 7].map((t) => ({ t, y: 0.4 }));
    for (const model of ['gompertz', 'logistic', 'richards', 'auto'] as const) {
      const fit = fitCurve({ model, points });
      expect(fit.status).toBe('insufficient-data');
      if (fit.status !== 'ok') expect(fit.reason).toMatch(/no rise/);
    }
  });

  it('falling data → insufficient-data (no rise)', () => {
    const points = [0, 1, 2, 3, 4, 5].map((t) => ({ t, y: 1 - 0.1 * t }));
    expect(fitCurve({ model: 'gompertz', points }).status).toBe('insufficient-data');
  });

  it('NaN, Infinity or a missing value → invalid-input naming the field', () => {
    const good = [0, 1, 2, 3, 4].map((t) => ({ t, y: t / 4 }));
    const nan = fitCurve({ model: 'gompertz', points: [...good, { t: 5, y: NaN }] });
    expect(nan).toMatchObject({ status: 'invalid-input', field: 'points.5.y' });
    const inf = fitCurve({ model: 'logistic', points: [{ t: Infinity, y: 1 }, ...good] });
    expect(inf).toMatchObject({ status: 'invalid-input', field: 'points.0.t' });
    const junk = JSON.parse('{"model":"gompertz","points":[{"t":1},{"t":"2","y":3}]}') as Parameters<
      typeof fitCurve
    >[0];
    expect(fitCurve(junk)).toMatchObject({ status: 'invalid-input', field: 'points.0.y' });
    const badModel = JSON.parse('{"model":"baranyi","points":[]}') as Parameters<typeof fitCurve>[0];
    expect(fitCurve(badModel)).toMatchObject({ status: 'invalid-input', field: 'model' });
  });

  it('data still in the exponential phase → did-not-converge rather than an invented plateau', () => {
    // Pure exponential growth has no asymptote; a sigmoid fitted to it would extrapolate one.
    const points = Array.from({ length: 10 }, (_, i) => ({ t: i, y: Math.exp(0.6 * i) - 1 }));
    const fit = fitCurve({ model: 'gompertz', points });
    expect(fit.status).toBe('did-not-converge');
    if (fit.status !== 'ok') expect(fit.reason).toMatch(/plateau/);
  });

  it('unsorted points and repeated times are accepted', () => {
    const times = [6, 0, 3, 3, 9, 1, 12, 4, 8, 2];
    const points = times.map((t) => ({ t, y: gompertz(t, 1.5, 0.4, 1.5) }));
    const fit = expectOk(fitCurve({ model: 'gompertz', points }));
    expect(fit.A).toBeCloseTo(1.5, 6);
  });
});
