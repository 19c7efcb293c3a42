import { describe, expect, it } from 'vitest';
import { formatSpot, formatTemperature } from './temperature';

// °F = °C × 9/5 + 32 (NIST SP 811, 4.2.1.1).
describe('formatTemperature', () => {
  it('shows readings to a tenth of the baker’s unit', () => {
    expect(formatTemperature(24.34, 'C')).toBe('24.3 °C');
    expect(formatTemperature(24, 'F')).toBe('75.2 °F');
  });

  it('rounds the lever’s spot to what a counter thermometer reads', () => {
    expect(formatSpot(26.5, 'C')).toBe('26.5 °C');
    expect(formatSpot(26.5, 'F')).toBe('80 °F'); // 79.7 °F
  });
});
