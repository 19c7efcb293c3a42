import { BakersMathError, fieldPath, requireNonNegative, requirePositive } from '../units/bakers-math-error.js';
import type { Ingredient, IngredientKind } from './ingredient.js';

/*
 * The other direction of the Guild layout (total formula → preferment + final dough): a baker who
 * designs in total-formula percentages needs to know what to weigh into the mixer once the levain
 * has taken its share of the flour and water.
 */

export interface TotalFormulaLineSpec {
  name: string;
  kind: Exclude<IngredientKind, 'starter'>;
  /** % of total flour. The flour lines add up to 100. */
  percent: number;
  waterFraction?: number;
  food?: string;
}

export interface PrefermentSpec {
  name: string;
  /** Water ÷ flour × 100. */
  hydration: number;
  /** Give exactly one: the share of total flour prefermented, or the preferment's weight. */
  prefermentedFlourPercent?: number;
  grams?: number;
  /** The flour line the preferment is made with; default: taken from every flour line in proportion. */
  flourName?: string;
}

export interface TotalFormulaSpec {
  totalFlourG: number;
  lines: TotalFormulaLineSpec[];
  preferment: PrefermentSpec;
}

export interface FinalDough {
  /** The lines to weigh into the mixer, the preferment as a starter line (feed to bakersPercentages). */
  ingredients: Ingredient[];
  prefermentG: number;
  prefermentFlourG: number;
  prefermentWaterG: number;
  prefermentedFlourPercent: number;
}

export function finalDoughFromTotalFormula(spec: TotalFormulaSpec, at = ''): FinalDough {
  const totalFlourG = requirePositive(spec.totalFlourG, fieldPath(at, 'totalFlourG'));
  const lines = spec.lines;
  if (!Array.isArray(lines)) throw new BakersMathError(fieldPath(at, 'lines'), 'lines must be a list');
  const grams = lines.map(
    (l, i) => (requireNonNegative(l.percent, fieldPath(at, 'lines', i, 'percent')) / 100) * totalFlourG,
  );
  const flourPercent = lines.reduce((s, l) => s + (l.kind === 'flour' ? l.percent : 0), 0);
  if (Math.abs(flourPercent - 100) > 1e-9) {
    throw new BakersMathError(fieldPath(at, 'lines'), `the flour lines add up to ${flourPercent} %, not 100 %`);
  }

  const p = spec.preferment;
  const pAt = fieldPath(at, 'preferment');
  const h = requireNonNegative(p.hydration, fieldPath(pAt, 'hydration')) / 100;
  if ((p.grams === undefined) === (p.prefermentedFlourPercent === undefined)) {
    throw new BakersMathError(pAt, 'give the preferment either grams or prefermentedFlourPercent');
  }
  const prefermentFlourG =
    p.grams !== undefined
      ? requireNonNegative(p.grams, fieldPath(pAt, 'grams')) / (1 + h)
      : (requireNonNegative(p.prefermentedFlourPercent, fieldPath(pAt, 'prefermentedFlourPercent')) / 100) *
        totalFlourG;
  const prefermentWaterG = prefermentFlourG * h;

  const flourFrom = lines.map((l) => l.kind === 'flour' && (p.flourName === undefined || l.name === p.flourName));
  if (!flourFrom.some(Boolean)) {
    throw new BakersMathError(fieldPath(pAt, 'flourName'), `no flour line is named "${String(p.flourName)}"`);
  }
  const take = (which: boolean[], amount: number, path: string, what: string): number[] => {
    const pool = grams.reduce((s, g, i) => s + (which[i] ? g : 0), 0);
    if (amount > pool * (1 + 1e-12)) {
      throw new BakersMathError(path, `the preferment needs ${amount} g of ${what} but the formula has ${pool} g`);
    }
    return grams.map((g, i) => (which[i] && pool > 0 ? (g / pool) * amount : 0));
  };
  const flourTaken = take(flourFrom, prefermentFlourG, pAt, 'flour');
  const waterTaken = take(
    lines.map((l) => l.kind === 'water'),
    prefermentWaterG,
    fieldPath(pAt, 'hydration'),
    'water',
  );

  const ingredients: Ingredient[] = lines.map((l, i) => {
    const g = (grams[i] ?? 0) - (flourTaken[i] ?? 0) - (waterTaken[i] ?? 0);
    const line: Ingredient = { name: l.name, kind: l.kind, grams: Math.max(0, g) };
    if (l.waterFraction !== undefined) line.waterFraction = l.waterFraction;
    if (l.food !== undefined) line.food = l.food;
    return line;
  });
  const starter: Ingredient = {
    name: p.name,
    kind: 'starter',
    grams: prefermentFlourG + prefermentWaterG,
    hydration: p.hydration,
  };
  if (p.flourName !== undefined) starter.flourName = p.flourName;
  ingredients.push(starter);

  return {
    ingredients,
    prefermentG: prefermentFlourG + prefermentWaterG,
    prefermentFlourG,
    prefermentWaterG,
    prefermentedFlourPercent: (prefermentFlourG / totalFlourG) * 100,
  };
}
