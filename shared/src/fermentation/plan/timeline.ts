// One pass forward through the steps of a bake from what fixes its times — the mix, and for a
// retard the bake, for "ready at" the ready time — plus, when live, the steps already checked off
// (kept at their actual times) and the dough's readings. Times are epoch ms here; format.ts turns
// them into the baker's zone. Planning and re-planning both come through this one function, so a
// re-plan moves exactly the steps a plan would have placed.
import { type BulkEstimate } from '../bulk/types.js';
import { type AliquotReading } from '../bulk/types.js';
import { type TemperatureSample } from '../temperature/series.js';
import { bulkEstimate, hoursToMs, proofHours, type HoursWithInterval } from './durations.js';
import { type ResolvedPlan } from './resolve-input.js';
import { type PlanOptionKind, type PlanStepKind, type StepUncertainty } from './types.js';

const MIN = 60_000;

export interface Anchors {
  kind: PlanOptionKind;
  mixMs: number;
  /** Retard: the bake's start. */
  bakeMs: number | null;
  /** "Ready at": the end of cooling, if later than the shortest cooling. */
  readyMs: number | null;
  doughC: number | null;
}

export interface Live {
  nowMs: number;
  done: ReadonlyMap<string, { start: number; end: number | null }>;
  temperatures?: readonly TemperatureSample[];
  readings?: readonly AliquotReading[];
}

export interface RawStep {
  id: string;
  kind: PlanStepKind;
  start: number;
  end: number;
  action: boolean;
  done: boolean;
  uncertainty: (Omit<StepUncertainty, 'low' | 'high'> & { low: number; high: number }) | null;
  temperatureC?: number;
  set?: number;
}

export interface Timeline {
  steps: RawStep[];
  bulk: BulkEstimate;
  mixMs: number;
  bakeMs: number;
  readyMs: number;
  warnings: string[];
}

