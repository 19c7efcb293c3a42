import type {
  DoughEnrichment,
  FormulaComputed,
  FormulaFlags,
  FormulaIngredientKind,
  PlanDough,
} from '@peakwise/shared';

// A saved formula as the bulk model sees it: the final dough's flour and water (the starter's
// own flour and water kept apart), the starter and its hydration, salt, and milk, butter and sugar
// as enrichment. Eggs only raise the dairy/egg flag: the model has no egg factor. Pure.

export interface DoughFromFormula {
  dough: PlanDough;
  /** For the planner's cautions. */
  flags: Required<FormulaFlags>;
  /** Milk, butter or egg: the room-temperature caution applies. */
  dairyOrEgg: boolean;
}

/**
 * The formula's default batch (its saved scaling) when it has one, else the amounts as typed.
 * Unrounded grams: the model wants the ratios, not what goes on the scale.
 */
export function doughFromFormula(computed: FormulaComputed): DoughFromFormula {
  const factor = computed.scaled?.factor ?? 1;
  const sum = (kinds: readonly FormulaIngredientKind[], pick: (l: FormulaComputed['lines'][number]) => number) =>
    computed.lines.reduce((s, l) => s + (kinds.includes(l.kind) ? pick(l) : 0), 0) * factor;
  const grams = (...kinds: FormulaIngredientKind[]) => sum(kinds, (l) => l.grams);
  const has = (kind: FormulaIngredientKind) => computed.lines.some((l) => l.kind === kind);

  const dough: PlanDough = { flourG: grams('flour'), waterG: grams('water'), starterG: grams('starter') };
  const starterFlourG = sum(['starter'], (l) => l.flourG);
  const starterWaterG = sum(['starter'], (l) => l.waterG);
  if (starterFlourG > 0) dough.starterHydrationPct = (starterWaterG / starterFlourG) * 100;
  const saltG = grams('salt');
  if (saltG > 0) dough.saltG = saltG;

  const enrichment: DoughEnrichment = {};
  const sugarG = grams('sugar');
  const fatG = grams('butter');
  const milkG = grams('milk');
  if (sugarG > 0) enrichment.sugarG = sugarG;
  if (fatG > 0) enrichment.fatG = fatG;
  if (milkG > 0) enrichment.milkG = milkG;
  if (Object.keys(enrichment).length > 0) dough.enrichment = enrichment;

  const flags = { dairy: has('milk') || has('butter'), egg: has('egg'), sugar: has('sugar') };
  return { dough, flags, dairyOrEgg: flags.dairy || flags.egg };
}
