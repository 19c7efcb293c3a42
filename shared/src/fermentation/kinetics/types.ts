// Shapes of the culture-kinetics model: what a past feeding must tell us, and what the fit and
// the prediction give back.
import { type TemperatureModel } from '../temperature/models.js';
import { type ForecastSegment, type TemperatureSample } from '../temperature/series.js';

/** The temperature models the kinetics can fit (Q10 or a cardinal model). */
export type KineticsModelName = 'q10' | 'ctmi' | 'ratkowsky1983';

interface FeedingAmounts {
  /** ISO 8601 with offset. */
  fedAt: string;
  starterG: number;
  flourG: number;
  waterG: number;
  /** One temperature for the whole feeding, °C. */
  temperatureC?: number;
  /** Logged temperatures, °C (interpolated linearly; held constant outside). */
  temperatures?: readonly TemperatureSample[];
}

/** A completed feeding with its observed time to peak. */
export interface ObservedFeeding extends FeedingAmounts {
  hoursToPeak: number;
}

/** The feeding to forecast. Temperatures: readings so far, then the forecast (or temperatureC). */
export interface NextFeeding extends FeedingAmounts {
  forecast?: readonly ForecastSegment[];
}

export interface KineticsOptions {
  /** Temperature model to fit; default DEFAULT_KINETICS_MODEL (chosen by the benchmark). */
  model?: KineticsModelName;
  /** Fit the temperature parameters per culture (default) or keep the published prior values. */
  fitTemperature?: boolean;
  /**
   * Weight of a feeding halves every `halfLifeFeedings` feedings away from `asOf`, so a culture
   * that changes (new flour, a maturing culture) is followed. Infinity weighs all alike.
   */
  halfLifeFeedings?: number;
  /** Where "now" is for the weights: default after the last feeding. */
  asOf?: string;
  /** Temperature assumed for feedings that logged none, °C (default: median of the others). */
  defaultTemperatureC?: number;
}

export type TrendLabel = 'steady' | 'faster' | 'slower';

export interface KineticsTrend {
  /** Slope of log residuals per feeding over the recent window; > 0 means taking longer. */
  slopePerFeeding: number;
  /** exp(slope × (window − 1)) − 1: change in time to peak across the window, as a fraction. */
  changeOverWindow: number;
  /** t statistic of the slope (0 when the window is too short). */
  tStatistic: number;
  label: TrendLabel;
  feedingsInWindow: number;
}

export interface KineticsParameters {
  /** Hours at 24 °C per unit of ln(dilution): 1/μ of the culture at the reference. */
  betaHours: number;
  /** Lag as "work to be done" in units of ln(dilution) (Baranyi's h0 = λ·μ). */
  h0: number;
  /** Lag at the reference temperature, hours (β·h0). */
  lagHoursAtRef: number;
  /** Specific growth rate at the reference, h⁻¹ (1/β). */
  muPerHourAtRef: number;
  q10?: number;
  tMin?: number;
  tOpt?: number;
  tMax?: number;
  c?: number;
}

export interface CultureKinetics {
  model: KineticsModelName;
  temperatureModel: TemperatureModel;
  referenceC: number;
  params: KineticsParameters;
  /** Time to peak at the reference temperature (24 °C) and a 1:1:1 feeding (dilution 3), hours. */
  hoursToPeakAtReference: number;
  /** Spread of log time-to-peak used for intervals (pooled with the prior spread). */
  residualSd: number;
  /** Spread from the feedings alone, or null with fewer than 3. */
  observedResidualSd: number | null;
  /** Degrees of freedom behind `residualSd` (including the prior's pseudo-observations). */
  dof: number;
  trend: KineticsTrend;
  feedingsUsed: number;
  /** Feedings that logged no temperature and were fitted at the assumed default. */
  feedingsWithAssumedTemperature: number;
  basis: 'culture' | 'default';
  /** Internal: fitted parameter vector, its names and covariance (for intervals). */
  theta: readonly number[];
  thetaNames: readonly string[];
  covariance: readonly (readonly number[])[];
}

export interface PeakPrediction {
  /** ISO 8601 in the offset of `fedAt`; null when the peak is not reached within the horizon. */
  peakAt: string | null;
  /** 80 % interval; `high` is null when even the slow end is beyond the horizon. */
  low: string | null;
  high: string | null;
  hoursToPeak: number | null;
  lowHours: number | null;
  highHours: number | null;
  /** Hours the peak would take at 24 °C (the culture's work for this dilution). */
  hoursAtReference: number;
  dilution: number;
  q10?: number;
  model: KineticsModelName;
  basis: 'culture' | 'default';
  feedingsUsed: number;
}
