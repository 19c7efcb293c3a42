import type { MeasureBasis } from '../fermentation/units/grams-from-measure.js';
import { MASS_UNITS, PORTION_UNITS, VOLUME_UNITS } from '../fermentation/units/measure-units.js';
import type { PageQuery, Paged } from './paging.js';

// Formula: a baker's saved formula as typed (any unit, by volume or weight) and the computed view
// the API answers with (grams, baker's percentages in both conventions, hydration, blend, scaling).
// The numbers come from the shared baker's math (fermentation/formula, fermentation/units).

export const FORMULA_NAME_MAX_LENGTH = 80;
export const FORMULA_NOTES_MAX_LENGTH = 2000;
export const FORMULA_INGREDIENT_NAME_MAX_LENGTH = 80;
export const FORMULA_INGREDIENTS_MAX = 40;
export const FORMULA_BLEND_FLOURS_MAX = 10;
/** In the line's own unit; 100 000 g is a large bakery batch, far below it in kg or lb. */
export const FORMULA_AMOUNT_MAX = 100_000;
/** g/mL a baker measured for their own flour; every kitchen ingredient lies well inside this. */
export const FORMULA_DENSITY_MIN = 0.05;
export const FORMULA_DENSITY_MAX = 3;
export const FORMULA_BLEND_PARTS_MAX = 1000;
export const FORMULA_SCALE_FACTOR_MAX = 100;
export const FORMULA_DOUGH_MAX_G = 500_000;
export const FORMULA_PIECES_MAX = 1000;
export const FORMULA_PIECE_MAX_G = 20_000;
/** Dough lost in the bowl and on the bench, % of the mix; above this it is not a loss but a mistake. */
export const FORMULA_LOSS_MAX_PCT = 50;

/**
 * What a line counts as. `inclusion` (seeds, nuts, fruit) brings no water to the hydration; the
 * model counts it as "other". formula_ingredient.kind has a CHECK with this list.
 */
export const FORMULA_INGREDIENT_KINDS = [
  'flour',
  'water',
  'starter',
  'milk',
  'butter',
  'egg',
  'sugar',
  'salt',
  'yeast',
  'inclusion',
  'other',
] as const;
export type FormulaIngredientKind = (typeof FORMULA_INGREDIENT_KINDS)[number];

/** Units a line may be typed in (the model's canonical names); formula_ingredient.unit has a CHECK. */
export const FORMULA_UNITS = [...MASS_UNITS, ...VOLUME_UNITS, ...PORTION_UNITS] as const;
export type FormulaUnit = (typeof FORMULA_UNITS)[number];

export const FORMULA_SCALE_BY = ['factor', 'dough-weight', 'pieces'] as const;
export type FormulaScaleBy = (typeof FORMULA_SCALE_BY)[number];

// ---- what the baker types

export interface FormulaIngredient {
  kind: FormulaIngredientKind;
  name: string;
  amount: number;
  unit: FormulaUnit;
  /**
   * A food of the catalogue (FOOD_IDS, USDA weights): needed for a volume or a portion unless a
   * density is given; also supplies the water of milk or butter. Water and milk by volume default
   * to tap water and whole milk.
   */
  food?: string | null;
  /** g per mL the baker measured (fresh-milled flour weighs differently); wins over the food's. */
  densityGPerMl?: number | null;
  /** Starter only: water ÷ flour × 100 (a 1:1 starter is 100). 100 when left out. */
  starterHydrationPct?: number | null;
}

/** One flour of the blend weighed into the mixer, in parts by weight (3 : 1 : 2). */
export interface FormulaBlendFlour {
  name: string;
  parts: number;
}

/** How big a batch to make: give the field(s) `by` names. */
export interface FormulaScaling {
  by: FormulaScaleBy;
  factor?: number;
  /** Total dough weight wanted, g. */
  doughG?: number;
  pieces?: number;
  /** g per piece at dividing. */
  pieceG?: number;
  /** % of the mix that never reaches the scale (bowl, bench); default 0. */
  lossPercent?: number;
}

/** What the editor sends to POST /api/formulas/compute: a formula, saved or not. */
export interface ComputeFormulaRequest {
  ingredients: FormulaIngredient[];
  /** Splits the flour weighed into the mixer (the flour lines together). */
  blend?: FormulaBlendFlour[];
  scaling?: FormulaScaling | null;
}

