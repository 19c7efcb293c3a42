import { fitRise } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { fitRiseRemembered } from './rise-memo.js';

const FED = '2026-11-20T08:00:00Z';
const at = (h: number) => new Date(Date.parse(FED) + h * 3_600_000).toISOString();
const readings = [1, 2, 3, 4, 5, 6, 8, 10].map((h) => ({ at: at(h), heightMm: 50 + 60 / (1 + Math.exp(-(h - 4))) }));

describe('fitRiseRemembered', () => {
  it('answers exactly what fitRise answers, the second time from memory', () => {
    const input = { fedAt: FED, initialHeightMm: 50, readings };
    const first = fitRiseRemembered(input);
    expect(first).toEqual(fitRise(input));
    expect(fitRiseRemembered({ ...input, readings: [...readings] })).toBe(first);
  });

  it('fits again when a rise check changes or is added', () => {
    const input = { fedAt: FED, initialHeightMm: 50, readings };
    const first = fitRiseRemembered(input);
    const edited = readings.map((r, i) => (i === 3 ? { ...r, heightMm: r.heightMm + 5 } : r));
    const second = fitRiseRemembered({ ...input, readings: edited });
    expect(second).not.toBe(first);
    expect(second).toEqual(fitRise({ ...input, readings: edited }));
    const more = fitRiseRemembered({ ...input, readings: [...readings, { at: at(12), heightMm: 100 }] });
    expect(more).not.toBe(first);
  });
});
