import {
  BAKE_PLAN_MAX_DAYS_AHEAD,
  BakersMathError,
  type BakePlanSettings,
  type CultureKinetics,
  type PlanInput,
  type PlanStepOptions,
} from '@peakwise/shared';
import { fieldError } from '../common/validation.js';
import type { DoughFromFormula } from './plan-dough.js';

// From what the baker chose on the form to the planner's input, and the planner's refusals back
// to the request's fields. No I/O: the service passes the formula's dough, the kinetics and "now".

const DAY_MS = 24 * 3_600_000;

/** The settings as they are stored: only what the baker sent, as plain data. */
export function plainSettings(settings: BakePlanSettings): BakePlanSettings {
  const plain = JSON.parse(JSON.stringify(settings)) as BakePlanSettings & Record<string, unknown>;
  // The request shapes extend the settings; keep only the settings' own fields.
  for (const key of ['formulaId', 'cultureId', 'name', 'option', 'useTemperatureLever']) delete plain[key];
  return plain;
}

/** readyAt must lie ahead, and no further than the planner looks. */
export function checkReadyAt(settings: BakePlanSettings, now: Date): void {
  if (settings.mode !== 'ready-at' || settings.readyAt === undefined) return;
  const at = Date.parse(settings.readyAt);
  if (at <= now.getTime()) throw fieldError('readyAt', 'Choose a time in the future.');
  if (at - now.getTime() > BAKE_PLAN_MAX_DAYS_AHEAD * DAY_MS) {
    throw fieldError('readyAt', `Choose a time within ${BAKE_PLAN_MAX_DAYS_AHEAD} days from now.`);
  }
}

/**
 * "prefer" picks the option shown first; the planner reads that from the final proof's kind, so
 * a preference with no final proof chosen becomes a final proof of that kind with its defaults.
 */
function stepsWithPreference(settings: BakePlanSettings): PlanStepOptions | undefined {
  const steps = settings.steps;
  if (!settings.prefer) return steps;
  const kind = settings.prefer === 'overnight-retard' ? 'retard' : 'room';
  if (steps?.finalProof) {
    if (steps.finalProof.kind !== kind) {
      throw fieldError('prefer', `Your final proof is "${steps.finalProof.kind}": prefer the option that matches it.`);
    }
    return steps;
  }
  return { ...steps, finalProof: { kind } };
}

export function planInputOf(
  settings: BakePlanSettings,
  context: { now: Date; timeZone: string; dough: DoughFromFormula; kinetics: CultureKinetics | null },
): PlanInput {
  const input: PlanInput = {
    mode: settings.mode,
    now: context.now.toISOString(),
    timeZone: context.timeZone,
    quietHours: settings.quietHours ?? null,
    dough: { ...context.dough.dough, temperatureC: settings.doughTemperatureC },
    formula: context.dough.flags,
  };
  if (settings.mode === 'ready-at' && settings.readyAt !== undefined) input.readyAt = settings.readyAt;
  if (context.kinetics) input.kinetics = context.kinetics;
  if (settings.starter) input.starter = settings.starter;
  const steps = stepsWithPreference(settings);
  if (steps) input.steps = steps;
  return input;
}

/** The request field behind a planner path: the dough comes from the formula, kinetics from the culture. */
export function requestField(path: string): string {
  if (path === 'dough.temperatureC') return 'doughTemperatureC';
  if (path.startsWith('dough') || path.startsWith('formula')) return 'formulaId';
  if (path.startsWith('kinetics')) return 'cultureId';
  return path || 'settings';
}

/** Runs the planner; its BakersMathError becomes a 400 naming the request field. */
export function withPlannerErrors<T>(run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof BakersMathError) {
      const field = requestField(error.path);
      const words = error.message.charAt(0).toUpperCase() + error.message.slice(1);
      const message = field === error.path ? words : `${words} (${error.path}).`;
      throw fieldError(field, message.endsWith('.') ? message : `${message}.`);
    }
    throw error;
  }
}

/** "Country loaf, ready Sat 5 Dec 09:00" in the baker's zone, within the name's length. */
export function defaultPlanName(formulaName: string, readyAt: string, timeZone: string, maxLength: number): string {
  const when = new Intl.DateTimeFormat('en-GB', {
    timeZone,
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  })
    .format(new Date(readyAt))
    .replace(',', '');
  const tail = `, ready ${when}`;
  const head = [...formulaName]
    .slice(0, Math.max(1, maxLength - [...tail].length))
    .join('')
    .trim();
  return `${head}${tail}`;
}
