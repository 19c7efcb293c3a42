// The model's answers the planner needs: how long the levain takes to peak, when bulk ends, and
// how long a room-temperature proof runs. Everything else in a plan is the baker's own minutes.
import { predictBulkEnd } from '../bulk/bulk-end.js';
import { type AliquotReading, type BulkEstimate, type BulkInput } from '../bulk/types.js';
import { predictNextPeak } from '../kinetics/predict.js';
import { relativeRate } from '../temperature/models.js';
import { type ForecastSegment, type TemperatureSample } from '../temperature/series.js';
import { MS_PER_HOUR, formatInstant, parseMs } from '../temperature/time.js';
import { BakersMathError } from '../units/bakers-math-error.js';
import { PROOF_SHARE_OF_BULK } from './defaults.js';
import { type ResolvedPlan } from './resolve-input.js';

export interface HoursWithInterval {
  hours: number;
  lowHours: number;
  highHours: number;
}

/**
 * Levain feeding to peak, hours, at the starter's constant temperature — the same for any feeding
 * time, so the planner computes it once. The feed's dilution is the ratio's (1 : 2 : 2 → 5).
 */
export function starterPeakHours(plan: ResolvedPlan): HoursWithInterval {
  const { ratio, temperatureC } = plan.starter;
  const p = predictNextPeak(plan.kinetics, {
    fedAt: formatInstant(plan.nowMs, null),
    starterG: ratio.starter,
    flourG: ratio.flour,
    waterG: ratio.water,
    temperatureC,
  });
  if (p.hoursToPeak === null) {
    throw new BakersMathError(
      'starter.temperatureC',
      `the levain does not peak within two weeks at ${temperatureC} °C`,
    );
  }
  return { hours: p.hoursToPeak, lowHours: p.lowHours ?? p.hoursToPeak, highHours: p.highHours ?? p.hoursToPeak };
}

export interface BulkRun {
  /** A constant dough temperature replacing the input's (the temperature lever). */
  doughC?: number | null;
  temperatures?: readonly TemperatureSample[];
  readings?: readonly AliquotReading[];
}

// The search builds many timelines with the same mix time: one estimate per plan and mix time.
const memo = new WeakMap<ResolvedPlan, Map<string, BulkEstimate>>();

/** The bulk model for a dough mixed at `mixMs` (when the levain went in). */
export function bulkEstimate(plan: ResolvedPlan, mixMs: number, run: BulkRun = {}): BulkEstimate {
  const live = !!run.temperatures?.length || !!run.readings?.length;
  const key = `${mixMs}|${run.doughC ?? ''}`;
  const cache = memo.get(plan) ?? new Map<string, BulkEstimate>();
  memo.set(plan, cache);
  const hit = live ? undefined : cache.get(key);
  if (hit) return hit;
  const estimate = estimateBulk(plan, mixMs, run);
  if (!live) cache.set(key, estimate);
  return estimate;
}

/** The part of a forecast still ahead of the last logged reading (the readings replace the rest). */
function forecastAfter(forecast: readonly ForecastSegment[], logged: readonly TemperatureSample[]): ForecastSegment[] {
  const last = Math.max(...logged.map((t) => parseMs(t.at)));
  const ahead = forecast.filter((f) => f.until === undefined || parseMs(f.until) > last);
  return ahead.map((f) => {
    const from = f.from !== undefined && parseMs(f.from) > last ? f.from : undefined;
    return { c: f.c, ...(from === undefined ? {} : { from }), ...(f.until === undefined ? {} : { until: f.until }) };
  });
}

function estimateBulk(plan: ResolvedPlan, mixMs: number, run: BulkRun): BulkEstimate {
  const dough: BulkInput = { ...plan.dough, mixedAt: formatInstant(mixMs, null) };
  if (run.doughC !== undefined && run.doughC !== null) {
    dough.temperatureC = run.doughC;
    delete dough.forecast;
  } else if (run.temperatures?.length) {
    // With logged readings the dough stays at the last one (the series holds it), unless the
    // baker gave a forecast; the planned constant would otherwise override what was measured.
    delete dough.temperatureC;
    if (dough.forecast) dough.forecast = forecastAfter(dough.forecast, run.temperatures);
  }
  if (run.temperatures?.length) dough.temperatures = run.temperatures;
  if (run.readings?.length) dough.readings = run.readings;
  let estimate: BulkEstimate;
  try {
    estimate = predictBulkEnd(dough, { kinetics: plan.kinetics });
  } catch (error) {
    if (error instanceof RangeError && !(error instanceof BakersMathError)) {
      throw new BakersMathError('dough', `dough: ${error.message}`);
    }
    throw error;
  }
  if (estimate.hoursFromMix === null) {
    throw new BakersMathError('dough.temperatureC', 'at this dough temperature bulk does not finish within two weeks');
  }
  return estimate;
}

/**
 * A room-temperature proof: the baker's hours, or PROOF_SHARE_OF_BULK of the bulk's work (hours
 * at 24 °C, already scaled by salt and the jar's pace) at the proof temperature, with the bulk's
 * own relative spread as its interval.
 */
export function proofHours(plan: ResolvedPlan, bulk: BulkEstimate): HoursWithInterval | null {
  if (plan.proof.hours !== null) return null;
  const rate = relativeRate(plan.kinetics.temperatureModel, plan.proof.temperatureC, plan.kinetics.referenceC);
  if (!(rate > 0)) {
    throw new BakersMathError('steps.finalProof.temperatureC', 'the dough does not rise at this proof temperature');
  }
  const hours = (PROOF_SHARE_OF_BULK * bulk.hoursAtReference) / rate;
  const mid = bulk.hoursFromMix ?? 0;
  const spread = (h: number | null): number => (mid > 0 && h !== null ? h / mid : 1);
  return { hours, lowHours: hours * spread(bulk.lowHours), highHours: hours * spread(bulk.highHours) };
}

export const hoursToMs = (h: number): number => h * MS_PER_HOUR;
