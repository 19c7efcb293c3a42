// planBake: from "ready at" (or "start now") to the options a baker can choose between — the
// same-day plan with a room-temperature proof and the overnight cold retard, each with its full
// times or the reason it does not fit — and, when the same-day plan does not fit, the dough
// temperature that would make it fit.
import { type BulkEstimate } from '../bulk/types.js';
import { MS_PER_HOUR } from '../temperature/time.js';
import { DEFAULTS, GRID_MINUTES } from './defaults.js';
import { starterPeakHours } from './durations.js';
import { clock, formatSteps, quietClashReason, stepName } from './format.js';
import { findRetardLever, findTemperatureLever, type LeverFound } from './plan-lever.js';
import { resolvePlanInput, type ResolvedPlan } from './resolve-input.js';
import { solveOption, type ScheduleContext, type Solution } from './schedule.js';
import { type Timeline } from './timeline.js';
import {
  type BakePlan,
  type PlanInput,
  type PlanOption,
  type PlanOptionKind,
  type PlanTiming,
  type TemperatureLever,
} from './types.js';
import { formatInZone, overlapsQuiet, quietIntervals, type Interval } from './zone.js';

const DAY = 24 * MS_PER_HOUR;

/** Quiet stretches over every time a plan or its attempts could touch. */
export function planQuiet(plan: ResolvedPlan): Interval[] {
  if (!plan.quiet) return [];
  const anchor = plan.readyAtMs ?? plan.nowMs;
  const from = Math.min(plan.nowMs, anchor - DEFAULTS.maxLookaheadHours * MS_PER_HOUR) - DAY;
  const to = Math.max(plan.nowMs + DEFAULTS.maxLookaheadHours * MS_PER_HOUR, anchor) + 2 * DAY;
  return quietIntervals(plan.quiet, plan.timeZone, from, to);
}

export function timingOf(plan: ResolvedPlan, kind: PlanOptionKind, s: Solution): PlanTiming {
  const at = (ms: number): string => formatInZone(ms, plan.timeZone);
  return {
    kind,
    mixAt: at(s.timeline.mixMs),
    bakeAt: kind === 'overnight-retard' ? at(s.timeline.bakeMs) : null,
    readyAt: plan.readyAtMs === null ? null : at(plan.readyAtMs),
    doughTemperatureC: s.anchors.doughC,
  };
}

/** The bulk's 80 % interval: would shaping at either end of it land in quiet hours? */
export function bulkSpreadWarnings(plan: ResolvedPlan, t: Timeline, bulk: BulkEstimate, quiet: readonly Interval[]) {
  const shape = t.steps.find((s) => s.kind === 'shape');
  if (!shape || shape.done || bulk.lowHours === null || bulk.highHours === null) return [];
  const out: string[] = [];
  const length = shape.end - shape.start;
  for (const [h, words] of [
    [bulk.lowHours, 'as early as'],
    [bulk.highHours, 'as late as'],
  ] as const) {
    const start = t.mixMs + h * MS_PER_HOUR;
    if (overlapsQuiet(start, start + length, quiet)) {
      out.push(`the bulk may end ${words} ${clock(start, plan.timeZone)} (80 % interval), inside quiet hours`);
    }
  }
  return out;
}

function toOption(plan: ResolvedPlan, kind: PlanOptionKind, s: Solution, quiet: readonly Interval[]): PlanOption {
  return {
    kind,
    fits: true,
    reason: null,
    timing: timingOf(plan, kind, s),
    steps: formatSteps(plan, s.timeline.steps, quiet),
    readyAt: formatInZone(s.timeline.readyMs, plan.timeZone),
    warnings: [...s.timeline.warnings, ...bulkSpreadWarnings(plan, s.timeline, s.timeline.bulk, quiet)],
  };
}

/**
 * "Ready at 09:00" often misses by minutes only (the oven may not be lit before quiet hours end);
 * a baker would rather eat at 09:05 than be told nothing fits. So when an option cannot be ready
 * in time, the nearest later ready time on the 5-minute grid, up to this far, is offered instead
 * (our own limit: past an hour it is another plan, not the one asked for).
 */
export const LATE_READY_MAX_MINUTES = 60;

function lateOption(ctx: ScheduleContext, kind: PlanOptionKind, quiet: readonly Interval[]): PlanOption | null {
  const { plan } = ctx;
  if (plan.readyAtMs === null) return null;
  for (let late = GRID_MINUTES; late <= LATE_READY_MAX_MINUTES; late += GRID_MINUTES) {
    const later: ResolvedPlan = { ...plan, readyAtMs: plan.readyAtMs + late * 60_000 };
    const found = solveOption({ ...ctx, plan: later }, kind, { quiet, respectNow: true, doughC: null });
    if (!found) continue;
    const option = toOption(later, kind, found, quiet);
    option.warnings.unshift(
      `ready at ${clock(later.readyAtMs ?? 0, plan.timeZone)}, ${late} min later than asked: ` +
        `on time, a hands-on step would fall inside quiet hours`,
    );
    return option;
  }
  return null;
}

