// Shared fixtures for the planner's tests (not exported from the package).
import { type PlanInput, type PlanOption, type PlanStep } from './types.js';

export const ZONE = 'Europe/Berlin';

/** Tartine-like country loaf: 1000 g flour, 750 g water, 200 g levain at 100 %, 20 g salt. */
export const DOUGH = { flourG: 1000, waterG: 750, starterG: 200, saltG: 20, temperatureC: 24 };

export function input(over: Partial<PlanInput> = {}): PlanInput {
  return {
    mode: 'ready-at',
    now: '2026-12-04T08:00:00+01:00',
    readyAt: '2026-12-05T18:00:00+01:00',
    timeZone: ZONE,
    dough: DOUGH,
    ...over,
  };
}

export function step(option: PlanOption | { steps: PlanStep[] }, id: string): PlanStep {
  const s = option.steps.find((x) => x.id === id);
  if (!s) throw new Error(`no step ${id}`);
  return s;
}

export const ms = (iso: string): number => Date.parse(iso);
export const hours = (from: string, to: string): number => (ms(to) - ms(from)) / 3_600_000;

/** Minutes after local midnight on the wall clock of `timeZone`, read by Intl on its own. */
export function wallMinutes(iso: string, timeZone = ZONE): number {
  const parts = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' })
    .formatToParts(new Date(iso))
    .reduce<Record<string, number>>(
      (acc, p) => (p.type === 'literal' ? acc : { ...acc, [p.type]: Number(p.value) }),
      {},
    );
  return (parts.hour ?? 0) * 60 + (parts.minute ?? 0);
}

/** True when the wall-clock span [start, end) of an action touches quiet hours from–until (overnight). */
export function inQuiet(s: PlanStep, from: number, until: number): boolean {
  const inside = (m: number): boolean => (from > until ? m >= from || m < until : m >= from && m < until);
  const a = ms(s.startAt);
  const b = ms(s.endAt);
  for (let t = a; t < b || t === a; t += 60_000) if (inside(wallMinutes(new Date(t).toISOString()))) return true;
  return false;
}
