// The arithmetic behind GET /api/cultures/:id/summary, as pure functions of the stored feedings
// and one "now". Every number comes from the shared model (fitRise, fitCultureKinetics,
// predictNextPeak); this file only chooses which of its answers to show.
import {
  dilution,
  fitCultureKinetics,
  growthModels,
  predictNextPeak,
  type Culture,
  type CultureKinetics,
  type CultureKineticsSummary,
  type CultureState,
  type CultureSummary,
  type Feeding,
  type ObservedFeeding,
  type PeakForecast,
  type RiseResult,
  type RisePoint,
  type RunningFeeding,
  type TemperatureSample,
} from '@peakwise/shared';
import { fitRiseRemembered } from './rise-memo.js';

export interface SummaryRiseCheck {
  at: string;
  heightMm: number;
  temperatureC: number | null;
}

/** One stored feeding with its rise checks and temperature readings (both oldest first). */
export interface FeedingHistory {
  feeding: Feeding;
  riseChecks: SummaryRiseCheck[];
  temperatures: TemperatureSample[];
}

export const DISCOLOURATION_CAUTION =
  "Pink, orange or fuzzy growth means the culture is spoiled: discard it, don't rescue it. " +
  'When in doubt, follow local food-safety advice.';

/** Kitchen temperatures the kinetics card quotes a 1:1:1 feeding at, °C. */
export const CARD_TEMPERATURES_C = [18, 21, 24, 27] as const;
/** Assumed when neither the running feeding nor any earlier log has a temperature, °C. */
export const FALLBACK_TEMPERATURE_C = 21;
export const FORECAST_LEVEL = 0.8;
const CURVE_POINTS = 40;
/** The fitted curve is drawn a little past the peak, to show the plateau. */
const CURVE_PAST_PEAK = 1.3;
const MS_PER_HOUR = 3_600_000;

const mean = (xs: number[]): number | undefined =>
  xs.length === 0 ? undefined : xs.reduce((s, x) => s + x, 0) / xs.length;

const hoursSince = (fedAt: string, at: string): number => (Date.parse(at) - Date.parse(fedAt)) / MS_PER_HOUR;

/** fitRise on a feeding's own rise checks (remembered, rise-memo.ts); without an initial height there is nothing to fit. */
export function riseOf(h: FeedingHistory): RiseResult | null {
  const { fedAt, initialHeightMm } = h.feeding;
  if (initialHeightMm === null) return null;
  return fitRiseRemembered({
    fedAt,
    initialHeightMm,
    readings: h.riseChecks.map((r) => ({ at: r.at, heightMm: r.heightMm })),
  });
}

/** The feeding's temperature, else the mean of its readings, else of its rise checks' temperatures. */
export function feedingTemperature(h: FeedingHistory): number | undefined {
  if (h.feeding.temperatureC !== null) return h.feeding.temperatureC;
  return (
    mean(h.temperatures.map((t) => t.c)) ??
    mean(h.riseChecks.flatMap((r) => (r.temperatureC === null ? [] : [r.temperatureC])))
  );
}

/** A completed feeding whose rise checks show its peak, in the shape fitCultureKinetics takes. */
export function observedFeeding(h: FeedingHistory): ObservedFeeding | null {
  const rise = riseOf(h);
  if (rise?.status !== 'peaked' || rise.hoursToPeak === null || !(rise.hoursToPeak > 0)) return null;
  const { fedAt, starterG, flourG, waterG } = h.feeding;
  const observed: ObservedFeeding = { fedAt, starterG, flourG, waterG, hoursToPeak: rise.hoursToPeak };
  const temperatureC = feedingTemperature(h);
  if (temperatureC !== undefined) observed.temperatureC = temperatureC;
  if (h.temperatures.length > 0) observed.temperatures = h.temperatures;
  return observed;
}