export function buildTimeline(
  plan: ResolvedPlan,
  starter: HoursWithInterval | null,
  a: Anchors,
  live?: Live,
): Timeline {
  const steps: RawStep[] = [];
  const warnings: string[] = [];
  const m = plan.min;
  const actual = (id: string) => live?.done.get(id);
  // A step not checked off cannot happen before now — unless a later one was checked off, so it
  // happened unrecorded (or was skipped) and stays where it was planned.
  const order = sequence(plan.folds);
  const rank = new Map(order.map((id, i) => [id, i]));
  const lastDone = live ? Math.max(-1, ...[...live.done.keys()].map((id) => rank.get(id) ?? -1)) : -1;
  const current = (id: string): boolean => (rank.get(id) ?? Infinity) > lastDone;
  let placing = '';
  const notBefore = (t: number, action: boolean): number =>
    live && action && current(placing) ? Math.max(t, live.nowMs) : t;
  const place = (
    id: string,
    kind: PlanStepKind,
    start: number,
    minutes: number,
    action: boolean,
    extra: Partial<RawStep> = {},
  ): RawStep => {
    const done = actual(id);
    placing = id;
    const s = done ? done.start : notBefore(start, action);
    const step: RawStep = {
      id,
      kind,
      start: s,
      end: done?.end ?? s + minutes * MIN,
      action,
      done: !!done,
      uncertainty: null,
      ...extra,
    };
    steps.push(step);
    return step;
  };
  /** A waiting step between two steps: done once the step after it is. */
  const wait = (
    id: string,
    kind: PlanStepKind,
    start: number,
    end: number,
    next: string,
    extra: Partial<RawStep> = {},
  ) => place(id, kind, start, (end - start) / MIN, false, { done: !!actual(next) || !!actual(id), ...extra });

  let mixStart = a.mixMs;
  if (starter && !plan.starter.skip) {
    const feed = place('feed-starter', 'feed-starter', a.mixMs - hoursToMs(starter.hours), m.feed, true);
    const peak = feed.start + hoursToMs(starter.hours);
    placing = 'mix';
    mixStart = actual('mix')?.start ?? notBefore(peak, true);
    wait('starter-rise', 'starter-rise', feed.end, Math.max(mixStart, feed.end), 'mix', {
      temperatureC: plan.starter.temperatureC,
      uncertainty: {
        low: feed.start + hoursToMs(starter.lowHours),
        high: feed.start + hoursToMs(starter.highHours),
        level: 0.8,
        source: 'starter-peak',
      },
    });
  }
  const mix = place('mix', 'mix', mixStart, m.mix, true);
  let cursor = mix.end;
  if (m.rest > 0) cursor = place('rest', 'rest', cursor, m.rest, false).end;
  if (m.salt > 0) cursor = place('add-salt', 'add-salt', cursor, m.salt, true).end;

  const bulk = bulkEstimate(plan, mix.start, {
    doughC: a.doughC,
    ...(live?.temperatures ? { temperatures: live.temperatures } : {}),
    ...(live?.readings ? { readings: live.readings } : {}),
  });
  const predicted = mix.start + hoursToMs(bulk.hoursFromMix ?? 0);
  const endDone = actual('bulk-end');
  placing = 'bulk-end';
  const bulkEnd = endDone ? endDone.start : Math.max(notBefore(predicted, true), cursor);
  const bulkUnc = {
    low: mix.start + hoursToMs(bulk.lowHours ?? 0),
    high: mix.start + hoursToMs(bulk.highHours ?? 0),
    level: 0.8,
    source: 'bulk-end' as const,
  };
  const doughC = a.doughC ?? plan.doughC;
  wait('bulk', 'bulk', cursor, bulkEnd, 'bulk-end', { temperatureC: doughC, uncertainty: bulkUnc });
  let foldAt = cursor;
  for (let k = 1; k <= plan.folds; k++) {
    const id = `fold-${k}`;
    placing = id;
    if (!actual(id) && notBefore(foldAt + m.foldInterval * MIN, true) + m.foldEach * MIN > bulkEnd) {
      warnings.push(`only ${k - 1} of ${plan.folds} sets of folds fit before the bulk ends`);
      break;
    }
    foldAt = place(id, 'fold', foldAt + m.foldInterval * MIN, m.foldEach, true, { set: k }).start;
  }
  place('bulk-end', 'bulk-end', bulkEnd, 0, true, { uncertainty: bulkUnc });
  const shape = place('shape', 'shape', bulkEnd, m.shape, true);

  let bakeStart: number;
  if (a.kind === 'same-day') {
    const proof = proofHours(plan, bulk);
    const hours = proof?.hours ?? plan.proof.hours ?? 0;
    const done = actual('proof');
    const end = done?.end ?? actual('bake')?.start ?? shape.end + hoursToMs(hours);
    wait('proof', 'proof', shape.end, end, 'bake', {
      temperatureC: plan.proof.temperatureC,
      uncertainty: proof
        ? {
            low: shape.end + hoursToMs(proof.lowHours),
            high: shape.end + hoursToMs(proof.highHours),
            level: 0.8,
            source: 'final-proof',
          }
        : null,
    });
    bakeStart = end;
  } else {
    const { minHours, maxHours, fridgeC } = plan.retard;
    let takeOut = (a.bakeMs ?? shape.end) - m.takeOut * MIN;
    const hours = (takeOut - shape.end) / hoursToMs(1);
    if (!actual('take-out') && hours < minHours - 1e-9) {
      takeOut = shape.end + hoursToMs(minHours);
      warnings.push(`the bake moves later so the dough still gets ${minHours} h in the fridge`);
    } else if (hours > maxHours + 1e-9) {
      warnings.push(`the retard runs ${hours.toFixed(1)} h, longer than ${maxHours} h`);
    }
    wait('retard', 'retard', shape.end, takeOut, 'take-out', { temperatureC: fridgeC });
    bakeStart = place('take-out', 'take-out', takeOut, m.takeOut, true).end;
  }
  bakeStart = actual('bake')?.start ?? bakeStart;
  if (live && current('preheat') && bakeStart - m.preheat * MIN < live.nowMs) {
    bakeStart = live.nowMs + m.preheat * MIN;
  }
  place('preheat', 'preheat', bakeStart - m.preheat * MIN, m.preheat, true, { temperatureC: plan.ovenC });
  const bake = place('bake', 'bake', bakeStart, m.bakeMax, true, { temperatureC: plan.ovenC });
  bake.uncertainty = {
    low: bake.start + m.bakeMin * MIN,
    high: bake.start + m.bakeMax * MIN,
    level: null,
    source: 'bake-time',
  };
  const ready = Math.max(bake.end + m.cool * MIN, a.readyMs ?? -Infinity);
  wait('cool', 'cool', bake.end, ready, 'finish');
  const finish = place('finish', 'finish', ready, m.finish, true);
  return { steps, bulk, mixMs: mix.start, bakeMs: bake.start, readyMs: finish.start, warnings };
}

/** Step ids in the order they happen, for "was a later step checked off?". */
function sequence(folds: number): string[] {
  const foldIds = Array.from({ length: folds }, (_, i) => `fold-${i + 1}`);
  return [
    ...['feed-starter', 'starter-rise', 'mix', 'rest', 'add-salt', 'bulk'],
    ...foldIds,
    ...['bulk-end', 'shape', 'proof', 'retard', 'take-out', 'preheat', 'bake', 'cool', 'finish'],
  ];
}
