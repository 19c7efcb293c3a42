// replanBake: the live Bench. Steps checked off keep their actual times; the levain's peak, the
// bulk end (now from the logged dough temperatures and the aliquot jar, through predictBulkEnd)
// and every step after them move; an action that is due but not done moves to "now".
import { type AliquotReading } from '../bulk/types.js';
import { doughFromKitchen } from '../temperature/kitchen.js';
import { type TemperatureSample } from '../temperature/series.js';
import { MS_PER_HOUR, parseMs } from '../temperature/time.js';
import { BakersMathError, requireFinite } from '../units/bakers-math-error.js';
import { starterPeakHours } from './durations.js';
import { formatSteps, quietClashReason } from './format.js';
import { liveTemperatureLever } from './live-lever.js';
import { bulkSpreadWarnings, planQuiet } from './plan-bake.js';
import { resolvePlanInput } from './resolve-input.js';
import { buildTimeline, type Anchors, type Live } from './timeline.js';
import { type LivePlan, type PlanInput, type PlanProgress, type PlanTiming } from './types.js';
import { formatInZone } from './zone.js';

function time(value: unknown, path: string): number {
  try {
    if (typeof value !== 'string') throw new RangeError('not a string');
    return parseMs(value);
  } catch {
    throw new BakersMathError(path, `${path} must be an ISO 8601 time with an offset`);
  }
}

function optionalTime(value: unknown, path: string): number | null {
  return value === null || value === undefined ? null : time(value, path);
}

function list(value: unknown, path: string): unknown[] {
  if (value === undefined) return [];
  if (!Array.isArray(value)) throw new BakersMathError(path, `${path} must be an array`);
  return value;
}

function item(value: unknown, path: string): Record<string, unknown> {
  if (typeof value !== 'object' || value === null) throw new BakersMathError(path, `${path} must be an object`);
  return value as Record<string, unknown>;
}

function readLive(progress: PlanProgress): Live & { kitchen: TemperatureSample[] } {
  const p = item(progress, 'progress');
  const done = new Map<string, { start: number; end: number | null }>();
  list(p.done, 'progress.done').forEach((raw, i) => {
    const at = `progress.done.${i}`;
    const d = item(raw, at);
    if (typeof d.id !== 'string' || !d.id) throw new BakersMathError(`${at}.id`, `${at}.id must be a step id`);
    const start = time(d.startedAt, `${at}.startedAt`);
    const end = optionalTime(d.endedAt, `${at}.endedAt`);
    if (end !== null && end < start)
      throw new BakersMathError(`${at}.endedAt`, `${at}.endedAt must not be before startedAt`);
    done.set(d.id, { start, end });
  });
  const temperatures = samples(p.doughTemperatures, 'progress.doughTemperatures');
  const kitchen = samples(p.kitchenTemperatures, 'progress.kitchenTemperatures');
  const readings: AliquotReading[] = list(p.aliquotReadings, 'progress.aliquotReadings').map((raw, i) => {
    const at = `progress.aliquotReadings.${i}`;
    const r = item(raw, at);
    time(r.at, `${at}.at`);
    const risePct = requireFinite(r.risePct, `${at}.risePct`);
    if (risePct < 0 || risePct > 1000) throw new BakersMathError(`${at}.risePct`, `${at}.risePct must be 0–1000`);
    return { at: r.at as string, risePct };
  });
  return { nowMs: time(p.now, 'progress.now'), done, temperatures, readings, kitchen };
}

function samples(value: unknown, path: string): TemperatureSample[] {
  return list(value, path).map((raw, i) => {
    const at = `${path}.${i}`;
    const r = item(raw, at);
    time(r.at, `${at}.at`);
    const c = requireFinite(r.c, `${at}.c`);
    if (c < -5 || c > 50) throw new BakersMathError(`${at}.c`, `${at}.c must be between -5 and 50 °C`);
    return { at: r.at as string, c };
  });
}

export function replanBake(input: PlanInput, timing: PlanTiming, progress: PlanProgress): LivePlan {
  const plan = resolvePlanInput(input);
  const t = item(timing, 'timing');
  if (t.kind !== 'same-day' && t.kind !== 'overnight-retard') {
    throw new BakersMathError('timing.kind', 'timing.kind must be "same-day" or "overnight-retard"');
  }
  const doughC =
    t.doughTemperatureC === null || t.doughTemperatureC === undefined
      ? null
      : requireFinite(t.doughTemperatureC, 'timing.doughTemperatureC');
  const anchors: Anchors = {
    kind: t.kind,
    mixMs: time(t.mixAt, 'timing.mixAt'),
    bakeMs: optionalTime(t.bakeAt, 'timing.bakeAt'),
    readyMs: optionalTime(t.readyAt, 'timing.readyAt'),
    doughC,
  };
  if (anchors.kind === 'overnight-retard' && anchors.bakeMs === null) {
    throw new BakersMathError('timing.bakeAt', 'timing.bakeAt is needed for a retard plan');
  }
  const { kitchen, ...live } = readLive(progress);
  if (kitchen.length > 0) {
    // The room series becomes the dough's estimated series from the mix on (the actual mix if
    // checked off), starting at the dough temperature the plan assumed.
    live.temperatures = doughFromKitchen({
      kitchen,
      dough: live.temperatures ?? [],
      mixMs: live.done.get('mix')?.start ?? anchors.mixMs,
      mixC: doughC ?? plan.doughC,
    });
  }
  const starter = plan.starter.skip ? null : starterPeakHours(plan);
  const timeline = buildTimeline(plan, starter, anchors, live);
  const quiet = planQuiet(plan);
  const clash = quietClashReason(plan, timeline.steps, quiet);
  const at = (ms: number): string => formatInZone(ms, plan.timeZone);
  const bulk = timeline.bulk;
  const endDone = live.done.get('bulk-end');
  const fromMix = (h: number | null): string | null => (h === null ? null : at(timeline.mixMs + h * MS_PER_HOUR));
  return {
    now: at(live.nowMs),
    timing: {
      kind: anchors.kind,
      mixAt: at(timeline.mixMs),
      bakeAt: anchors.kind === 'overnight-retard' ? at(timeline.bakeMs) : null,
      readyAt: anchors.readyMs === null ? null : at(anchors.readyMs),
      doughTemperatureC: doughC,
    },
    steps: formatSteps(plan, timeline.steps, quiet),
    bulk: {
      status: endDone ? 'done' : bulk.status,
      endAt: endDone ? at(endDone.start) : fromMix(bulk.hoursFromMix),
      low: endDone ? null : fromMix(bulk.lowHours),
      high: endDone ? null : fromMix(bulk.highHours),
      rateScale: bulk.rateScale,
      readingsUsed: bulk.readingsUsed,
    },
    readyAt: at(timeline.readyMs),
    temperatureLever: liveTemperatureLever(plan, timeline, live, quiet, doughC),
    warnings: [...timeline.warnings, ...(clash ? [clash] : []), ...bulkSpreadWarnings(plan, timeline, bulk, quiet)],
  };
}