function planOption(ctx: ScheduleContext, kind: PlanOptionKind, quiet: readonly Interval[]) {
  const { plan } = ctx;
  const found = solveOption(ctx, kind, { quiet, respectNow: true, doughC: null });
  if (found) return { option: toOption(plan, kind, found, quiet), attempt: found.timeline };
  const late = lateOption(ctx, kind, quiet);
  if (late) return { option: late, attempt: null };
  let attempt = solveOption(ctx, kind, { quiet, respectNow: true, doughC: null, bestEffort: true });
  let reason: string | null = attempt ? quietClashReason(plan, attempt.timeline.steps, quiet) : null;
  if (!attempt) {
    attempt = solveOption(ctx, kind, { quiet, respectNow: false, doughC: null, bestEffort: true });
    const first = attempt?.timeline.steps.reduce((a, b) => (b.start < a.start ? b : a));
    if (first) {
      reason = `not enough time: ${stepName(first.kind)} would have to start at ${clock(first.start, plan.timeZone)}, before now`;
    }
  }
  const option: PlanOption = attempt
    ? { ...toOption(plan, kind, attempt, quiet), fits: false }
    : { kind, fits: false, reason: null, timing: null, steps: [], readyAt: null, warnings: [] };
  option.reason =
    reason ??
    (kind === 'overnight-retard'
      ? `no bake time fits a ${plan.retard.minHours}–${plan.retard.maxHours} h retard`
      : 'no mix time fits');
  return { option, attempt: attempt?.timeline ?? null };
}

function leverOf(
  plan: ResolvedPlan,
  kind: PlanOptionKind,
  lever: LeverFound,
  quiet: readonly Interval[],
): TemperatureLever {
  const bulkEnd = lever.bulkEndMs;
  const spot = lever.doughC > plan.doughC ? 'warmer' : 'cooler';
  const name = kind === 'same-day' ? 'the same-day plan' : 'the overnight retard';
  return {
    doughTemperatureC: lever.doughC,
    currentDoughTemperatureC: plan.doughC,
    bulkEndAt: formatInZone(bulkEnd, plan.timeZone),
    reason:
      `a ${spot} spot: keep the dough near ${lever.doughC.toFixed(1)} °C during bulk (the plan assumed ` +
      `${plan.doughC} °C) so bulk ends by ${clock(bulkEnd, plan.timeZone)}; then ${name} fits`,
    option: toOption(plan, kind, { anchors: lever.anchors, timeline: lever.timeline }, quiet),
  };
}

export function planBake(input: PlanInput): BakePlan {
  const plan = resolvePlanInput(input);
  const ctx: ScheduleContext = { plan, starter: plan.starter.skip ? null : starterPeakHours(plan) };
  const quiet = planQuiet(plan);
  const sameDay = planOption(ctx, 'same-day', quiet);
  const retard = planOption(ctx, 'overnight-retard', quiet);
  const options = [sameDay.option, retard.option];
  // The option asked for, if it fits in time; else one that does; else the nearest late one.
  const onTime = (o: PlanOption): boolean =>
    o.fits && (plan.readyAtMs === null || o.readyAt === null || Date.parse(o.readyAt) <= plan.readyAtMs + 60_000);
  const byPreference = [...options].sort(
    (a, b) => Number(b.kind === plan.requested) - Number(a.kind === plan.requested),
  );
  const recommended = (byPreference.find(onTime) ?? byPreference.find((o) => o.fits))?.kind ?? null;

  let temperatureLever: BakePlan['temperatureLever'] = null;
  if (!sameDay.option.fits && sameDay.attempt) {
    const lever = findTemperatureLever(ctx, sameDay.attempt, quiet);
    if (lever) temperatureLever = leverOf(plan, 'same-day', lever, quiet);
  }
  if (!temperatureLever && !sameDay.option.fits && !retard.option.fits) {
    const lever = findRetardLever(ctx, quiet);
    if (lever) temperatureLever = leverOf(plan, 'overnight-retard', lever, quiet);
  }
  return {
    mode: plan.mode,
    timeZone: plan.timeZone,
    now: formatInZone(plan.nowMs, plan.timeZone),
    readyAt: plan.readyAtMs === null ? null : formatInZone(plan.readyAtMs, plan.timeZone),
    recommended,
    options,
    temperatureLever,
    assumptions: plan.assumptions,
  };
}
