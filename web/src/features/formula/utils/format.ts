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
