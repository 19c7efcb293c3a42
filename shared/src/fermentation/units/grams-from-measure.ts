import { BakersMathError, fieldPath, requireNonNegative } from './bakers-math-error.js';
import { findFood, type Food, type FoodId } from './food-catalogue.js';
import {
  gramsPer,
  isMassUnit,
  isPortionUnit,
  millilitresPer,
  parseMeasureUnit,
  type MassStandard,
  type MeasureUnit,
  type VolumeStandard,
} from './measure-units.js';

/** "2 tbsp butter-unsalted", "1.5 lb", "250 ml whole-milk". */
export interface Measure {
  amount: number;
  unit: string;
  /** Catalogue id (see FOODS); needed for volumes and portions, optional for weights. */
  food?: string;
}

export interface MeasureOptions {
  /** Which cup/spoon/fl oz the recipe means; default 'us-customary' (NIST). */
  volumeStandard?: VolumeStandard;
  /** Which ounce; default 'avoirdupois'. */
  massStandard?: MassStandard;
}

/**
 * - `mass`: a weight unit, exact.
 * - `usda-household-measure`: USDA weighed this very measure of this food (1 tsp salt = 6.0 g),
 *   used as is because a spoonful packs differently from a cupful.
 * - `density`: volume × the food's density (from its largest USDA volume measure).
 */
export type MeasureBasis = 'mass' | 'usda-household-measure' | 'density';

export interface GramsFromMeasure {
  grams: number;
  unit: MeasureUnit;
  basis: MeasureBasis;
  food?: FoodId;
  /** Present for volumes: the volume in mL under the chosen standard. */
  millilitres?: number;
  densityGPerMl?: number;
}

/**
 * Grams in a measure. Throws BakersMathError with a path relative to `at` (e.g. `ingredients.3`)
 * for an unknown unit or food, a volume without a food, or a food with no density.
 */
export function gramsFromMeasure(measure: Measure, options: MeasureOptions = {}, at = ''): GramsFromMeasure {
  const amount = requireNonNegative(measure.amount, fieldPath(at, 'amount'));
  const unitPath = fieldPath(at, 'unit');
  const unit = parseMeasureUnit(measure.unit, unitPath);
  const food = measure.food === undefined ? undefined : findFood(measure.food, fieldPath(at, 'food'));
  const foodPart = food === undefined ? {} : { food: food.id as FoodId };

  if (isMassUnit(unit)) {
    return { grams: amount * gramsPer(unit, options.massStandard, unitPath), unit, basis: 'mass', ...foodPart };
  }
  if (food === undefined) {
    throw new BakersMathError(fieldPath(at, 'food'), `a measure in "${unit}" needs a food to know what it weighs`);
  }
  if (isPortionUnit(unit)) {
    const portion = food.measures.find((x) => x.unit === unit);
    if (portion === undefined) {
      throw new BakersMathError(unitPath, `${food.name} has no USDA "${unit}" portion; weigh it instead`);
    }
    return { grams: amount * portion.grams, unit, basis: 'usda-household-measure', ...foodPart };
  }

  const standard = options.volumeStandard ?? 'us-customary';
  const millilitres = amount * millilitresPer(unit, standard, unitPath);
  // USDA weighed its measures in US customary cups and spoons (its 1 cup of water weighs 237 g,
  // matching 236.6 mL, not 240 or 250 mL), so a measured weight only stands for that standard.
  const weighed = standard === 'us-customary' ? food.measures.find((x) => x.unit === unit) : undefined;
  if (weighed !== undefined) {
    return { grams: amount * weighed.grams, unit, basis: 'usda-household-measure', millilitres, ...foodPart };
  }
  const density = requireDensity(food, unitPath);
  return { grams: millilitres * density, unit, basis: 'density', millilitres, densityGPerMl: density, ...foodPart };
}

function requireDensity(food: Food, path: string): number {
  if (food.densityGPerMl === null) {
    throw new BakersMathError(path, `${food.name} has no known density, so it cannot be measured by volume`);
  }
  return food.densityGPerMl;
}
