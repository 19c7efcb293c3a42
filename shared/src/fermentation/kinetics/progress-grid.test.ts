import { describe, expect, it } from 'vitest';
import { simulateCulture } from '../../bench/simulate.js';
import { prepareModel } from '../temperature/integrate.js';
import { DEFAULT_Q10, LACTOBACILLI_CARDINALS, YEAST_CARDINALS } from '../temperature/models.js';
import { feedingProgress, prepareFeeding } from './feedings.js';
import { buildProgressGrid, gridProgress } from './progress-grid.js';

describe('progress grid', () => {
  // SIMULATION logbook: constant temperatures, hourly readings and fridge retards (3–6 °C).
  const feedings = simulateCulture(3, 120, 31).feedings.map((f) => prepareFeeding(f, 22));
  const grid = buildProgressGrid(feedings);

  it('matches the exact integrator within 2e-5 of the progress for every model and feeding', () => {
    const models = [
      { kind: 'q10', q10: DEFAULT_Q10 },
      { kind: 'q10', q10: 6 },
      { kind: 'ctmi', ...LACTOBACILLI_CARDINALS },
      { kind: 'ctmi', ...YEAST_CARDINALS },
      { kind: 'ratkowsky1983', tMin: 5.8, tMax: 41.3, c: 0.13 },
    ] as const;
    for (const model of models) {
      const pm = prepareModel(model);
      const out = new Float64Array(feedings.length);
      gridProgress(grid, pm, out);
      feedings.forEach((f, i) => {
        const exact = feedingProgress(f, pm);
        // Relative to the feeding's length, so a fridge feeding with almost no progress counts too.
        expect(Math.abs((out[i] ?? 0) - exact) / f.hours, `${model.kind} #${i}`).toBeLessThan(2e-5);
      });
    }
  });

  it('puts all of a feeding’s time on the grid', () => {
    feedings.forEach((f, i) => {
      const w = grid.rows[i]?.weights ?? new Float64Array();
      expect(w.reduce((s, x) => s + x, 0)).toBeCloseTo(f.hours, 9);
    });
  });
});
