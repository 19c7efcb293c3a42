import { describe, expect, it } from 'vitest';
import { celsiusDeltaToFahrenheit, celsiusToFahrenheit, fahrenheitToCelsius, formatTemperature } from './units.js';

// NIST SP 811 (2008), appendix B.9: t/°F = 1.8 · t/°C + 32, exact. Fixed points of the scale:
// water freezes at 0 °C = 32 °F and boils at 100 °C = 212 °F; −40 is the same on both.
describe('temperature conversion (NIST SP 811 B.9)', () => {
  it.each([
    [0, 32],
    [100, 212],
    [-40, -40],
    [4, 39.2],
    [24, 75.2],
  ])('%d °C is %d °F and back', (c, f) => {
    expect(celsiusToFahrenheit(c)).toBeCloseTo(f, 10);
    expect(fahrenheitToCelsius(f)).toBeCloseTo(c, 10);
  });

  it('converts a temperature difference without the 32° offset', () => {
    // A 10 K difference is 18 °F (SP 811 B.9: 1 °F interval = 5/9 K).
    expect(celsiusDeltaToFahrenheit(10)).toBeCloseTo(18, 10);
  });

  it('formats in the reader’s unit with the unit shown', () => {
    expect(formatTemperature(24, 'C')).toBe('24 °C');
    expect(formatTemperature(24, 'F')).toBe('75 °F');
    expect(formatTemperature(18.25, 'C', 1)).toBe('18.3 °C');
  });
});
