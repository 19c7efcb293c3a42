import type { Account, RiseCheck, UpdateRiseCheckRequest } from '@peakwise/shared';
import { toLocalInput } from '@/lib/format/local-input';
import {
  heightFromInput,
  heightToInput,
  parseNumber,
  temperatureFromInput,
  temperatureToInput,
} from '@/lib/format/units';

type Units = Pick<Account, 'unitSystem' | 'temperatureUnit'>;

/** A rise check as the edit form holds it: text in the baker's units. */
export interface RiseCheckEditValues {
  height: string;
  temperature: string;
  /** datetime-local text, in the browser's zone. */
  takenAt: string;
}

export function riseCheckValues(check: RiseCheck, units: Units): RiseCheckEditValues {
  return {
    height: String(heightToInput(check.heightMm, units.unitSystem)),
    temperature:
      check.temperatureC === null ? '' : String(temperatureToInput(check.temperatureC, units.temperatureUnit)),
    takenAt: toLocalInput(new Date(check.takenAt)),
  };
}

/**
 * Only what the baker changed, in SI, for PATCH; a blank temperature clears it. Null when the
 * height is not a number (a rise check always has one).
 */
export function riseCheckChanges(
  values: RiseCheckEditValues,
  before: RiseCheckEditValues,
  units: Units,
): UpdateRiseCheckRequest | null {
  const height = parseNumber(values.height);
  if (height === null) return null;
  const body: UpdateRiseCheckRequest = {};
  if (values.height.trim() !== before.height) body.heightMm = heightFromInput(height, units.unitSystem);
  if (values.temperature.trim() !== before.temperature) {
    const temperature = parseNumber(values.temperature);
    body.temperatureC = temperature === null ? null : temperatureFromInput(temperature, units.temperatureUnit);
  }
  if (values.takenAt !== before.takenAt && values.takenAt) body.takenAt = new Date(values.takenAt).toISOString();
  return body;
}
