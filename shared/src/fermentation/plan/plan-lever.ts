// The lever inside a plan: when the same-day plan does not fit, look for a mix time and a bulk
// end that would fit, and the constant dough temperature (18–30 °C) that joins them — preferring
// the temperature nearest the one the baker has. The bulk's length at each temperature comes from
// a table of the model (0.25 °C steps, interpolated in ln hours); the temperature offered is
// rounded to 0.5 °C (what a baker can set) and checked by building the whole timeline at it.
import { formatInstant } from '../temperature/time.js';
import { DEFAULTS, GRID_MINUTES } from './defaults.js';
import { bulkHoursAt, warmestUsefulC } from './lever.js';
import { solveOption, type ScheduleContext } from './schedule.js';
import { buildTimeline, type Anchors, type Timeline } from './timeline.js';
import { overlapsQuiet, type Interval } from './zone.js';

const MIN = 60_000;
const HOUR = 60 * MIN;
const GRID = GRID_MINUTES * MIN;
const MAX_CHECKS = 400;

const roundHalf = (c: number): number => Math.round(c * 2) / 2;

export interface LeverFound {
  doughC: number;
  bulkEndMs: number;
  anchors: Anchors;
  timeline: Timeline;
}

function table(ctx: ScheduleContext, lo: number, hi: number) {
  const { plan } = ctx;
  const at = formatInstant(plan.nowMs, null);
  const rows: Array<{ c: number; lnH: number }> = [];
  for (let c = lo; c <= hi + 1e-9; c += 0.25)
    rows.push({ c, lnH: Math.log(bulkHoursAt(plan.dough, at, c, plan.kinetics)) });
  if ((rows[rows.length - 1]?.c ?? lo) < hi)
    rows.push({ c: hi, lnH: Math.log(bulkHoursAt(plan.dough, at, hi, plan.kinetics)) });
  /** Temperature for a bulk of `hours`, or null outside the table. */
  return (hours: number): number | null => {
    const l = Math.log(hours);
    for (let i = 1; i < rows.length; i++) {
      const a = rows[i - 1];
      const b = rows[i];
      if (!a || !b) continue;
      if (l <= a.lnH && l >= b.lnH) return a.lnH === b.lnH ? a.c : a.c + ((b.c - a.c) * (a.lnH - l)) / (a.lnH - b.lnH);
    }
    return null;
  };
}

function fits(ctx: ScheduleContext, t: Timeline, quiet: readonly Interval[]): boolean {
  const { plan } = ctx;
  if (t.steps.some((s) => s.action && overlapsQuiet(s.start, s.end, quiet))) return false;
  if (plan.mode === 'start-now') return true;
  if (Math.min(...t.steps.map((s) => s.start)) < plan.nowMs) return false;
  const slack = (plan.readyAtMs ?? 0) - (t.bakeMs + (plan.min.bakeMax + plan.min.cool) * MIN);
  return slack >= -MIN && slack <= (plan.min.maxHold + 1) * MIN;
}

/**
 * `attempt` is the same-day plan that did not fit (at the baker's temperature): it gives the
 * mix-to-bulk-end and bulk-end-to-bake lengths that do not depend on the bulk's temperature.
 */
export function findTemperatureLever(
  ctx: ScheduleContext,
  attempt: Timeline,
  quiet: readonly Interval[],
): LeverFound | null {
  const { plan } = ctx;
  const lo = DEFAULTS.leverMinC;
  const hi = warmestUsefulC(plan.kinetics, lo, DEFAULTS.leverMaxC);
  const temperatureFor = table(ctx, lo, hi);
  const bulkEnd = attempt.steps.find((s) => s.kind === 'bulk-end')?.start ?? attempt.mixMs;
  const afterBulk = attempt.bakeMs - bulkEnd;
  const lead = attempt.mixMs - Math.min(...attempt.steps.map((s) => s.start));

  const mixes: number[] = [];
  const ends: number[] = [];
  if (plan.mode === 'start-now') {
    mixes.push(attempt.mixMs);
    const shortest = bulkHoursAt(plan.dough, formatInstant(plan.nowMs, null), hi, plan.kinetics);
    const longest = bulkHoursAt(plan.dough, formatInstant(plan.nowMs, null), lo, plan.kinetics);
    for (let e = attempt.mixMs + shortest * HOUR; e <= attempt.mixMs + longest * HOUR; e += GRID) ends.push(e);
  } else {
    const ready = plan.readyAtMs ?? 0;
    const latestEnd = ready - (plan.min.cool + plan.min.bakeMax) * MIN - afterBulk;
    for (let e = latestEnd; e >= latestEnd - plan.min.maxHold * MIN; e -= GRID) ends.push(e);
    for (let m = ready - Math.ceil((ready - latestEnd) / GRID) * GRID; m - lead >= plan.nowMs; m -= GRID) mixes.push(m);
  }
  // A baker sets a spot to the nearest half degree; a lever within that of today's is no lever.
  const current = roundHalf(plan.doughC);
  const candidates: Array<{ mix: number; end: number; c: number; score: number }> = [];
  for (const mix of mixes) {
    for (const end of ends) {
      if (end <= mix) continue;
      const exact = temperatureFor((end - mix) / HOUR);
      if (exact === null) continue;
      const c = Math.min(hi, Math.max(lo, roundHalf(exact)));
      if (c === current) continue;
      // Nearest to the baker's temperature; among equals the later bulk end, then the later mix.
      candidates.push({ mix, end, c, score: Math.abs(exact - plan.doughC) - end * 1e-12 - mix * 1e-15 });
    }
  }
  candidates.sort((a, b) => a.score - b.score);
  const tried = new Set<string>();
  for (const cand of candidates) {
    const key = `${cand.mix}|${cand.c}`;
    if (tried.has(key)) continue;
    tried.add(key);
    if (tried.size > MAX_CHECKS) break;
    const anchors: Anchors = {
      kind: 'same-day',
      mixMs: cand.mix,
      bakeMs: null,
      readyMs: plan.readyAtMs,
      doughC: cand.c,
    };
    const timeline = buildTimeline(plan, ctx.starter, anchors);
    if (!fits(ctx, timeline, quiet)) continue;
    const bulkEndMs = timeline.steps.find((x) => x.kind === 'bulk-end')?.start ?? cand.end;
    return { doughC: cand.c, bulkEndMs, anchors, timeline };
  }
  return null;
}

/**
 * The same lever for the overnight retard, when neither option fits: the retard's own search
 * run at constant bulk temperatures in half degrees, nearest the baker's first.
 */
export function findRetardLever(ctx: ScheduleContext, quiet: readonly Interval[]): LeverFound | null {
  const { plan } = ctx;
  const lo = DEFAULTS.leverMinC;
  const hi = warmestUsefulC(plan.kinetics, lo, DEFAULTS.leverMaxC);
  const current = roundHalf(plan.doughC);
  const temperatures: number[] = [];
  for (let c = Math.ceil(lo * 2) / 2; c <= hi + 1e-9; c += 0.5) if (c !== current) temperatures.push(c);
  temperatures.sort((a, b) => Math.abs(a - plan.doughC) - Math.abs(b - plan.doughC));
  for (const c of temperatures) {
    const s = solveOption(ctx, 'overnight-retard', { quiet, respectNow: true, doughC: c });
    if (!s) continue;
    const bulkEndMs = s.timeline.steps.find((x) => x.kind === 'bulk-end')?.start ?? s.timeline.mixMs;
    return { doughC: c, bulkEndMs, anchors: s.anchors, timeline: s.timeline };
  }
  return null;
}