/** The most recent temperature logged anywhere in the history (newest feeding first). */
export function lastKnownTemperature(history: FeedingHistory[]): number | undefined {
  for (const h of history) {
    const logged: { at: string; c: number }[] = [
      ...(h.feeding.temperatureC === null ? [] : [{ at: h.feeding.fedAt, c: h.feeding.temperatureC }]),
      ...h.temperatures,
      ...h.riseChecks.flatMap((r) => (r.temperatureC === null ? [] : [{ at: r.at, c: r.temperatureC }])),
    ];
    if (logged.length > 0) return logged.reduce((a, b) => (Date.parse(b.at) > Date.parse(a.at) ? b : a)).c;
  }
  return undefined;
}

function fittedCurve(rise: RiseResult, lastReadingHours: number): RisePoint[] | null {
  const fit = rise.fit;
  if (!fit || fit.model === 'richards') return null; // fitRise fits Gompertz; Richards would need ν
  // Past the peak when one is known; otherwise only as far as the readings go (no guessing a top).
  const end = rise.hoursToPeak !== null ? CURVE_PAST_PEAK * rise.hoursToPeak : lastReadingHours;
  if (!(end > 0)) return null;
  const model = growthModels[fit.model];
  return Array.from({ length: CURVE_POINTS }, (_, i) => {
    const hours = (end * i) / (CURVE_POINTS - 1);
    return { hours, multiple: 1 + model.value([fit.A, fit.muMax, fit.lag], hours) };
  });
}

export function runningFeeding(h: FeedingHistory, rise: RiseResult | null): RunningFeeding {
  const { fedAt, initialHeightMm } = h.feeding;
  const readings =
    initialHeightMm === null
      ? []
      : h.riseChecks.map((r) => ({ hours: hoursSince(fedAt, r.at), multiple: r.heightMm / initialHeightMm }));
  const lastHours = Math.max(0, ...readings.map((r) => r.hours));
  return {
    feeding: h.feeding,
    // invalid-input cannot come from stored rows (the API validated them); read it as "no fit".
    riseStatus: rise?.status === 'rising' || rise?.status === 'peaked' ? rise.status : 'insufficient-data',
    readings,
    fittedCurve: rise ? fittedCurve(rise, lastHours) : null,
    riseMultiple: rise?.riseMultiple ?? null,
    peakAt: rise?.peakAt ?? null,
    readyFrom: rise?.readyFrom ?? null,
    readyUntil: rise?.readyUntil ?? null,
  };
}

export function kineticsSummary(
  kinetics: CultureKinetics,
  past: { feeding: Feeding; observed: ObservedFeeding }[],
  asOf: string,
): CultureKineticsSummary {
  const hoursToPeakAt = CARD_TEMPERATURES_C.flatMap((temperatureC) => {
    const p = predictNextPeak(kinetics, { fedAt: asOf, starterG: 1, flourG: 1, waterG: 1, temperatureC });
    return p.hoursToPeak === null ? [] : [{ temperatureC, hours: p.hoursToPeak }];
  });
  // For the chart only: a feeding that logged no temperature is drawn at the culture's typical one.
  const known = past.flatMap((p) => (p.observed.temperatureC === undefined ? [] : [p.observed.temperatureC]));
  const typical = mean(known) ?? kinetics.referenceC;
  const observations = past.map(({ feeding, observed }) => ({
    feedingId: feeding.id,
    fedAt: feeding.fedAt,
    temperatureC: observed.temperatureC ?? typical,
    hoursToPeak: observed.hoursToPeak,
    dilution: dilution(observed),
  }));
  const { q10, tMin, tOpt, tMax } = kinetics.params;
  return {
    model: kinetics.model,
    hoursToPeakAtReference: kinetics.hoursToPeakAtReference,
    referenceTemperatureC: kinetics.referenceC,
    hoursToPeakAt,
    q10: q10 ?? null,
    tMin: tMin ?? null,
    tOpt: tOpt ?? null,
    tMax: tMax ?? null,
    trend: kinetics.trend.label,
    feedingsUsed: kinetics.feedingsUsed,
    basis: kinetics.basis,
    observations,
  };
}

