// Conversions the logbook applies to what a baker types: a feeding ratio with a total weight into
// grams, and a rise given as "% rise" or "× initial" into mm. Pure; the API and the web form share
// them so the form's preview is the value that gets stored.

export interface FeedingGrams {
  starterG: number;
  flourG: number;
  waterG: number;
}

const RATIO = /^\s*(\d+(?:\.\d+)?)\s*:\s*(\d+(?:\.\d+)?)\s*:\s*(\d+(?:\.\d+)?)\s*$/;

/** "1:2:2" → [1, 2, 2] (starter : flour : water); null unless three numbers above 0. */
export function parseRatio(ratio: string): [number, number, number] | null {
  const match = RATIO.exec(ratio);
  if (!match) return null;
  const parts = [Number(match[1]), Number(match[2]), Number(match[3])] as [number, number, number];
  return parts.every((part) => part > 0) ? parts : null;
}

/**
 * Splits `totalG` by a starter:flour:water ratio. Weights are rounded to 0.1 g (a good kitchen
 * scale's step) by largest remainder, so they add up to the total: 100 g at 1:1:1 is
 * 33.4 + 33.3 + 33.3, not 99.9. Null when the ratio does not parse or the total is not above 0.
 */
export function gramsFromRatio(ratio: string, totalG: number): FeedingGrams | null {
  const parts = parseRatio(ratio);
  if (!parts || !Number.isFinite(totalG) || totalG <= 0) return null;
  const units = Math.round(totalG * 10);
  const sum = parts[0] + parts[1] + parts[2];
  const shares = parts.map((part) => (units * part) / sum);
  const tenths = shares.map(Math.floor);
  let left = units - tenths.reduce((a, b) => a + b, 0);
  // Ties go to the earlier part: starter, then flour, then water.
  const byRemainder = [0, 1, 2].sort((a, b) => shares[b]! - tenths[b]! - (shares[a]! - tenths[a]!) || a - b);
  for (const i of byRemainder) {
    if (left <= 0) break;
    tenths[i]! += 1;
    left -= 1;
  }
  const [starter, flour, water] = tenths.map((t) => t / 10) as [number, number, number];
  return { starterG: starter, flourG: flour, waterG: water };
}

const toTenth = (mm: number) => Math.round(mm * 10) / 10;

/** Height in mm (to 0.1 mm) of a starter that rose `risePct` % above `initialHeightMm`; 100 % = doubled. */
export function heightFromRisePct(initialHeightMm: number, risePct: number): number {
  return toTenth(initialHeightMm * (1 + risePct / 100));
}

/** Height in mm (to 0.1 mm) of a starter at `multiple` × `initialHeightMm`; 2 = doubled. */
export function heightFromMultiple(initialHeightMm: number, multiple: number): number {
  return toTenth(initialHeightMm * multiple);
}
