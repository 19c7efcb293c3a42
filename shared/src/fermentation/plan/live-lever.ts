// The lever while baking: bulk is running and its end would put the shaping into quiet hours.
// Moving the dough now to a warmer spot can finish it before the night, a cooler one after it;
// the temperature comes from the model through doughTemperatureForBulkEnd (with the readings so
// far), rounded to half a degree in the direction that still makes it, and the nearer of the two
// to the dough's present temperature is offered.
import { formatInstant } from '../temperature/time.js';
import { DEFAULTS } from './defaults.js';
import { clock } from './format.js';
import {
  bulkHoursAfterChange,
  doughTemperatureForBulkEnd,
  warmestUsefulC,
  type DoughTemperatureRequest,
} from './lever.js';
import { type ResolvedPlan } from './resolve-input.js';
import { type Live, type Timeline } from './timeline.js';
import { type LiveTemperatureLever } from './types.js';
import { formatInZone, overlapsQuiet, type Interval } from './zone.js';

const MIN = 60_000;
const HOUR = 60 * MIN;

export function liveTemperatureLever(
  plan: ResolvedPlan,
  t: Timeline,
  live: Live,
  quiet: readonly Interval[],
  doughC: number | null,
): LiveTemperatureLever | null {
  const shape = t.steps.find((s) => s.kind === 'shape');
  if (!shape || shape.done || live.done.has('bulk-end') || t.bulk.status !== 'fermenting') return null;
  const night = quiet.find((q) => overlapsQuiet(shape.start, shape.end, [q]));
  if (!night) return null;
  const base: DoughTemperatureRequest = {
    dough: doughC === null ? plan.dough : { ...plan.dough, temperatureC: doughC },
    mixedAt: formatInstant(t.mixMs, null),
    wantedEndAt: '',
    kinetics: plan.kinetics,
    changeAt: formatInstant(live.nowMs, null),
    ...(live.temperatures?.length ? { temperatures: live.temperatures } : {}),
    ...(live.readings?.length ? { readings: live.readings } : {}),
  };
  const last = live.temperatures?.reduce((a, b) => (Date.parse(b.at) >= Date.parse(a.at) ? b : a));
  const current = last?.c ?? doughC ?? plan.doughC;
  const lo = DEFAULTS.leverMinC;
  const hi = warmestUsefulC(plan.kinetics, lo, DEFAULTS.leverMaxC);
  const targets = [
    { end: night.start - plan.min.shape * MIN, round: (c: number) => Math.ceil(c * 2) / 2, words: 'before' },
    { end: night.end, round: (c: number) => Math.floor(c * 2) / 2, words: 'after' },
  ];
  let best: LiveTemperatureLever | null = null;
  let bestGap = Infinity;
  for (const target of targets) {
    if (target.end <= live.nowMs) continue;
    const req = { ...base, wantedEndAt: formatInstant(target.end, null) };
    const answer = doughTemperatureForBulkEnd({ ...req, minC: lo, maxC: hi });
    if (!answer.reachable) continue;
    const c = Math.min(hi, Math.max(lo, target.round(answer.temperatureC)));
    const endMs = t.mixMs + bulkHoursAfterChange(req, c, plan.kinetics) * HOUR;
    const gap = Math.abs(c - current);
    if (gap >= bestGap || c === Math.round(current * 2) / 2) continue;
    bestGap = gap;
    const spot = c > current ? 'warmer' : 'cooler';
    best = {
      doughTemperatureC: c,
      fromAt: formatInZone(live.nowMs, plan.timeZone),
      bulkEndAt: formatInZone(endMs, plan.timeZone),
      reason:
        `shaping would fall in quiet hours ${plan.quiet?.label ?? ''}: a ${spot} spot near ${c.toFixed(1)} °C from now ` +
        `ends bulk near ${clock(endMs, plan.timeZone)}, ${target.words} them`,
    };
  }
  return best;
}
