import { describe, expect, it } from 'vitest';
import {
  formatHeight,
  formatWeight,
  formatWeights,
  heightFromInput,
  heightToInput,
  parseNumber,
  temperatureFromInput,
  temperatureToInput,
} from './units';

describe('form units', () => {
  // 1 in = 25.4 mm exactly (NIST Handbook 44, appendix C); °F = °C × 9/5 + 32 (NIST SP 811).
  it('turns inches typed into mm and back', () => {
    expect(heightFromInput(2, 'us')).toBe(50.8);
    expect(heightToInput(50.8, 'us')).toBe(2);
    expect(heightFromInput(42, 'metric')).toBe(42);
  });

  it('turns °F typed into °C and back', () => {
    expect(temperatureFromInput(75.2, 'F')).toBe(24);
    expect(temperatureFromInput(32, 'F')).toBe(0);
    expect(temperatureToInput(24, 'F')).toBe(75.2);
    expect(temperatureFromInput(21.5, 'C')).toBe(21.5);
  });

  it('formats with the unit', () => {
    expect(formatHeight(50.8, 'us')).toBe('2 in');
    expect(formatHeight(42.4, 'metric')).toBe('42 mm');
    expect(formatWeight(28.349523125, 'us')).toBe('1 oz');
    expect(formatWeight(50, 'metric')).toBe('50 g');
    expect(formatWeights([30, 60, 60], 'metric')).toBe('30 : 60 : 60 g');
  });

  it('reads typed numbers, with a comma too', () => {
    expect(parseNumber('21,5')).toBe(21.5);
    expect(parseNumber('')).toBeNull();
    expect(parseNumber('abc')).toBeNull();
  });
});
