// Shapes of the bulk-fermentation estimate.
import { type ForecastSegment, type TemperatureSample } from '../temperature/series.js';
import { type CultureKinetics, type KineticsModelName } from '../kinetics/types.js';

export interface DoughEnrichment {
  /** Sugar (any kind), g. */
  sugarG?: number;
  /** Butter, oil or other fat, g. */
  fatG?: number;
  /** Milk, g (its water is part of the dough's hydration; here it counts as enrichment). */
  milkG?: number;
}

/** One look at the aliquot jar: how far the dough sample has risen since mixing. */
export interface AliquotReading {
  /** ISO 8601 with offset. */
  at: string;
  /** (height / height at mixing − 1) × 100. */
  risePct: number;
}

export interface BulkInput {
  /** When the levain went into the dough (start of bulk), ISO 8601 with offset. */
  mixedAt: string;
  /** Flour of the final dough, not counting the flour inside the starter, g. */
  flourG: number;
  /** Water of the final dough, not counting the starter's water, g. */
  waterG: number;
  /** Starter (levain) added, g. */
  starterG: number;
  /** Starter hydration, water/flour × 100; default 100. */
  starterHydrationPct?: number;
  saltG?: number;
  enrichment?: DoughEnrichment;
  /** Dough temperature: one value, logged readings, and/or a forecast. */
  temperatureC?: number;
  temperatures?: readonly TemperatureSample[];
  forecast?: readonly ForecastSegment[];
  /** Rise of the aliquot jar that ends bulk, %; default from flourProteinPct, else 50. */
  targetRisePct?: number;
  /** Protein of the flour, % — picks the default target rise (SOURCES.md §6c). */
  flourProteinPct?: number;
  readings?: readonly AliquotReading[];
}

export interface BulkOptions {
  /** The culture's fitted kinetics; without it the published/common-practice defaults. */
  kinetics?: CultureKinetics;
  /** Rise of the culture at its peak, % (e.g. from fitRise's riseMultiple); default 150. */
  peakRisePct?: number;
  horizonHours?: number;
}

export interface BulkInoculation {
  /** Flour inside the starter as % of all flour (the prefermented flour). */
  prefermentedFlourPct: number;
  /** Starter as % of the final dough's flour (the other way bakers quote it). */
  starterPctOfFlour: number;
  /** 1 / prefermented-flour fraction: the dough's dilution of the culture (1:1:1 → 3). */
  dilution: number;
}

export interface BulkFactors {
  /** Rate multiplier for salt (1 = no effect). */
  salt: number;
  /** Rate multiplier for sugar, fat and milk together. */
  enrichment: number;
}

export type BulkStatus = 'fermenting' | 'done' | 'not-reached';

export interface BulkEstimate {
  status: BulkStatus;
  /** End of bulk (target rise reached), ISO in the offset of mixedAt; null if not reached. */
  endAt: string | null;
  /** 80 % interval. */
  low: string | null;
  high: string | null;
  hoursFromMix: number | null;
  lowHours: number | null;
  highHours: number | null;
  targetRisePct: number;
  inoculation: BulkInoculation;
  factors: BulkFactors;
  /** Hours the bulk would take at 24 °C with these factors and the fitted rate scale. */
  hoursAtReference: number;
  /** Speed of this dough relative to the model, from the aliquot readings (1 = as modelled). */
  rateScale: number;
  readingsUsed: number;
  /** The rise the model expects at the time of the latest reading, % (null without readings). */
  expectedRiseAtLastReadingPct: number | null;
  model: KineticsModelName;
  basis: 'culture' | 'default';
}
