import type { Account, NewTemperatureReading } from '@peakwise/shared';
import { parseNumber, temperatureFromInput } from '@/lib/format/units';

/** One manual reading as typed: the time (datetime-local text) and the temperature in the baker's unit. */
export interface TemperatureEntryValues {
  takenAt: string;
  temperature: string;
}

/**
 * The reading in °C for the API. A time the baker left at its default means "now", taken at the
 * moment of saving (the form may have sat open a while). Null when the temperature is not a number.
 */
export function toNewReading(
  values: TemperatureEntryValues,
  units: Pick<Account, 'temperatureUnit'>,
  takenAtEdited: boolean,
  now: Date,
): NewTemperatureReading | null {
  const temperature = parseNumber(values.temperature);
  if (temperature === null) return null;
  const takenAt = takenAtEdited && values.takenAt ? new Date(values.takenAt) : now;
  return { takenAt: takenAt.toISOString(), temperatureC: temperatureFromInput(temperature, units.temperatureUnit) };
}
