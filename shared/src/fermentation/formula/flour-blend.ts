import { BakersMathError, fieldPath, requireFinite, requirePositive } from '../units/bakers-math-error.js';

/** One flour of a blend, in parts by weight ("3 parts bread flour : 1 part whole rye"). */
export interface BlendPart {
  name: string;
  parts: number;
  /** Protein, g per 100 g of this flour (from its bag or a food table). */
  proteinPercent?: number;
}

export interface BlendLine {
  name: string;
  parts: number;
  /** Share of the blend's weight. */
  percent: number;
  /** Present when a flour weight was asked for. */
  grams?: number;
  /** Whole grams that add up exactly to the rounded flour weight (largest-remainder rounding). */
  roundedG?: number;
  proteinPercent?: number;
}

export interface FlourBlend {
  lines: BlendLine[];
  totalParts: number;
  flourG?: number;
  /** Weight-weighted protein of the blend; null unless every flour gave its protein. */
  proteinPercent: number | null;
  /** Flours that gave no protein, so the blend's protein could not be worked out. */
  proteinMissingFor: string[];
}

/** Turns parts by weight into percentages, and grams when `flourG` (the blend's weight) is given. */
export function blendFlours(parts: readonly BlendPart[], flourG?: number, at = ''): FlourBlend {
  // Checked as `unknown`: Array.isArray would otherwise widen a readonly array to any[].
  const given: unknown = parts;
  if (!Array.isArray(given) || parts.length === 0) {
    throw new BakersMathError(fieldPath(at, 'flours'), 'a blend needs at least one flour');
  }
  parts.forEach((p, i) => {
    if (typeof p.name !== 'string' || p.name.trim() === '') {
      throw new BakersMathError(fieldPath(at, 'flours', i, 'name'), 'every flour needs a name');
    }
    requirePositive(p.parts, fieldPath(at, 'flours', i, 'parts'));
    if (p.proteinPercent !== undefined) {
      const protein = requireFinite(p.proteinPercent, fieldPath(at, 'flours', i, 'proteinPercent'));
      if (protein < 0 || protein > 100) {
        throw new BakersMathError(fieldPath(at, 'flours', i, 'proteinPercent'), 'protein is g per 100 g, 0 to 100');
      }
    }
  });
  const total = flourG === undefined ? undefined : requirePositive(flourG, fieldPath(at, 'flourG'));
  const totalParts = parts.reduce((s, p) => s + p.parts, 0);
  const rounded = total === undefined ? undefined : largestRemainder(parts.map((p) => (p.parts / totalParts) * total));

  const lines = parts.map((p, i): BlendLine => {
    const line: BlendLine = { name: p.name, parts: p.parts, percent: (p.parts / totalParts) * 100 };
    if (total !== undefined) line.grams = (p.parts / totalParts) * total;
    if (rounded !== undefined) line.roundedG = rounded[i] ?? 0;
    if (p.proteinPercent !== undefined) line.proteinPercent = p.proteinPercent;
    return line;
  });
  const proteinMissingFor = parts.filter((p) => p.proteinPercent === undefined).map((p) => p.name);
  const proteinPercent =
    proteinMissingFor.length > 0
      ? null
      : parts.reduce((s, p) => s + (p.parts / totalParts) * (p.proteinPercent ?? 0), 0);

  const blend: FlourBlend = { lines, totalParts, proteinPercent, proteinMissingFor };
  if (total !== undefined) blend.flourG = total;
  return blend;
}

/**
 * Whole grams that sum to the rounded total: round everything down, then hand the missing grams
 * to the largest remainders. Rounding each line alone can leave the bowl a gram or two off.
 */
export function largestRemainder(values: readonly number[]): number[] {
  const target = Math.round(values.reduce((s, v) => s + v, 0));
  const floors = values.map(Math.floor);
  let missing = target - floors.reduce((s, v) => s + v, 0);
  const order = values.map((v, i) => ({ i, rest: v - Math.floor(v) })).sort((a, b) => b.rest - a.rest || a.i - b.i);
  for (const { i } of order) {
    if (missing <= 0) break;
    floors[i] = (floors[i] ?? 0) + 1;
    missing -= 1;
  }
  return floors;
}
