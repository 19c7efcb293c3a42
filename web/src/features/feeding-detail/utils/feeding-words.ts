import type { Feeding } from '@peakwise/shared';

const tenth = (n: number) => Math.round(n * 10) / 10;

/** The feeding's ratio from its grams, starter as 1: "1 : 2 : 2", "1 : 4.5 : 4" (to 0.1). */
export function ratioWords(feeding: Pick<Feeding, 'starterG' | 'flourG' | 'waterG'>): string {
  const { starterG, flourG, waterG } = feeding;
  return `1 : ${tenth(flourG / starterG)} : ${tenth(waterG / starterG)}`;
}

/** Water as % of the fresh flour (the feed's own hydration, leaving out the starter's): "100 %". */
export function feedHydrationWords(feeding: Pick<Feeding, 'flourG' | 'waterG'>): string {
  return `${Math.round((feeding.waterG / feeding.flourG) * 100)} %`;
}

/**
 * How far a reading stands above the feeding's starting height, in % (100 = doubled), to whole
 * per cent; null without a starting height.
 */
export function risePct(heightMm: number, initialHeightMm: number | null): number | null {
  if (initialHeightMm === null || initialHeightMm <= 0) return null;
  return Math.round((heightMm / initialHeightMm - 1) * 100);
}

/** "1 Dec 2026, 14:05" in the baker's zone. */
export function formatWhen(iso: string, timeZone: string): string {
  return new Date(iso).toLocaleString('en-GB', { timeZone, dateStyle: 'medium', timeStyle: 'short' });
}

/** A reading's time in the baker's zone, with its day only when it is not the feeding's day: "15:05", "2 Dec, 09:10". */
export function readingTime(iso: string, fedAtIso: string, timeZone: string): string {
  const day = (d: string) => new Date(d).toLocaleDateString('en-CA', { timeZone });
  const time = new Date(iso).toLocaleTimeString('en-GB', { timeZone, hour: '2-digit', minute: '2-digit' });
  if (day(iso) === day(fedAtIso)) return time;
  return `${new Date(iso).toLocaleDateString('en-GB', { timeZone, day: 'numeric', month: 'short' })}, ${time}`;
}

/** Hours from the feeding to a reading, for "+1 h 30 min". */
export function hoursAfter(fedAtIso: string, iso: string): number {
  return (Date.parse(iso) - Date.parse(fedAtIso)) / 3_600_000;
}
