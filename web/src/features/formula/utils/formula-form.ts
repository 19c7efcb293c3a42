import {
  FOODS,
  isMassUnit,
  isVolumeUnit,
  type ComputeFormulaRequest,
  type CreateFormulaRequest,
  type FoodId,
  type Formula,
  type FormulaIngredient,
  type FormulaIngredientKind,
  type FormulaScaleBy,
  type FormulaScaling,
  type FormulaUnit,
} from '@peakwise/shared';
import { parseNumber } from '@/lib/format/units';

// The editor's form keeps numbers as typed text (a half-typed "1." must survive a re-render) and
// names every field as the API does, so a 400's `ingredients.2.amount` lands on the right input.

export interface IngredientRow {
  kind: FormulaIngredientKind;
  name: string;
  amount: string;
  unit: FormulaUnit;
  /** '' when none is chosen. */
  food: string;
  densityGPerMl: string;
  starterHydrationPct: string;
}

export interface BlendRow {
  name: string;
  parts: string;
}

export type ScaleChoice = 'none' | FormulaScaleBy;

export interface FormulaFormValues {
  name: string;
  notes: string;
  ingredients: IngredientRow[];
  blend: BlendRow[];
  scaling: {
    by: ScaleChoice;
    factor: string;
    doughG: string;
    pieces: string;
    pieceG: string;
    lossPercent: string;
  };
}

export const emptyRow = (kind: FormulaIngredientKind = 'flour'): IngredientRow => ({
  kind,
  name: '',
  amount: '',
  unit: 'g',
  food: '',
  densityGPerMl: '',
  starterHydrationPct: kind === 'starter' ? '100' : '',
});

const EMPTY_SCALING: FormulaFormValues['scaling'] = {
  by: 'none',
  factor: '2',
  doughG: '',
  pieces: '',
  pieceG: '',
  lossPercent: '',
};

export function newFormulaValues(): FormulaFormValues {
  return {
    name: '',
    notes: '',
    ingredients: [
      { ...emptyRow('flour'), name: 'Bread flour' },
      { ...emptyRow('water'), name: 'Water' },
      { ...emptyRow('starter'), name: 'Levain' },
      { ...emptyRow('salt'), name: 'Salt' },
    ],
    blend: [],
    scaling: EMPTY_SCALING,
  };
}

const text = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));

export function valuesFromFormula(formula: Formula): FormulaFormValues {
  const s = formula.scaling;
  return {
    name: formula.name,
    notes: formula.notes ?? '',
    ingredients: formula.ingredients.map((l) => ({
      kind: l.kind,
      name: l.name,
      amount: text(l.amount),
      unit: l.unit,
      food: l.food ?? '',
      densityGPerMl: text(l.densityGPerMl),
      starterHydrationPct: text(l.starterHydrationPct),
    })),
    blend: formula.blend.map((b) => ({ name: b.name, parts: text(b.parts) })),
    scaling: s
      ? {
          by: s.by,
          factor: text(s.factor),
          doughG: text(s.doughG),
          pieces: text(s.pieces),
          pieceG: text(s.pieceG),
          lossPercent: text(s.lossPercent),
        }
      : EMPTY_SCALING,
  };
}

/** A number, or NaN for blank or unreadable text: sent as null, so the API names the field. */
const num = (value: string): number => parseNumber(value) ?? Number.NaN;

function ingredientOf(row: IngredientRow): FormulaIngredient {
  const line: FormulaIngredient = { kind: row.kind, name: row.name.trim(), amount: num(row.amount), unit: row.unit };
  if (row.food !== '') line.food = row.food;
  if (row.densityGPerMl.trim() !== '') line.densityGPerMl = num(row.densityGPerMl);
  if (row.kind === 'starter' && row.starterHydrationPct.trim() !== '') {
    line.starterHydrationPct = num(row.starterHydrationPct);
  }
  return line;
}

export function scalingOf(values: FormulaFormValues['scaling']): FormulaScaling | null {
  switch (values.by) {
    case 'factor':
      return { by: 'factor', factor: num(values.factor) };
    case 'dough-weight':
      return { by: 'dough-weight', doughG: num(values.doughG) };
    case 'pieces': {
      const s: FormulaScaling = { by: 'pieces', pieces: num(values.pieces), pieceG: num(values.pieceG) };
      if (values.lossPercent.trim() !== '') s.lossPercent = num(values.lossPercent);
      return s;
    }
    default:
      return null;
  }
}

/** Everything as typed, for saving: the API is the judge of what is missing. */
export function toCreateRequest(values: FormulaFormValues): CreateFormulaRequest {
  return {
    name: values.name.trim(),
    notes: values.notes.trim() === '' ? null : values.notes.trim(),
    ingredients: values.ingredients.map(ingredientOf),
    blend: values.blend.map((b) => ({ name: b.name.trim(), parts: num(b.parts) })),
    scaling: scalingOf(values.scaling),
  };
}

const finite = (n: number | undefined) => n === undefined || Number.isFinite(n);

/** A line worth computing: named, with an amount above 0. */
export function isComplete(row: IngredientRow): boolean {
  const amount = parseNumber(row.amount);
  return row.name.trim() !== '' && amount !== null && amount > 0;
}

export interface LiveRequest {
  request: ComputeFormulaRequest;
  /** For each line sent, the form row it came from (half-typed rows are left out). */
  rows: number[];
}

/**
 * What the editor asks the API to compute while the baker types: complete lines only, and a blend
 * or scaling only once its numbers read. Null when there is nothing to compute yet.
 */
export function toLiveRequest(values: FormulaFormValues): LiveRequest | null {
  const rows = values.ingredients.flatMap((row, i) => (isComplete(row) ? [i] : []));
  if (rows.length === 0) return null;
  const ingredients = rows
    .map((i) => ingredientOf(values.ingredients[i]!))
    .map((l) => {
      // An unreadable optional number is left out here; saving still sends it for the API to name.
      const line = { ...l };
      if (!finite(line.densityGPerMl ?? undefined)) delete line.densityGPerMl;
      if (!finite(line.starterHydrationPct ?? undefined)) delete line.starterHydrationPct;
      return line;
    });
  const blend = values.blend
    .filter((b) => b.name.trim() !== '' && (parseNumber(b.parts) ?? 0) > 0)
    .map((b) => ({ name: b.name.trim(), parts: num(b.parts) }));
  const scaling = scalingOf(values.scaling);
  const scalingReads =
    scaling !== null &&
    [scaling.factor, scaling.doughG, scaling.pieces, scaling.pieceG, scaling.lossPercent].every(finite);
  const request: ComputeFormulaRequest = { ingredients, blend };
  if (scalingReads) request.scaling = scaling;
  return { request, rows };
}

/** Foods that fit a line of this kind, for its "what is it" list. */
export function foodsFor(kind: FormulaIngredientKind): { id: FoodId; name: string }[] {
  return (Object.keys(FOODS) as FoodId[])
    .filter((id) => FOODS[id].kind === kind)
    .map((id) => ({ id, name: FOODS[id].name }));
}

/** Whether the row needs a food or a density to be weighed, or a food for its water content. */
export function needsFood(row: IngredientRow): boolean {
  return !isMassUnit(row.unit) || row.kind === 'milk' || row.kind === 'butter';
}

export const takesDensity = (row: IngredientRow): boolean => isVolumeUnit(row.unit);
