import { describe, expect, it } from 'vitest';
import { readReferenceCsv } from '../../bench/reference-data.js';
import { BakersMathError } from '../units/bakers-math-error.js';
import { gramsFromMeasure } from '../units/grams-from-measure.js';
import { bakersPercentages, type FormulaSummary } from './bakers-percentages.js';
import type { Ingredient } from './ingredient.js';

// Worked examples: test-fixtures/reference/baking/bakers_percentage_worked_examples.csv
// (SOURCES.md §6b). Each figure is compared at the precision it is printed with there: within half
// a unit of its last printed digit.
const rows = readReferenceCsv('baking/bakers_percentage_worked_examples.csv');
const row = (example: string, component: string, ingredient: string): Record<string, string> => {
  const found = rows.find((r) => r.example_id === example && r.component === component && r.ingredient === ingredient);
  if (!found) throw new Error(`no row ${example}/${component}/${ingredient}`);
  return found;
};
const asPrinted = (actual: number | null | undefined, printed: string | undefined): void => {
  if (printed === undefined || printed === '') throw new Error('nothing printed to compare with');
  const decimals = (printed.split('.')[1] ?? '').length;
  expect(actual).not.toBeNull();
  expect(Math.abs((actual ?? Number.NaN) - Number(printed))).toBeLessThanOrEqual(0.5 * 10 ** -decimals + 1e-9);
};
const totalLine = (s: FormulaSummary, name: string) => s.totalFormula.find((l) => l.name === name);
const line = (s: FormulaSummary, name: string) => s.lines.find((l) => l.name === name);

describe('Wild Yeast poolish example (S. Tenney, Wild Yeast blog, Baker’s Percentage part 4, 2008)', () => {
  const g = (component: string, ingredient: string): number =>
    Number(row('wildyeast_poolish', component, ingredient).grams);
  // The poolish is given by what it was built from, so its pinch of yeast reaches the total formula.
  const dough: Ingredient[] = [
    { name: 'flour', kind: 'flour', grams: g('final dough', 'flour') },
    { name: 'water', kind: 'water', grams: g('final dough', 'water') },
    { name: 'instant yeast', kind: 'yeast', grams: g('final dough', 'instant yeast') },
    { name: 'salt', kind: 'salt', grams: g('final dough', 'salt') },
    {
      name: 'poolish',
      kind: 'starter',
      contents: [
        { name: 'flour', kind: 'flour', grams: g('poolish', 'flour') },
        { name: 'water', kind: 'water', grams: g('poolish', 'water') },
        { name: 'instant yeast', kind: 'yeast', grams: g('poolish', 'instant yeast') },
      ],
    },
  ];
  const s = bakersPercentages(dough);

  it('total formula: flour 1368 g, water 936 g = 68.42 %, prefermented flour 34.21 % (derived rows)', () => {
    expect(s.totalFlourG).toBeCloseTo(Number(row('wildyeast_poolish', 'total formula', 'flour').grams), 9);
    expect(s.totalWaterG).toBeCloseTo(Number(row('wildyeast_poolish', 'total formula', 'water').grams), 9);
    asPrinted(s.totalHydrationPercent, row('wildyeast_poolish', 'total formula', 'water').percent_of_component_flour);
    asPrinted(
      s.prefermentedFlourPercent,
      row('wildyeast_poolish', 'total formula', 'prefermented flour').percent_of_component_flour,
    );
  });

  it('total formula: yeast 9.3 g = 0.68 %, salt 1.97 %', () => {
    for (const name of ['instant yeast', 'salt']) {
      const r = row('wildyeast_poolish', 'total formula', name);
      expect(totalLine(s, name)?.grams).toBeCloseTo(Number(r.grams), 9);
      asPrinted(totalLine(s, name)?.percentOfTotalFlour, r.percent_of_component_flour);
    }
    expect(totalLine(s, 'instant yeast')?.prefermentedG).toBeCloseTo(0.3, 12);
  });

  it('final-dough line (published rows): water 52 %, yeast 1 %, salt 3 %, poolish 104 % of 900 g', () => {
    for (const name of ['water', 'instant yeast', 'salt', 'poolish']) {
      asPrinted(
        line(s, name)?.percentOfFinalDoughFlour,
        row('wildyeast_poolish', 'final dough', name).percent_of_component_flour,
      );
    }
    asPrinted(
      s.finalDoughHydrationPercent,
      row('wildyeast_poolish', 'final dough', 'water').percent_of_component_flour,
    );
  });

  it('poolish rows: 100 % water and 0.06 % yeast of the poolish flour', () => {
    const poolish = bakersPercentages([
      { name: 'flour', kind: 'flour', grams: g('poolish', 'flour') },
      { name: 'water', kind: 'water', grams: g('poolish', 'water') },
      { name: 'instant yeast', kind: 'yeast', grams: g('poolish', 'instant yeast') },
    ]);
    asPrinted(
      line(poolish, 'water')?.percentOfTotalFlour,
      row('wildyeast_poolish', 'poolish', 'water').percent_of_component_flour,
    );
    asPrinted(
      line(poolish, 'instant yeast')?.percentOfTotalFlour,
      row('wildyeast_poolish', 'poolish', 'instant yeast').percent_of_component_flour,
    );
  });

  it('the poolish as a plain 100 % starter gives the same hydration and prefermented flour', () => {
    const plain = bakersPercentages([
      ...dough.slice(0, 4),
      { name: 'poolish', kind: 'starter', grams: 936, hydration: 100 },
    ]);
    asPrinted(plain.totalHydrationPercent, '68.42');
    asPrinted(plain.prefermentedFlourPercent, '34.21');
  });
});