/**
 * The running feeding's peak: from its own rise checks while they predict one; from the
 * culture's kinetics while they cannot yet; none once it has peaked (nothing left to forecast).
 */
export function forecastFor(
  h: FeedingHistory,
  rise: RiseResult | null,
  kinetics: CultureKinetics,
  history: FeedingHistory[],
): PeakForecast | null {
  if (rise?.status === 'peaked') return null;
  if (rise?.status === 'rising' && rise.peakAt && rise.peakInterval && rise.hoursToPeak !== null) {
    const { low, high } = rise.peakInterval;
    return { peakAt: rise.peakAt, low, high, level: FORECAST_LEVEL, hoursToPeak: rise.hoursToPeak, basis: 'readings' };
  }
  const { fedAt, starterG, flourG, waterG } = h.feeding;
  // The feeding's own temperature, else the culture's last logged one, else a mild 21 °C kitchen.
  const temperatureC = h.feeding.temperatureC ?? lastKnownTemperature(history) ?? FALLBACK_TEMPERATURE_C;
  const p = predictNextPeak(
    kinetics,
    { fedAt, starterG, flourG, waterG, temperatureC, temperatures: h.temperatures },
    { coverage: FORECAST_LEVEL },
  );
  // Beyond the model's horizon (a culture kept far too cold) there is no time to promise.
  if (p.peakAt === null || p.low === null || p.high === null || p.hoursToPeak === null) return null;
  return {
    peakAt: p.peakAt,
    low: p.low,
    high: p.high,
    level: FORECAST_LEVEL,
    hoursToPeak: p.hoursToPeak,
    basis: p.basis,
  };
}

/** See CultureState in shared/src/contracts/culture-summary.ts; the choice is explained in each line. */
export function stateOf(
  culture: Culture,
  running: RunningFeeding | null,
  forecast: PeakForecast | null,
  now: Date,
): CultureState {
  if (culture.location === 'fridge') return 'in-fridge';
  if (!running) return 'not-fed-yet';
  const t = now.getTime();
  // The ready window from the rise checks when they place it, else the forecast's 80 % interval.
  const fromReadings = running.readyFrom !== null && running.readyUntil !== null;
  const window = fromReadings
    ? { from: Date.parse(running.readyFrom ?? ''), until: Date.parse(running.readyUntil ?? '') }
    : forecast
      ? { from: Date.parse(forecast.low), until: Date.parse(forecast.high) }
      : null;
  if (window && t >= window.from && t <= window.until) return 'ready';
  if (running.riseStatus === 'peaked') return 'past-peak';
  // Past the window. Only the culture's usual pace placed it while the jar's own checks still
  // show a climb: trust the jar and keep saying rising.
  if (window && t > window.until && (fromReadings || running.riseStatus !== 'rising')) return 'past-peak';
  if (running.riseStatus === 'rising') return 'rising';
  // Fed, but too few rise checks for more than the culture's usual pace.
  return 'waiting';
}

/** The whole summary; `history` newest feeding first. */
export function computeSummary(culture: Culture, history: FeedingHistory[], now: Date): CultureSummary {
  const [latest, ...earlier] = history;
  const past = earlier.flatMap((h) => {
    const observed = observedFeeding(h);
    return observed ? [{ feeding: h.feeding, observed }] : [];
  });
  const asOf = latest?.feeding.fedAt ?? now.toISOString();
  const kinetics = fitCultureKinetics(
    past.map((p) => p.observed),
    { asOf },
  );
  const rise = latest ? riseOf(latest) : null;
  const running = latest ? runningFeeding(latest, rise) : null;
  const forecast = latest ? forecastFor(latest, rise, kinetics, history) : null;
  return {
    culture,
    state: stateOf(culture, running, forecast, now),
    lastFedAt: latest?.feeding.fedAt ?? null,
    running,
    forecast,
    kinetics: kineticsSummary(kinetics, past, asOf),
    caution: latest?.feeding.observations.includes('discolouration') ? DISCOLOURATION_CAUTION : null,
  };
}
