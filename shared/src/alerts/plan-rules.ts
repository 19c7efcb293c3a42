// Which step reminders a live bake plan wants. Pure: the caller passes the plan as re-planned now.
import type { AlertKind } from '../contracts/alert.js';
import type { BakePlanStatus } from '../contracts/bake-plan.js';
import type { PlanStep, PlanStepKind } from '../fermentation/plan/types.js';
import { alertSlotKey } from './slot-key.js';
import type { WantedAlert } from './types.js';

const MS_PER_MINUTE = 60_000;

/** Every kind planAlerts() produces: all a plan's refresh may cancel (see CULTURE_ALERT_KINDS). */
export const PLAN_ALERT_KINDS = ['plan-step'] as const satisfies readonly AlertKind[];

/**
 * A step reminder an hour late is noise: the baker has moved on and the next step's reminder is
 * coming (common practice for kitchen timers, from memory).
 */
export const PLAN_STEP_STALE_MINUTES = 60;

/** The steps worth a reminder, when (start or end of the step) and what to say. */
const REMINDED: Partial<Record<PlanStepKind, { at: 'start' | 'end'; title: (s: PlanStep) => string; body: string }>> = {
  fold: {
    at: 'start',
    title: (s) => `Fold ${s.set ?? ''}`.trim() + ' is due',
    body: 'Time for a set of stretch-and-folds.',
  },
  'bulk-end': { at: 'start', title: () => 'Bulk fermentation ends', body: 'Check the dough and get ready to shape.' },
  'take-out': { at: 'start', title: () => 'Take the dough out of the fridge', body: 'The cold retard is over.' },
  preheat: { at: 'start', title: () => 'Preheat the oven', body: 'Hot oven ahead: use oven gloves.' },
  bake: {
    at: 'end',
    title: () => 'The bake is done',
    body: 'Take the bread out (hot oven, use oven gloves) and let it cool.',
  },
};

export interface PlanAlertInput {
  accountId: string;
  plan: { id: string; name: string; status: BakePlanStatus; steps: PlanStep[] };
  now: string;
}

/** Reminders for the live plan's hands-on steps not yet checked off; none once finished or cancelled. */
export function planAlerts(input: PlanAlertInput): WantedAlert[] {
  const { plan, accountId } = input;
  if (plan.status !== 'active') return [];
  const now = Date.parse(input.now);
  const out: WantedAlert[] = [];
  for (const step of plan.steps) {
    const rule = REMINDED[step.kind];
    if (!rule || step.done) continue;
    const due = Date.parse(rule.at === 'start' ? step.startAt : step.endAt);
    const stale = due + PLAN_STEP_STALE_MINUTES * MS_PER_MINUTE;
    if (stale <= now) continue;
    out.push({
      slotKey: alertSlotKey(accountId, 'plan-step', plan.id, step.id),
      kind: 'plan-step',
      subjectType: 'bake-plan',
      subjectId: plan.id,
      feedingId: null,
      dueAt: new Date(due).toISOString(),
      staleAt: new Date(stale).toISOString(),
      title: `${plan.name}: ${rule.title(step)}`,
      body: rule.body,
      linkPath: `/bench/${plan.id}`,
    });
  }
  return out;
}
