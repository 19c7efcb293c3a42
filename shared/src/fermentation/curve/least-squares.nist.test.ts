// The fitter against NIST's Statistical Reference Datasets for nonlinear regression (NIST ITL,
// StRD, itl.nist.gov/div898/strd/nls/nls_main.shtml; verbatim files and provenance in
// test-fixtures/reference/nist-strd/README.md). Each file certifies the parameters, their
// standard deviations and the residual sum of squares; NIST's test is to reach them from both
// Start 1 and Start 2. Accuracy is counted as the log relative error (LRE), the number of
// significant digits that agree (McCullough 1998, Am Statistician 52:358 [from memory]).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

import { type DataPoint, type ModelFunction, fitLeastSquares, fitWithPackageOnly } from './least-squares.js';

const dir = new URL('../../../../test-fixtures/reference/nist-strd/', import.meta.url);

interface NistProblem {
  name: string;
  starts: [number[], number[]];
  certified: number[];
  certifiedSd: number[];
  certifiedRss: number;
  points: DataPoint[];
}

/** The .dat layout: "b1 = start1 start2 certified sd" lines, the RSS line, data (y x) at the end. */
function readNist(name: string): NistProblem {
  const text = readFileSync(new URL(`${name}.dat`, dir), 'utf8');
  const lines = text.split(/\r?\n/);
  const dataLines = /Data\s+\(lines\s+(\d+)\s+to\s+(\d+)\)/.exec(text);
  const rssLine = /Residual Sum of Squares:\s+(\S+)/.exec(text);
  if (!dataLines || !rssLine) throw new Error(`${name}.dat: header not understood`);
  const start1: number[] = [];
  const start2: number[] = [];
  const certified: number[] = [];
  const certifiedSd: number[] = [];
  for (const line of lines) {
    const m = /^\s*b\d+\s*=\s*(\S+)\s+(\S+)\s+(\S+)\s+(\S+)\s*$/.exec(line);
    if (!m) continue;
    start1.push(Number(m[1]));
    start2.push(Number(m[2]));
    certified.push(Number(m[3]));
    certifiedSd.push(Number(m[4]));
  }
  const points = lines.slice(Number(dataLines[1]) - 1, Number(dataLines[2])).map((line) => {
    const [y, x] = line.trim().split(/\s+/).map(Number);
    return { t: x ?? NaN, y: y ?? NaN };
  });
  return { name, starts: [start1, start2], certified, certifiedSd, certifiedRss: Number(rssLine[1]), points };
}

const b = (p: readonly number[], i: number): number => p[i] ?? NaN;

/** The model line of each file, transcribed. */
const nistModels: Record<string, ModelFunction> = {
  Misra1a: (p, x) => b(p, 0) * (1 - Math.exp(-b(p, 1) * x)),
  Misra1b: (p, x) => b(p, 0) * (1 - (1 + (b(p, 1) * x) / 2) ** -2),
  Chwirut2: (p, x) => Math.exp(-b(p, 0) * x) / (b(p, 1) + b(p, 2) * x),
  DanWood: (p, x) => b(p, 0) * x ** b(p, 1),
  Rat42: (p, x) => b(p, 0) / (1 + Math.exp(b(p, 1) - b(p, 2) * x)),
  Rat43: (p, x) => b(p, 0) / (1 + Math.exp(b(p, 1) - b(p, 2) * x)) ** (1 / b(p, 3)),
  MGH09: (p, x) => (b(p, 0) * (x * x + x * b(p, 1))) / (x * x + x * b(p, 2) + b(p, 3)),
  MGH10: (p, x) => b(p, 0) * Math.exp(b(p, 1) / (x + b(p, 2))),
  Thurber: (p, x) =>
    (b(p, 0) + b(p, 1) * x + b(p, 2) * x ** 2 + b(p, 3) * x ** 3) /
    (1 + b(p, 4) * x + b(p, 5) * x ** 2 + b(p, 6) * x ** 3),
  Eckerle4: (p, x) => (b(p, 0) / b(p, 1)) * Math.exp(-0.5 * ((x - b(p, 2)) / b(p, 1)) ** 2),
  BoxBOD: (p, x) => b(p, 0) * (1 - Math.exp(-b(p, 1) * x)),
};

/** Significant digits in agreement: −log10(|x − c|/|c|), capped at 15 for exact agreement. */
function digits(value: number, certified: number): number {
  if (value === certified) return 15;
  return Math.min(15, -Math.log10(Math.abs(value - certified) / Math.abs(certified)));
}

function fewestDigits(values: readonly number[], certified: readonly number[]): number {
  return Math.min(...certified.map((c, i) => digits(values[i] ?? NaN, c)));
}

const problems = Object.keys(nistModels).map(readNist);
const runs = problems.flatMap((problem) => [1, 2].map((start) => ({ problem, start, label: `${problem.name}` })));
/** Runs that the method cannot claim; each is asserted as a failure under 'known limits'. */
const knownLimits = new Set(['BoxBOD/1']);

