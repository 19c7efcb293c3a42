// A feeding's observed time to peak, restated as if it had been a 1:1:1 feeding at 24 °C, so
// feedings at different kitchen temperatures and ratios can be compared on one line (the class
// chart, the roster's trend). Pure: the caller passes the culture's fitted kinetics.
import { predictNextPeak } from '../fermentation/kinetics/predict.js';
import type { CultureKinetics, ObservedFeeding } from '../fermentation/kinetics/types.js';

/**
 * observed × predicted(1:1:1 at the reference) ÷ predicted(this feeding's temperature and
 * dilution). The culture's own temperature and dilution model takes out what the kitchen and the
 * ratio did, leaving what the culture did. Null when the model places no peak for the feeding
 * (beyond its horizon, e.g. a jar that spent the whole time in the fridge).
 */
export function normalisedHoursToPeak(
  kinetics: CultureKinetics,
  feeding: ObservedFeeding,
  /** For a feeding that logged no temperature: the culture's typical one, °C (default 24 °C). */
  assumedC = kinetics.referenceC,
): number | null {
  const { fedAt, starterG, flourG, waterG, temperatureC, temperatures } = feeding;
  const next = { fedAt, starterG, flourG, waterG, temperatureC: temperatureC ?? assumedC };
  const predicted = predictNextPeak(kinetics, temperatures?.length ? { ...next, temperatures } : next).hoursToPeak;
  if (predicted === null || !(predicted > 0)) return null;
  return (feeding.hoursToPeak * kinetics.hoursToPeakAtReference) / predicted;
}
