import type { TemperatureUnit } from './contracts/account.js';

/** °F = °C × 9/5 + 32 (NIST SP 811, appendix B.9: exact). */
export function celsiusToFahrenheit(celsius: number): number {
  return (celsius * 9) / 5 + 32;
}

export function fahrenheitToCelsius(fahrenheit: number): number {
  return ((fahrenheit - 32) * 5) / 9;
}

/** A temperature *difference* (e.g. a friction factor) scales by 9/5 without the offset. */
export function celsiusDeltaToFahrenheit(deltaCelsius: number): number {
  return (deltaCelsius * 9) / 5;
}

/** Formats a temperature stored in °C for a person who reads `unit`. */
export function formatTemperature(celsius: number, unit: TemperatureUnit, digits = 0): string {
  const value = unit === 'F' ? celsiusToFahrenheit(celsius) : celsius;
  return `${value.toFixed(digits)} °${unit}`;
}
