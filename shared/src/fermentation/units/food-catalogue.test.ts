import { describe, expect, it } from 'vitest';
import { readReferenceCsv } from '../../bench/reference-data.js';
import { BakersMathError } from './bakers-math-error.js';
import { FOODS, FOOD_IDS, findFood, type Food } from './food-catalogue.js';
import { gramsFromMeasure } from './grams-from-measure.js';
import { isVolumeUnit, millilitresPer } from './measure-units.js';

// Source for everything below: USDA National Nutrient Database for Standard Reference, Release 26
// (2013), household weights and water content, as tabled in
// test-fixtures/reference/usda/usda_sr_household_weights.csv (SOURCES.md §4).
const usdaRows = readReferenceCsv('usda/usda_sr_household_weights.csv');

/** The catalogue measure a USDA row stands for (same NDB number and same portion wording). */
function catalogueMatch(row: Record<string, string>): { food: Food; grams: number; unit: string }[] {
  return Object.values(FOODS).flatMap((food) =>
    food.usda?.ndb === row.ndb_no
      ? food.measures.filter((m) => m.usdaPortion === row.portion).map((m) => ({ food, grams: m.grams, unit: m.unit }))
      : [],
  );
}

describe('the food catalogue holds the USDA SR household weights exactly', () => {
  it('reads the whole USDA table (42 portions)', () => {
    expect(usdaRows.length).toBe(42);
  });

  it.each(usdaRows.map((r) => [`${r.ndb_no} ${r.description} — ${r.amount} ${r.portion}`, r] as const))(
    '%s',
    (_label, row) => {
      const matches = catalogueMatch(row);
      expect(matches).toHaveLength(1);
      const [match] = matches;
      expect(row.amount).toBe('1');
      expect(match?.grams).toBe(Number(row.gram_weight));
      expect(match?.food.waterFraction).toBeCloseTo(Number(row.water_g_per_100g) / 100, 12);
      expect(match?.food.usda?.description).toBe(row.description);
      expect(match?.food.usda?.fdcId ?? '').toBe(row.fdc_id_sr_legacy === '' ? '' : Number(row.fdc_id_sr_legacy));
      expect(match?.food.usda?.fdcIdStatus).toBe(row.fdc_id_status);
    },
  );

  it('has no measure the USDA table does not have', () => {
    const tabled = new Set(usdaRows.map((r) => `${r.ndb_no}|${r.portion}`));
    for (const food of Object.values(FOODS)) {
      for (const m of food.measures) expect(tabled.has(`${food.usda?.ndb}|${m.usdaPortion}`), food.id).toBe(true);
    }
  });
});

