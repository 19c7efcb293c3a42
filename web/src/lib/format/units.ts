import { celsiusToFahrenheit, fahrenheitToCelsius, type TemperatureUnit, type UnitSystem } from '@peakwise/shared';

// Stored SI (g, mm, °C); shown and typed in the baker's own units. 1 in = 25.4 mm and
// 1 oz = 28.349523125 g exactly (NIST Handbook 44, appendix C).
export const MM_PER_INCH = 25.4;
export const GRAMS_PER_OUNCE = 28.349523125;

const round = (value: number, digits: number) => {
  const f = 10 ** digits;
  return Math.round(value * f) / f;
};

export function heightUnit(system: UnitSystem): 'mm' | 'in' {
  return system === 'us' ? 'in' : 'mm';
}

/** mm → the number the baker types (mm to 1 mm, inches to 0.1 in). */
export function heightToInput(mm: number, system: UnitSystem): number {
  return system === 'us' ? round(mm / MM_PER_INCH, 2) : round(mm, 1);
}

/** What the baker typed → mm for the API. */
export function heightFromInput(value: number, system: UnitSystem): number {
  return system === 'us' ? round(value * MM_PER_INCH, 1) : value;
}

export function formatHeight(mm: number, system: UnitSystem): string {
  return system === 'us' ? `${round(mm / MM_PER_INCH, 1)} in` : `${Math.round(mm)} mm`;
}

export function temperatureToInput(celsius: number, unit: TemperatureUnit): number {
  return unit === 'F' ? round(celsiusToFahrenheit(celsius), 1) : round(celsius, 1);
}

/** What the baker typed (°C or °F) → °C for the API, to 0.01 °C. */
export function temperatureFromInput(value: number, unit: TemperatureUnit): number {
  return unit === 'F' ? round(fahrenheitToCelsius(value), 2) : value;
}

export function formatWeight(grams: number, system: UnitSystem): string {
  return system === 'us' ? `${round(grams / GRAMS_PER_OUNCE, 2)} oz` : `${round(grams, 1)} g`;
}

/** A number typed in a form field: '' and anything not a finite number are null. */
export function parseNumber(text: string | number | null | undefined): number | null {
  if (text === null || text === undefined || text === '') return null;
  const value = typeof text === 'number' ? text : Number(String(text).replace(',', '.'));
  return Number.isFinite(value) ? value : null;
}

/** Three amounts with one unit: "30 : 60 : 60 g" (starter : flour : water). */
export function formatWeights(grams: readonly number[], system: UnitSystem): string {
  const values = grams.map((g) => (system === 'us' ? round(g / GRAMS_PER_OUNCE, 2) : round(g, 1)));
  return `${values.join(' : ')} ${system === 'us' ? 'oz' : 'g'}`;
}
