import type { PlanStep, PlanStepKind } from '@peakwise/shared';

// The step names a baker reads on the Bench, in the trade's words.
const TITLES: Record<PlanStepKind, string> = {
  'feed-starter': 'Feed the starter (levain)',
  'starter-rise': 'Levain rises to its peak',
  mix: 'Mix the dough',
  rest: 'Rest (autolyse)',
  'add-salt': 'Add the salt',
  bulk: 'Bulk fermentation',
  fold: 'Stretch-and-fold',
  'bulk-end': 'End of bulk: check the rise',
  shape: 'Divide and shape',
  proof: 'Final proof on the counter',
  retard: 'Cold retard in the fridge',
  'take-out': 'Out of the fridge, score',
  preheat: 'Preheat the oven',
  bake: 'Bake',
  cool: 'Cool on a rack',
  finish: 'Ready: slice or store',
};

export function stepTitle(step: Pick<PlanStep, 'kind' | 'set'>): string {
  if (step.kind === 'fold' && step.set !== undefined) return `Stretch-and-fold, set ${step.set}`;
  return TITLES[step.kind];
}

/** What the step's temperature is of, for the line under its title. */
export function temperatureRole(kind: PlanStepKind): 'dough' | 'fridge' | 'oven' | 'levain' {
  if (kind === 'retard') return 'fridge';
  if (kind === 'preheat' || kind === 'bake') return 'oven';
  if (kind === 'feed-starter' || kind === 'starter-rise') return 'levain';
  return 'dough';
}

/** Why a range shows: what the model predicts or the baker chose. */
export function uncertaintyWords(source: NonNullable<PlanStep['uncertainty']>['source']): string {
  switch (source) {
    case 'starter-peak':
      return 'Levain peaks';
    case 'bulk-end':
      return 'Bulk ends';
    case 'final-proof':
      return 'Proof ends';
    case 'bake-time':
      return 'Bake ends';
  }
}
