import type { ComputeFormulaRequest } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { computeFormula } from '../formula/formula.compute.js';
import { doughFromFormula } from './plan-dough.js';

const line = (kind: string, amount: number, extra: Record<string, unknown> = {}) =>
  ({ kind, name: `${kind} ${amount}`, amount, unit: 'g', ...extra }) as ComputeFormulaRequest['ingredients'][number];

const dough = (request: ComputeFormulaRequest) => doughFromFormula(computeFormula(request));

describe('doughFromFormula', () => {
  it('keeps the starter apart from the final dough’s flour and water (final-dough convention)', () => {
    const {
      dough: d,
      flags,
      dairyOrEgg,
    } = dough({
      ingredients: [line('flour', 800), line('flour', 200), line('water', 750), line('starter', 200), line('salt', 20)],
    });
    // A 1:1 starter is 100 % hydration [common practice]; the two flour lines add up.
    expect(d).toEqual({ flourG: 1000, waterG: 750, starterG: 200, starterHydrationPct: 100, saltG: 20 });
    expect(flags).toEqual({ dairy: false, egg: false, sugar: false });
    expect(dairyOrEgg).toBe(false);
  });

  it('two starters: the hydration is their water over their flour, together', () => {
    const { dough: d } = dough({
      ingredients: [
        line('flour', 500),
        line('water', 300),
        line('starter', 100, { starterHydrationPct: 100 }),
        line('starter', 100, { starterHydrationPct: 60 }),
      ],
    });
    // 100 g at 100 % = 50 g flour + 50 g water; 100 g at 60 % = 62.5 g flour + 37.5 g water.
    expect(d.starterG).toBe(200);
    expect(d.starterHydrationPct).toBeCloseTo((87.5 / 112.5) * 100, 9);
  });

  it('milk, butter and sugar are enrichment; eggs only raise the flag', () => {
    const {
      dough: d,
      flags,
      dairyOrEgg,
    } = dough({
      ingredients: [
        line('flour', 500),
        line('milk', 300, { food: 'whole-milk' }),
        line('butter', 50, { food: 'butter-unsalted' }),
        line('sugar', 40),
        line('egg', 50),
        line('water', 20),
        line('starter', 100),
        line('inclusion', 80),
      ],
    });
    expect(d.enrichment).toEqual({ sugarG: 40, fatG: 50, milkG: 300 });
    // Milk's water is enrichment to the model, not final-dough water; the egg is not counted at all.
    expect(d.waterG).toBe(20);
    expect(flags).toEqual({ dairy: true, egg: true, sugar: true });
    expect(dairyOrEgg).toBe(true);
  });

  it('an egg alone is enough for the dairy/egg caution', () => {
    const r = dough({ ingredients: [line('flour', 500), line('water', 300), line('starter', 100), line('egg', 50)] });
    expect(r.flags).toEqual({ dairy: false, egg: true, sugar: false });
    expect(r.dairyOrEgg).toBe(true);
    expect(r.dough.enrichment).toBeUndefined();
  });

  it('a saved scaling sets the batch: every weight times its factor', () => {
    const request: ComputeFormulaRequest = {
      ingredients: [line('flour', 500), line('water', 350), line('starter', 100), line('salt', 10)],
      scaling: { by: 'factor', factor: 2 },
    };
    expect(dough(request).dough).toEqual({
      flourG: 1000,
      waterG: 700,
      starterG: 200,
      starterHydrationPct: 100,
      saltG: 20,
    });
  });

  it('a formula without a starter line gives a dough with no starter (the service refuses it)', () => {
    expect(dough({ ingredients: [line('flour', 500), line('water', 350)] }).dough.starterG).toBe(0);
  });
});
