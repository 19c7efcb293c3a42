import {
  BakersMathError,
  bakersPercentages,
  blendFlours,
  scaleFormula,
  type ComputeFormulaRequest,
  type FlourBlend,
  type FormulaBlendFlour,
  type FormulaBlendLineView,
  type FormulaCaution,
  type FormulaComputed,
  type FormulaIngredientKind,
  type FormulaScaledView,
  type FormulaScaling,
  type Ingredient,
  type IngredientKind,
  type ScaleTarget,
} from '@peakwise/shared';
import { fieldError } from '../common/validation.js';
import { weighLine } from './formula.weigh.js';

// The computed view of a formula: every number comes from the shared baker's math; this file only
// turns typed amounts into grams, feeds the model, and names its fields as the request does.

export const RAW_DOUGH_CAUTION =
  'Raw flour and raw dough are not ready-to-eat: do not taste the dough, and wash hands, bowls and surfaces after handling it.';
export const DAIRY_EGG_CAUTION =
  'This dough has milk, butter or egg: keep its time at room temperature short, proof it cool where you can, and refrigerate leftovers. Follow your local food-safety advice.';

const DAIRY_OR_EGG: readonly FormulaIngredientKind[] = ['milk', 'butter', 'egg'];
// Kinds whose water the model takes from a food when one is given.
const FOOD_SETS_WATER: readonly FormulaIngredientKind[] = ['milk', 'butter', 'egg', 'sugar', 'salt', 'yeast', 'other'];

/** The model has no "inclusion": seeds and fruit count like any other line without water. */
const modelKind = (kind: FormulaIngredientKind): IngredientKind => (kind === 'inclusion' ? 'other' : kind);

/** The shared model's ingredients for a typed formula, with each line's weighing. */
export function toModelIngredients(request: ComputeFormulaRequest) {
  const weighed = request.ingredients.map((line, i) => weighLine(line, `ingredients.${i}`));
  const ingredients = request.ingredients.map((line, i): Ingredient => {
    const w = weighed[i]!;
    const ingredient: Ingredient = { name: line.name, kind: modelKind(line.kind), grams: w.grams };
    if (line.kind === 'starter' && line.starterHydrationPct != null) ingredient.hydration = line.starterHydrationPct;
    // Named after its starter, so the total formula reads "Flour in Levain" rather than a bare "flour".
    if (line.kind === 'starter') ingredient.flourName = `Flour in ${line.name}`;
    if (w.food !== undefined && FOOD_SETS_WATER.includes(line.kind)) ingredient.food = w.food;
    return ingredient;
  });
  return { weighed, ingredients };
}

export function scaleTargetOf(scaling: FormulaScaling): ScaleTarget {
  switch (scaling.by) {
    case 'factor':
      return { by: 'factor', factor: scaling.factor ?? Number.NaN };
    case 'dough-weight':
      return { by: 'dough-weight', doughG: scaling.doughG ?? Number.NaN };
    case 'pieces':
      return {
        by: 'pieces',
        pieces: scaling.pieces ?? Number.NaN,
        pieceG: scaling.pieceG ?? Number.NaN,
        lossPercent: scaling.lossPercent ?? 0,
      };
  }
}

function blendLines(blend: FlourBlend): FormulaBlendLineView[] {
  return blend.lines.map((l) => ({
    name: l.name,
    parts: l.parts,
    percent: l.percent,
    grams: l.grams ?? 0,
    roundedG: l.roundedG ?? 0,
  }));
}

function cautionsOf(request: ComputeFormulaRequest): FormulaCaution[] {
  const cautions: FormulaCaution[] = [{ code: 'raw-dough', message: RAW_DOUGH_CAUTION }];
  if (request.ingredients.some((l) => DAIRY_OR_EGG.includes(l.kind))) {
    cautions.push({ code: 'dairy-egg-room-temperature', message: DAIRY_EGG_CAUTION });
  }
  return cautions;
}

/**
 * The computed view of a formula. Throws BakersMathError on input the model refuses (a cup with
 * nothing to weigh it by, no flour); `computeOrFieldError` turns that into a field-named 400.
 */
