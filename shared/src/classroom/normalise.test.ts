import { describe, expect, it } from 'vitest';
import { fitCultureKinetics } from '../fermentation/kinetics/fit-kinetics.js';
import { predictNextPeak } from '../fermentation/kinetics/predict.js';
import type { ObservedFeeding } from '../fermentation/kinetics/types.js';
import { normalisedHoursToPeak } from './normalise.js';

// Invented feedings (not measured data). The assertions follow from the definitions alone.
const history: ObservedFeeding[] = [18, 21, 24, 26, 22, 20].map((c, i) => ({
  fedAt: `2026-11-${String(10 + i).padStart(2, '0')}T08:00:00.000Z`,
  starterG: 20,
  flourG: 40,
  waterG: 40,
  temperatureC: c,
  hoursToPeak: 6 * 2 ** ((24 - c) / 10),
}));

describe('normalisedHoursToPeak', () => {
  const kinetics = fitCultureKinetics(history, { model: 'q10', fitTemperature: false });

  it('leaves a 1:1:1 feeding at 24 °C as it was observed (it is already at the reference)', () => {
    const feeding = { ...history[0]!, starterG: 30, flourG: 30, waterG: 30, temperatureC: 24, hoursToPeak: 5.2 };
    expect(normalisedHoursToPeak(kinetics, feeding)).toBeCloseTo(5.2, 6);
  });

  it('scales a cold feeding by the Q10 rate ratio (Q10 definition: rate ratio per 10 °C)', () => {
    const q10 = kinetics.params.q10 ?? NaN;
    const at14 = { ...history[0]!, starterG: 30, flourG: 30, waterG: 30, temperatureC: 14, hoursToPeak: 10 };
    // At 14 °C the culture runs q10^(−1) as fast as at 24 °C, so 10 h there is 10 / q10 h at 24 °C.
    expect(normalisedHoursToPeak(kinetics, at14)).toBeCloseTo(10 / q10, 3);
  });

  it('gives the reference time for a feeding that took exactly as long as the model predicted', () => {
    const feeding = { ...history[1]!, flourG: 100, waterG: 100 };
    const predicted = predictNextPeak(kinetics, feeding).hoursToPeak ?? NaN;
    const n = normalisedHoursToPeak(kinetics, { ...feeding, hoursToPeak: predicted });
    expect(n).toBeCloseTo(kinetics.hoursToPeakAtReference, 6);
  });
});
