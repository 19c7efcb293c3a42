import { describe, expect, it } from 'vitest';
import type { BakersMathError } from '../units/bakers-math-error.js';
import { bakersPercentages } from './bakers-percentages.js';
import { finalDoughFromTotalFormula, type TotalFormulaSpec } from './final-dough.js';

// Forum worked example (thefreshloaf.com/comment/447058, not authoritative; tabled in
// test-fixtures/reference/baking/bakers_percentage_worked_examples.csv, rows fci_levain_forum):
// total formula 950 g flour, 65 % water, 2 % salt; 250 g levain at 60 % hydration.
const fci: TotalFormulaSpec = {
  totalFlourG: 950,
  lines: [
    { name: 'flour', kind: 'flour', percent: 100 },
    { name: 'water', kind: 'water', percent: 65 },
    { name: 'salt', kind: 'salt', percent: 2 },
  ],
  preferment: { name: 'levain', hydration: 60, grams: 250 },
};

describe('total formula → final dough (BBGA layout, SOURCES.md §6b)', () => {
  it('takes the levain’s 156.25 g flour and 93.75 g water out of the mix', () => {
    const fd = finalDoughFromTotalFormula(fci);
    expect(fd.prefermentFlourG).toBeCloseTo(156.25, 12);
    expect(fd.prefermentWaterG).toBeCloseTo(93.75, 12);
    expect(fd.prefermentedFlourPercent).toBeCloseTo(16.447, 3); // forum: 16.4 %
    const grams = Object.fromEntries(fd.ingredients.map((i) => [i.name, i.grams]));
    expect(grams.flour).toBeCloseTo(793.75, 12); // forum rounds to 795 ("950-156")
    expect(grams.water).toBeCloseTo(523.75, 12); // forum rounds to 523
    expect(grams.salt).toBeCloseTo(19, 12);
    expect(grams.levain).toBeCloseTo(250, 12);
  });

  it('round-trips: the final dough’s total formula is the one we started from', () => {
    const s = bakersPercentages(finalDoughFromTotalFormula(fci).ingredients);
    expect(s.totalFlourG).toBeCloseTo(950, 9);
    expect(s.totalHydrationPercent).toBeCloseTo(65, 9);
    expect(s.totalFormula.find((l) => l.name === 'salt')?.percentOfTotalFlour).toBeCloseTo(2, 9);
  });

  it('takes preferment flour from a named flour only, when told which', () => {
    const fd = finalDoughFromTotalFormula({
      totalFlourG: 1000,
      lines: [
        { name: 'bread flour', kind: 'flour', percent: 80 },
        { name: 'whole rye', kind: 'flour', percent: 20 },
        { name: 'water', kind: 'water', percent: 75 },
      ],
      preferment: { name: 'rye sour', hydration: 100, prefermentedFlourPercent: 15, flourName: 'whole rye' },
    });
    const grams = Object.fromEntries(fd.ingredients.map((i) => [i.name, i.grams]));
    expect(grams['bread flour']).toBeCloseTo(800, 12);
    expect(grams['whole rye']).toBeCloseTo(50, 12);
    expect(grams.water).toBeCloseTo(600, 12);
    expect(grams['rye sour']).toBeCloseTo(300, 12);
    const s = bakersPercentages(fd.ingredients);
    expect(s.totalFormula.find((l) => l.name === 'whole rye')?.grams).toBeCloseTo(200, 9);
    expect(s.prefermentedFlourPercent).toBeCloseTo(15, 9);
  });

  it.each<[string, Partial<TotalFormulaSpec>, string]>([
    ['flour not 100 %', { lines: [{ name: 'flour', kind: 'flour', percent: 90 }] }, 'lines'],
    [
      'both grams and %',
      { preferment: { name: 'l', hydration: 100, grams: 1, prefermentedFlourPercent: 1 } },
      'preferment',
    ],
    ['too much levain', { preferment: { name: 'l', hydration: 60, grams: 2000 } }, 'preferment'],
    [
      'too wet a levain',
      { preferment: { name: 'l', hydration: 500, prefermentedFlourPercent: 20 } },
      'preferment.hydration',
    ],
    [
      'no such flour',
      { preferment: { name: 'l', hydration: 100, grams: 10, flourName: 'spelt' } },
      'preferment.flourName',
    ],
  ])('%s → error at %s', (_label, change, path) => {
    expect(() => finalDoughFromTotalFormula({ ...fci, ...change })).toThrow(
      expect.objectContaining({ path }) as BakersMathError,
    );
  });
});
