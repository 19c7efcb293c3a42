import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import {
  bakersPercentages,
  blendFlours,
  gramsFromMeasure,
  scaleFormula,
  type Formula,
  type FormulaComputed,
  type FormulaListResponse,
} from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { expectError, expectFieldErrors, send, signUp, type InjectResponse, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

let theo: SignedUp;
let amara: SignedUp;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
  amara = await signUp(t.app, { displayName: 'Amara Quist' });
});

const call = (method: 'GET' | 'POST' | 'PATCH' | 'DELETE', url: string, payload?: unknown, who = theo) =>
  send(t.app, method, url, who.cookie, payload);

async function compute(payload: unknown): Promise<FormulaComputed> {
  const res = await call('POST', '/api/formulas/compute', payload);
  expect(res.statusCode, res.body).toBe(200);
  return res.json<FormulaComputed>();
}

async function create(payload: Record<string, unknown>): Promise<Formula> {
  const res = await call('POST', '/api/formulas', payload);
  expect(res.statusCode, res.body).toBe(201);
  return res.json<Formula>();
}

// A milk loaf typed the way a volume recipe reads.
const BY_VOLUME = {
  ingredients: [
    { kind: 'flour', name: 'Bread flour', amount: 3, unit: 'cup', food: 'bread-flour' },
    { kind: 'water', name: 'Water', amount: 0.75, unit: 'cup' },
    { kind: 'milk', name: 'Milk', amount: 0.5, unit: 'cup', food: 'whole-milk' },
    { kind: 'butter', name: 'Butter', amount: 2, unit: 'tbsp', food: 'butter-unsalted' },
    { kind: 'salt', name: 'Salt', amount: 1.5, unit: 'tsp', food: 'table-salt' },
    { kind: 'starter', name: 'Levain', amount: 100, unit: 'g', starterHydrationPct: 100 },
  ],
};

const TARTINE = {
  ingredients: [
    { kind: 'flour', name: 'flour', amount: 1000, unit: 'g' },
    { kind: 'water', name: 'water', amount: 750, unit: 'g' },
    { kind: 'starter', name: 'leaven', amount: 200, unit: 'g', starterHydrationPct: 100 },
  ],
};