describe('country loaf with a 20 % levain (Tartine Bread, as restated on The Fresh Loaf node/69688)', () => {
  const r = (c: string, i: string) => row('tartine_country', c, i);
  const s = bakersPercentages([
    { name: 'flour', kind: 'flour', grams: Number(r('final dough', 'flour').grams) },
    { name: 'water', kind: 'water', grams: Number(r('final dough', 'water').grams) },
    {
      name: 'leaven',
      kind: 'starter',
      hydration: 100,
      grams: Number(r('final dough', 'leaven (100% hydration)').grams),
    },
  ]);

  it('total formula: flour 1100 g, water 850 g, 77.27 % hydration, 9.09 % prefermented flour', () => {
    expect(s.totalFlourG).toBeCloseTo(Number(r('total formula', 'flour').grams), 9);
    expect(s.totalWaterG).toBeCloseTo(Number(r('total formula', 'water').grams), 9);
    asPrinted(s.totalHydrationPercent, r('total formula', 'water').percent_of_component_flour);
    asPrinted(s.prefermentedFlourPercent, r('total formula', 'prefermented flour').percent_of_component_flour);
  });

  it('final-dough line: 75 % water and 20 % leaven, as printed', () => {
    asPrinted(s.finalDoughHydrationPercent, r('final dough', 'water').percent_of_component_flour);
    asPrinted(
      line(s, 'leaven')?.percentOfFinalDoughFlour,
      r('final dough', 'leaven (100% hydration)').percent_of_component_flour,
    );
  });
});

describe('straight dough in pounds (artisanbakers.com/percentage.html)', () => {
  const r = (i: string) => row('artisanbakers_french', 'straight dough', i);
  const lb = (n: number) => gramsFromMeasure({ amount: n, unit: 'lb' }).grams;
  const s = bakersPercentages([
    { name: 'flour', kind: 'flour', grams: lb(5) },
    { name: 'water', kind: 'water', grams: lb(3.25) },
    { name: 'salt', kind: 'salt', grams: lb(0.1) },
    { name: 'yeast', kind: 'yeast', grams: lb(0.1) },
  ]);

  it('the pounds convert to the tabled grams (NIST avoirdupois pound 453.59237 g)', () => {
    expect(lb(5)).toBeCloseTo(Number(r('flour').grams), 2);
    expect(lb(3.25)).toBeCloseTo(Number(r('water').grams), 2);
    expect(lb(0.1)).toBeCloseTo(Number(r('salt').grams), 2);
  });

  it('65 % water, 2 % salt, 2 % yeast, 169 % in all', () => {
    for (const name of ['water', 'salt', 'yeast'])
      asPrinted(line(s, name)?.percentOfTotalFlour, r(name).percent_of_component_flour);
    asPrinted(s.totalPercent, '169');
  });
});

