import { CAUTION_TEXT, type PlanCaution } from '@peakwise/shared';

// Short names for a caution already spelled out further up the timeline.
export const CAUTION_LABEL: Record<PlanCaution, string> = {
  'raw-dough': 'Raw dough',
  'dairy-egg-room-temperature': 'Dairy or egg out of the fridge',
  'hot-oven': 'Hot oven',
  'hot-sugar': 'Hot sugar',
};

/** The caution in full, always ending with the deference to local codes every caution carries. */
export function cautionText(caution: PlanCaution): string {
  const text = CAUTION_TEXT[caution];
  return /local/i.test(text) ? text : `${text} Follow local food-safety codes.`;
}
