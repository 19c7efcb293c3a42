import {
  BakersMathError,
  FOODS,
  findFood,
  gramsFromMeasure,
  isMassUnit,
  isPortionUnit,
  isVolumeUnit,
  millilitresPer,
  type FoodId,
  type FormulaIngredient,
  type FormulaLineView,
} from '@peakwise/shared';

/** One line turned into grams, with how that was done in words a baker can check. */
export interface WeighedLine {
  grams: number;
  basis: FormulaLineView['gramsBasis'];
  note: string | null;
  /** The catalogue food used (given, or the default for water and milk by volume). */
  food: FoodId | undefined;
  assumptions: string[];
  warnings: string[];
}

// Water and milk measured by volume are common enough to weigh without asking; anything else
// needs the baker to say what it is, since a cup of rye and a cup of sugar differ by half.
const DEFAULT_FOOD: Partial<Record<FormulaIngredient['kind'], FoodId>> = { water: 'water', milk: 'whole-milk' };

const trim = (x: number, digits = 3): string => String(Number(x.toFixed(digits)));

/** Grams in one typed line. Throws BakersMathError with a path under `at` (e.g. ingredients.2). */
export function weighLine(line: FormulaIngredient, at: string): WeighedLine {
  const unit = line.unit;
  const given = line.food ?? undefined;
  const food = given === undefined ? undefined : (findFood(given, `${at}.food`).id as FoodId);
  if (isMassUnit(unit)) {
    const grams = gramsFromMeasure({ amount: line.amount, unit }, {}, at).grams;
    return { grams, basis: 'mass', note: null, food, assumptions: [], warnings: [] };
  }
  if (line.densityGPerMl != null) {
    if (!isVolumeUnit(unit)) {
      throw new BakersMathError(`${at}.unit`, `a density weighs volumes only; a ${unit} needs a food instead`);
    }
    const density = line.densityGPerMl;
    const grams = line.amount * millilitresPer(unit) * density;
    const note = `1 ${unit} = ${trim(millilitresPer(unit) * density, 1)} g (your ${trim(density)} g/mL)`;
    return { grams, basis: 'your-density', note, food, assumptions: [], warnings: [] };
  }
  const assumed = food === undefined ? DEFAULT_FOOD[line.kind] : undefined;
  const used = food ?? assumed;
  if (used === undefined) {
    throw new BakersMathError(
      `${at}.food`,
      `to weigh a ${unit} of ${line.name}, choose what it is from the food list or enter your own density in g/mL; or give it in g`,
    );
  }
  const measured = gramsFromMeasure({ amount: line.amount, unit, food: used }, {}, at);
  const entry = FOODS[used];
  const perUnit = measured.grams / line.amount;
  const usda = entry.usda ? `USDA SR ${entry.usda.ndb}` : 'catalogue';
  const note =
    measured.basis === 'usda-household-measure'
      ? `1 ${unit} = ${trim(perUnit, 1)} g (${usda}, ${entry.name.toLowerCase()})`
      : `1 ${unit} = ${trim(perUnit, 1)} g (${trim(measured.densityGPerMl ?? 0)} g/mL, ${usda}, ${entry.name.toLowerCase()})`;
  const assumptions = assumed ? [`${line.name}: weighed as ${entry.name.toLowerCase()} (no food chosen)`] : [];
  // Flour by volume swings with how the cup is filled (common practice); a baker's own
  // weighed cup beats a table value, most of all for fresh-milled flour.
  const warnings =
    line.kind === 'flour' && !isPortionUnit(unit)
      ? [
          `${line.name}: a ${unit} of flour weighs more or less with how it is filled; weigh one ${unit} of yours and enter its density for a closer figure`,
        ]
      : [];
  return { grams: measured.grams, basis: measured.basis, note, food: used, assumptions, warnings };
}
