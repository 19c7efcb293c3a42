import {
  gramsFromRatio,
  type Account,
  type CreateFeedingRequest,
  type Culture,
  type Feeding,
  type FeedingObservation,
  type UpdateFeedingRequest,
} from '@peakwise/shared';
import {
  heightFromInput,
  heightToInput,
  parseNumber,
  temperatureFromInput,
  temperatureToInput,
} from '@/lib/format/units';
import { toLocalInput } from '@/lib/format/local-input';

export const RATIO_PRESETS = ['1:1:1', '1:2:2', '1:5:5'] as const;
export type RatioChoice = (typeof RATIO_PRESETS)[number] | 'custom';

/** What the form holds: text as typed, in the baker's units. */
export interface FeedingFormValues {
  ratio: RatioChoice;
  totalG: string;
  starterG: string;
  flourG: string;
  waterG: string;
  flour: string;
  /** datetime-local text, in the browser's zone. */
  fedAt: string;
  temperature: string;
  initialHeight: string;
  observations: FeedingObservation[];
  notes: string;
}

// The feeding form, shared by Log feeding (a new feeding) and the feeding page (correcting one).

/** The API's field names mapped to the form's (temperatures and heights are typed in the baker's unit). */
export const FEEDING_FIELD_OF: Record<string, keyof FeedingFormValues> = {
  starterG: 'starterG',
  flourG: 'flourG',
  waterG: 'waterG',
  flour: 'flour',
  fedAt: 'fedAt',
  temperatureC: 'temperature',
  initialHeightMm: 'initialHeight',
  notes: 'notes',
  observations: 'observations',
};

/** The preset a feeding's grams match (within 2 %), else custom. */
export function presetOf(feeding: Pick<Feeding, 'starterG' | 'flourG' | 'waterG'>): RatioChoice {
  const f = feeding.flourG / feeding.starterG;
  const w = feeding.waterG / feeding.starterG;
  const close = (a: number, b: number) => Math.abs(a - b) <= 0.02 * b;
  return (
    RATIO_PRESETS.find((preset) => {
      const [, pf, pw] = preset.split(':').map(Number) as [number, number, number];
      return close(f, pf) && close(w, pw);
    }) ?? 'custom'
  );
}

const text = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));

/** The form's starting point: the last feeding's amounts, flour and temperature, fed now. */
export function defaultsFrom(
  last: Feeding | undefined,
  culture: Culture,
  account: Pick<Account, 'unitSystem' | 'temperatureUnit'>,
  now: Date,
): FeedingFormValues {
  const ratio = last ? presetOf(last) : '1:1:1';
  const total = last ? Math.round((last.starterG + last.flourG + last.waterG) * 10) / 10 : 150;
  const grams = last ?? gramsFromRatio(ratio === 'custom' ? '1:1:1' : ratio, total);
  return {
    ratio,
    totalG: text(total),
    starterG: text(grams?.starterG),
    flourG: text(grams?.flourG),
    waterG: text(grams?.waterG),
    flour: last?.flour ?? culture.defaultFlour ?? '',
    fedAt: toLocalInput(now),
    temperature: last?.temperatureC != null ? text(temperatureToInput(last.temperatureC, account.temperatureUnit)) : '',
    initialHeight: '',
    observations: [],
    notes: '',
  };
}

/** The form in SI for the API. `fedAt` is left out when the baker kept "now". */
export function toFeedingRequest(
  values: FeedingFormValues,
  account: Pick<Account, 'unitSystem' | 'temperatureUnit'>,
  fedAtEdited: boolean,
): CreateFeedingRequest {
  const temperature = parseNumber(values.temperature);
  const height = parseNumber(values.initialHeight);
  const body: CreateFeedingRequest = {
    starterG: parseNumber(values.starterG) ?? undefined,
    flourG: parseNumber(values.flourG) ?? undefined,
    waterG: parseNumber(values.waterG) ?? undefined,
    flour: values.flour.trim() || null,
    temperatureC: temperature === null ? null : temperatureFromInput(temperature, account.temperatureUnit),
    initialHeightMm: height === null ? null : heightFromInput(height, account.unitSystem),
    notes: values.notes.trim() || null,
    observations: values.observations,
  };
  if (fedAtEdited && values.fedAt) body.fedAt = new Date(values.fedAt).toISOString();
  return body;
}

/** A preset and a total → the three grams as text, or null when they do not make grams. */
export function gramsText(
  ratio: RatioChoice,
  totalG: string,
): Pick<FeedingFormValues, 'starterG' | 'flourG' | 'waterG'> | null {
  if (ratio === 'custom') return null;
  const total = parseNumber(totalG);
  const grams = total === null ? null : gramsFromRatio(ratio, total);
  if (!grams) return null;
  return { starterG: String(grams.starterG), flourG: String(grams.flourG), waterG: String(grams.waterG) };
}

/** A recorded feeding as the form shows it, to correct: its own time, amounts and words, in the baker's units. */
export function valuesFromFeeding(
  feeding: Feeding,
  account: Pick<Account, 'unitSystem' | 'temperatureUnit'>,
): FeedingFormValues {
  return {
    ratio: presetOf(feeding),
    totalG: text(Math.round((feeding.starterG + feeding.flourG + feeding.waterG) * 10) / 10),
    starterG: text(feeding.starterG),
    flourG: text(feeding.flourG),
    waterG: text(feeding.waterG),
    flour: feeding.flour ?? '',
    fedAt: toLocalInput(new Date(feeding.fedAt)),
    temperature:
      feeding.temperatureC === null ? '' : text(temperatureToInput(feeding.temperatureC, account.temperatureUnit)),
    initialHeight:
      feeding.initialHeightMm === null ? '' : text(heightToInput(feeding.initialHeightMm, account.unitSystem)),
    observations: [...feeding.observations],
    notes: feeding.notes ?? '',
  };
}

/**
 * Only what the baker changed, for PATCH. A field left alone is not sent back, so a value shown
 * rounded (75.2 °F for 24.01 °C, the time to the minute) is never overwritten by its rounding.
 */
export function feedingChanges(
  values: FeedingFormValues,
  recorded: FeedingFormValues,
  account: Pick<Account, 'unitSystem' | 'temperatureUnit'>,
): UpdateFeedingRequest {
  const next = toFeedingRequest(values, account, values.fedAt !== recorded.fedAt);
  const before = toFeedingRequest(recorded, account, false);
  const changed = Object.entries(next).filter(
    ([key, value]) => JSON.stringify(value) !== JSON.stringify(before[key as keyof UpdateFeedingRequest]),
  );
  return Object.fromEntries(changed);
}
