// Published and common-practice values the kinetics start from, and how strongly. With no
// history these are the prediction; with a short history they pull the per-culture fit
// (penalised least squares: each prior is a Gaussian pseudo-observation of its parameter).
import { DEFAULT_Q10, LACTOBACILLI_CARDINALS, type TemperatureModel } from '../temperature/models.js';
import { type KineticsModelName } from './types.js';

/**
 * Culture speed and lag at 24 °C, from the common-practice times to peak (SOURCES.md §6c: at
 * about 20–24 °C, 1:1:1 ≈ 3–6 h, 1:2:2 ≈ 5–8 h, 1:5:5 ≈ 8–14 h, 1:10:10 ≈ 12–16 h). With
 * t = β·(h0 + ln D) at the reference, β = 3.0 h and h0 = 0.3 give 4.2 / 5.7 / 8.1 / 10.0 h at
 * 24 °C and 5.3 / 7.2 / 10.2 / 12.7 h at 21 °C, inside every range. The spreads are wide because
 * cultures differ several-fold in speed; they are assumptions, not published values.
 */
export const PRIOR_LN_BETA = { mean: Math.log(3.0), sd: 0.5 } as const;
export const PRIOR_H0 = { mean: 0.3, sd: 0.5 } as const;

/**
 * Day-to-day spread of log time-to-peak assumed before a culture shows its own (≈ ±20 %), and how
 * many feedings' worth of weight that assumption carries. Assumption (from memory of logbooks
 * generally; no published figure).
 */
export const PRIOR_RESIDUAL_SD = 0.2;
export const PRIOR_RESIDUAL_DOF = 4;

/**
 * Feedings this far from "now" count half (KineticsOptions.halfLifeFeedings): about three weeks
 * of daily feeding, so a culture that changes is followed. The benchmark finds no half-life from
 * 5 to ∞ better by more than 0.3 points of median error on the simulated forward runs (10.7–10.9 %),
 * so this one stays for the reason it was chosen.
 */
export const DEFAULT_HALF_LIFE_FEEDINGS = 20;

/**
 * The temperature model used unless a caller asks for another, picked by bench/model-bench.ts
 * with a rule fixed beforehand: lowest median % error of leave-one-out peak predictions on the
 * simulated cultures, candidates within 0.5 points counting as tied, ties going to the lowest
 * mean p90 % error on the real data sets. Run of 2026-12-01 (24 SIMULATED cultures, 1,028
 * predictions; median / p90 % error):
 *   CTMI fitted 10.8 / 27.7, CTMI fixed 10.8 / 27.8, Ratkowsky 1983 fitted 10.8 / 27.8,
 *   Ratkowsky fixed 10.9 / 27.7, Q10 fitted 11.2 / 30.3, Q10 fixed 11.6 / 31.1
 *   (baselines: same as last 30.9 / 106.0, last × Q10 = 2 21.9 / 66.4).
 * Four cardinal variants tie; mean p90 % error over Gause, Gänzle lactobacilli and Gänzle yeast
 * (leave-one-temperature-out): Ratkowsky fitted 62.5, Ratkowsky fixed 72.6, CTMI fixed 74.8,
 * CTMI fitted 122.6 — so Ratkowsky 1983 with Tmin and c fitted per culture. The simulation is
 * built on CTMI, so its tie is not a home advantage for the winner.
 */
export const DEFAULT_KINETICS_MODEL: KineticsModelName = 'ratkowsky1983';

/** Ratkowsky 1983 fitted to Gänzle's lactobacilli table (fit.test.ts reproduces it). */
export const GANZLE_LACTOBACILLI_RATKOWSKY = { tMin: 5.79, tMax: 41.33, c: 0.131 } as const;

/** How a model's per-culture temperature parameters map to a TemperatureModel, with priors. */
export interface TemperatureParameterSpec {
  names: readonly string[];
  mean: readonly number[];
  sd: readonly number[];
  lower: readonly number[];
  upper: readonly number[];
  build(theta: readonly number[]): TemperatureModel;
}

export function temperatureSpec(model: KineticsModelName): TemperatureParameterSpec {
  switch (model) {
    case 'q10':
      // ln Q10 ~ N(ln 2.59, 0.35): 2σ spans Q10 1.3–5.2, the range of Q10s implied by Gänzle's
      // table (1.7–4, SOURCES.md §1e) with room either side.
      return {
        names: ['lnQ10'],
        mean: [Math.log(DEFAULT_Q10)],
        sd: [0.35],
        lower: [Math.log(1.01)],
        upper: [Math.log(20)],
        build: (t) => ({ kind: 'q10', q10: Math.exp(t[0] ?? Math.log(DEFAULT_Q10)) }),
      };
    case 'ctmi':
      // Gänzle's lactobacilli cardinals as the centre (SOURCES.md §1a); sd 2.5 °C lets a
      // yeast-led culture (Tmin 8, Topt 28) move there within 2σ. Tmax stays at 41 °C: kitchens
      // never get near it, so the data cannot say anything about it.
      return {
        names: ['tMin', 'tOpt'],
        mean: [LACTOBACILLI_CARDINALS.tMin, LACTOBACILLI_CARDINALS.tOpt],
        sd: [2.5, 2.5],
        lower: [-10, 25],
        upper: [20, 40],
        build: (t) => ({
          kind: 'ctmi',
          tMin: t[0] ?? LACTOBACILLI_CARDINALS.tMin,
          tOpt: t[1] ?? LACTOBACILLI_CARDINALS.tOpt,
          tMax: LACTOBACILLI_CARDINALS.tMax,
        }),
      };
    case 'ratkowsky1983':
      return {
        names: ['tMin', 'lnC'],
        mean: [GANZLE_LACTOBACILLI_RATKOWSKY.tMin, Math.log(GANZLE_LACTOBACILLI_RATKOWSKY.c)],
        sd: [2.5, 0.5],
        lower: [-10, Math.log(0.01)],
        upper: [20, Math.log(3)],
        build: (t) => ({
          kind: 'ratkowsky1983',
          tMin: t[0] ?? GANZLE_LACTOBACILLI_RATKOWSKY.tMin,
          tMax: GANZLE_LACTOBACILLI_RATKOWSKY.tMax,
          c: Math.exp(t[1] ?? Math.log(GANZLE_LACTOBACILLI_RATKOWSKY.c)),
        }),
      };
  }
}
