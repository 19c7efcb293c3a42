import { BakersMathError, fieldPath, requireFinite, requireNonNegative } from '../units/bakers-math-error.js';
import { FOODS, findFood, type Food } from '../units/food-catalogue.js';

export const INGREDIENT_KINDS = [
  'flour',
  'water',
  'starter',
  'milk',
  'butter',
  'salt',
  'sugar',
  'yeast',
  'egg',
  'other',
] as const;
export type IngredientKind = (typeof INGREDIENT_KINDS)[number];

/** One line of a formula as the baker weighs it into the final dough. */
export interface Ingredient {
  name: string;
  /** May be left out when `food` says what it is. */
  kind?: IngredientKind;
  /** Required, except for a starter given by `contents` (then it is the contents' sum). */
  grams?: number;
  /** Starter only: water ÷ flour × 100 (a 1:1 starter is 100). Default 100. */
  hydration?: number;
  /** Water per gram (0–1) for milk, butter, egg or anything else; not for flour, water or starter. */
  waterFraction?: number;
  /** A catalogue id (FOODS): supplies the kind and the USDA water fraction. */
  food?: string;
  /** Starter only, without `contents`: what to call its flour in the total formula. Default "flour". */
  flourName?: string;
  /**
   * Starter/preferment only: what it was built from (e.g. poolish = flour, water, a pinch of
   * yeast). When `grams` is also given and differs, only that much of the build goes into the
   * dough and every part is scaled to it.
   */
  contents?: Ingredient[];
}

/** A part of the total formula (a starter opened up into what it was built from). */
export interface FormulaPart {
  name: string;
  kind: IngredientKind;
  grams: number;
  /** True when this part came inside a starter or preferment. */
  prefermented: boolean;
}

/** One ingredient, opened: how much flour and water it brings to the total formula. */
export interface OpenedIngredient {
  name: string;
  kind: IngredientKind;
  grams: number;
  flourG: number;
  waterG: number;
  /** The water fraction used for a non-starter line, and where it came from. */
  waterFraction: number | null;
  waterSource: string;
  /** Defaults this line (or anything inside it) had to assume, as sentences. */
  assumptions: string[];
  parts: FormulaPart[];
}

// Defaults when a milk, butter or egg line gives neither a water fraction nor a food. The milk and
// butter figures are USDA SR values (project table usda_sr_household_weights.csv).
const DEFAULT_WATER: Partial<Record<IngredientKind, WaterFraction>> = {
  milk: {
    fraction: FOODS['whole-milk'].waterFraction,
    source: 'assumed whole milk: USDA SR 01077, 88.13 g/100 g',
    assumed: true,
  },
  butter: {
    fraction: FOODS['butter-unsalted'].waterFraction,
    source: 'assumed unsalted butter: USDA SR 01145, 17.94 g/100 g',
    assumed: true,
  },
  egg: {
    fraction: 0.75,
    source: 'assumed whole egg about 75 % water (from memory; not in the USDA table used)',
    assumed: true,
  },
};

interface WaterFraction {
  fraction: number;
  source: string;
  assumed: boolean;
}

const NO_WATER_FRACTION: readonly IngredientKind[] = ['flour', 'water', 'starter'];

export function openIngredient(ingredient: Ingredient, at: string): OpenedIngredient {
  if (typeof ingredient !== 'object' || ingredient === null) {
    throw new BakersMathError(at, 'each ingredient must be an object');
  }
  const name = ingredient.name;
  if (typeof name !== 'string' || name.trim() === '') {
    throw new BakersMathError(fieldPath(at, 'name'), 'every ingredient needs a name');
  }
  const food = ingredient.food === undefined ? undefined : findFood(ingredient.food, fieldPath(at, 'food'));
  const kind = resolveKind(ingredient, food, at);
  if (kind === 'starter') return openStarter(ingredient, name, at);
  for (const key of ['hydration', 'contents', 'flourName'] as const) {
    if (ingredient[key] !== undefined) {
      throw new BakersMathError(fieldPath(at, key), `${key} only applies to a starter`);
    }
  }
  const grams = requireNonNegative(ingredient.grams, fieldPath(at, 'grams'));
  const part: FormulaPart = { name, kind, grams, prefermented: false };
  if (kind === 'flour') {
    rejectWaterFraction(ingredient, kind, at);
    // Flour's own 11–14 % moisture is not counted in baker's hydration (common practice).
    const waterSource = 'flour';
    return {
      name,
      kind,
      grams,
      flourG: grams,
      waterG: 0,
      waterFraction: null,
      waterSource,
      assumptions: [],
      parts: [part],
    };
  }
  if (kind === 'water') {
    rejectWaterFraction(ingredient, kind, at);
    const waterSource = 'water';
    return {
      name,
      kind,
      grams,
      flourG: 0,
      waterG: grams,
      waterFraction: 1,
      waterSource,
      assumptions: [],
      parts: [part],
    };
  }
  const { fraction, source, assumed } = waterFractionOf(ingredient, kind, food, at);
  const assumptions = assumed ? [`${name}: ${source}`] : [];
  return {
    name,
    kind,
    grams,
    flourG: 0,
    waterG: grams * fraction,
    waterFraction: fraction,
    waterSource: source,
    assumptions,
    parts: [part],
  };
}