describe('volume → grams reproduces the USDA weights (USDA SR26 household weights)', () => {
  it.each([
    ['all-purpose-flour', 1, 'cup', 125],
    ['bread-flour', 1, 'cup', 137],
    ['whole-wheat-flour', 1, 'cup', 120],
    ['dark-rye-flour', 1, 'cup', 128],
    ['medium-rye-flour', 1, 'cup', 102],
    ['light-rye-flour', 1, 'cup', 102],
    ['whole-milk', 1, 'cup', 244],
    ['butter-unsalted', 1, 'tbsp', 14.2],
    ['butter-salted', 1, 'stick', 113],
    ['water', 1, 'cup', 237],
    ['granulated-sugar', 1, 'cup', 200],
    ['brown-sugar-packed', 1, 'cup', 220],
    ['table-salt', 1, 'tsp', 6.0],
    ['active-dry-yeast', 1, 'packet', 7.2],
    ['active-dry-yeast', 2, 'tsp', 8.0],
    ['compressed-yeast', 1, 'cake', 17],
  ] as const)('%s: %d %s = %d g', (food, amount, unit, grams) => {
    expect(gramsFromMeasure({ amount, unit, food }).grams).toBeCloseTo(grams, 9);
  });

  // The density path is what every other volume (½ cup in mL, a metric cup…) goes through. Check
  // it against each USDA volume measure, allowing the rounding of USDA's printed value (half a unit
  // in its last digit). Two spoon measures fall outside it: USDA weighed spoonfuls separately, and
  // they do not pack like a cupful. They are reproduced by the household-measure path instead.
  const KNOWN_SPOON_EXCEPTIONS: Record<string, [number, number]> = {
    'table-salt|tsp': [0.01, 0.02], // density says 6.08 g, USDA weighed 6.0 g (+1.4 %)
    'powdered-sugar|tbsp': [-0.07, -0.05], // density says 7.50 g, USDA weighed 8.0 g (−6.3 %)
  };
  const volumeRows = Object.values(FOODS).flatMap((food) =>
    food.measures.filter((m) => isVolumeUnit(m.unit)).map((m) => [`${food.id} 1 ${m.usdaPortion}`, food, m] as const),
  );

  it.each(volumeRows)('density path: %s', (_label, food, measure) => {
    if (!isVolumeUnit(measure.unit) || food.densityGPerMl === null) throw new Error('volume measure without density');
    const predicted = food.densityGPerMl * millilitresPer(measure.unit);
    const decimals = (String(measure.grams).split('.')[1] ?? '').length;
    const row = usdaRows.find((r) => r.ndb_no === food.usda?.ndb && r.portion === measure.usdaPortion);
    const printedDecimals = (row?.gram_weight?.split('.')[1] ?? '').length;
    const halfStep = 0.5 * 10 ** -Math.max(decimals, printedDecimals);
    const exception = KNOWN_SPOON_EXCEPTIONS[`${food.id}|${measure.unit}`];
    if (exception) {
      const relative = predicted / measure.grams - 1;
      expect(Math.abs(predicted - measure.grams)).toBeGreaterThan(halfStep);
      expect(relative).toBeGreaterThan(exception[0]);
      expect(relative).toBeLessThan(exception[1]);
    } else {
      expect(Math.abs(predicted - measure.grams)).toBeLessThanOrEqual(halfStep + 1e-9);
    }
  });

  it('derives densities that look like the foods (g/mL)', () => {
    expect(FOODS['all-purpose-flour'].densityGPerMl).toBeCloseTo(125 / 236.5882365, 12);
    // Water from USDA's 1 L = 1000 g; milk is denser than water, flour much lighter.
    expect(FOODS.water.densityGPerMl).toBe(1);
    expect(FOODS['whole-milk'].densityGPerMl).toBeCloseTo(976 / 946.352946, 12);
    expect(FOODS['whole-milk'].densityBasis).toMatch(/^USDA SR 01077: 1 quart = 976 g/);
    expect(FOODS['compressed-yeast'].densityGPerMl).toBeNull();
  });

  it('weighs other volumes through the density, and says so', () => {
    const halfCupMilk = gramsFromMeasure({ amount: 125, unit: 'ml', food: 'whole-milk' });
    expect(halfCupMilk.basis).toBe('density');
    expect(halfCupMilk.grams).toBeCloseTo((125 * 976) / 946.352946, 9);
    // A 240 mL labelling cup of flour is heavier than a NIST cup by 240/236.588.
    const labelCup = gramsFromMeasure(
      { amount: 1, unit: 'cup', food: 'all-purpose-flour' },
      { volumeStandard: 'us-nutrition-label' },
    );
    expect(labelCup.basis).toBe('density');
    expect(labelCup.grams).toBeCloseTo((125 * 240) / 236.5882365, 9);
    expect(gramsFromMeasure({ amount: 1, unit: 'cup', food: 'all-purpose-flour' }).basis).toBe(
      'usda-household-measure',
    );
  });

  it('borrows the active-dry density for instant yeast (USDA SR has no instant yeast)', () => {
    expect(FOODS['instant-yeast'].usda).toBeNull();
    expect(FOODS['instant-yeast'].densityGPerMl).toBe(FOODS['active-dry-yeast'].densityGPerMl);
    expect(FOODS['instant-yeast'].densityBasis).toMatch(/borrowed/);
    expect(gramsFromMeasure({ amount: 1, unit: 'tsp', food: 'instant-yeast' }).grams).toBeCloseTo(4.0, 9);
  });

  it('weighs mass units exactly, food or not (NIST HB44 App. C; 21 CFR 101.9 for the 28 g ounce)', () => {
    expect(gramsFromMeasure({ amount: 1.5, unit: 'lb' }).grams).toBeCloseTo(680.388555, 9);
    expect(gramsFromMeasure({ amount: 2, unit: 'oz' }, { massStandard: 'us-nutrition-label' }).grams).toBe(56);
    expect(gramsFromMeasure({ amount: 0.5, unit: 'kg', food: 'bread-flour' })).toEqual({
      grams: 500,
      unit: 'kg',
      basis: 'mass',
      food: 'bread-flour',
    });
  });
});

describe('clear errors, each naming the field', () => {
  const fails = (fn: () => unknown, path: string, message: RegExp): void => {
    try {
      fn();
    } catch (e) {
      expect(e).toBeInstanceOf(BakersMathError);
      expect(e).toBeInstanceOf(RangeError);
      expect((e as BakersMathError).path).toBe(path);
      expect((e as Error).message).toMatch(message);
      return;
    }
    throw new Error('expected an error');
  };

  it('unknown food, unit, or a volume without a food', () => {
    fails(() => findFood('spelt-flour'), 'food', /unknown food "spelt-flour"/);
    fails(
      () => gramsFromMeasure({ amount: 1, unit: 'cup', food: 'unicorn' }, {}, 'ingredients.4'),
      'ingredients.4.food',
      /unknown food/,
    );
    fails(() => gramsFromMeasure({ amount: 1, unit: 'handful', food: 'water' }), 'unit', /unknown unit/);
    fails(() => gramsFromMeasure({ amount: 1, unit: 'cup' }), 'food', /needs a food/);
  });

  it('a food without a density, or a portion the food does not have', () => {
    fails(() => gramsFromMeasure({ amount: 1, unit: 'tsp', food: 'compressed-yeast' }), 'unit', /no known density/);
    fails(() => gramsFromMeasure({ amount: 1, unit: 'stick', food: 'whole-milk' }), 'unit', /no USDA "stick" portion/);
  });

  it('bad amounts and undefined units of a standard', () => {
    fails(() => gramsFromMeasure({ amount: -1, unit: 'g' }), 'amount', /must not be negative/);
    fails(() => gramsFromMeasure({ amount: Number.NaN, unit: 'g' }), 'amount', /finite/);
    fails(
      () => gramsFromMeasure({ amount: 1, unit: 'lb' }, { massStandard: 'us-nutrition-label' }),
      'unit',
      /not defined/,
    );
  });

  it('lists every food id once', () => {
    expect(new Set(FOOD_IDS).size).toBe(FOOD_IDS.length);
    for (const id of FOOD_IDS) expect(FOODS[id].id).toBe(id);
  });
});
