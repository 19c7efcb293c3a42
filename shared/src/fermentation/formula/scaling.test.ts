import { describe, expect, it } from 'vitest';
import { gramsFromMeasure } from '../units/grams-from-measure.js';
import { gramsToMassUnit } from '../units/measure-units.js';
import { bakersPercentages } from './bakers-percentages.js';
import type { Ingredient } from './ingredient.js';
import { roundGrams, scaleFormula } from './scaling.js';

const lb = (n: number) => gramsFromMeasure({ amount: n, unit: 'lb' }).grams;
// artisanbakers.com/percentage.html (bakers_percentage_worked_examples.csv, artisanbakers_french).
const french: Ingredient[] = [
  { name: 'flour', kind: 'flour', grams: lb(5) },
  { name: 'water', kind: 'water', grams: lb(3.25) },
  { name: 'salt', kind: 'salt', grams: lb(0.1) },
  { name: 'yeast', kind: 'yeast', grams: lb(0.1) },
];
const country: Ingredient[] = [
  { name: 'flour', kind: 'flour', grams: 1000 },
  { name: 'water', kind: 'water', grams: 750 },
  { name: 'salt', kind: 'salt', grams: 20 },
  { name: 'levain', kind: 'starter', grams: 200, hydration: 100 },
];

describe('scaling a formula', () => {
  it('to 3 lb of dough: flour = 3 lb ÷ 169 % = 1.775 lb (artisanbakers.com/percentage.html)', () => {
    const scaled = scaleFormula(french, { by: 'dough-weight', doughG: lb(3) });
    expect(gramsToMassUnit(scaled.totalFlourG, 'lb')).toBeCloseTo(3 / 1.69, 12);
    expect(Math.round(gramsToMassUnit(scaled.totalFlourG, 'lb') * 1000) / 1000).toBe(1.775);
    expect(scaled.doughWeightG).toBeCloseTo(lb(3), 9);
  });

  it('keeps every percentage, the hydration and the levain’s share when scaling by a factor', () => {
    const before = bakersPercentages(country);
    const scaled = scaleFormula(country, { by: 'factor', factor: 0.37 });
    const after = bakersPercentages(scaled.ingredients);
    expect(after.totalHydrationPercent).toBeCloseTo(before.totalHydrationPercent, 12);
    expect(after.prefermentedFlourPercent).toBeCloseTo(before.prefermentedFlourPercent, 12);
    after.lines.forEach((l, i) =>
      expect(l.percentOfTotalFlour).toBeCloseTo(before.lines[i]?.percentOfTotalFlour ?? NaN, 12),
    );
    expect(scaled.ingredients[3]?.hydration).toBe(100);
  });

  it('to pieces × piece weight with a loss: 6 × 900 g at 2 % loss needs 5400/0.98 g of dough', () => {
    const scaled = scaleFormula(country, { by: 'pieces', pieces: 6, pieceG: 900, lossPercent: 2 });
    expect(scaled.doughWeightG).toBeCloseTo(5400 / 0.98, 9);
    expect(scaled.factor).toBeCloseTo(5400 / 0.98 / 1970, 12);
    expect(scaleFormula(country, { by: 'pieces', pieces: 2, pieceG: 985 }).factor).toBeCloseTo(1, 12);
  });

  it('to a total flour weight, counting the levain’s flour', () => {
    const scaled = scaleFormula(country, { by: 'flour-weight', flourG: 550 });
    expect(scaled.totalFlourG).toBeCloseTo(550, 9);
    expect(scaled.lines.find((l) => l.name === 'flour')?.grams).toBeCloseTo(500, 9);
  });

  it('scales the contents of a built preferment too', () => {
    const dough: Ingredient[] = [
      { name: 'flour', kind: 'flour', grams: 900 },
      {
        name: 'poolish',
        kind: 'starter',
        contents: [
          { name: 'flour', kind: 'flour', grams: 468 },
          { name: 'water', kind: 'water', grams: 468 },
        ],
      },
    ];
    const scaled = scaleFormula(dough, { by: 'factor', factor: 0.5 });
    expect(scaled.ingredients[1]?.contents?.[0]?.grams).toBe(234);
    expect(scaled.lines[1]?.grams).toBe(468);
  });

  it('rounds for the scale: 1 g from 10 g, 0.1 g from 1 g, 0.01 g below', () => {
    expect([roundGrams(812.5), roundGrams(10.4), roundGrams(9.96), roundGrams(2.345), roundGrams(0.2999)]).toEqual([
      813, 10, 10, 2.3, 0.3,
    ]);
    const scaled = scaleFormula(french, { by: 'dough-weight', doughG: 1000 });
    for (const l of scaled.lines) expect(Math.abs(l.roundedG - l.grams) / l.grams).toBeLessThanOrEqual(0.05);
    expect(scaled.lines.map((l) => l.roundedG)).toEqual([592, 385, 12, 12]);
  });

  it.each([
    [{ by: 'factor', factor: 0 }, 'target.factor'],
    [{ by: 'pieces', pieces: 2, pieceG: 500, lossPercent: 100 }, 'target.lossPercent'],
    [{ by: 'dough-weight', doughG: -5 }, 'target.doughG'],
    [{ by: 'pan' }, 'target.by'],
  ] as const)('rejects %j at %s', (target, path) => {
    // @ts-expect-error: the last case is deliberately not a ScaleTarget
    expect(() => scaleFormula(country, target)).toThrow(expect.objectContaining({ path }) as Error);
  });
});
