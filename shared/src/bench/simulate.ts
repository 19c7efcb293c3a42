// SIMULATION — synthetic culture logbooks for the kinetics benchmark and tests. No real culture
// is behind these numbers. The process, and where each ingredient comes from:
//   • temperature response: a mix of Gänzle's two cardinal-temperature sets (lactobacilli
//     4/32.5/41 °C, yeast 8/28/35 °C; SOURCES.md §1a) in CTMI form (Rosso et al. 1993), with a
//     per-culture yeast share w ~ U(0, 1) and cardinals jittered by N(0, 0.7 °C);
//   • growth: work to peak β·(h0 + ln D) hours at 24 °C (lag + ln(D)/μ with h0 = λμ), β ~
//     log-uniform 2–5 h and h0 ~ U(0, 1) — a spread around the common-practice peak times of
//     SOURCES.md §6c (assumption);
//   • noise: log-normal on the work, σ ~ U(0.08, 0.22) per culture (assumption), peak times read to
//     the quarter hour; a third of the cultures drift by ±30 % in speed over their history
//     (assumption: new flour, a maturing culture);
//   • kitchens: 18–27 °C per feeding around a culture's own mean, with a ±1.5 °C day/night swing;
//     half the feedings log one rounded temperature (the swing is then unlogged), half log hourly
//     readings; 15 % are fridge retards at 3–6 °C for 6–14 h, then the counter;
//   • ratios 1:1:1 … 1:10:10, each culture with a habitual ratio (70 %) and occasional others.
// Deterministic: a seeded PRNG (mulberry32), no clock.
import { hoursToReach, type PreparedModel } from '../fermentation/temperature/integrate.js';
import {
  LACTOBACILLI_CARDINALS,
  YEAST_CARDINALS,
  ctmiRate,
  type CardinalTemperatures,
} from '../fermentation/temperature/models.js';
import { compileSeries, type TemperatureSample } from '../fermentation/temperature/series.js';
import { formatInstant } from '../fermentation/temperature/time.js';
import { type ObservedFeeding, type NextFeeding } from '../fermentation/kinetics/types.js';

export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function normal(rand: () => number): number {
  const u = Math.max(rand(), 1e-12);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rand());
}

export interface SimulatedCulture {
  id: number;
  truth: {
    yeastShare: number;
    lab: CardinalTemperatures;
    yeast: CardinalTemperatures;
    beta: number;
    h0: number;
    sigma: number;
    drift: number;
  };
  feedings: ObservedFeeding[];
  /**
   * What the baker knows at feeding time, for forecasting the same feeding: the amounts and a
   * plan ("kitchen about 22 °C", or "fridge 4.5 °C until 05:00, then the counter"), not the
   * temperatures that were later logged.
   */
  plans: NextFeeding[];
  fridge: boolean[];
}

const RATIOS = [1, 2, 3, 5, 10];
const START_MS = Date.UTC(2026, 0, 5, 7, 0, 0);
const OFFSET = 60; // +01:00

function jitter(c: CardinalTemperatures, rand: () => number): CardinalTemperatures {
  return { tMin: c.tMin + 0.7 * normal(rand), tOpt: c.tOpt + 0.7 * normal(rand), tMax: c.tMax + 0.7 * normal(rand) };
}

export function trueRateModel(truth: SimulatedCulture['truth']): PreparedModel {
  const w = truth.yeastShare;
  const labRef = ctmiRate(24, truth.lab);
  const yeastRef = ctmiRate(24, truth.yeast);
  return {
    rate: (c) => (1 - w) * (ctmiRate(c, truth.lab) / labRef) + w * (ctmiRate(c, truth.yeast) / yeastRef),
    breakpoints: [truth.lab.tMin, truth.lab.tMax, truth.yeast.tMin, truth.yeast.tMax],
    tRef: 24,
  };
}

