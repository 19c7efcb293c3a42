// A feeding turned into what the fit needs: ln(dilution), observed hours, and its temperature as
// a constant or a compiled series measured from the feeding time.
import { piecesBetween, piecesProgress, type PreparedModel } from '../temperature/integrate.js';
import { compileSeries } from '../temperature/series.js';
import { parseInstant } from '../temperature/time.js';
import { type ObservedFeeding } from './types.js';

/** (starter + flour + water) / starter: how far the feeding thins the culture (1:1:1 → 3). */
export function dilution(f: { starterG: number; flourG: number; waterG: number }): number {
  if (!(f.starterG > 0)) throw new RangeError('starterG must be greater than 0');
  if (!(f.flourG >= 0) || !(f.waterG >= 0) || !(f.flourG + f.waterG > 0)) {
    throw new RangeError('flourG and waterG must be at least 0 and not both 0');
  }
  return (f.starterG + f.flourG + f.waterG) / f.starterG;
}

export interface PreparedFeeding {
  fedAtMs: number;
  offsetMinutes: number | null;
  lnD: number;
  hours: number;
  /** Set when the feeding has a single temperature. */
  constantC?: number;
  /** Set when it logged a series: its linear pieces from feeding to peak (piecesBetween). */
  pieces?: Float64Array;
  /** True when no temperature was logged and the default was assumed. */
  assumedTemperature: boolean;
}

export function prepareFeeding(f: ObservedFeeding, defaultC: number): PreparedFeeding {
  if (!(f.hoursToPeak > 0) || !Number.isFinite(f.hoursToPeak))
    throw new RangeError('hoursToPeak must be greater than 0');
  const fed = parseInstant(f.fedAt);
  const base = { fedAtMs: fed.ms, offsetMinutes: fed.offsetMinutes, lnD: Math.log(dilution(f)), hours: f.hoursToPeak };
  if (f.temperatures && f.temperatures.length > 0) {
    const series = compileSeries({ readings: f.temperatures }, fed.ms);
    return { ...base, pieces: piecesBetween(series, 0, f.hoursToPeak), assumedTemperature: false };
  }
  if (f.temperatureC !== undefined) {
    if (!Number.isFinite(f.temperatureC)) throw new RangeError('temperatureC must be a finite number');
    return { ...base, constantC: f.temperatureC, assumedTemperature: false };
  }
  return { ...base, constantC: defaultC, assumedTemperature: true };
}

/** Progress in hours at the reference accumulated from feeding to the observed peak. */
export function feedingProgress(f: PreparedFeeding, pm: PreparedModel): number {
  if (f.pieces) return piecesProgress(f.pieces, pm);
  return f.hours * pm.rate(f.constantC ?? pm.tRef);
}

/** Median of the temperatures the feedings logged (a series counts with the mean of its readings). */
export function typicalTemperature(history: readonly ObservedFeeding[], fallback: number): number {
  const values: number[] = [];
  for (const f of history) {
    if (f.temperatures && f.temperatures.length > 0) {
      values.push(f.temperatures.reduce((s, r) => s + r.c, 0) / f.temperatures.length);
    } else if (f.temperatureC !== undefined && Number.isFinite(f.temperatureC)) values.push(f.temperatureC);
  }
  if (values.length === 0) return fallback;
  values.sort((a, b) => a - b);
  const mid = values.length >> 1;
  return values.length % 2 ? (values[mid] ?? fallback) : ((values[mid - 1] ?? 0) + (values[mid] ?? 0)) / 2;
}
