import type { CheckedStep, PlanStep } from '@peakwise/shared';
import { dayKey } from './clock';

/**
 * The step the big "Done" button belongs to: the first hands-on step not yet checked off.
 * Waiting steps (the levain rising, bulk, proof, cooling) pass by themselves; the planner moves
 * an overdue hands-on step to now, so the first open one is always the one to do next.
 */
export function currentStep(steps: readonly PlanStep[]): PlanStep | null {
  return steps.find((s) => s.action && !s.done) ?? null;
}

/**
 * The step "Undo" takes back: the latest check-off by its recorded time. Only steps the baker
 * checked off count — a wait that passed with them (the levain's rise) has nothing to undo.
 */
export function lastDoneStep(steps: readonly PlanStep[], checked: readonly CheckedStep[]): PlanStep | null {
  let best: CheckedStep | null = null;
  const at = (c: CheckedStep) => Date.parse(c.endedAt ?? c.startedAt);
  for (const c of checked) if (!best || at(c) >= at(best)) best = c;
  return best ? (steps.find((s) => s.id === best.stepId) ?? null) : null;
}

/** Every hands-on step is checked off: time for the finish form. */
export function allDone(steps: readonly PlanStep[]): boolean {
  return steps.length > 0 && steps.every((s) => s.done || !s.action);
}

export type TimelineRow =
  | { type: 'day'; key: string; day: string }
  | { type: 'now'; key: string }
  | { type: 'step'; key: string; step: PlanStep; current: boolean };

/**
 * The rows of the vertical timeline: a day heading whenever the calendar day changes (in the
 * baker's zone), each step, and the now-marker before the first step that has not started yet
 * (after the last one when everything has begun). With `now` undefined no marker is placed.
 */
export function timelineRows(steps: readonly PlanStep[], timeZone: string, now?: Date): TimelineRow[] {
  const rows: TimelineRow[] = [];
  const current = currentStep(steps);
  const nowMs = now?.getTime();
  let placed = nowMs === undefined;
  let lastDay: string | null = null;
  for (const step of steps) {
    const day = dayKey(step.startAt, timeZone);
    if (!placed && Date.parse(step.startAt) > (nowMs ?? 0)) {
      rows.push({ type: 'now', key: 'now' });
      placed = true;
    }
    if (day !== lastDay) {
      rows.push({ type: 'day', key: `day-${day}`, day: step.startAt });
      lastDay = day;
    }
    rows.push({ type: 'step', key: step.id, step, current: step === current });
  }
  if (!placed) rows.push({ type: 'now', key: 'now' });
  return rows;
}

/** Collapse a run of fold sets into one line for the compact option timelines. */
export interface CompactStep {
  step: PlanStep;
  /** For a run of folds: how many sets, and when the last one starts. */
  sets?: number;
  lastAt?: string;
  /** Any step of the line touches quiet hours (for folds: any set). */
  quiet: boolean;
}

/** The steps of an option in short: waiting steps out except bulk, proof and retard; folds as one line. */
export function compactSteps(steps: readonly PlanStep[]): CompactStep[] {
  const out: CompactStep[] = [];
  for (const step of steps) {
    if (!step.action && !['bulk', 'proof', 'retard'].includes(step.kind)) continue;
    const prev = out[out.length - 1];
    if (step.kind === 'fold' && prev?.step.kind === 'fold') {
      prev.sets = (prev.sets ?? 1) + 1;
      prev.lastAt = step.startAt;
      prev.quiet ||= step.inQuietHours;
      continue;
    }
    const quiet = step.inQuietHours;
    out.push(step.kind === 'fold' ? { step, sets: 1, lastAt: step.startAt, quiet } : { step, quiet });
  }
  return out;
}
