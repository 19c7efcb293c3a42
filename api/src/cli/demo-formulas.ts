// Demo formulas for the seed: the three bakes of the invented Larkspur "Weekend Levain" class.
// Each is checked by the same computation the API runs, so the seed cannot store one the editor
// would refuse. The braid is typed by volume, as the family recipe card had it.
import type { CreateFormulaRequest } from '@peakwise/shared';
import type { Database } from '../db/database.js';
import { computeFormula } from '../formula/formula.compute.js';
import { FormulaRepository } from '../formula/formula.repository.js';

const DEMO_NOTE = 'Demo formula for the Larkspur class (invented).';

export const DEMO_FORMULAS: { owner: string; formula: CreateFormulaRequest }[] = [
  {
    owner: 'theo@larkspur-kitchen.example',
    formula: {
      name: 'Country loaf, 75 % hydration',
      notes: `${DEMO_NOTE} Levain from Bramble at its peak; 4 sets of stretch-and-folds.`,
      ingredients: [
        { kind: 'flour', name: 'Flour blend', amount: 1000, unit: 'g' },
        // 725 g + the levain's 100 g of water over 1100 g of flour: 75 % in the total formula.
        { kind: 'water', name: 'Water', amount: 725, unit: 'g' },
        { kind: 'starter', name: 'Levain (Bramble)', amount: 200, unit: 'g', starterHydrationPct: 100 },
        { kind: 'salt', name: 'Fine sea salt', amount: 22, unit: 'g' },
      ],
      blend: [
        { name: 'Bread flour', parts: 9 },
        { name: 'Whole-wheat flour', parts: 1 },
      ],
      scaling: { by: 'pieces', pieces: 2, pieceG: 900, lossPercent: 2 },
    },
  },
  {
    owner: 'amara@larkspur-kitchen.example',
    formula: {
      name: 'Rye-spelt tin loaf',
      notes: `${DEMO_NOTE} Old Copper fed on spelt; one 1 kg tin, seeds soaked overnight.`,
      ingredients: [
        { kind: 'flour', name: 'Rye and spelt', amount: 500, unit: 'g' },
        { kind: 'water', name: 'Water', amount: 400, unit: 'g' },
        { kind: 'starter', name: 'Starter (Old Copper)', amount: 150, unit: 'g', starterHydrationPct: 100 },
        { kind: 'salt', name: 'Salt', amount: 11, unit: 'g' },
        { kind: 'inclusion', name: 'Sunflower seeds', amount: 60, unit: 'g' },
      ],
      blend: [
        { name: 'Whole rye', parts: 2 },
        { name: 'Spelt', parts: 3 },
      ],
      scaling: { by: 'dough-weight', doughG: 1000 },
    },
  },
  {
    owner: 'ines@larkspur-kitchen.example',
    formula: {
      name: 'Enriched milk-bread braid',
      notes: `${DEMO_NOTE} Typed by volume from a recipe card; weigh it once and save the grams.`,
      ingredients: [
        { kind: 'flour', name: 'All-purpose flour', amount: 4, unit: 'cup', food: 'all-purpose-flour' },
        { kind: 'milk', name: 'Whole milk', amount: 1, unit: 'cup', food: 'whole-milk' },
        { kind: 'egg', name: 'Egg', amount: 50, unit: 'g' },
        { kind: 'butter', name: 'Butter, soft', amount: 4, unit: 'tbsp', food: 'butter-unsalted' },
        { kind: 'sugar', name: 'Sugar', amount: 3, unit: 'tbsp', food: 'granulated-sugar' },
        { kind: 'salt', name: 'Table salt', amount: 1.5, unit: 'tsp', food: 'table-salt' },
        { kind: 'starter', name: 'Levain (Larkspur Mother)', amount: 120, unit: 'g', starterHydrationPct: 100 },
      ],
      scaling: { by: 'pieces', pieces: 2, pieceG: 550 },
    },
  },
];

/** Saves each demo formula for its owner (when that account was seeded); returns how many. */
export async function seedDemoFormulas(db: Database, accountIds: Map<string, string>): Promise<number> {
  const formulas = new FormulaRepository(db);
  let saved = 0;
  for (const { owner, formula } of DEMO_FORMULAS) {
    const accountId = accountIds.get(owner);
    if (!accountId) continue;
    computeFormula(formula);
    await formulas.insert(accountId, {
      name: formula.name,
      notes: formula.notes ?? null,
      ingredients: formula.ingredients,
      blend: formula.blend ?? [],
      scaling: formula.scaling ?? null,
    });
    saved += 1;
  }
  return saved;
}
