import type { IngredientKind } from '../formula/ingredient.js';
import { BakersMathError } from './bakers-math-error.js';
import { isVolumeUnit, millilitresPer, type PortionUnit, type VolumeUnit } from './measure-units.js';

/*
 * Foods a baker measures by volume, with USDA National Nutrient Database for Standard Reference,
 * Release 26 (2013) household weights and water content (g/100 g), by NDB number; FDC IDs are the
 * SR Legacy IDs in FoodData Central. Copied by hand from the project's reference table
 * test-fixtures/reference/usda/usda_sr_household_weights.csv; a test re-reads that file and checks
 * every value here, so the two cannot drift apart silently.
 */

export interface UsdaReference {
  ndb: string;
  /** SR Legacy FDC ID; null where none was found (tap water). */
  fdcId: number | null;
  fdcIdStatus: 'matched' | 'inferred' | 'unknown';
  description: string;
}

/** One USDA household measure: `1 <unit>` of this food weighs `grams`. */
export interface HouseholdMeasure {
  unit: VolumeUnit | PortionUnit;
  grams: number;
  /** USDA's own wording of the portion, e.g. "cup packed". */
  usdaPortion: string;
}

export interface Food {
  id: string;
  name: string;
  /** What the food counts as in a formula. */
  kind: IngredientKind;
  /** null for a food USDA SR does not list (its values are borrowed; see `note`). */
  usda: UsdaReference | null;
  /** Water, g per g of food (USDA water g/100 g ÷ 100). */
  waterFraction: number;
  measures: readonly HouseholdMeasure[];
  /** g per mL, from the food's largest USDA volume measure and the NIST US customary volume; null if none. */
  densityGPerMl: number | null;
  /** How the density was obtained, e.g. "USDA SR 20081: 1 cup = 125 g ÷ 236.5882365 mL". */
  densityBasis: string | null;
  note?: string;
}

/** `densityFrom`: the id of a food whose density is borrowed (a food USDA does not list). */
type FoodEntry = Omit<Food, 'densityGPerMl' | 'densityBasis' | 'id'> & { densityFrom?: string };

const usda = (
  ndb: string,
  fdcId: number | null,
  description: string,
  fdcIdStatus: UsdaReference['fdcIdStatus'] = 'matched',
): UsdaReference => ({ ndb, fdcId, fdcIdStatus, description });

const m = (unit: HouseholdMeasure['unit'], grams: number, usdaPortion: string = unit): HouseholdMeasure => ({
  unit,
  grams,
  usdaPortion,
});

