// GET /api/cultures/:id/summary — everything the Shelf card and the culture page need to say
// where a culture stands and when it will be ready. Every number is computed by the shared model
// (fermentation/) from the stored feedings; `basedOn` says which input produced it.
import type { Culture, Feeding } from './culture.js';

/**
 * Where the culture stands, as a baker would say it:
 * - `rising`: fed and climbing; the ready window is ahead.
 * - `ready`: inside its ready window now.
 * - `past-peak`: the window has passed, or a fall was seen; time to feed (or use it soon).
 * - `in-fridge`: kept in the fridge (location), resting between bakes.
 * - `waiting`: fed, but too few rise checks to say more than the culture's usual pace.
 * - `not-fed-yet`: no feeding logged.
 */
export const CULTURE_STATES = ['rising', 'ready', 'past-peak', 'in-fridge', 'waiting', 'not-fed-yet'] as const;
export type CultureState = (typeof CULTURE_STATES)[number];

/** One point of a rise curve: hours since feeding and height as a multiple of the initial height. */
export interface RisePoint {
  hours: number;
  multiple: number;
}

/** The latest feeding and what its own rise checks say. */
export interface RunningFeeding {
  feeding: Feeding;
  /** From the shared model's fitRise: rising | peaked | insufficient-data. */
  riseStatus: 'rising' | 'peaked' | 'insufficient-data';
  /** The rise checks as multiples of the initial height (empty without an initial height). */
  readings: RisePoint[];
  /** The fitted curve sampled from feeding to a little past the peak; null before a fit. */
  fittedCurve: RisePoint[] | null;
  /** Peak height ÷ initial height (observed when peaked, fitted while rising). */
  riseMultiple: number | null;
  peakAt: string | null;
  readyFrom: string | null;
  readyUntil: string | null;
}

/** When the latest feeding will peak, with an 80 % interval. */
export interface PeakForecast {
  peakAt: string;
  low: string;
  high: string;
  /** Always 0.8: the interval is meant to hold the peak four times in five. */
  level: number;
  hoursToPeak: number;
  /**
   * `readings`: from this feeding's own rise checks (fitRise); `culture`: from the culture's past
   * feedings and the temperature (kinetics); `default`: published priors, too little history.
   */
  basis: 'readings' | 'culture' | 'default';
}

/** How this culture responds to temperature and dilution, learnt from its completed feedings. */
export interface CultureKineticsSummary {
  /** `q10`, `ctmi` or `ratkowsky1983` (the default). */
  model: string;
  /** Time to peak of a 1:1:1 feeding at 24 °C (the reference), hours. */
  hoursToPeakAtReference: number;
  referenceTemperatureC: number;
  /** Hours to peak of a 1:1:1 feeding at a few kitchen temperatures, for the plain-words card. */
  hoursToPeakAt: { temperatureC: number; hours: number }[];
  q10: number | null;
  /** Cardinal temperatures where the model has them (°C). */
  tMin: number | null;
  tOpt: number | null;
  tMax: number | null;
  trend: 'steady' | 'faster' | 'slower';
  feedingsUsed: number;
  basis: 'culture' | 'default';
  /** Past feedings as (temperature, hours to peak, dilution) for the time-to-peak chart. */
  observations: { feedingId: string; fedAt: string; temperatureC: number; hoursToPeak: number; dilution: number }[];
}

export interface CultureSummary {
  culture: Culture;
  state: CultureState;
  lastFedAt: string | null;
  running: RunningFeeding | null;
  forecast: PeakForecast | null;
  kinetics: CultureKineticsSummary;
  /** Shown with any discolouration observation on the running feeding. */
  caution: string | null;
}