function resolveKind(ingredient: Ingredient, food: Food | undefined, at: string): IngredientKind {
  const kind = ingredient.kind ?? food?.kind;
  if (kind === undefined) {
    throw new BakersMathError(fieldPath(at, 'kind'), `give a kind (${INGREDIENT_KINDS.join(', ')}) or a food`);
  }
  if (!INGREDIENT_KINDS.includes(kind)) {
    throw new BakersMathError(
      fieldPath(at, 'kind'),
      `unknown kind "${String(kind)}"; use ${INGREDIENT_KINDS.join(', ')}`,
    );
  }
  return kind;
}

function rejectWaterFraction(ingredient: Ingredient, kind: IngredientKind, at: string): void {
  if (ingredient.waterFraction !== undefined && NO_WATER_FRACTION.includes(kind)) {
    throw new BakersMathError(
      fieldPath(at, 'waterFraction'),
      `a ${kind} line takes no waterFraction (flour counts none, water all, a starter by its hydration)`,
    );
  }
}

function waterFractionOf(
  ingredient: Ingredient,
  kind: IngredientKind,
  food: Food | undefined,
  at: string,
): WaterFraction {
  if (ingredient.waterFraction !== undefined) {
    const fraction = requireFinite(ingredient.waterFraction, fieldPath(at, 'waterFraction'));
    if (fraction < 0 || fraction > 1) {
      throw new BakersMathError(fieldPath(at, 'waterFraction'), 'waterFraction is grams of water per gram, 0 to 1');
    }
    return { fraction, source: 'given', assumed: false };
  }
  if (food?.usda) {
    return {
      fraction: food.waterFraction,
      source: `USDA SR ${food.usda.ndb} ${food.usda.description}`,
      assumed: false,
    };
  }
  if (food)
    return { fraction: food.waterFraction, source: `${food.name} (${food.note ?? 'catalogue'})`, assumed: false };
  return DEFAULT_WATER[kind] ?? { fraction: 0, source: 'counted as no water', assumed: false };
}

function openStarter(ingredient: Ingredient, name: string, at: string): OpenedIngredient {
  rejectWaterFraction(ingredient, 'starter', at);
  if (ingredient.contents !== undefined) return openBuiltStarter(ingredient, name, at);
  const grams = requireNonNegative(ingredient.grams, fieldPath(at, 'grams'));
  const hydration = requireNonNegative(ingredient.hydration ?? 100, fieldPath(at, 'hydration')) / 100;
  // Levain split: flour = L/(1+h), water = L·h/(1+h), with h = water ÷ flour.
  const flourG = grams / (1 + hydration);
  const waterG = grams - flourG;
  const flourName = ingredient.flourName ?? 'flour';
  const source = `starter at ${hydration * 100} % hydration`;
  const assumptions = ingredient.hydration === undefined ? [`${name}: assumed 100 % hydration (none given)`] : [];
  return {
    name,
    kind: 'starter',
    grams,
    flourG,
    waterG,
    waterFraction: null,
    waterSource: source,
    assumptions,
    parts: [
      { name: flourName, kind: 'flour', grams: flourG, prefermented: true },
      { name: 'water', kind: 'water', grams: waterG, prefermented: true },
    ],
  };
}

function openBuiltStarter(ingredient: Ingredient, name: string, at: string): OpenedIngredient {
  if (ingredient.hydration !== undefined || ingredient.flourName !== undefined) {
    const key = ingredient.hydration !== undefined ? 'hydration' : 'flourName';
    throw new BakersMathError(fieldPath(at, key), `give a starter either contents or ${key}, not both`);
  }
  const contents = ingredient.contents;
  if (!Array.isArray(contents) || contents.length === 0) {
    throw new BakersMathError(fieldPath(at, 'contents'), 'contents must list what the starter was built from');
  }
  const opened = contents.map((c, i) => openIngredient(c, fieldPath(at, 'contents', i)));
  const built = opened.reduce((sum, o) => sum + o.grams, 0);
  const grams = ingredient.grams === undefined ? built : requireNonNegative(ingredient.grams, fieldPath(at, 'grams'));
  if (built <= 0) throw new BakersMathError(fieldPath(at, 'contents'), 'a starter built from nothing weighs nothing');
  const share = grams / built;
  return {
    name,
    kind: 'starter',
    grams,
    flourG: share * opened.reduce((sum, o) => sum + o.flourG, 0),
    waterG: share * opened.reduce((sum, o) => sum + o.waterG, 0),
    waterFraction: null,
    waterSource: share === 1 ? 'starter contents' : `starter contents, ${grams} g of a ${built} g build`,
    assumptions: opened.flatMap((o) => o.assumptions.map((a) => `${name} › ${a}`)),
    parts: opened.flatMap((o) => o.parts.map((p) => ({ ...p, grams: p.grams * share, prefermented: true }))),
  };
}
