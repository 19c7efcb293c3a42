// Choosing the times of an option. A plan is fixed by its mix time (and, for a retard, its bake
// time), so the search tries those on a 5-minute grid and keeps the first that fits:
//   ready-at, same day — the latest mix whose loaf is cooled by "ready at" and waits at most
//     maxHold for it (the freshest bread);
//   ready-at, retard — the latest bake that fits, then the latest mix giving a fridge time inside
//     the window (bread fresh, the baker's evening short);
//   start-now — mix at the levain's peak; a retard is baked at the first fitting time after its
//     shortest fridge time.
// "Fits": no action step touches quiet hours and (ready-at) nothing starts before now. With
// `bestEffort` (and, if need be, without the "now" rule) the same search returns the candidate
// with the fewest clashes: the nearest attempt to show with its reason.
import { GRID_MINUTES } from './defaults.js';
import { type HoursWithInterval } from './durations.js';
import { type ResolvedPlan } from './resolve-input.js';
import { buildTimeline, type Anchors, type Timeline } from './timeline.js';
import { type PlanOptionKind } from './types.js';
import { overlapsQuiet, type Interval } from './zone.js';

const MIN = 60_000;
const GRID = GRID_MINUTES * MIN;
/** Slack for "cooled by ready-at" when a forecast makes durations shift with the start. */
const TOLERANCE = MIN;

export interface ScheduleContext {
  plan: ResolvedPlan;
  starter: HoursWithInterval | null;
}

export interface SearchRules {
  quiet: readonly Interval[];
  respectNow: boolean;
  /** A constant dough temperature for the bulk (the lever), or null for the input's. */
  doughC: number | null;
  /** No time fits: return the candidate with the fewest action steps in quiet hours. */
  bestEffort?: boolean;
}

export interface Solution {
  anchors: Anchors;
  timeline: Timeline;
}

function clashCount(t: Timeline, quiet: readonly Interval[]): number {
  return t.steps.filter((s) => s.action && overlapsQuiet(s.start, s.end, quiet)).length;
}

/** Keeps the first candidate without clashes, or (best effort) the one with the fewest. */
class Picker {
  best: Solution | null = null;
  private fewest = Infinity;
  constructor(private readonly rules: SearchRules) {}
  /** True when `s` fits: the search can stop. */
  offer(s: Solution): boolean {
    const n = clashCount(s.timeline, this.rules.quiet);
    if (n === 0) {
      this.best = s;
      return true;
    }
    if (this.rules.bestEffort && n < this.fewest) [this.best, this.fewest] = [s, n];
    return false;
  }
}

function firstStart(t: Timeline): number {
  return Math.min(...t.steps.map((s) => s.start));
}

function bakeEnd(ctx: ScheduleContext, t: Timeline): number {
  return t.bakeMs + ctx.plan.min.bakeMax * MIN;
}

function retardHours(t: Timeline): number {
  const r = t.steps.find((s) => s.kind === 'retard');
  return r ? (r.end - r.start) / (60 * MIN) : 0;
}

function build(ctx: ScheduleContext, kind: PlanOptionKind, mixMs: number, bakeMs: number | null, rules: SearchRules) {
  const anchors: Anchors = { kind, mixMs, bakeMs, readyMs: ctx.plan.readyAtMs, doughC: rules.doughC };
  return { anchors, timeline: buildTimeline(ctx.plan, ctx.starter, anchors) };
}

function sameDayReadyAt(ctx: ScheduleContext, rules: SearchRules): Solution | null {
  const { plan } = ctx;
  const ready = plan.readyAtMs ?? 0;
  const coolBy = (t: Timeline): number => bakeEnd(ctx, t) + plan.min.cool * MIN;
  // The mix that cools the loaf exactly by "ready at" (twice, in case a forecast shifts it).
  let mix = ready;
  for (let i = 0; i < 3; i++) mix += ready - coolBy(build(ctx, 'same-day', mix, null, rules).timeline);
  // On the 5-minute grid of "ready at": round clock times, the loaf cooled a little early.
  mix = ready - Math.ceil((ready - mix) / GRID) * GRID;
  const pick = new Picker(rules);
  for (let k = 0; ; k++) {
    const s = build(ctx, 'same-day', mix - k * GRID, null, rules);
    const slack = ready - coolBy(s.timeline);
    if (slack < -TOLERANCE) continue;
    if (slack > plan.min.maxHold * MIN + TOLERANCE) break;
    if (rules.respectNow && firstStart(s.timeline) < plan.nowMs) break;
    if (pick.offer(s)) break;
  }
  return pick.best;
}

function retardReadyAt(ctx: ScheduleContext, rules: SearchRules): Solution | null {
  const { plan } = ctx;
  const ready = plan.readyAtMs ?? 0;
  const m = plan.min;
  const latestBake = ready - (m.cool + m.bakeMax) * MIN;
  const probe = build(ctx, 'overnight-retard', ready, latestBake, rules).timeline;
  // Mix to end of shaping, at the probe's start: the bulk is near enough time-invariant.
  const shapeEnd = probe.steps.find((s) => s.kind === 'shape')?.end ?? ready;
  const prefix = shapeEnd - probe.mixMs;
  const pick = new Picker(rules);
  for (let bake = latestBake; bake >= latestBake - m.maxHold * MIN - TOLERANCE; bake -= GRID) {
    const fridgeIn = (h: number): number => bake - m.takeOut * MIN - h * 60 * MIN - prefix;
    // Mix times on the grid of "ready at", latest first, for a fridge time in the window.
    const first = ready - Math.ceil((ready - fridgeIn(plan.retard.minHours)) / GRID) * GRID;
    const last = fridgeIn(plan.retard.maxHours) - GRID;
    for (let mix = first; mix >= last; mix -= GRID) {
      const s = build(ctx, 'overnight-retard', mix, bake, rules);
      const hours = retardHours(s.timeline);
      if (hours < plan.retard.minHours - 1e-9 || s.timeline.bakeMs !== bake) continue;
      if (hours > plan.retard.maxHours + 1e-9) break;
      if (rules.respectNow && firstStart(s.timeline) < plan.nowMs) break;
      if (pick.offer(s)) return s;
    }
  }
  return pick.best;
}

function startNow(ctx: ScheduleContext, kind: PlanOptionKind, rules: SearchRules): Solution | null {
  const { plan } = ctx;
  const mix = plan.nowMs + (ctx.starter && !plan.starter.skip ? ctx.starter.hours * 60 * MIN : 0);
  const pick = new Picker(rules);
  if (kind === 'same-day') {
    pick.offer(build(ctx, kind, mix, null, rules));
    return pick.best;
  }
  const probe = build(ctx, kind, mix, null, rules).timeline;
  const shapeEnd = probe.steps.find((s) => s.kind === 'shape')?.end ?? mix;
  const earliest = Math.ceil((shapeEnd + (plan.retard.minHours * 60 + plan.min.takeOut) * MIN) / GRID) * GRID;
  const latest = shapeEnd + (plan.retard.maxHours * 60 + plan.min.takeOut) * MIN;
  for (let bake = earliest; bake <= latest + 1; bake += GRID) {
    if (pick.offer(build(ctx, kind, mix, bake, rules))) break;
  }
  return pick.best;
}

export function solveOption(ctx: ScheduleContext, kind: PlanOptionKind, rules: SearchRules): Solution | null {
  if (ctx.plan.mode === 'start-now') return startNow(ctx, kind, rules);
  return kind === 'same-day' ? sameDayReadyAt(ctx, rules) : retardReadyAt(ctx, rules);
}
