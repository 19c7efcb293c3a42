/// <reference types="node" />
// Speed of the model's three hot paths, each as the median of several runs after a warm-up.
import { performance } from 'node:perf_hooks';
import { gompertz } from '../fermentation/curve/growth-models.js';
import { fitCultureKinetics } from '../fermentation/kinetics/fit-kinetics.js';
import { predictNextPeak } from '../fermentation/kinetics/predict.js';
import { type KineticsOptions } from '../fermentation/kinetics/types.js';
import { fitRise } from '../fermentation/rise/fit-rise.js';
import { type FitRiseInput } from '../fermentation/rise/rise-types.js';
import { formatInstant } from '../fermentation/temperature/time.js';
import { mulberry32, normal, simulateCulture } from './simulate.js';
import { median } from './table.js';

export function timeMs(run: () => unknown, repeats: number, warmups = 2): number {
  for (let i = 0; i < warmups; i++) run();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    run();
    times.push(performance.now() - t0);
  }
  return median(times);
}

/**
 * SIMULATION: 1,000 jar rise curves — Gompertz rises (A 1–2.5× the initial height, μm 0.2–0.6
 * per hour, lag 0.5–2 h), a reading every 30 min for 12 h, a fall of 3 % per hour after the
 * curve's 97 % point, ±1 mm reading noise. Seeded, so every run fits the same curves.
 */
export function simulatedRises(count: number, seed = 99): FitRiseInput[] {
  const rand = mulberry32(seed);
  const fedMs = Date.UTC(2026, 1, 1, 7, 0, 0);
  return Array.from({ length: count }, () => {
    const A = 1 + 1.5 * rand();
    const mu = 0.2 + 0.4 * rand();
    const lag = 0.5 + 1.5 * rand();
    const h0 = 40;
    const peakT = lag + (A / (mu * Math.E)) * (1 - Math.log(-Math.log(0.97)));
    const readings = Array.from({ length: 24 }, (_, k) => {
      const t = 0.5 * (k + 1);
      const rise = gompertz(Math.min(t, peakT), A, mu, lag) * (t > peakT ? 1 - 0.03 * (t - peakT) : 1);
      return { at: formatInstant(fedMs + t * 3_600_000, 60), heightMm: h0 * (1 + rise) + normal(rand) };
    });
    return { fedAt: formatInstant(fedMs, 60), initialHeightMm: h0, readings };
  });
}

export interface SpeedRow {
  what: string;
  ms: number;
  note: string;
}

export function speedRows(defaults: KineticsOptions): SpeedRow[] {
  const rows: SpeedRow[] = [];
  const rises = simulatedRises(1000);
  let peaked = 0;
  const riseMs = timeMs(
    () => {
      peaked = rises.map((r) => fitRise(r)).filter((r) => r.status === 'peaked' || r.status === 'rising').length;
    },
    5,
    1,
  );
  rows.push({
    what: 'fit 1,000 rise curves (fitRise)',
    ms: riseMs,
    note: `${peaked}/1000 fitted; 24 readings each; SIMULATION`,
  });

  const culture = simulateCulture(0, 1000, 4242);
  const used = fitCultureKinetics(culture.feedings, defaults).feedingsUsed;
  rows.push({
    what: 'refit a culture with 1,000 feedings (default)',
    ms: timeMs(() => fitCultureKinetics(culture.feedings, defaults), 9),
    note: `${used} feedings weigh ≥ 1e-4 at half-life ${defaults.halfLifeFeedings ?? 20}; SIMULATION`,
  });
  for (const model of ['q10', 'ctmi', 'ratkowsky1983'] as const) {
    rows.push({
      what: `refit 1,000 feedings, all weighted alike (${model})`,
      ms: timeMs(() => fitCultureKinetics(culture.feedings, { ...defaults, model, halfLifeFeedings: Infinity }), 9),
      note: 'every feeding fitted; SIMULATION',
    });
  }
  const kinetics = fitCultureKinetics(culture.feedings.slice(0, 60), defaults);
  const plan = culture.plans[60];
  if (plan) {
    rows.push({
      what: 'one prediction (fitted kinetics given)',
      ms: timeMs(() => predictNextPeak(kinetics, plan), 201),
      note: '',
    });
    const history = culture.feedings.slice(0, 60);
    rows.push({
      what: 'one prediction from 60 feedings (fit + predict)',
      ms: timeMs(() => predictNextPeak(history, plan, defaults), 51),
      note: '',
    });
  }
  return rows;
}
