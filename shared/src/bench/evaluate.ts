// Accuracy of peak prediction by leave-one-out, for the model variants and the two baselines a
// baker uses today: "same time as last feeding" and "last feeding corrected by a fixed Q10 = 2".
import { compileSeries, temperatureAt, type TemperatureSeries } from '../fermentation/temperature/series.js';
import { parseMs } from '../fermentation/temperature/time.js';
import { predictNextPeak, nextFeedingSeries } from '../fermentation/kinetics/predict.js';
import { type ObservedFeeding, type KineticsOptions, type NextFeeding } from '../fermentation/kinetics/types.js';
import { dilution } from '../fermentation/kinetics/feedings.js';

export interface Forecast {
  hours: number | null;
  lowHours?: number | null;
  highHours?: number | null;
}

export interface Case {
  history: readonly ObservedFeeding[];
  next: NextFeeding;
  actualHours: number;
  /** The feeding a baker would copy: the previous one (or, for Gause/Gänzle, the nearest temperature). */
  last: ObservedFeeding;
}

export type Predictor = (c: Case) => Forecast;

export function modelPredictor(options: KineticsOptions): Predictor {
  return (c) => {
    const p = predictNextPeak(c.history, c.next, options);
    return { hours: p.hoursToPeak, lowHours: p.lowHours, highHours: p.highHours ?? Infinity };
  };
}

/** Time-weighted mean temperature of a series over the first `hours` from `fromMs` (midpoint rule). */
function meanTemperature(series: TemperatureSeries, fromMs: number, hours: number): number {
  const compiled = compileSeries(series, fromMs);
  const steps = 200;
  let sum = 0;
  for (let i = 0; i < steps; i++) sum += temperatureAt(compiled, ((i + 0.5) * hours) / steps);
  return sum / steps;
}

function observedSeries(f: ObservedFeeding): TemperatureSeries {
  if (f.temperatures && f.temperatures.length > 0) return { readings: f.temperatures };
  return { readings: [], forecast: [{ c: f.temperatureC ?? 24 }] };
}

export const sameAsLast: Predictor = (c) => ({ hours: c.last.hoursToPeak });

/** Last feeding's time moved to the new temperature with Q10 = 2 (a doubling per 10 °C). */
export const fixedQ10: Predictor = (c) => {
  const tLast = meanTemperature(observedSeries(c.last), parseMs(c.last.fedAt), c.last.hoursToPeak);
  const tNext = meanTemperature(nextFeedingSeries(c.next), parseMs(c.next.fedAt), c.last.hoursToPeak);
  return { hours: c.last.hoursToPeak * Math.pow(2, (tLast - tNext) / 10) };
};

/** Like fixedQ10 but copying the most recent feeding at the same ratio (a more careful baker). */
export const fixedQ10SameRatio: Predictor = (c) => {
  const d = dilution(c.next);
  const nextMs = parseMs(c.next.fedAt);
  const same = c.history
    .filter((f) => Math.abs(dilution(f) - d) < 1e-9 && parseMs(f.fedAt) < nextMs)
    .sort((a, b) => parseMs(b.fedAt) - parseMs(a.fedAt))[0];
  return fixedQ10({ ...c, last: same ?? c.last });
};

export interface Metrics {
  n: number;
  medianAbsH: number;
  p90AbsH: number;
  medianPct: number;
  p90Pct: number;
  /** Fraction of actual times inside the 80 % interval; null for predictors without one. */
  coverage: number | null;
  /** Cases where the predictor gave no answer (counted as misses in coverage). */
  missing: number;
}

function quantile(sorted: number[], q: number): number {
  if (sorted.length === 0) return NaN;
  const pos = (sorted.length - 1) * q;
  const lo = Math.floor(pos);
  const hi = Math.ceil(pos);
  return (sorted[lo] ?? NaN) + ((sorted[hi] ?? NaN) - (sorted[lo] ?? NaN)) * (pos - lo);
}

export function evaluate(cases: readonly Case[], predictor: Predictor): Metrics {
  const abs: number[] = [];
  const pct: number[] = [];
  let covered = 0;
  let withInterval = 0;
  let missing = 0;
  for (const c of cases) {
    const f = predictor(c);
    if (f.hours === null) {
      missing++;
      continue;
    }
    const e = Math.abs(f.hours - c.actualHours);
    abs.push(e);
    pct.push((100 * e) / c.actualHours);
    if (f.lowHours !== undefined) {
      withInterval++;
      const low = f.lowHours ?? Infinity;
      const high = f.highHours ?? Infinity;
      if (c.actualHours >= low && c.actualHours <= high) covered++;
    }
  }
  abs.sort((a, b) => a - b);
  pct.sort((a, b) => a - b);
  return {
    n: abs.length,
    medianAbsH: quantile(abs, 0.5),
    p90AbsH: quantile(abs, 0.9),
    medianPct: quantile(pct, 0.5),
    p90Pct: quantile(pct, 0.9),
    coverage: withInterval > 0 ? covered / (withInterval + missing) : null,
    missing,
  };
}

/** Leave-one-out cases of one culture: each feeding after the first, predicted from all others. */
export function leaveOneOutCases(
  feedings: readonly ObservedFeeding[],
  plans: readonly NextFeeding[],
  mode: 'loo' | 'forward',
  minHistory = 1,
): Case[] {
  const cases: Case[] = [];
  for (let i = Math.max(1, minHistory); i < feedings.length; i++) {
    const target = feedings[i];
    const plan = plans[i];
    const last = feedings[i - 1];
    if (!target || !plan || !last) continue;
    const history = mode === 'loo' ? feedings.filter((_, j) => j !== i) : feedings.slice(0, i);
    cases.push({ history, next: plan, actualHours: target.hoursToPeak, last });
  }
  return cases;
}
