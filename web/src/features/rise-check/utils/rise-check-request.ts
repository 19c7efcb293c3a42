import type { Account, CreateRiseCheckRequest } from '@peakwise/shared';
import { heightFromInput, parseNumber, temperatureFromInput } from '@/lib/format/units';

export type RiseMode = 'height' | 'risePct' | 'multiple';

export interface RiseCheckValues {
  mode: RiseMode;
  value: string;
  temperature: string;
  /** datetime-local text; sent only when the baker changed it. */
  takenAt: string;
}

/** The one number as exactly one of heightMm | risePct | multiple, in SI. Null when not a number. */
export function toRiseCheckRequest(
  values: RiseCheckValues,
  account: Pick<Account, 'unitSystem' | 'temperatureUnit'>,
  takenAtEdited: boolean,
): CreateRiseCheckRequest | null {
  const value = parseNumber(values.value);
  if (value === null) return null;
  const body: CreateRiseCheckRequest =
    values.mode === 'height'
      ? { heightMm: heightFromInput(value, account.unitSystem) }
      : values.mode === 'risePct'
        ? { risePct: value }
        : { multiple: value };
  const temperature = parseNumber(values.temperature);
  if (temperature !== null) body.temperatureC = temperatureFromInput(temperature, account.temperatureUnit);
  if (takenAtEdited && values.takenAt) body.takenAt = new Date(values.takenAt).toISOString();
  return body;
}

/** The API's field for the mode, so its message lands under the one number. */
export const MODE_FIELD: Record<RiseMode, string> = { height: 'heightMm', risePct: 'risePct', multiple: 'multiple' };
