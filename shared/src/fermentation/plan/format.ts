// Raw timelines (epoch ms) into the plan's shapes: ISO times in the baker's zone, cautions, the
// quiet-hour clashes, and the words a reason is made of.
import { cautionsFor } from './cautions.js';
import { type ResolvedPlan } from './resolve-input.js';
import { type RawStep } from './timeline.js';
import { type PlanStep, type PlanStepKind } from './types.js';
import { formatInZone, localParts, overlapsQuiet, type Interval } from './zone.js';

/** Steps in time order (ties keep the order they were placed in). */
export function formatSteps(plan: ResolvedPlan, steps: readonly RawStep[], quiet: readonly Interval[]): PlanStep[] {
  const at = (ms: number): string => formatInZone(ms, plan.timeZone);
  return steps
    .map((s, i) => ({ s, i }))
    .sort((x, y) => x.s.start - y.s.start || x.i - y.i)
    .map(({ s }): PlanStep => ({
      id: s.id,
      kind: s.kind,
      startAt: at(s.start),
      endAt: at(s.end),
      action: s.action,
      done: s.done,
      inQuietHours: s.action && overlapsQuiet(s.start, s.end, quiet),
      uncertainty: s.uncertainty
        ? { ...s.uncertainty, low: at(s.uncertainty.low), high: at(s.uncertainty.high) }
        : null,
      cautions: cautionsFor(s.kind, plan.flags),
      ...(s.temperatureC === undefined ? {} : { temperatureC: s.temperatureC }),
      ...(s.set === undefined ? {} : { set: s.set }),
    }));
}

const NAMES: Record<PlanStepKind, string> = {
  'feed-starter': 'feeding the starter',
  'starter-rise': 'the levain rising',
  mix: 'mixing',
  rest: 'the rest',
  'add-salt': 'adding the salt',
  bulk: 'bulk fermentation',
  fold: 'a set of folds',
  'bulk-end': 'the end of bulk',
  shape: 'dividing and shaping',
  proof: 'the final proof',
  retard: 'the cold retard',
  'take-out': 'taking the dough out of the fridge',
  preheat: 'preheating',
  bake: 'baking',
  cool: 'cooling',
  finish: 'slicing or storing',
};

export function stepName(kind: PlanStepKind): string {
  return NAMES[kind];
}

const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'] as const;
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;

/**
 * "01:10 on Sat 5 Dec", the local clock in the baker's zone: the words a baker reads in a reason
 * or a warning (the year is never in doubt within a plan's week).
 */
export function clock(ms: number, timeZone: string): string {
  const p = localParts(ms, timeZone);
  const two = (n: number): string => String(n).padStart(2, '0');
  const weekday = WEEKDAYS[new Date(Date.UTC(p.year, p.month - 1, p.day)).getUTCDay()] ?? '';
  return `${two(p.hour)}:${two(p.minute)} on ${weekday} ${p.day} ${MONTHS[p.month - 1] ?? ''}`;
}

/** "dividing and shaping at 01:10 on … and baking at 02:40 on … fall inside quiet hours 23:00–06:30". */
export function quietClashReason(
  plan: ResolvedPlan,
  steps: readonly RawStep[],
  quiet: readonly Interval[],
): string | null {
  const clashes = steps.filter((s) => s.action && !s.done && overlapsQuiet(s.start, s.end, quiet));
  if (clashes.length === 0) return null;
  const kinds = new Set<PlanStepKind>();
  const parts: string[] = [];
  for (const s of clashes) {
    if (kinds.has(s.kind)) continue;
    kinds.add(s.kind);
    parts.push(`${stepName(s.kind)} at ${clock(s.start, plan.timeZone)}`);
  }
  const verb = parts.length > 1 ? 'fall' : 'falls';
  return `${parts.join(', ')} ${verb} inside quiet hours ${plan.quiet?.label ?? ''}`.trim();
}