export function computeFormula(request: ComputeFormulaRequest): FormulaComputed {
  const { weighed, ingredients } = toModelIngredients(request);
  const summary = bakersPercentages(ingredients, 'ingredients');
  const inclusions = new Set(
    request.ingredients.filter((l) => l.kind === 'inclusion').map((l) => l.name.trim().toLowerCase()),
  );
  const kindOf = (kind: IngredientKind, name: string): FormulaIngredientKind =>
    kind === 'other' && inclusions.has(name.trim().toLowerCase()) ? 'inclusion' : kind;
  const saltG = (rows: { kind: IngredientKind; grams: number }[]) =>
    rows.reduce((s, r) => s + (r.kind === 'salt' ? r.grams : 0), 0);

  const blendParts: FormulaBlendFlour[] = request.blend ?? [];
  const warnings = weighed.flatMap((w) => w.warnings);
  let blend: FormulaBlendLineView[] = [];
  if (blendParts.length > 0 && summary.finalDoughFlourG > 0) {
    blend = blendLines(blendFlours(blendParts, summary.finalDoughFlourG, 'blend'));
  } else if (blendParts.length > 0) {
    warnings.push('The blend splits the flour lines, and this formula has none (its flour is all in the starter).');
  }

  return {
    lines: summary.lines.map((l, i) => {
      const typed = request.ingredients[i]!;
      return {
        kind: typed.kind,
        name: typed.name,
        amount: typed.amount,
        unit: typed.unit,
        grams: l.grams,
        gramsBasis: weighed[i]!.basis,
        gramsNote: weighed[i]!.note,
        flourG: l.flourG,
        waterG: l.waterG,
        percentOfTotalFlour: l.percentOfTotalFlour,
        percentOfFinalDoughFlour: l.percentOfFinalDoughFlour,
      };
    }),
    // The model names a starter's water "water"; the baker's own lines start with a capital.
    totalFormula: summary.totalFormula.map((t) => ({
      ...t,
      name: t.name === 'water' ? 'Water' : t.name,
      kind: kindOf(t.kind, t.name),
    })),
    doughWeightG: summary.doughWeightG,
    totalFlourG: summary.totalFlourG,
    totalWaterG: summary.totalWaterG,
    totalHydrationPercent: summary.totalHydrationPercent,
    prefermentedFlourPercent: summary.prefermentedFlourPercent,
    saltPercent: (saltG(summary.totalFormula) / summary.totalFlourG) * 100,
    finalDoughFlourG: summary.finalDoughFlourG,
    finalDoughHydrationPercent: summary.finalDoughHydrationPercent,
    finalDoughSaltPercent:
      summary.finalDoughFlourG > 0 ? (saltG(summary.lines) / summary.finalDoughFlourG) * 100 : null,
    blend,
    scaled: request.scaling ? scaledView(request, ingredients, summary.finalDoughFlourG) : null,
    assumptions: [...weighed.flatMap((w) => w.assumptions), ...summary.assumptions],
    warnings,
    cautions: cautionsOf(request),
  };
}

function scaledView(
  request: ComputeFormulaRequest,
  ingredients: Ingredient[],
  finalDoughFlourG: number,
): FormulaScaledView {
  const scaling = request.scaling!;
  const scaled = scaleFormula(ingredients, scaleTargetOf(scaling), '');
  const blendParts = request.blend ?? [];
  const blend =
    blendParts.length > 0 && finalDoughFlourG > 0
      ? blendLines(blendFlours(blendParts, finalDoughFlourG * scaled.factor, 'blend'))
      : [];
  return {
    scaling,
    factor: scaled.factor,
    doughWeightG: scaled.doughWeightG,
    totalFlourG: scaled.totalFlourG,
    lines: scaled.lines.map((l, i) => ({
      kind: request.ingredients[i]!.kind,
      name: l.name,
      grams: l.grams,
      roundedG: l.roundedG,
    })),
    blend,
    roundingRule: scaled.roundingRule,
  };
}

/** The request field a model error names: grams are typed as `amount`, a scale target as `scaling`. */
export function requestField(path: string): string {
  return path
    .replace(/^(ingredients\.\d+)\.grams$/, '$1.amount')
    .replace(/^(ingredients\.\d+)\.hydration$/, '$1.starterHydrationPct')
    .replace(/^blend\.flours\./, 'blend.')
    .replace(/^target\b/, 'scaling');
}

/** computeFormula, with the model's refusals as a 400 naming the request field. */
export function computeOrFieldError(request: ComputeFormulaRequest): FormulaComputed {
  try {
    return computeFormula(request);
  } catch (error) {
    if (error instanceof BakersMathError) {
      const message = error.message.charAt(0).toUpperCase() + error.message.slice(1);
      throw fieldError(requestField(error.path) || 'ingredients', message.endsWith('.') ? message : `${message}.`);
    }
    throw error;
  }
}
