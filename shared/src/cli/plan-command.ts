// `plan`: a bake plan from "ready at" or "start now" (planBake), or — with `timing` (an option's
// timing from an earlier plan) and `progress` (steps checked off, dough temperatures, aliquot
// readings) — the live re-plan (replanBake). The culture's kinetics come from `history`, past
// feedings as in predict-peak; without it the published defaults.
import { fitCultureKinetics } from '../fermentation/kinetics/fit-kinetics.js';
import type { ObservedFeeding } from '../fermentation/kinetics/types.js';
import { planBake } from '../fermentation/plan/plan-bake.js';
import { replanBake } from '../fermentation/plan/replan.js';
import type { PlanInput, PlanProgress, PlanTiming } from '../fermentation/plan/types.js';
import { readPastFeeding } from './fermentation-input.js';
import { InputError, each, object, optionalArray, type JsonObject } from './input.js';

export function planCommand(input: JsonObject): unknown {
  const { history: _history, timing, progress, kinetics, ...rest } = input;
  if (kinetics !== undefined) throw new InputError('kinetics', 'give history (past feedings) instead');
  const usable: ObservedFeeding[] = each(optionalArray(input, 'history', '') ?? [], 'history', readPastFeeding).flatMap(
    (p) => (p.hoursToPeak === null ? [] : [{ ...p.feeding, hoursToPeak: p.hoursToPeak }]),
  );
  const now = typeof rest.now === 'string' ? rest.now : undefined;
  const planInput = {
    ...(rest as unknown as PlanInput),
    ...(usable.length ? { kinetics: fitCultureKinetics(usable, now ? { asOf: now } : {}) } : {}),
  };
  if (timing === undefined && progress === undefined) return planBake(planInput);
  const t = object(timing, 'timing') as unknown as PlanTiming;
  const p = object(progress, 'progress') as unknown as PlanProgress;
  return replanBake(planInput, t, p);
}
