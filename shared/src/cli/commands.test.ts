import { describe, expect, it } from 'vitest';
import { gompertz } from '../fermentation/curve/growth-models.js';
import { COMMANDS } from './commands.js';
import { InputError, type JsonObject } from './input.js';

function run(name: string, input: unknown): Record<string, unknown> {
  const command = COMMANDS[name];
  if (!command) throw new Error(`no command ${name}`);
  return command(input as JsonObject) as Record<string, unknown>;
}

function pathOf(name: string, input: unknown): string {
  try {
    run(name, input);
  } catch (error) {
    if (error instanceof InputError) return error.path;
    if (error instanceof RangeError && 'path' in error) return String(error.path);
    throw error;
  }
  throw new Error('expected the command to refuse its input');
}

const feeding = { fedAt: '2026-11-20T08:00:00+00:00', starterG: 50, flourG: 50, waterG: 50, temperatureC: 24 };

describe('model command line', () => {
  it('fit-curve recovers a Zwietering Gompertz curve and reports times to fractions of A', () => {
    // Points from the modified Gompertz of Zwietering et al. (1990) with A 1.5, μm 0.5, λ 1.5.
    const points = Array.from({ length: 12 }, (_, i) => ({ t: i, y: gompertz(i, 1.5, 0.5, 1.5) }));
    const out = run('fit-curve', { model: 'gompertz', points });
    expect(out).toMatchObject({ status: 'ok', converged: true });
    expect(out.A).toBeCloseTo(1.5, 6);
    expect(out.muMax).toBeCloseTo(0.5, 6);
    expect(out.lag).toBeCloseTo(1.5, 6);
    // t_p = λ + A/(μm e)(1 − ln(−ln p)): the closed form in Zwietering's parameters.
    const t95 = 1.5 + (1.5 / (0.5 * Math.E)) * (1 - Math.log(-Math.log(0.95)));
    expect((out.tAtFraction as Record<string, number>)['0.95']).toBeCloseTo(t95, 6);
  });

  it('names the offending field in the dotted style', () => {
    expect(
      pathOf('fit-curve', {
        points: [
          { t: 0, y: 0 },
          { t: 1, y: 'x' },
        ],
      }),
    ).toBe('points.1.y');
    expect(pathOf('predict-peak', { history: [{ ...feeding, starterG: -1 }], next: feeding })).toBe(
      'history.0.starterG',
    );
    expect(pathOf('predict-peak', { history: [feeding], next: feeding })).toBe('history.0.peakAt');
    expect(pathOf('predict-peak', { history: [], next: { ...feeding, fedAt: '2026-11-20 08:00' } })).toBe('next.fedAt');
    expect(pathOf('bulk-end', { mixedAt: feeding.fedAt, flourG: 1000, waterG: 700, starterG: 200 })).toBe(
      'temperatureC',
    );
    expect(pathOf('blend', { flours: [{ name: 'rye', parts: 0 }] })).toBe('flours.0.parts');
  });

  it('predict-peak learns from past peaks and says so in its basis', () => {
    const history = [0, 1, 2, 3].map((day) => ({
      ...feeding,
      fedAt: `2026-11-2${day}T08:00:00+00:00`,
      peakAt: `2026-11-2${day}T14:00:00+00:00`,
    }));
    const out = run('predict-peak', { history, next: { ...feeding, fedAt: '2026-11-30T08:00:00+00:00' } });
    expect(out).toMatchObject({ basis: 'culture', feedingsUsed: 4, level: 0.8 });
    // The same feeding at the same temperature as four 6-hour peaks is predicted near 6 h.
    expect(out.hoursToPeak as number).toBeGreaterThan(5);
    expect(out.hoursToPeak as number).toBeLessThan(7);
    expect(Date.parse(out.low as string)).toBeLessThan(Date.parse(out.peakAt as string));
    expect(Date.parse(out.high as string)).toBeGreaterThan(Date.parse(out.peakAt as string));
    const none = run('predict-peak', { history: [], next: feeding });
    expect(none).toMatchObject({ basis: 'default', feedingsUsed: 0 });
  });

  it('predict-peak takes a past peak from rise checks and skips one that shows none yet', () => {
    const readings = [2, 3, 4, 5, 6, 8].map((h, i) => ({
      at: `2026-11-20T${String(8 + h).padStart(2, '0')}:00:00Z`,
      heightMm: [44, 56, 72, 82, 85, 70][i],
    }));
    const out = run('predict-peak', {
      history: [
        { ...feeding, initialHeightMm: 40, readings },
        { ...feeding, fedAt: '2026-11-21T08:00:00+00:00', initialHeightMm: 40, readings: readings.slice(0, 1) },
      ],
      next: { ...feeding, fedAt: '2026-11-30T08:00:00+00:00' },
    });
    expect(out.feedingsUsed).toBe(1);
    expect(out.skipped).toEqual([{ index: 1, reason: expect.stringContaining('no peak') as unknown }]);
  });

  it('formula and ddt reproduce the worked examples', () => {
    // 1000 g flour, 750 g water, 200 g levain at 100 % hydration: 77.27 % total hydration
    // (Tartine country loaf as restated on a forum thread; test-fixtures/reference/baking).
    const formula = run('formula', {
      ingredients: [
        { name: 'flour', kind: 'flour', grams: 1000 },
        { name: 'water', kind: 'water', grams: 750 },
        { name: 'leaven', kind: 'starter', grams: 200, hydration: 100 },
      ],
    });
    expect(formula.totalHydrationPercent).toBeCloseTo(77.27, 2);
    // SFBI Artisan I: DDT 75 °F, flour 65, room 65, friction 8 → water 87 °F.
    expect(run('ddt', { unit: 'F', desired: 75, room: 65, flour: 65, friction: 8 }).water).toBeCloseTo(87, 9);
  });
});