export interface CreateFormulaRequest extends ComputeFormulaRequest {
  name: string;
  notes?: string | null;
}

/** Only the fields sent change; `ingredients` and `blend` are replaced as a whole when sent. */
export type UpdateFormulaRequest = Partial<CreateFormulaRequest>;

// ---- what the API answers

/** One line as typed, with its weight and both baker's percentages. */
export interface FormulaLineView {
  kind: FormulaIngredientKind;
  name: string;
  amount: number;
  unit: FormulaUnit;
  grams: number;
  /** How the grams were found: a weight unit, USDA's own measure, a density (food's or yours). */
  gramsBasis: MeasureBasis | 'your-density';
  /** e.g. "1 cup = 125 g (USDA)"; null for a weight. */
  gramsNote: string | null;
  /** Flour and water this line brings to the total formula, g. */
  flourG: number;
  waterG: number;
  /** Total-formula convention: % of all the flour, starter flour included. */
  percentOfTotalFlour: number;
  /** Final-dough convention: % of the flour weighed into the mixer (null with no flour line). */
  percentOfFinalDoughFlour: number | null;
}

/** A line of the total formula: starters opened into flour and water, like lines added together. */
export interface FormulaTotalLineView {
  kind: FormulaIngredientKind;
  name: string;
  grams: number;
  /** Of `grams`, how much came inside a starter. */
  prefermentedG: number;
  percentOfTotalFlour: number;
}

export interface FormulaBlendLineView {
  name: string;
  parts: number;
  /** Share of the blend's weight, %. */
  percent: number;
  grams: number;
  /** Whole grams that add up to the rounded flour weight. */
  roundedG: number;
}

export interface FormulaScaledLineView {
  kind: FormulaIngredientKind;
  name: string;
  grams: number;
  /** What to put on the scale (see roundingRule). */
  roundedG: number;
}

export interface FormulaScaledView {
  scaling: FormulaScaling;
  factor: number;
  doughWeightG: number;
  totalFlourG: number;
  /** In the order typed. */
  lines: FormulaScaledLineView[];
  blend: FormulaBlendLineView[];
  roundingRule: string;
}

export const FORMULA_CAUTIONS = ['raw-dough', 'dairy-egg-room-temperature'] as const;
export type FormulaCautionCode = (typeof FORMULA_CAUTIONS)[number];

export interface FormulaCaution {
  code: FormulaCautionCode;
  message: string;
}

export interface FormulaComputed {
  lines: FormulaLineView[];
  totalFormula: FormulaTotalLineView[];
  doughWeightG: number;
  /** All flour, starter flour included. */
  totalFlourG: number;
  /** All water: water lines, starter water, water inside milk, butter and eggs. */
  totalWaterG: number;
  totalHydrationPercent: number;
  /** Flour inside starters ÷ all flour × 100. */
  prefermentedFlourPercent: number;
  /** Salt ÷ all flour × 100. */
  saltPercent: number;
  /** The flour lines weighed into the mixer. */
  finalDoughFlourG: number;
  /** Water lines only ÷ final-dough flour × 100 (null with no flour line). */
  finalDoughHydrationPercent: number | null;
  /** Salt ÷ final-dough flour × 100 (null with no flour line). */
  finalDoughSaltPercent: number | null;
  /** The blend split over finalDoughFlourG; empty without a blend. */
  blend: FormulaBlendLineView[];
  /** Null unless a scaling was given (or saved). */
  scaled: FormulaScaledView | null;
  /** Defaults the calculation had to take (starter hydration, milk type, water by volume…). */
  assumptions: string[];
  /** Things worth a second look (e.g. a volume measured with no density of the baker's own). */
  warnings: string[];
  cautions: FormulaCaution[];
}

export interface Formula {
  id: string;
  name: string;
  notes: string | null;
  ingredients: FormulaIngredient[];
  blend: FormulaBlendFlour[];
  scaling: FormulaScaling | null;
  computed: FormulaComputed;
  createdAt: string;
  updatedAt: string;
}

/** A list entry: enough for the list page without computing every formula. */
export interface FormulaListItem {
  id: string;
  name: string;
  ingredientCount: number;
  updatedAt: string;
}

/** Newest change first. */
export type FormulaListQuery = PageQuery;
export type FormulaListResponse = Paged<FormulaListItem>;
