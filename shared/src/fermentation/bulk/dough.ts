// What a dough's formula means for fermentation: how strongly it is inoculated, and how much its
// salt and enrichment slow the culture down.
import { type BulkFactors, type BulkInoculation, type BulkInput } from './types.js';

function nonNegative(value: number | undefined, name: string): number {
  const v = value ?? 0;
  if (!Number.isFinite(v) || v < 0) throw new RangeError(`${name} must be a number of at least 0`);
  return v;
}

/**
 * Prefermented flour = the starter's flour, starter / (1 + hydration). Its share of all the flour
 * plays the role of a feeding's dilution: 1/share is the factor by which the culture is thinned
 * (a starter of the same hydration as its feed gives exactly the feeding ratio's dilution, e.g.
 * 1:1:1 → 3).
 */
export function inoculation(input: BulkInput): BulkInoculation {
  if (!(input.flourG > 0)) throw new RangeError('flourG must be greater than 0');
  if (!(input.starterG > 0)) throw new RangeError('starterG must be greater than 0');
  nonNegative(input.waterG, 'waterG');
  const hydration = (input.starterHydrationPct ?? 100) / 100;
  if (!(hydration > 0 && hydration <= 5)) throw new RangeError('starterHydrationPct must be in (0, 500]');
  const starterFlour = input.starterG / (1 + hydration);
  const totalFlour = input.flourG + starterFlour;
  const share = starterFlour / totalFlour;
  return {
    prefermentedFlourPct: 100 * share,
    starterPctOfFlour: (100 * input.starterG) / input.flourG,
    dilution: 1 / share,
  };
}

/** All the flour of the dough, including the starter's, g. */
export function totalFlour(input: BulkInput): number {
  return input.flourG + input.starterG / (1 + (input.starterHydrationPct ?? 100) / 100);
}

/**
 * Salt: rate × (1 − salt/8 %), salt as % of all flour. A linear ("gamma") inhibition that reaches
 * zero at 8 % NaCl, the level C. milleri tolerates (Gänzle, Ehmann & Hammes 1998, AEM 64:2616:
 * lactobacilli stopped by 4 %, the yeast tolerating up to 8 %; SOURCES.md §1a). The yeast's
 * limit is used because a dough's rise is mostly the yeast's gas [common practice]. 2 % salt →
 * 0.75. The linear shape is our modelling choice, not a published curve.
 */
export const SALT_LIMIT_PCT = 8;

/**
 * Enrichment slows fermentation [common practice; the magnitudes are our assumption, from memory]:
 * sugar above about 5 % of the flour draws water from the cells (−2 % rate per % above 5), fat
 * coats them (−1 % per %), milk slows acidification and gas (−0.2 % per %). A milk braid with
 * 10 % sugar, 10 % butter and 60 % milk comes out at about 0.71× the rate of a lean dough.
 */
export const SUGAR_FREE_PCT = 5;
export const SUGAR_SLOWDOWN_PER_PCT = 0.02;
export const FAT_SLOWDOWN_PER_PCT = 0.01;
export const MILK_SLOWDOWN_PER_PCT = 0.002;
/** Floor: no formula in this model slows a culture below 30 % of its lean-dough rate. */
const MIN_FACTOR = 0.3;

export function rateFactors(input: BulkInput): BulkFactors {
  const flour = totalFlour(input);
  const pct = (g: number | undefined, name: string): number => (100 * nonNegative(g, name)) / flour;
  const salt = Math.max(0, 1 - pct(input.saltG, 'saltG') / SALT_LIMIT_PCT);
  const e = input.enrichment ?? {};
  const sugar = 1 - SUGAR_SLOWDOWN_PER_PCT * Math.max(0, pct(e.sugarG, 'enrichment.sugarG') - SUGAR_FREE_PCT);
  const fat = 1 - FAT_SLOWDOWN_PER_PCT * pct(e.fatG, 'enrichment.fatG');
  const milk = 1 - MILK_SLOWDOWN_PER_PCT * pct(e.milkG, 'enrichment.milkG');
  return { salt, enrichment: Math.max(MIN_FACTOR, sugar * fat * milk) };
}

/**
 * Aliquot-jar rise that ends bulk, by flour protein: 8–10 % → 25 %, 10–12 % → 50 %, 12–15 % →
 * 100 %, above 15 % → 100 % (the table says "> 100 %"; we stop at 100). Source: The Sourdough
 * Framework (Kleinwächter), table "dough size increase" (SOURCES.md §6c; book guidance). Without
 * a protein figure: 50 %, the low end of the common-practice 50–100 %.
 */
export function defaultTargetRisePct(flourProteinPct?: number): number {
  if (flourProteinPct === undefined) return 50;
  if (flourProteinPct < 10) return 25;
  if (flourProteinPct < 12) return 50;
  return 100;
}
