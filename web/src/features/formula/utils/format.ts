import type { UnitSystem } from '@peakwise/shared';
import { GRAMS_PER_OUNCE } from '@/lib/format/units';

// How the Formula screens write numbers: every one with its unit, to a step a baker can use.

/** "411 g", "9.4 g", "0.35 g": whole grams from 10 g up, finer below (as the scale rounding does). */
export function formatGrams(grams: number): string {
  const abs = Math.abs(grams);
  const digits = abs >= 10 ? 0 : abs >= 1 ? 1 : 2;
  return `${grams.toLocaleString('en-GB', { maximumFractionDigits: digits, minimumFractionDigits: 0 })} g`;
}

/** "75.0 %" — one decimal, so 77.27 % and 77.3 % read the same and 2.0 % salt stays visible. */
export function formatPercent(percent: number | null): string {
  return percent === null ? '—' : `${percent.toFixed(1)} %`;
}

/** A factor as a baker says it: "× 1.5", "× 0.48". */
export function formatFactor(factor: number): string {
  return `× ${Number(factor.toPrecision(3))}`;
}

/** For a US baker, the ounces beside the grams ("14.5 oz"); null in metric. 1 oz = 28.349523125 g. */
export function ouncesFor(grams: number, system: UnitSystem): string | null {
  if (system !== 'us') return null;
  const oz = grams / GRAMS_PER_OUNCE;
  return `${oz >= 10 ? oz.toFixed(1) : oz.toFixed(2)} oz`;
}
