import { describe, expect, it } from 'vitest';
import { formatGrams, formatPercent, ouncesFor } from './format';

describe('how Formula writes numbers', () => {
  it('writes grams to the step the scale rounding uses', () => {
    expect(formatGrams(411.2)).toBe('411 g');
    expect(formatGrams(9.04)).toBe('9 g');
    expect(formatGrams(9.36)).toBe('9.4 g');
    expect(formatGrams(0.347)).toBe('0.35 g');
    expect(formatGrams(1234)).toBe('1,234 g');
  });

  it('keeps one decimal on percentages and a dash when there is none', () => {
    expect(formatPercent(77.2727)).toBe('77.3 %');
    expect(formatPercent(null)).toBe('—');
  });

  it('adds ounces for a US baker only (1 oz = 28.349523125 g, NIST Handbook 44)', () => {
    expect(ouncesFor(453.59237, 'us')).toBe('16.0 oz');
    expect(ouncesFor(28.349523125, 'us')).toBe('1.00 oz');
    expect(ouncesFor(500, 'metric')).toBeNull();
  });
});
