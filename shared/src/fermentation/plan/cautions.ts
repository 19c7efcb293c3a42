// Food-safety cautions, by step. Codes travel in the plan; the words below are the defaults a
// screen can show (and defer to local codes, as every caution in Peakwise does).
import { type PlanCaution, type PlanStepKind } from './types.js';

export const CAUTION_TEXT: Readonly<Record<PlanCaution, string>> = {
  'raw-dough':
    'Raw flour and raw dough are not ready-to-eat: do not taste, and wash hands, tools and surfaces afterwards.',
  'dairy-egg-room-temperature':
    'This dough holds dairy or egg and sits at room temperature here; follow local food-safety guidance on time out of the fridge.',
  'hot-oven': 'Hot oven and pot: use dry oven gloves and keep children and pets away.',
  'hot-sugar': 'The dough has sugar: it browns fast, and hot sugar burns skin — watch the crust and handle with care.',
};

const RAW: readonly PlanStepKind[] = ['feed-starter', 'mix', 'add-salt', 'fold', 'bulk-end', 'shape', 'take-out'];
const ROOM_TEMPERATURE: readonly PlanStepKind[] = ['rest', 'bulk', 'proof'];
const OVEN: readonly PlanStepKind[] = ['preheat', 'bake'];

export function cautionsFor(
  kind: PlanStepKind,
  flags: { dairy: boolean; egg: boolean; sugar: boolean },
): PlanCaution[] {
  const out: PlanCaution[] = [];
  if (RAW.includes(kind)) out.push('raw-dough');
  if ((flags.dairy || flags.egg) && ROOM_TEMPERATURE.includes(kind)) out.push('dairy-egg-room-temperature');
  if (OVEN.includes(kind)) {
    out.push('hot-oven');
    if (flags.sugar) out.push('hot-sugar');
  }
  return out;
}