describe('POST /api/formulas/compute', () => {
  it('answers what the shared model answers for the same formula typed by volume', async () => {
    const view = await compute(BY_VOLUME);
    // The model's own pieces, called directly on the same input.
    const grams = BY_VOLUME.ingredients.map((l) =>
      l.unit === 'g' ? l.amount : gramsFromMeasure({ amount: l.amount, unit: l.unit, food: l.food ?? 'water' }).grams,
    );
    const summary = bakersPercentages(
      BY_VOLUME.ingredients.map((l, i) => ({
        name: l.name,
        kind: l.kind as 'flour',
        grams: grams[i]!,
        ...(l.food && l.kind !== 'flour' ? { food: l.food } : {}),
        ...(l.starterHydrationPct ? { hydration: l.starterHydrationPct } : {}),
      })),
    );
    expect(view.lines.map((l) => l.grams)).toEqual(grams);
    expect(view.lines.map((l) => l.percentOfTotalFlour)).toEqual(summary.lines.map((l) => l.percentOfTotalFlour));
    expect(view.totalHydrationPercent).toBe(summary.totalHydrationPercent);
    expect(view.prefermentedFlourPercent).toBe(summary.prefermentedFlourPercent);
    expect(view.finalDoughHydrationPercent).toBe(summary.finalDoughHydrationPercent);
    expect(view.lines[0]).toMatchObject({
      gramsBasis: 'usda-household-measure',
      gramsNote: expect.stringContaining('137 g') as string,
    });
    // Water by the cup with no food chosen is weighed as tap water, and says so.
    expect(view.assumptions.some((a) => a.startsWith('Water: weighed as water (tap)'))).toBe(true);
    // Milk and butter bring water: total hydration is above the water and starter alone.
    const waterAndStarterOnly = ((grams[1]! + 50) / (grams[0]! + 50)) * 100;
    expect(view.totalHydrationPercent).toBeGreaterThan(waterAndStarterOnly);
    expect(view.cautions.map((c) => c.code)).toEqual(['raw-dough', 'dairy-egg-room-temperature']);
  });

  it('matches the Tartine country-loaf worked example in both conventions', async () => {
    // Source: test-fixtures/reference/baking/bakers_percentage_worked_examples.csv, rows
    // tartine_country (C. Robertson, Tartine Bread, 2010, as restated at thefreshloaf.com/node/69688).
    const csv = readFileSync(
      fileURLToPath(
        new URL('../../test-fixtures/reference/baking/bakers_percentage_worked_examples.csv', import.meta.url),
      ),
      'utf8',
    );
    const rows = csv
      .split('\n')
      .filter((r) => r.startsWith('tartine_country,'))
      .map((r) => r.split(','));
    const pct = (component: string, ingredient: string) =>
      Number(rows.find((r) => r[1] === component && r[2] === ingredient)![4]);
    const view = await compute(TARTINE);
    expect(view.totalHydrationPercent).toBeCloseTo(pct('total formula', 'water'), 2);
    expect(view.prefermentedFlourPercent).toBeCloseTo(pct('total formula', 'prefermented flour'), 2);
    expect(view.finalDoughHydrationPercent).toBeCloseTo(pct('final dough', 'water'), 6);
    expect(view.lines[2]!.percentOfFinalDoughFlour).toBeCloseTo(pct('final dough', 'leaven (100% hydration)'), 6);
    expect(view.totalFlourG).toBeCloseTo(1100, 9);
  });

  it('scales to pieces with weighable grams and splits the blend over the flour', async () => {
    const scaling = { by: 'pieces', pieces: 12, pieceG: 80, lossPercent: 2 };
    const blend = [
      { name: 'Bread flour', parts: 3 },
      { name: 'Whole rye', parts: 1 },
    ];
    const view = await compute({ ...TARTINE, blend, scaling });
    const model = scaleFormula(
      [
        { name: 'flour', kind: 'flour', grams: 1000 },
        { name: 'water', kind: 'water', grams: 750 },
        { name: 'leaven', kind: 'starter', grams: 200, hydration: 100 },
      ],
      { by: 'pieces', pieces: 12, pieceG: 80, lossPercent: 2 },
    );
    expect(view.scaled).not.toBeNull();
    expect(view.scaled!.factor).toBe(model.factor);
    expect(view.scaled!.lines.map((l) => l.roundedG)).toEqual(model.lines.map((l) => l.roundedG));
    expect(view.scaled!.doughWeightG).toBeCloseTo(960 / 0.98, 9);
    // Blend at 3 : 1 is 75 % and 25 %; its whole grams add up to the rounded flour line.
    expect(view.blend.map((b) => b.percent)).toEqual(blendFlours(blend, 1000).lines.map((l) => l.percent));
    expect(view.blend.map((b) => b.grams)).toEqual([750, 250]);
    const blendSum = view.scaled!.blend.reduce((s, b) => s + b.roundedG, 0);
    expect(blendSum).toBe(view.scaled!.lines[0]!.roundedG);
  });

  it('names the field the model refuses, nested paths included', async () => {
    const noFood = structuredClone(BY_VOLUME);
    delete (noFood.ingredients[0] as { food?: string }).food;
    const body = expectFieldErrors(await call('POST', '/api/formulas/compute', noFood), ['ingredients.0.food']);
    expect(body.details![0]!.message).toMatch(/density/);

    const noFlour = { ingredients: [{ kind: 'water', name: 'Water', amount: 100, unit: 'g' }] };
    expectFieldErrors(await call('POST', '/api/formulas/compute', noFlour), ['ingredients']);

    const bad = structuredClone(TARTINE) as { ingredients: Record<string, unknown>[] };
    bad.ingredients[2]!.amount = -5;
    bad.ingredients[1]!.kind = 'honey';
    bad.ingredients[0]!.unit = 'handful';
    bad.ingredients[0]!.starterHydrationPct = 80;
    expectFieldErrors(await call('POST', '/api/formulas/compute', bad), [
      'ingredients.0.unit',
      'ingredients.0.starterHydrationPct',
      'ingredients.1.kind',
      'ingredients.2.amount',
    ]);
    expectFieldErrors(await call('POST', '/api/formulas/compute', { ...TARTINE, scaling: { by: 'factor' } }), [
      'scaling.factor',
    ]);
    expectFieldErrors(
      await call('POST', '/api/formulas/compute', { ...TARTINE, scaling: { by: 'factor', factor: 2, pieces: 3 } }),
      ['scaling.pieces'],
    );
    expectFieldErrors(await call('POST', '/api/formulas/compute', { ...TARTINE, blend: [{ name: 'Rye', parts: 0 }] }), [
      'blend.0.parts',
    ]);
  });

  it('needs a session', async () => {
    expectError(await send(t.app, 'POST', '/api/formulas/compute', null, TARTINE), 401);
  });
});

