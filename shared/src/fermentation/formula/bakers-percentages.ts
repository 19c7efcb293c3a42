import { BakersMathError, fieldPath } from '../units/bakers-math-error.js';
import { openIngredient, type Ingredient, type IngredientKind, type OpenedIngredient } from './ingredient.js';

/*
 * Two conventions, both in use, both reported (Bread Bakers Guild of America, "Formatting Guild
 * Formulas", 2009; SOURCES.md §6b):
 * - total formula: every ingredient as a % of ALL the flour, including the flour inside starters
 *   and preferments; hydration counts all water, including the water inside starters, milk,
 *   butter and eggs. This is the figure that describes the dough.
 * - final-dough line: the lines as weighed into the mixer, each as a % of the flour weighed in
 *   with them; the starter is just another line. This is how many printed recipes read.
 */

export interface FormulaLine {
  name: string;
  kind: IngredientKind;
  grams: number;
  /** Flour and water this line brings to the total formula. */
  flourG: number;
  waterG: number;
  /** Water per gram used for this line (null for flour and starters) and where it came from. */
  waterFraction: number | null;
  waterSource: string;
  /** Total-formula convention: grams ÷ total flour × 100. */
  percentOfTotalFlour: number;
  /** Final-dough-line convention: grams ÷ flour weighed into the final dough × 100 (null if none). */
  percentOfFinalDoughFlour: number | null;
}

/** A line of the total formula: starters opened up and like ingredients added together. */
export interface TotalFormulaLine {
  name: string;
  kind: IngredientKind;
  grams: number;
  /** Of `grams`, how much came inside a starter or preferment. */
  prefermentedG: number;
  percentOfTotalFlour: number;
}

export interface FormulaSummary {
  lines: FormulaLine[];
  totalFormula: TotalFormulaLine[];
  doughWeightG: number;
  /** All flour, including the flour inside starters. */
  totalFlourG: number;
  /** All water: water lines, starter water, and the water inside milk, butter, eggs… */
  totalWaterG: number;
  /** Total-formula hydration: totalWaterG ÷ totalFlourG × 100. */
  totalHydrationPercent: number;
  /** Dough weight ÷ total flour × 100 (the "total %" used to scale). */
  totalPercent: number;
  /** Flour inside starters ÷ total flour × 100. */
  prefermentedFlourPercent: number;
  /** Final-dough line: flour lines weighed into the mixer (starter flour not counted). */
  finalDoughFlourG: number;
  /** Final-dough line: water lines only ÷ final-dough flour × 100 (null if no flour line). */
  finalDoughHydrationPercent: number | null;
  /** Defaults the calculation had to assume (starter hydration, milk or butter type…). */
  assumptions: string[];
}

const percent = (part: number, whole: number): number => (part / whole) * 100;

/**
 * Baker's percentages of a formula given as the lines weighed into the final dough.
 * Throws BakersMathError (path `ingredients.N.field`) on a bad line, or on a formula with no flour.
 */
export function bakersPercentages(ingredients: readonly Ingredient[], at = 'ingredients'): FormulaSummary {
  // Checked as `unknown`: Array.isArray would otherwise widen a readonly array to any[].
  const given: unknown = ingredients;
  if (!Array.isArray(given) || ingredients.length === 0) {
    throw new BakersMathError(at, 'a formula needs at least one ingredient');
  }
  const opened = ingredients.map((ing, i) => openIngredient(ing, fieldPath(at, i)));
  return summarise(opened, at);
}

function summarise(opened: OpenedIngredient[], at: string): FormulaSummary {
  const sum = (f: (o: OpenedIngredient) => number): number => opened.reduce((s, o) => s + f(o), 0);
  const totalFlourG = sum((o) => o.flourG);
  if (!(totalFlourG > 0)) {
    throw new BakersMathError(at, 'a formula needs flour: baker’s percentages are shares of the flour');
  }
  const totalWaterG = sum((o) => o.waterG);
  const doughWeightG = sum((o) => o.grams);
  const finalDoughFlourG = sum((o) => (o.kind === 'flour' ? o.grams : 0));
  const finalDoughWaterG = sum((o) => (o.kind === 'water' ? o.grams : 0));
  const prefermentedFlourG = sum((o) => (o.kind === 'starter' ? o.flourG : 0));

  const lines = opened.map((o): FormulaLine => ({
    name: o.name,
    kind: o.kind,
    grams: o.grams,
    flourG: o.flourG,
    waterG: o.waterG,
    waterFraction: o.waterFraction,
    waterSource: o.waterSource,
    percentOfTotalFlour: percent(o.grams, totalFlourG),
    percentOfFinalDoughFlour: finalDoughFlourG > 0 ? percent(o.grams, finalDoughFlourG) : null,
  }));

  return {
    lines,
    totalFormula: totalFormulaOf(opened, totalFlourG),
    doughWeightG,
    totalFlourG,
    totalWaterG,
    totalHydrationPercent: percent(totalWaterG, totalFlourG),
    totalPercent: percent(doughWeightG, totalFlourG),
    prefermentedFlourPercent: percent(prefermentedFlourG, totalFlourG),
    finalDoughFlourG,
    finalDoughHydrationPercent: finalDoughFlourG > 0 ? percent(finalDoughWaterG, finalDoughFlourG) : null,
    assumptions: opened.flatMap((o) => o.assumptions),
  };
}

/** Adds like parts together: same kind and same name (ignoring case and spacing), in first-seen order. */
function totalFormulaOf(opened: OpenedIngredient[], totalFlourG: number): TotalFormulaLine[] {
  const byKey = new Map<string, TotalFormulaLine>();
  for (const part of opened.flatMap((o) => o.parts)) {
    const key = `${part.kind}:${part.name.trim().toLowerCase().replace(/\s+/g, ' ')}`;
    const line = byKey.get(key) ?? {
      name: part.name,
      kind: part.kind,
      grams: 0,
      prefermentedG: 0,
      percentOfTotalFlour: 0,
    };
    line.grams += part.grams;
    if (part.prefermented) line.prefermentedG += part.grams;
    byKey.set(key, line);
  }
  return [...byKey.values()].map((line) => ({ ...line, percentOfTotalFlour: percent(line.grams, totalFlourG) }));
}
