// What fitRise takes and gives back. Heights in millimetres, durations in hours, rates per hour,
// times as UTC ISO strings. Every field that cannot be known yet is null, never a guess.
import { type CurveStandardErrors } from '../curve/curve-fit-types.js';
import { type GrowthModelName } from '../curve/growth-models.js';
import { type RiseReading } from './rise-readings.js';

export type { RiseReading } from './rise-readings.js';

export interface FitRiseInput {
  /** When the starter was fed (ISO 8601 with offset). */
  fedAt: string;
  /** Height of the culture in the jar right after feeding, mm. */
  initialHeightMm: number;
  /** Rise checks after feeding, in any order. */
  readings: readonly RiseReading[];
  /** Curve to fit; Gompertz unless asked otherwise ('auto' picks by AICc). */
  model?: 'gompertz' | 'logistic' | 'auto';
}

/**
 * rising: the readings are still climbing; peakAt is a prediction (with peakInterval).
 * peaked: a fall after the highest reading was seen, or the fitted curve's top was reached.
 * insufficient-data: fewer than 3 usable readings after feeding, or no rise yet.
 * invalid-input: fedAt, initialHeightMm or readings itself is unusable (see field).
 */
export type RiseStatus = 'rising' | 'peaked' | 'insufficient-data' | 'invalid-input';

export interface RiseFitSummary {
  model: GrowthModelName;
  /** Asymptote of the rise y = h/h0 − 1 (1.0 = doubled). */
  A: number;
  /** Maximum rise rate, fraction of the initial height per hour. */
  muMax: number;
  /** Lag, hours after feeding. */
  lag: number;
  se: CurveStandardErrors;
  /** 1 − RSS/TSS on the fitted readings. */
  r2: number;
  /** Residual standard deviation, in mm. */
  residualStdDevMm: number;
  /** Points fitted: the feeding itself plus the readings up to the fall. */
  pointsUsed: number;
}

export interface RiseResult {
  status: RiseStatus;
  /** Why this status, in a sentence. */
  reason: string;
  /** For invalid-input: the offending field. */
  field?: string;
  /**
   * Peak height over the initial height (2.4 = rose to 2.4× the height after feeding). Peaked:
   * the highest reading. Rising: 1 + A of the fit, never below the highest reading so far.
   */
  riseMultiple: number | null;
  /** The highest reading over the initial height, whatever the status. */
  observedRiseMultiple: number | null;
  /** Fitted lag, hours after feeding before the rise gets going. */
  lagHours: number | null;
  /** Steepest rise, as % of the initial height per hour (100·μm). */
  maxRisePercentPerHour: number | null;
  /** Steepest rise in mm per hour (μm·initial height). */
  maxRiseMmPerHour: number | null;
  /** Peak time (see peak-window.ts for the definition). */
  peakAt: string | null;
  /** Hours from feeding to the peak. */
  hoursToPeak: number | null;
  /** For a predicted peak (rising): an 80 % interval by the delta method. */
  peakInterval: { low: string; high: string; level: number } | null;
  /** Start of the ready window (85 % of the fitted rise). */
  readyFrom: string | null;
  /** End of the ready window: the observed fall, or as long after the peak as readyFrom was before it. */
  readyUntil: string | null;
  /** The highest reading (before any fall). */
  highestReading: { at: string; heightMm: number } | null;
  /** The first reading that showed the fall, when one did. */
  fallSeenAt: string | null;
  fit: RiseFitSummary | null;
  /** Readings dropped or merged, and why. */
  warnings: string[];
}