const ENTRIES = {
  'all-purpose-flour': {
    name: 'All-purpose flour',
    kind: 'flour',
    usda: usda('20081', 168894, 'Wheat flour, white, all-purpose, enriched, bleached'),
    waterFraction: 0.1192,
    measures: [m('cup', 125)],
  },
  'bread-flour': {
    name: 'Bread flour',
    kind: 'flour',
    usda: usda('20083', 168896, 'Wheat flour, white, bread, enriched'),
    waterFraction: 0.1336,
    measures: [m('cup', 137)],
  },
  'whole-wheat-flour': {
    name: 'Whole-wheat flour',
    kind: 'flour',
    usda: usda('20080', 168893, 'Wheat flour, whole-grain', 'inferred'),
    waterFraction: 0.1074,
    measures: [m('cup', 120)],
  },
  'self-rising-flour': {
    name: 'Self-rising flour',
    kind: 'flour',
    usda: usda('20082', 168895, 'Wheat flour, white, all-purpose, self-rising, enriched', 'inferred'),
    waterFraction: 0.1059,
    measures: [m('cup', 125)],
  },
  'dark-rye-flour': {
    name: 'Dark rye flour',
    kind: 'flour',
    usda: usda('20063', 168885, 'Rye flour, dark'),
    waterFraction: 0.1075,
    measures: [m('cup', 128)],
  },
  'medium-rye-flour': {
    name: 'Medium rye flour',
    kind: 'flour',
    usda: usda('20064', 168886, 'Rye flour, medium'),
    waterFraction: 0.1097,
    measures: [m('cup', 102)],
  },
  'light-rye-flour': {
    name: 'Light rye flour',
    kind: 'flour',
    usda: usda('20065', 168887, 'Rye flour, light'),
    waterFraction: 0.114,
    measures: [m('cup', 102)],
  },
  'whole-milk': {
    name: 'Whole milk',
    kind: 'milk',
    usda: usda('01077', 171265, 'Milk, whole, 3.25% milkfat, with added vitamin D'),
    waterFraction: 0.8813,
    measures: [m('cup', 244), m('fl oz', 30.5), m('tbsp', 15), m('quart', 976)],
  },
  'butter-salted': {
    name: 'Butter, salted',
    kind: 'butter',
    usda: usda('01001', 173410, 'Butter, salted'),
    waterFraction: 0.1587,
    measures: [m('tbsp', 14.2), m('stick', 113), m('cup', 227), m('pat', 5.0, 'pat (1" sq, 1/3" high)')],
  },
  'butter-unsalted': {
    name: 'Butter, unsalted',
    kind: 'butter',
    usda: usda('01145', 173430, 'Butter, without salt'),
    waterFraction: 0.1794,
    measures: [m('tbsp', 14.2), m('stick', 113), m('cup', 227)],
  },
  water: {
    name: 'Water (tap)',
    kind: 'water',
    usda: usda('14411', null, 'Water, tap, drinking', 'unknown'),
    waterFraction: 0.999,
    measures: [m('fl oz', 29.6), m('cup', 237, 'cup 8 fl oz'), m('l', 1000, 'liter')],
  },
  'bottled-water': {
    name: 'Water (bottled)',
    kind: 'water',
    usda: usda('14555', 174158, 'Water, bottled, generic'),
    waterFraction: 0.9998,
    measures: [m('fl oz', 29.6), m('cup', 237), m('ml', 1.0)],
  },
  'granulated-sugar': {
    name: 'Granulated sugar',
    kind: 'sugar',
    usda: usda('19335', 169655, 'Sugars, granulated'),
    waterFraction: 0.0002,
    measures: [m('cup', 200), m('tsp', 4.2)],
  },
  'brown-sugar-packed': {
    name: 'Brown sugar, packed',
    kind: 'sugar',
    usda: usda('19334', 168833, 'Sugars, brown'),
    waterFraction: 0.0134,
    measures: [m('cup', 220, 'cup packed'), m('tsp', 4.6, 'tsp packed')],
  },
  'brown-sugar-loose': {
    name: 'Brown sugar, not packed',
    kind: 'sugar',
    usda: usda('19334', 168833, 'Sugars, brown'),
    waterFraction: 0.0134,
    measures: [m('cup', 145, 'cup unpacked'), m('tsp', 3.0, 'tsp unpacked')],
  },
  'powdered-sugar': {
    name: 'Powdered sugar, unsifted',
    kind: 'sugar',
    usda: usda('19336', 169656, 'Sugars, powdered'),
    waterFraction: 0.0023,
    measures: [m('cup', 120, 'cup unsifted'), m('tbsp', 8.0, 'tbsp unsifted'), m('tsp', 2.5, 'tsp')],
    note: 'USDA gives "1 tsp = 2.5 g" without saying sifted or not; it is filed here with the unsifted measures.',
  },
  'powdered-sugar-sifted': {
    name: 'Powdered sugar, sifted',
    kind: 'sugar',
    usda: usda('19336', 169656, 'Sugars, powdered'),
    waterFraction: 0.0023,
    measures: [m('cup', 100, 'cup sifted')],
  },
  'table-salt': {
    name: 'Table salt',
    kind: 'salt',
    usda: usda('02047', 173468, 'Salt, table'),
    waterFraction: 0.002,
    measures: [m('tsp', 6.0), m('tbsp', 18), m('cup', 292), m('dash', 0.4)],
    note: 'Fine table salt only: flaky and coarse kosher salts weigh much less per spoon (common practice).',
  },
  'active-dry-yeast': {
    name: 'Active dry yeast',
    kind: 'yeast',
    usda: usda('18375', 175043, "Leavening agents, yeast, baker's, active dry"),
    waterFraction: 0.0508,
    measures: [m('tsp', 4.0), m('tbsp', 12.0), m('packet', 7.2)],
  },
  'instant-yeast': {
    name: 'Instant yeast',
    kind: 'yeast',
    usda: null,
    waterFraction: 0.0508,
    measures: [],
    densityFrom: 'active-dry-yeast',
    note: 'USDA SR has no separate instant yeast; density and water are borrowed from active dry yeast (an assumption).',
  },
  'compressed-yeast': {
    name: 'Fresh (compressed) yeast',
    kind: 'yeast',
    usda: usda('18374', 175042, "Leavening agents, yeast, baker's, compressed"),
    waterFraction: 0.69,
    measures: [m('cake', 17, 'cake (0.6 oz)')],
    note: 'Weighed or counted in cakes only: a crumbly block has no meaningful volume.',
  },
} as const satisfies Record<string, FoodEntry>;

export type FoodId = keyof typeof ENTRIES;

/** The largest volume measure rounds least, so its weight gives the sharpest density. */
function densityOf(entry: FoodEntry): { densityGPerMl: number; densityBasis: string } | null {
  const volumes = entry.measures
    .filter((x): x is HouseholdMeasure & { unit: VolumeUnit } => isVolumeUnit(x.unit))
    .map((x) => ({ measure: x, ml: millilitresPer(x.unit) }))
    .sort((a, b) => b.ml - a.ml);
  const largest = volumes[0];
  if (largest === undefined || entry.usda === null) return null;
  return {
    densityGPerMl: largest.measure.grams / largest.ml,
    densityBasis: `USDA SR ${entry.usda.ndb}: 1 ${largest.measure.usdaPortion} = ${largest.measure.grams} g ÷ ${largest.ml} mL (NIST US customary)`,
  };
}

function buildCatalogue(): Record<FoodId, Food> {
  const foods = {} as Record<FoodId, Food>;
  for (const id of Object.keys(ENTRIES) as FoodId[]) {
    const entry: FoodEntry = ENTRIES[id];
    const { densityFrom, ...rest } = entry;
    const own = densityOf(entry);
    const lender: FoodEntry | undefined =
      densityFrom === undefined ? undefined : (ENTRIES as Record<string, FoodEntry>)[densityFrom];
    const borrowed = lender === undefined ? null : densityOf(lender);
    const density = own ?? borrowed;
    foods[id] = {
      id,
      ...rest,
      densityGPerMl: density?.densityGPerMl ?? null,
      densityBasis: density === null ? null : `${density.densityBasis}${own === null ? ' (borrowed)' : ''}`,
    };
  }
  return foods;
}

export const FOODS: Readonly<Record<FoodId, Food>> = buildCatalogue();

export const FOOD_IDS = Object.keys(FOODS) as FoodId[];

export function isFoodId(id: unknown): id is FoodId {
  return typeof id === 'string' && Object.hasOwn(FOODS, id);
}

export function findFood(id: unknown, path = 'food'): Food {
  if (!isFoodId(id)) {
    throw new BakersMathError(path, `unknown food "${String(id)}"; known foods: ${FOOD_IDS.join(', ')}`);
  }
  return FOODS[id];
}
