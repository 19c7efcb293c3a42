import { gompertz, type Feeding, type RiseCheck } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { riseOverlay } from './rise-overlay';

const fedAt = '2026-11-20T08:00:00.000Z';
const feeding = { id: 'f1', fedAt, initialHeightMm: 40 } as Feeding;
// Readings exactly on a Gompertz rise (A = 1.2, μm = 0.45 /h, λ = 1 h), so the fit recovers it.
const checks = [1, 2, 3, 4, 5, 6, 7, 8].map(
  (h) =>
    ({
      takenAt: new Date(Date.parse(fedAt) + h * 3_600_000).toISOString(),
      heightMm: 40 * (1 + gompertz(h, 1.2, 0.45, 1)),
    }) as RiseCheck,
);

describe('riseOverlay', () => {
  it('puts readings on the hours-since-feeding clock as multiples, with the fitted curve', () => {
    const { grid, series } = riseOverlay([{ feeding, checks }]);
    expect(series).toHaveLength(1);
    const [s] = series;
    expect(s!.readings[0]!.hours).toBeCloseTo(1, 9);
    expect(s!.readings[0]!.multiple).toBeCloseTo(1 + gompertz(1, 1.2, 0.45, 1), 9);
    // On the grid, the curve runs through the readings it was fitted to.
    const i = grid.findIndex((t) => t > 3);
    expect(s!.curve[i]).toBeCloseTo(1 + gompertz(grid[i]!, 1.2, 0.45, 1), 2);
    expect(grid[0]).toBe(0);
  });

  it('leaves out feedings without a starting height or rise checks', () => {
    expect(riseOverlay([{ feeding: { ...feeding, initialHeightMm: null }, checks }]).series).toHaveLength(0);
    expect(riseOverlay([{ feeding, checks: [] }]).series).toHaveLength(0);
  });
});