describe('/api/formulas CRUD', () => {
  it('creates, reads, lists, changes and deletes a formula, with its computed view', async () => {
    const made = await create({
      name: ' Country loaf ',
      notes: 'Weekend bake',
      ...BY_VOLUME,
      blend: [{ name: 'Bread flour', parts: 1 }],
      scaling: { by: 'dough-weight', doughG: 1800 },
    });
    expect(made).toMatchObject({
      name: 'Country loaf',
      notes: 'Weekend bake',
      scaling: { by: 'dough-weight', doughG: 1800 },
    });
    expect(made.ingredients).toEqual(BY_VOLUME.ingredients);
    expect(made.computed).toEqual(await compute({ ...BY_VOLUME, blend: made.blend, scaling: made.scaling }));
    expect(made.computed.scaled!.doughWeightG).toBeCloseTo(1800, 9);
    expect((await call('GET', `/api/formulas/${made.id}`)).json()).toEqual(made);

    const patched = await call('PATCH', `/api/formulas/${made.id}`, {
      name: 'Country loaf, 75 %',
      ingredients: TARTINE.ingredients,
      scaling: null,
      notes: null,
    });
    expect(patched.statusCode, patched.body).toBe(200);
    const changed = patched.json<Formula>();
    expect(changed).toMatchObject({ name: 'Country loaf, 75 %', notes: null, scaling: null });
    expect(changed.ingredients).toEqual(TARTINE.ingredients);
    expect(changed.blend).toEqual([{ name: 'Bread flour', parts: 1 }]);
    expect(changed.computed.scaled).toBeNull();

    expect((await call('DELETE', `/api/formulas/${made.id}`)).statusCode).toBe(204);
    expectError(await call('GET', `/api/formulas/${made.id}`), 404);
    expect(await t.db.selectFrom('formulaIngredient').select('formulaId').execute()).toEqual([]);
  });

  it('lists newest change first, a page at a time', async () => {
    for (const name of ['Rye-spelt tin', 'Milk braid', 'Country loaf']) await create({ name, ...TARTINE });
    const page = (await call('GET', '/api/formulas?limit=2')).json<FormulaListResponse>();
    expect(page).toMatchObject({ total: 3, limit: 2, offset: 0 });
    expect(page.items.map((f) => f.name)).toEqual(['Country loaf', 'Milk braid']);
    expect(page.items[0]!.ingredientCount).toBe(3);
    const next = (await call('GET', '/api/formulas?limit=2&offset=2')).json<FormulaListResponse>();
    expect(next.items.map((f) => f.name)).toEqual(['Rye-spelt tin']);
    expectFieldErrors(await call('GET', '/api/formulas?limit=0'), ['limit']);
  });

  it('keeps a formula private: another baker gets 404 and an empty list', async () => {
    const made = await create({ name: 'Country loaf', ...TARTINE });
    expectError(await call('GET', `/api/formulas/${made.id}`, undefined, amara), 404);
    expectError(await call('PATCH', `/api/formulas/${made.id}`, { name: 'Mine now' }, amara), 404);
    expectError(await call('DELETE', `/api/formulas/${made.id}`, undefined, amara), 404);
    expect((await call('GET', '/api/formulas', undefined, amara)).json<FormulaListResponse>().total).toBe(0);
    expect((await call('GET', `/api/formulas/${made.id}`)).json<Formula>().name).toBe('Country loaf');
    expectFieldErrors(await call('GET', '/api/formulas/not-a-uuid'), ['id']);
  });

  it('refuses what cannot be saved, naming the field', async () => {
    expectFieldErrors(await call('POST', '/api/formulas', { name: '', ...TARTINE }), ['name']);
    expectFieldErrors(await call('POST', '/api/formulas', { name: 'Empty', ingredients: [] }), ['ingredients']);
    const noFood = structuredClone(BY_VOLUME);
    delete (noFood.ingredients[0] as { food?: string }).food;
    expectFieldErrors(await call('POST', '/api/formulas', { name: 'Loaf', ...noFood }), ['ingredients.0.food']);
    const made = await create({ name: 'Loaf', ...TARTINE });
    expectFieldErrors(
      await call('PATCH', `/api/formulas/${made.id}`, {
        ingredients: [{ kind: 'flour', name: 'Rye', amount: 0, unit: 'g' }],
      }),
      ['ingredients.0.amount'],
    );
    expect(await t.db.selectFrom('formula').select('id').execute()).toHaveLength(1);
  });

  it('saves once when a create is retried with the same Idempotency-Key', async () => {
    const post = (key: string): Promise<InjectResponse> =>
      t.app.inject({
        method: 'POST',
        url: '/api/formulas',
        payload: { name: 'Milk braid', ...BY_VOLUME },
        headers: { cookie: theo.cookie, 'idempotency-key': key },
      });
    const first = await post('braid-1');
    const again = await post('braid-1');
    expect(first.statusCode, first.body).toBe(201);
    expect(again.statusCode).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.json<Formula>().id).toBe(first.json<Formula>().id);
    expect(await t.db.selectFrom('formula').select('id').execute()).toHaveLength(1);
  });
});
