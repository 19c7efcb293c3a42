import type { Formula } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { liveProblems } from './editor-errors';
import { ApiError } from '@/lib/api-client';
import { emptyRow, newFormulaValues, toCreateRequest, toLiveRequest, valuesFromFormula } from './formula-form';

describe('the editor form and the API shapes', () => {
  it('computes live only the complete lines, remembering which row each came from', () => {
    const values = newFormulaValues();
    values.ingredients[0]!.amount = '500';
    values.ingredients[1]!.amount = '';
    values.ingredients[2]!.amount = '100';
    values.ingredients[3]!.amount = '1,5';
    const live = toLiveRequest(values)!;
    expect(live.rows).toEqual([0, 2, 3]);
    expect(live.request.ingredients.map((l) => l.amount)).toEqual([500, 100, 1.5]);
    expect(live.request.ingredients[1]).toMatchObject({ kind: 'starter', starterHydrationPct: 100 });
    expect(live.request.scaling).toBeUndefined();
  });

  it('waits with the scaling until its numbers read, and leaves out half-typed blend rows', () => {
    const values = newFormulaValues();
    values.ingredients[0]!.amount = '500';
    values.scaling = { ...values.scaling, by: 'pieces', pieces: '6', pieceG: '' };
    values.blend = [
      { name: 'Rye', parts: '1' },
      { name: '', parts: '2' },
    ];
    expect(toLiveRequest(values)!.request).toMatchObject({ blend: [{ name: 'Rye', parts: 1 }] });
    expect(toLiveRequest(values)!.request.scaling).toBeUndefined();
    values.scaling.pieceG = '80';
    expect(toLiveRequest(values)!.request.scaling).toEqual({ by: 'pieces', pieces: 6, pieceG: 80 });
  });

  it('saves every row as typed, so the API can name a blank amount at its row', () => {
    const values = newFormulaValues();
    values.name = ' Country loaf ';
    values.ingredients.push(emptyRow('other'));
    const request = toCreateRequest(values);
    expect(request.name).toBe('Country loaf');
    expect(request.ingredients).toHaveLength(5);
    // NaN goes out as null in JSON: the API answers "ingredients.4.amount".
    expect(JSON.parse(JSON.stringify(request.ingredients[4]))).toMatchObject({ amount: null });
    expect(request.scaling).toBeNull();
  });

  it('reads a saved formula back into the same form values', () => {
    const formula = {
      id: 'f',
      name: 'Braid',
      notes: null,
      ingredients: [
        { kind: 'flour', name: 'Flour', amount: 4, unit: 'cup', food: 'all-purpose-flour', densityGPerMl: 0.55 },
        { kind: 'starter', name: 'Levain', amount: 120, unit: 'g', starterHydrationPct: 80 },
      ],
      blend: [{ name: 'Spelt', parts: 3 }],
      scaling: { by: 'factor', factor: 1.5 },
    } as Formula;
    const values = valuesFromFormula(formula);
    expect(toCreateRequest(values)).toEqual({
      name: 'Braid',
      notes: null,
      ingredients: formula.ingredients,
      blend: formula.blend,
      scaling: formula.scaling,
    });
  });

  it('names the form row of a live problem, not the API’s line number', () => {
    const error = new ApiError({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Some fields need another look.',
      details: [{ field: 'ingredients.1.food', message: 'Say what it is.' }],
    });
    expect(liveProblems(error, [0, 2], ['Flour', 'Half typed', 'Rye'])).toEqual(['Line 3 (Rye): Say what it is.']);
  });
});
