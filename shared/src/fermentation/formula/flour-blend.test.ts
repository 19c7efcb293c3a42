import { describe, expect, it } from 'vitest';
import { blendFlours, largestRemainder } from './flour-blend.js';

// Arithmetic of parts by weight; the protein figures are example inputs, not claims about flours.
describe('flour blends in parts', () => {
  it('3 parts bread flour : 1 part whole rye → 75 % / 25 %, 750 g / 250 g of 1000 g', () => {
    const b = blendFlours(
      [
        { name: 'bread flour', parts: 3, proteinPercent: 12.8 },
        { name: 'whole rye', parts: 1, proteinPercent: 10 },
      ],
      1000,
    );
    expect(b.lines.map((l) => l.percent)).toEqual([75, 25]);
    expect(b.lines.map((l) => l.grams)).toEqual([750, 250]);
    expect(b.proteinPercent).toBeCloseTo(0.75 * 12.8 + 0.25 * 10, 12);
    expect(b.proteinMissingFor).toEqual([]);
  });

  it('rounded grams add up to the flour weight even when each line alone would not', () => {
    const b = blendFlours(
      [
        { name: 'a', parts: 1 },
        { name: 'b', parts: 1 },
        { name: 'c', parts: 1 },
      ],
      500,
    );
    expect(b.lines.map((l) => l.roundedG)).toEqual([167, 167, 166]);
    expect(b.lines.reduce((s, l) => s + (l.roundedG ?? 0), 0)).toBe(500);
    expect(largestRemainder([1.2, 2.2, 3.6])).toEqual([1, 2, 4]);
  });

  it('gives no blend protein when a flour’s protein is unknown, and names it', () => {
    const b = blendFlours([
      { name: 'bread flour', parts: 2, proteinPercent: 12.8 },
      { name: 'spelt', parts: 1 },
    ]);
    expect(b.proteinPercent).toBeNull();
    expect(b.proteinMissingFor).toEqual(['spelt']);
    expect(b.lines[0]?.grams).toBeUndefined();
    expect(b.lines[0]?.percent).toBeCloseTo(200 / 3, 12);
  });

  it.each([
    [[], undefined, 'flours'],
    [[{ name: 'a', parts: 0 }], undefined, 'flours.0.parts'],
    [[{ name: '', parts: 1 }], undefined, 'flours.0.name'],
    [[{ name: 'a', parts: 1, proteinPercent: 120 }], undefined, 'flours.0.proteinPercent'],
    [[{ name: 'a', parts: 1 }], -1, 'flourG'],
  ])('rejects %j (flour %s g) at %s', (parts, flourG, path) => {
    expect(() => blendFlours(parts, flourG)).toThrow(expect.objectContaining({ path }) as Error);
  });
});
