import { BakersMathError, fieldPath, requireFinite, requirePositive } from '../units/bakers-math-error.js';
import { bakersPercentages } from './bakers-percentages.js';
import type { Ingredient, IngredientKind } from './ingredient.js';

/** How big the new batch should be. */
export type ScaleTarget =
  | { by: 'factor'; factor: number }
  /** Total dough weight wanted; the factor is that ÷ the current dough weight. */
  | { by: 'dough-weight'; doughG: number }
  /** Total flour wanted (including flour inside starters). */
  | { by: 'flour-weight'; flourG: number }
  /**
   * Pieces × piece weight at dividing. `lossPercent` is the share of the mixed dough that never
   * reaches the scale (left in the bowl, on the bench, trimmed), so the mix is made that much bigger.
   */
  | { by: 'pieces'; pieces: number; pieceG: number; lossPercent?: number };

export interface ScaledLine {
  name: string;
  kind: IngredientKind;
  /** Exact scaled weight. */
  grams: number;
  /** The weight to put on the scale (see ROUNDING_RULE). */
  roundedG: number;
}

export interface ScaledFormula {
  factor: number;
  doughWeightG: number;
  totalFlourG: number;
  /** The same formula, every weight (and every starter's contents) multiplied by `factor`. */
  ingredients: Ingredient[];
  lines: ScaledLine[];
  roundingRule: string;
}

export const ROUNDING_RULE =
  'nearest 1 g from 10 g up (a kitchen scale’s step), nearest 0.1 g from 1 g to 10 g, nearest 0.01 g below 1 g (a pocket scale’s step for salt and yeast)';

/**
 * Rounds a weight to what a home scale can show without moving a small line's percentage much:
 * the relative rounding error stays at or under 5 % for any line of 1 g or more.
 */
export function roundGrams(grams: number): number {
  const step = grams >= 10 ? 1 : grams >= 1 ? 0.1 : 0.01;
  // Work in whole steps so 0.1-steps do not come back as 2.3000000000000003.
  const steps = Math.round(grams / step);
  return step === 1 ? steps : Number((steps * step).toFixed(step === 0.1 ? 1 : 2));
}

/** Scales a formula while keeping every baker's percentage (and starter hydration) as it was. */
export function scaleFormula(ingredients: readonly Ingredient[], target: ScaleTarget, at = ''): ScaledFormula {
  const summary = bakersPercentages(ingredients, fieldPath(at, 'ingredients'));
  const factor = factorFor(target, summary.doughWeightG, summary.totalFlourG, fieldPath(at, 'target'));
  const scaled = ingredients.map((i) => scaleIngredient(i, factor));
  const scaledSummary = bakersPercentages(scaled, fieldPath(at, 'ingredients'));
  return {
    factor,
    doughWeightG: scaledSummary.doughWeightG,
    totalFlourG: scaledSummary.totalFlourG,
    ingredients: scaled,
    lines: scaledSummary.lines.map((l) => ({
      name: l.name,
      kind: l.kind,
      grams: l.grams,
      roundedG: roundGrams(l.grams),
    })),
    roundingRule: ROUNDING_RULE,
  };
}

function factorFor(target: ScaleTarget, doughG: number, flourG: number, at: string): number {
  switch (target.by) {
    case 'factor':
      return requirePositive(target.factor, fieldPath(at, 'factor'));
    case 'dough-weight':
      return requirePositive(target.doughG, fieldPath(at, 'doughG')) / doughG;
    case 'flour-weight':
      return requirePositive(target.flourG, fieldPath(at, 'flourG')) / flourG;
    case 'pieces': {
      const pieces = requirePositive(target.pieces, fieldPath(at, 'pieces'));
      const pieceG = requirePositive(target.pieceG, fieldPath(at, 'pieceG'));
      const loss = requireFinite(target.lossPercent ?? 0, fieldPath(at, 'lossPercent'));
      if (loss < 0 || loss >= 100) {
        throw new BakersMathError(fieldPath(at, 'lossPercent'), 'lossPercent must be from 0 up to (not including) 100');
      }
      return (pieces * pieceG) / (1 - loss / 100) / doughG;
    }
    default:
      throw new BakersMathError(fieldPath(at, 'by'), 'scale by "factor", "dough-weight", "flour-weight" or "pieces"');
  }
}

function scaleIngredient(ingredient: Ingredient, factor: number): Ingredient {
  const scaled: Ingredient = { ...ingredient };
  if (ingredient.grams !== undefined) scaled.grams = ingredient.grams * factor;
  if (ingredient.contents !== undefined) scaled.contents = ingredient.contents.map((c) => scaleIngredient(c, factor));
  return scaled;
}
