import type { CultureKineticsSummary } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { basisWords, fractionWords, hoursAt, kineticsSentence } from './kinetics-words';

const kinetics = (overrides: Partial<CultureKineticsSummary> = {}): CultureKineticsSummary => ({
  model: 'q10',
  hoursToPeakAtReference: 5 + 10 / 60,
  referenceTemperatureC: 24,
  hoursToPeakAt: [
    { temperatureC: 18, hours: 9 },
    { temperatureC: 24, hours: 5 + 10 / 60 },
    { temperatureC: 29, hours: 3.45 },
  ],
  q10: 2.2,
  tMin: null,
  tOpt: null,
  tMax: null,
  trend: 'steady',
  feedingsUsed: 6,
  basis: 'culture',
  observations: [],
  ...overrides,
});

describe('kineticsSentence', () => {
  it('says the reference time and what 5 °C warmer does', () => {
    expect(kineticsSentence(kinetics(), 'C')).toBe(
      'At 24 °C a 1:1:1 feeding peaks in about 5 h 10 min; each 5 °C warmer cuts that by about a third.',
    );
  });

  it('speaks °F to a °F baker (5 °C is 9 °F)', () => {
    expect(kineticsSentence(kinetics(), 'F')).toBe(
      'At 75 °F a 1:1:1 feeding peaks in about 5 h 10 min; each 9 °F warmer cuts that by about a third.',
    );
  });

  it('interpolates when 29 °C is not sampled', () => {
    const k = kinetics({
      hoursToPeakAt: [
        { temperatureC: 24, hours: 4 },
        { temperatureC: 34, hours: 1 },
      ],
      hoursToPeakAtReference: 4,
    });
    expect(hoursAt(k.hoursToPeakAt, 29)).toBeCloseTo(2, 9);
    expect(kineticsSentence(k, 'C')).toContain('cuts that by about half');
  });

  it('carries the curve on when it stops short of 5 °C warmer', () => {
    // 4 h at 24 °C, 3 h at 27 °C: per 5 °C the time goes × (3/4)^(5/3) ≈ 0.62, a cut of about 40 %.
    const k = kinetics({
      hoursToPeakAt: [
        { temperatureC: 18, hours: 8 },
        { temperatureC: 24, hours: 4 },
        { temperatureC: 27, hours: 3 },
      ],
      hoursToPeakAtReference: 4,
    });
    expect(kineticsSentence(k, 'C')).toBe(
      'At 24 °C a 1:1:1 feeding peaks in about 4 h; each 5 °C warmer cuts that by about 40 %.',
    );
  });

  it('leaves the second half out without a warmer point', () => {
    const k = kinetics({ hoursToPeakAt: [{ temperatureC: 24, hours: 5 }], hoursToPeakAtReference: 5 });
    expect(kineticsSentence(k, 'C')).toBe('At 24 °C a 1:1:1 feeding peaks in about 5 h.');
  });
});

describe('fractionWords and basisWords', () => {
  it('names common fractions, else rounds to 5 %', () => {
    expect(fractionWords(0.34)).toBe('about a third');
    expect(fractionWords(0.41)).toBe('about 40 %');
  });

  it('says what the numbers rest on', () => {
    expect(basisWords(kinetics())).toBe('Based on 6 feedings of this culture.');
    expect(basisWords(kinetics({ basis: 'default', feedingsUsed: 0 }))).toBe(
      'Based on typical starters until you’ve logged a few peaks.',
    );
  });
});
