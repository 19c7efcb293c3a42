import {
  BakersMathError,
  PLAN_DEFAULTS,
  replanBake,
  type AliquotReading,
  type BakePlanView,
  type CheckedStep,
  type DoughReading,
  type KitchenSummary,
  type LivePlan,
  type PlanProgress,
  type TemperatureSample,
} from '@peakwise/shared';
import type { BakePlanRow, CheckedStepRow, DoughReadingRow, PlanLog } from './bake-plan.repository.js';

// The live Bench: the stored plan re-planned at "now" from what the baker checked off and logged.
// Dough temperatures become the temperature series the model integrates (with a kitchen logger's
// room series, the dough's estimated one); the aliquot jar's rise becomes the readings that
// rescale the bulk.

export function toCheckedStep(row: CheckedStepRow): CheckedStep {
  return { stepId: row.stepId, startedAt: row.startedAt.toISOString(), endedAt: row.endedAt?.toISOString() ?? null };
}

export function toDoughReading(row: DoughReadingRow): DoughReading {
  return {
    id: row.id,
    takenAt: row.takenAt.toISOString(),
    temperatureC: row.temperatureC,
    risePct: row.risePct,
    createdAt: row.createdAt.toISOString(),
  };
}

export function livePlan(
  row: Pick<BakePlanRow, 'input' | 'timing'>,
  { checked, readings, kitchen }: PlanLog,
  now: Date,
): LivePlan {
  const doughTemperatures: TemperatureSample[] = readings.flatMap((r) =>
    r.temperatureC === null ? [] : [{ at: r.takenAt.toISOString(), c: r.temperatureC }],
  );
  const aliquotReadings: AliquotReading[] = readings.flatMap((r) =>
    r.risePct === null ? [] : [{ at: r.takenAt.toISOString(), risePct: r.risePct }],
  );
  // The input keeps its creation "now": the planner checks readyAt against it, and it was valid then.
  const progress: PlanProgress = {
    now: now.toISOString(),
    done: checked.map((c) => ({
      id: c.stepId,
      startedAt: c.startedAt.toISOString(),
      ...(c.endedAt ? { endedAt: c.endedAt.toISOString() } : {}),
    })),
    doughTemperatures,
    kitchenTemperatures: kitchen.map((k) => ({ at: k.takenAt.toISOString(), c: k.temperatureC })),
    aliquotReadings,
  };
  try {
    return replanBake(row.input, row.timing, progress);
  } catch (error) {
    // A logged value the model cannot carry through (a dough at 0 °C never ends its bulk): the
    // plan stays readable, without the readings, and says why, so the baker can correct them.
    if (!(error instanceof BakersMathError)) throw error;
    const plain = replanBake(row.input, row.timing, { now: progress.now, done: progress.done });
    const why = `the logged readings put the end of bulk out of reach (${error.message}); the timeline leaves them out until they are corrected`;
    return { ...plain, warnings: [...plain.warnings, why] };
  }
}

/**
 * Step ids a check-off may name: those of the live timeline, and every set of folds the plan asked
 * for (a set the live timeline dropped because the bulk ends early may still have been done).
 */
export function stepIdsOf(row: Pick<BakePlanRow, 'input'>, live: LivePlan): Set<string> {
  const ids = new Set(live.steps.map((s) => s.id));
  const sets = row.input.steps?.folds?.sets ?? PLAN_DEFAULTS.foldSets;
  for (let k = 1; k <= Math.round(sets); k++) ids.add(`fold-${k}`);
  return ids;
}

function kitchenSummary(kitchen: PlanLog['kitchen']): KitchenSummary | null {
  const first = kitchen[0];
  const last = kitchen[kitchen.length - 1];
  if (!first || !last) return null;
  return { count: kitchen.length, firstAt: first.takenAt.toISOString(), lastAt: last.takenAt.toISOString() };
}

export function toView(row: BakePlanRow, log: PlanLog, now: Date): BakePlanView {
  const { checked, readings, kitchen } = log;
  return {
    id: row.id,
    name: row.name,
    status: row.status,
    formulaId: row.formulaId,
    formulaName: row.formulaName,
    cultureId: row.cultureId,
    cultureName: row.cultureName,
    settings: row.settings,
    timing: row.timing,
    kineticsBasis: row.kineticsBasis,
    live: livePlan(row, log, now),
    checked: checked.map(toCheckedStep),
    readings: readings.map(toDoughReading),
    kitchen: kitchenSummary(kitchen),
    dairyOrEgg: row.dairyOrEgg,
    notes: row.notes,
    rating: row.rating,
    feedingId: row.feedingId,
    finishedAt: row.finishedAt?.toISOString() ?? null,
    cancelledAt: row.cancelledAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
