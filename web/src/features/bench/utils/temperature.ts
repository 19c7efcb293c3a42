import type { TemperatureUnit } from '@peakwise/shared';
import { temperatureToInput } from '@/lib/format/units';

/**
 * "24.3 °C" / "75.7 °F", to `step` degrees of the baker's unit (0.1 by default; the lever says
 * "near 26 °C" in whole or half degrees, as a thermometer on the counter is read).
 */
export function formatTemperature(celsius: number, unit: TemperatureUnit, step = 0.1): string {
  const value = temperatureToInput(celsius, unit);
  const shown = Math.round(Math.round(value / step) * step * 10) / 10;
  return `${shown} °${unit}`;
}

/** The lever's spot: half degrees in °C, whole degrees in °F. */
export const formatSpot = (celsius: number, unit: TemperatureUnit) =>
  formatTemperature(celsius, unit, unit === 'C' ? 0.5 : 1);