describe('60 %-hydration levain (forum worked example, thefreshloaf.com/comment/447058; not authoritative)', () => {
  const r = (c: string, i: string) => row('fci_levain_forum', c, i);
  const levain: Ingredient = {
    name: 'levain',
    kind: 'starter',
    hydration: 60,
    grams: Number(r('levain (60% hydration)', 'levain').grams),
  };

  it('the levain splits into 156.25 g flour and 93.75 g water: L/(1+h), L·h/(1+h)', () => {
    const s = bakersPercentages([levain]);
    expect(s.totalFlourG).toBeCloseTo(156.25, 12);
    expect(s.totalWaterG).toBeCloseTo(93.75, 12);
  });

  it('with the forum’s rounded final dough: prefermented flour 16.4 %, levain 31 % of final flour', () => {
    const s = bakersPercentages([
      { name: 'flour', kind: 'flour', grams: Number(r('final dough', 'flour').grams) },
      { name: 'water', kind: 'water', grams: Number(r('final dough', 'water').grams) },
      { name: 'salt', kind: 'salt', grams: Number(r('total formula', 'salt').grams) },
      levain,
    ]);
    asPrinted(s.prefermentedFlourPercent, r('derived', 'prefermented flour').percent_of_component_flour);
    asPrinted(line(s, 'levain')?.percentOfFinalDoughFlour, '31');
    asPrinted(s.totalHydrationPercent, r('total formula', 'water').percent_of_component_flour);
  });

  it('with the unrounded final dough (950 − 156.25 g flour): the total formula comes back exactly', () => {
    const s = bakersPercentages([
      { name: 'flour', kind: 'flour', grams: 950 - 156.25 },
      { name: 'water', kind: 'water', grams: 617.5 - 93.75 },
      { name: 'salt', kind: 'salt', grams: 19 },
      levain,
    ]);
    expect(s.totalFlourG).toBeCloseTo(Number(r('total formula', 'flour').grams), 9);
    expect(s.totalWaterG).toBeCloseTo(Number(r('total formula', 'water').grams), 9);
    asPrinted(s.totalHydrationPercent, r('total formula', 'water').percent_of_component_flour);
    asPrinted(line(s, 'salt')?.percentOfTotalFlour, r('total formula', 'salt').percent_of_component_flour);
    asPrinted(s.prefermentedFlourPercent, '16.4');
  });
});

