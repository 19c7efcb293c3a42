// Progress of many feedings under many candidate temperature models, fast. Each feeding's
// temperature history is turned once into its "time spent at each temperature" on a fine grid
// (0.05 °C): a linear ramp spends equal time per degree, a constant stretch all its time at one
// temperature, and that time is shared between the two neighbouring grid nodes by linear (hat)
// weights. Progress under a model is then Σ weight × rate(node): the rate is evaluated once per
// node (a few hundred values) instead of at quadrature points of every piece of every feeding.
// That is the exact integral of the rate interpolated linearly between nodes, so the error is at
// most step²/8 × max|r''| — below 1e-5 of the rate for CTMI, Ratkowsky and Q10 at kitchen
// temperatures (progress-grid.test.ts checks it against the exact integrator).
import { type PreparedModel } from '../temperature/integrate.js';
import { type PreparedFeeding } from './feedings.js';

export const GRID_STEP_C = 0.05;

export interface ProgressGrid {
  /** Temperature of node 0, °C. */
  t0: number;
  step: number;
  size: number;
  /** Per feeding: first node and the hours attributed to each node from there. */
  rows: Array<{ offset: number; weights: Float64Array }>;
}

/** Adds `hours` spread uniformly over [a, b] (grid units) to `acc` by hat weights. */
function spread(acc: Float64Array, a: number, b: number, hours: number): void {
  const add = (k: number, w: number): void => {
    acc[k] = (acc[k] ?? 0) + w;
  };
  if (b - a < 1e-9) {
    const k = Math.floor(a);
    const f = a - k;
    add(k, hours * (1 - f));
    add(k + 1, hours * f);
    return;
  }
  const density = hours / (b - a);
  for (let k = Math.floor(a); k < b; k++) {
    const s = Math.max(a, k);
    const e = Math.min(b, k + 1);
    if (e <= s) continue;
    // ∫ (k + 1 − u) du and ∫ (u − k) du over [s, e].
    const toLeft = (k + 1) * (e - s) - (e * e - s * s) / 2;
    const toRight = (e * e - s * s) / 2 - k * (e - s);
    add(k, density * toLeft);
    add(k + 1, density * toRight);
  }
}

export function buildProgressGrid(feedings: readonly PreparedFeeding[], step = GRID_STEP_C): ProgressGrid {
  let lo = Infinity;
  let hi = -Infinity;
  const visit = (f: PreparedFeeding, fn: (c0: number, c1: number, h: number) => void): void => {
    if (f.pieces) {
      for (let i = 0; i + 2 < f.pieces.length; i += 3) fn(f.pieces[i] ?? 0, f.pieces[i + 1] ?? 0, f.pieces[i + 2] ?? 0);
    } else fn(f.constantC ?? 0, f.constantC ?? 0, f.hours);
  };
  for (const f of feedings) {
    visit(f, (c0, c1) => {
      lo = Math.min(lo, c0, c1);
      hi = Math.max(hi, c0, c1);
    });
  }
  if (!Number.isFinite(lo)) return { t0: 0, step, size: 0, rows: [] };
  const t0 = Math.floor(lo / step) * step - step;
  const size = Math.ceil((hi - t0) / step) + 3;
  // One scratch row reused for every feeding; only the span a feeding touched is copied out.
  const acc = new Float64Array(size);
  const rows = feedings.map((f) => {
    let first = size;
    let last = -1;
    visit(f, (c0, c1, h) => {
      if (!(h > 0)) return;
      const a = (Math.min(c0, c1) - t0) / step;
      const b = (Math.max(c0, c1) - t0) / step;
      spread(acc, a, b, h);
      first = Math.min(first, Math.floor(a));
      last = Math.max(last, Math.ceil(b) + 1);
    });
    if (last < first) return { offset: 0, weights: new Float64Array(0) };
    const weights = acc.slice(first, last + 1);
    acc.fill(0, first, last + 1);
    return { offset: first, weights };
  });
  return { t0, step, size, rows };
}

/** Fills `out[i]` with the progress of feeding i (hours at the reference) under `pm`. */
export function gridProgress(grid: ProgressGrid, pm: PreparedModel, out: Float64Array): void {
  const rates = new Float64Array(grid.size);
  for (let k = 0; k < grid.size; k++) rates[k] = pm.rate(grid.t0 + k * grid.step);
  for (let i = 0; i < grid.rows.length; i++) {
    const row = grid.rows[i];
    if (!row) continue;
    let sum = 0;
    const w = row.weights;
    for (let k = 0; k < w.length; k++) sum += (w[k] ?? 0) * (rates[row.offset + k] ?? 0);
    out[i] = sum;
  }
}