function fit(problem: NistProblem, start: number) {
  const model = nistModels[problem.name];
  if (!model) throw new Error(`no model for ${problem.name}`);
  return fitLeastSquares(model, problem.points, problem.starts[start === 1 ? 0 : 1]);
}

describe('NIST StRD nonlinear regression: certified values from Start 1 and Start 2', () => {
  it('reads every file: parameters, starts and data as the header says', () => {
    // Counts from each file's header (nist-strd/README.md table: params, obs).
    const expected: Record<string, [number, number]> = {
      Misra1a: [2, 14],
      Misra1b: [2, 14],
      Chwirut2: [3, 54],
      DanWood: [2, 6],
      Rat42: [3, 9],
      Rat43: [4, 15],
      MGH09: [4, 11],
      MGH10: [3, 16],
      Thurber: [7, 37],
      Eckerle4: [3, 35],
      BoxBOD: [2, 6],
    };
    for (const p of problems) {
      expect([p.certified.length, p.points.length]).toEqual(expected[p.name]);
      expect(p.points.every(({ t, y }) => Number.isFinite(t) && Number.isFinite(y))).toBe(true);
    }
  });

  const claimed = runs.filter(({ problem, start }) => !knownLimits.has(`${problem.name}/${start}`));
  it.each(claimed)('$label from Start $start: parameters and RSS to 6 digits, SDs to 3', ({ problem, start }) => {
    const result = fit(problem, start);
    expect(result.converged).toBe(true);
    // Source: the certified values in nist-strd/<name>.dat.
    expect(fewestDigits(result.params, problem.certified)).toBeGreaterThanOrEqual(6);
    expect(digits(result.rss, problem.certifiedRss)).toBeGreaterThanOrEqual(6);
    expect(result.standardErrors).not.toBeNull();
    expect(fewestDigits(result.standardErrors ?? [], problem.certifiedSd)).toBeGreaterThanOrEqual(3);
  });
});

describe('known limits', () => {
  it('BoxBOD from Start 1 (b1 = 1, b2 = 1) ends on a saturated plateau and reports it, not a fit', () => {
    // Why: from b2 = 1 the first steps push b2 up until exp(−b2·x) vanishes at every x ≥ 1 (the
    // data's x are 1–10); the curve becomes the constant b1, ∂y/∂b2 is 0 to double precision, and
    // no derivative-based method has a direction back. NIST rates BoxBOD "higher difficulty".
    const problem = problems.find((p) => p.name === 'BoxBOD');
    if (!problem) throw new Error('BoxBOD missing');
    const result = fit(problem, 1);
    expect(result.converged).toBe(false);
    expect(result.stopReason).toMatch(/no longer moves/);
    expect(fewestDigits(result.params, problem.certified)).toBeLessThan(1);
  });
});

describe('our refinement against ml-levenberg-marquardt alone, same files, same starts', () => {
  // The full fitter must never end at a worse sum of squares than the package on its own, and on
  // every claimed run it must agree with NIST to at least as many digits (compared up to 6,
  // below which both are at round-off).
  const table = runs.map(({ problem, start }) => {
    const model = nistModels[problem.name];
    if (!model) throw new Error(`no model for ${problem.name}`);
    const initial = problem.starts[start === 1 ? 0 : 1];
    const ours = fitLeastSquares(model, problem.points, initial);
    const pkg = fitWithPackageOnly(model, problem.points, initial);
    const run = `${problem.name}/${start}`;
    return {
      run,
      claimed: !knownLimits.has(run),
      ours: fewestDigits(ours.params, problem.certified),
      pkg: fewestDigits(pkg.params, problem.certified),
      oursRss: ours.rss,
      pkgRss: pkg.rss,
    };
  });

  it.each(table)('$run: ours matches or beats the package', ({ claimed, ours, pkg, oursRss, pkgRss }) => {
    expect(oursRss).toBeLessThanOrEqual(pkgRss * (1 + 1e-9));
    if (claimed) expect(ours).toBeGreaterThanOrEqual(Math.min(pkg, 6));
  });

  it('reaches 4 digits on several runs where the package alone does not', () => {
    const rescued = table.filter(({ ours, pkg }) => ours >= 4 && pkg < 4).map(({ run }) => run);
    // At the time of writing: Rat42/1, Rat43/1, MGH09/1, MGH10/1, Thurber/1, Eckerle4/1.
    expect(rescued.length).toBeGreaterThanOrEqual(4);
  });
});

describe('fitLeastSquares with an analytic gradient', () => {
  it('gives the Misra1a certified values with ∂y/∂b supplied instead of differences', () => {
    const problem = problems.find((p) => p.name === 'Misra1a');
    const model = nistModels.Misra1a;
    if (!problem || !model) throw new Error('Misra1a missing');
    const result = fitLeastSquares(model, problem.points, problem.starts[0], {
      gradient: (p, x) => [1 - Math.exp(-b(p, 1) * x), b(p, 0) * x * Math.exp(-b(p, 1) * x)],
    });
    expect(fewestDigits(result.params, problem.certified)).toBeGreaterThanOrEqual(6);
    expect(fewestDigits(result.standardErrors ?? [], problem.certifiedSd)).toBeGreaterThanOrEqual(3);
  });
});