export function simulateCulture(id: number, feedingCount: number, seed: number): SimulatedCulture {
  const rand = mulberry32(seed);
  const uniform = (a: number, b: number): number => a + (b - a) * rand();
  const truth = {
    yeastShare: rand(),
    lab: jitter(LACTOBACILLI_CARDINALS, rand),
    yeast: jitter(YEAST_CARDINALS, rand),
    beta: Math.exp(uniform(Math.log(2), Math.log(5))),
    h0: uniform(0, 1),
    sigma: uniform(0.08, 0.22),
    drift: rand() < 1 / 3 ? (rand() < 0.5 ? -1 : 1) * Math.log(1.3) : 0,
  };
  const pm = trueRateModel(truth);
  const kitchenMean = uniform(19.5, 25.5);
  const habit = RATIOS[Math.floor(rand() * RATIOS.length)] ?? 1;
  const feedings: ObservedFeeding[] = [];
  const fridge: boolean[] = [];
  const plans: NextFeeding[] = [];
  let t = START_MS;
  for (let i = 0; feedings.length < feedingCount && i < feedingCount * 3; i++) {
    const ratio = rand() < 0.7 ? habit : (RATIOS[Math.floor(rand() * RATIOS.length)] ?? 1);
    const starterG = 20;
    const kitchen = Math.min(27, Math.max(18, kitchenMean + 1.5 * normal(rand)));
    const isFridge = rand() < 0.15;
    const fridgeC = uniform(3, 6);
    const fridgeH = uniform(6, 14);
    const phase = rand() * 2 * Math.PI;
    // True temperature, hourly for four days: fridge first if retarded, then a day/night swing.
    const readings: TemperatureSample[] = [];
    for (let h = 0; h <= 96; h++) {
      const at = formatInstant(t + h * 3_600_000, OFFSET);
      const onCounter = kitchen + 1.5 * Math.sin(phase + (2 * Math.PI * h) / 24);
      if (isFridge && h < fridgeH) readings.push({ at, c: fridgeC });
      else if (isFridge && h - 1 < fridgeH) {
        readings.push({ at: formatInstant(t + fridgeH * 3_600_000, OFFSET), c: fridgeC });
        readings.push({ at, c: onCounter });
      } else readings.push({ at, c: onCounter });
    }
    const progressFraction = feedings.length / Math.max(1, feedingCount - 1);
    const beta = truth.beta * Math.exp(truth.drift * progressFraction);
    const work = beta * (truth.h0 + Math.log(1 + 2 * ratio)) * Math.exp(truth.sigma * normal(rand));
    const series = compileSeries({ readings }, t);
    const hours = hoursToReach(series, pm, 0, work, 96);
    if (hours !== null) {
      const observed = Math.max(0.25, Math.round(hours * 4) / 4);
      const logged = readings.filter((r) => Date.parse(r.at) - t <= observed * 3_600_000 + 3_600_000);
      const feeding: ObservedFeeding = {
        fedAt: formatInstant(t, OFFSET),
        starterG,
        flourG: starterG * ratio,
        waterG: starterG * ratio,
        hoursToPeak: observed,
      };
      if (isFridge || rand() < 0.5)
        feeding.temperatures = logged.map((r) => ({ at: r.at, c: Math.round(r.c * 10) / 10 }));
      else feeding.temperatureC = Math.round(kitchen * 2) / 2;
      feedings.push(feeding);
      fridge.push(isFridge);
      const plannedKitchen = Math.round(kitchen * 2) / 2;
      plans.push({
        fedAt: feeding.fedAt,
        starterG,
        flourG: feeding.flourG,
        waterG: feeding.waterG,
        forecast: isFridge
          ? [
              { c: Math.round(fridgeC * 2) / 2, until: formatInstant(t + fridgeH * 3_600_000, OFFSET) },
              { c: plannedKitchen },
            ]
          : [{ c: plannedKitchen }],
      });
    }
    t += Math.round(uniform(20, 28)) * 3_600_000;
  }
  return { id, truth, feedings, plans, fridge };
}

/** The benchmark's population: `count` cultures of 30–60 feedings each, fixed seeds. */
export function simulatePopulation(count: number, seed = 20261205): SimulatedCulture[] {
  const rand = mulberry32(seed);
  return Array.from({ length: count }, (_, id) =>
    simulateCulture(id, 30 + Math.floor(rand() * 31), Math.floor(rand() * 2 ** 31)),
  );
}