describe('milk bread: the water inside milk and butter counts (USDA SR 01077 and 01145 water values)', () => {
  const s = bakersPercentages([
    { name: 'bread flour', kind: 'flour', grams: 500 },
    { name: 'whole milk', kind: 'milk', grams: 300, food: 'whole-milk' },
    { name: 'butter', kind: 'butter', grams: 50, food: 'butter-unsalted' },
    { name: 'sugar', kind: 'sugar', grams: 40 },
    { name: 'salt', kind: 'salt', grams: 9 },
  ]);

  it('water 300·0.8813 + 50·0.1794 = 273.36 g → 54.67 % (derived from USDA values)', () => {
    expect(s.totalWaterG).toBeCloseTo(273.36, 9);
    asPrinted(s.totalHydrationPercent, '54.67');
    expect(line(s, 'whole milk')?.waterSource).toMatch(/USDA SR 01077/);
    expect(s.assumptions).toEqual([]);
  });

  it('no water line, so the final-dough hydration is 0 % while the total formula knows better', () => {
    expect(s.finalDoughHydrationPercent).toBe(0);
    // Sugar and salt bring no water unless told (their food would add 0.02 % and 0.2 %).
    expect(line(s, 'sugar')?.waterG).toBe(0);
  });

  it('milk and butter without a food fall back to whole milk and unsalted butter, and say so', () => {
    const assumed = bakersPercentages([
      { name: 'flour', kind: 'flour', grams: 500 },
      { name: 'milk', kind: 'milk', grams: 300 },
      { name: 'butter', kind: 'butter', grams: 50 },
      { name: 'eggs', kind: 'egg', grams: 100 },
      { name: 'starter', kind: 'starter', grams: 100 },
    ]);
    // 273.36 g from milk and butter, 75 g from eggs (~75 % water, from memory), 50 g from the starter.
    expect(assumed.totalWaterG).toBeCloseTo(273.36 + 75 + 50, 9);
    expect(assumed.assumptions).toHaveLength(4);
    expect(assumed.assumptions.join('\n')).toMatch(/from memory/);
  });

  it('reports assumptions made inside a preferment’s contents, naming the preferment', () => {
    const s = bakersPercentages([
      { name: 'flour', kind: 'flour', grams: 400 },
      {
        name: 'milk sponge',
        kind: 'starter',
        contents: [
          { name: 'flour', kind: 'flour', grams: 100 },
          { name: 'milk', kind: 'milk', grams: 100 },
        ],
      },
    ]);
    expect(s.assumptions).toEqual(['milk sponge › milk: assumed whole milk: USDA SR 01077, 88.13 g/100 g']);
    expect(s.totalWaterG).toBeCloseTo(88.13, 9);
    expect(s.prefermentedFlourPercent).toBeCloseTo(20, 12);
  });

  it('salted butter brings less water (USDA SR 01001: 15.87 g/100 g)', () => {
    const salted = bakersPercentages([
      { name: 'flour', kind: 'flour', grams: 500 },
      { name: 'butter', grams: 50, food: 'butter-salted' },
    ]);
    expect(salted.totalWaterG).toBeCloseTo(50 * 0.1587, 12);
    expect(salted.lines[1]?.kind).toBe('butter');
  });
});

describe('formula input errors name the field', () => {
  const pathOf = (fn: () => unknown): string => {
    try {
      fn();
    } catch (e) {
      expect(e).toBeInstanceOf(BakersMathError);
      return (e as BakersMathError).path;
    }
    throw new Error('expected an error');
  };
  const flour: Ingredient = { name: 'flour', kind: 'flour', grams: 500 };

  it.each<[string, Ingredient[], string]>([
    ['no ingredients', [], 'ingredients'],
    ['no flour', [{ name: 'water', kind: 'water', grams: 300 }], 'ingredients'],
    ['negative grams', [flour, { name: 'water', kind: 'water', grams: -1 }], 'ingredients.1.grams'],
    ['missing grams', [flour, { name: 'salt', kind: 'salt' }], 'ingredients.1.grams'],
    ['unknown kind', [flour, { name: 'x', kind: 'spice' as 'other', grams: 1 }], 'ingredients.1.kind'],
    ['no kind, no food', [flour, { name: 'x', grams: 1 }], 'ingredients.1.kind'],
    ['waterFraction on flour', [{ ...flour, waterFraction: 0.1 }], 'ingredients.0.waterFraction'],
    [
      'waterFraction above 1',
      [flour, { name: 'milk', kind: 'milk', grams: 1, waterFraction: 88 }],
      'ingredients.1.waterFraction',
    ],
    ['hydration on milk', [flour, { name: 'milk', kind: 'milk', grams: 1, hydration: 100 }], 'ingredients.1.hydration'],
    [
      'negative hydration',
      [flour, { name: 'levain', kind: 'starter', grams: 100, hydration: -5 }],
      'ingredients.1.hydration',
    ],
    [
      'bad content',
      [flour, { name: 'poolish', kind: 'starter', contents: [{ name: 'flour', kind: 'flour', grams: Number.NaN }] }],
      'ingredients.1.contents.0.grams',
    ],
    ['unknown food', [flour, { name: 'milk', food: 'oat-milk', grams: 100 }], 'ingredients.1.food'],
    ['unnamed', [{ ...flour, name: ' ' }], 'ingredients.0.name'],
  ])('%s → %s', (_label, ingredients, path) => {
    expect(pathOf(() => bakersPercentages(ingredients))).toBe(path);
  });
});
