import type { Account, PreviewBakePlanRequest } from '@peakwise/shared';
import { parseNumber, temperatureFromInput, temperatureToInput } from '@/lib/format/units';
import { tomorrowAt, wallTimeToIso } from './zoned-time';

/** The new-plan form as typed: numbers stay text until sent, temperatures in the baker's unit. */
export interface PlanFormValues {
  formulaId: string;
  /** '' = no culture (the planner uses published priors). */
  cultureId: string;
  mode: 'ready-at' | 'start-now';
  /** Wall time in the account's zone, "2026-12-03T09:00". */
  readyAt: string;
  quietOn: boolean;
  quietFrom: string;
  quietUntil: string;
  doughTemperature: string;
  /** The starter is ripe already: no feeding step. */
  starterRipe: boolean;
  foldSets: string;
  foldInterval: string;
  finalProof: 'room' | 'retard';
  /** Blank: the model works out the proof. */
  proofHours: string;
  fridgeTemperature: string;
  retardMinHours: string;
  retardMaxHours: string;
  ovenTemperature: string;
  bakeMinMinutes: string;
  bakeMaxMinutes: string;
}

// Common practice, and the planner's own defaults (shared/README.md "plan").
const DOUGH_C = 24;
const FRIDGE_C = 4;
const OVEN_C = 250;

export function planFormDefaults(account: Account, now: Date, formulaId = ''): PlanFormValues {
  const t = (c: number) => String(temperatureToInput(c, account.temperatureUnit));
  // °F ovens are set in steps of 5 or 25: 250 °C → 480 °F rather than 482.
  const oven =
    account.temperatureUnit === 'F' ? String(Math.round(temperatureToInput(OVEN_C, 'F') / 5) * 5) : t(OVEN_C);
  return {
    formulaId,
    cultureId: '',
    mode: 'ready-at',
    readyAt: tomorrowAt(now, account.timeZone),
    quietOn: true,
    quietFrom: '23:00',
    quietUntil: '06:30',
    doughTemperature: t(DOUGH_C),
    starterRipe: false,
    foldSets: '4',
    foldInterval: '30',
    finalProof: 'room',
    proofHours: '',
    fridgeTemperature: t(FRIDGE_C),
    retardMinHours: '8',
    retardMaxHours: '16',
    ovenTemperature: oven,
    bakeMinMinutes: '40',
    bakeMaxMinutes: '50',
  };
}

/** Form field → the request field the server names in its errors. */
export const PLAN_FIELD_OF = {
  formulaId: 'formulaId',
  cultureId: 'cultureId',
  readyAt: 'readyAt',
  'quietHours.from': 'quietFrom',
  'quietHours.until': 'quietUntil',
  doughTemperatureC: 'doughTemperature',
  'steps.folds.sets': 'foldSets',
  'steps.folds.intervalMinutes': 'foldInterval',
  'steps.finalProof.hours': 'proofHours',
  'steps.finalProof.fridgeC': 'fridgeTemperature',
  'steps.finalProof.minHours': 'retardMinHours',
  'steps.finalProof.maxHours': 'retardMaxHours',
  'steps.oven.temperatureC': 'ovenTemperature',
  'steps.oven.minMinutes': 'bakeMinMinutes',
  'steps.oven.maxMinutes': 'bakeMaxMinutes',
} as const satisfies Record<string, keyof PlanFormValues>;

export type PlanFormProblem = { field: keyof PlanFormValues; message: string };

/**
 * The request the preview and the create both send, or the fields that cannot be sent as typed
 * (the server checks ranges; this only catches what is not a number or a time at all).
 */
export function toPreviewRequest(
  values: PlanFormValues,
  account: Account,
): { request: PreviewBakePlanRequest } | { problems: PlanFormProblem[] } {
  const problems: PlanFormProblem[] = [];
  const number = (field: keyof PlanFormValues, text: string, optional = false): number | undefined => {
    const n = parseNumber(text);
    if (n === null) {
      if (!optional || text.trim() !== '') problems.push({ field, message: 'Enter a number.' });
      return undefined;
    }
    return n;
  };
  const temperature = (field: keyof PlanFormValues, text: string) => {
    const n = number(field, text);
    return n === undefined ? undefined : temperatureFromInput(n, account.temperatureUnit);
  };

  if (values.formulaId === '') problems.push({ field: 'formulaId', message: 'Pick a formula.' });
  let readyAt: string | undefined;
  if (values.mode === 'ready-at') {
    readyAt = wallTimeToIso(values.readyAt, account.timeZone) ?? undefined;
    if (!readyAt) problems.push({ field: 'readyAt', message: 'Enter a date and time.' });
  }
  const clock = /^\d{2}:\d{2}$/;
  if (values.quietOn && !clock.test(values.quietFrom)) problems.push({ field: 'quietFrom', message: 'Enter a time.' });
  if (values.quietOn && !clock.test(values.quietUntil))
    problems.push({ field: 'quietUntil', message: 'Enter a time.' });

  const doughTemperatureC = temperature('doughTemperature', values.doughTemperature);
  const sets = number('foldSets', values.foldSets);
  const intervalMinutes = number('foldInterval', values.foldInterval);
  const minMinutes = number('bakeMinMinutes', values.bakeMinMinutes);
  const maxMinutes = number('bakeMaxMinutes', values.bakeMaxMinutes);
  const ovenC = temperature('ovenTemperature', values.ovenTemperature);
  const finalProof =
    values.finalProof === 'retard'
      ? {
          kind: 'retard' as const,
          fridgeC: temperature('fridgeTemperature', values.fridgeTemperature),
          minHours: number('retardMinHours', values.retardMinHours),
          maxHours: number('retardMaxHours', values.retardMaxHours),
        }
      : { kind: 'room' as const };
  const proofHours = values.finalProof === 'room' ? number('proofHours', values.proofHours, true) : undefined;
  if (problems.length > 0) return { problems };

  return {
    request: {
      formulaId: values.formulaId,
      cultureId: values.cultureId === '' ? null : values.cultureId,
      mode: values.mode,
      ...(readyAt ? { readyAt } : {}),
      quietHours: values.quietOn ? { from: values.quietFrom, until: values.quietUntil } : null,
      doughTemperatureC: doughTemperatureC as number,
      ...(values.starterRipe ? { starter: { skipFeeding: true } } : {}),
      steps: {
        folds: { sets, intervalMinutes },
        finalProof: proofHours === undefined ? finalProof : { kind: 'room', hours: proofHours },
        oven: { temperatureC: ovenC, minMinutes, maxMinutes },
      },
      prefer: values.finalProof === 'retard' ? 'overnight-retard' : 'same-day',
    },
  };
}
