import { describe, expect, it } from 'vitest';
import { BakersMathError } from '../units/bakers-math-error.js';
import { planBake } from './plan-bake.js';
import { DOUGH, input } from './plan-test-helpers.js';
import { replanBake } from './replan.js';
import { type PlanTiming } from './types.js';

function pathOf(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(BakersMathError);
    return (error as BakersMathError).path;
  }
  throw new Error('expected a BakersMathError');
}

const bad = (over: Record<string, unknown>) => pathOf(() => planBake({ ...input(), ...over }));

describe('plan input errors name the field path', () => {
  it.each([
    [{ mode: 'later' }, 'mode'],
    [{ now: '2026-12-04 08:00' }, 'now'],
    [{ readyAt: undefined }, 'readyAt'],
    [{ readyAt: '2026-12-03T08:00:00+01:00' }, 'readyAt'],
    [{ readyAt: '2027-02-01T08:00:00+01:00' }, 'readyAt'],
    [{ timeZone: 'Mars/Olympus_Mons' }, 'timeZone'],
    [{ quietHours: { from: '25:00', until: '06:00' } }, 'quietHours.from'],
    [{ quietHours: { from: '23:00', until: '6' } }, 'quietHours.until'],
    [{ quietHours: { from: '23:00', until: '23:00' } }, 'quietHours.until'],
    [{ dough: { ...DOUGH, flourG: 0 } }, 'dough.flourG'],
    [{ dough: { ...DOUGH, starterG: 'lots' } }, 'dough.starterG'],
    [{ dough: { ...DOUGH, temperatureC: undefined } }, 'dough.temperatureC'],
    [{ dough: { ...DOUGH, temperatureC: 80 } }, 'dough.temperatureC'],
    [{ dough: { ...DOUGH, enrichment: { sugarG: -5 } } }, 'dough.enrichment.sugarG'],
    [{ dough: { ...DOUGH, temperatureC: undefined, forecast: [{ c: 22, until: 'soon' }] } }, 'dough.forecast.0.until'],
    [{ starter: { ratio: { starter: 0, flour: 2, water: 2 } } }, 'starter.ratio.starter'],
    [{ starter: { skipFeeding: 'yes' } }, 'starter.skipFeeding'],
    [{ steps: { folds: { sets: -1 } } }, 'steps.folds.sets'],
    [{ steps: { restMinutes: -10 } }, 'steps.restMinutes'],
    [{ steps: { oven: { minMinutes: 50, maxMinutes: 40 } } }, 'steps.oven.maxMinutes'],
    [{ steps: { finalProof: { kind: 'freezer' } } }, 'steps.finalProof.kind'],
    [{ steps: { finalProof: { kind: 'retard', minHours: 16, maxHours: 8 } } }, 'steps.finalProof.maxHours'],
    [{ formula: { dairy: 1 } }, 'formula.dairy'],
    [{ kinetics: { model: 'q10' } }, 'kinetics'],
  ])('%j → %s', (over, path) => {
    expect(bad(over)).toBe(path);
  });

  it('kinetics: null counts as absent (the published defaults)', () => {
    const plan = planBake({ ...input(), kinetics: null });
    expect(plan.assumptions).toContain('culture kinetics: published defaults (no feeding history)');
  });

  it('a levain that cannot peak (fridge-cold) is refused at its temperature', () => {
    expect(bad({ starter: { temperatureC: 2 } })).toBe('starter.temperatureC');
  });

  it('re-plan: timing and progress fields by path', () => {
    const timing: PlanTiming = {
      kind: 'same-day',
      mixAt: '2026-12-05T06:00:00+01:00',
      bakeAt: null,
      readyAt: null,
      doughTemperatureC: null,
    };
    const progress = { now: '2026-12-05T07:00:00+01:00', done: [] };
    const replan = (t: unknown, p: unknown) => pathOf(() => replanBake(input(), t as PlanTiming, p as never));
    expect(replan({ ...timing, kind: 'tomorrow' }, progress)).toBe('timing.kind');
    expect(replan({ ...timing, mixAt: 'noon' }, progress)).toBe('timing.mixAt');
    expect(replan({ ...timing, kind: 'overnight-retard' }, progress)).toBe('timing.bakeAt');
    expect(replan(timing, { ...progress, done: [{ id: 'mix', startedAt: 'x' }] })).toBe('progress.done.0.startedAt');
    expect(
      replan(timing, {
        ...progress,
        done: [{ id: 'mix', startedAt: '2026-12-05T06:00:00+01:00', endedAt: '2026-12-05T05:00:00+01:00' }],
      }),
    ).toBe('progress.done.0.endedAt');
    expect(replan(timing, { ...progress, doughTemperatures: [{ at: progress.now, c: 99 }] })).toBe(
      'progress.doughTemperatures.0.c',
    );
    expect(replan(timing, { ...progress, aliquotReadings: [{ at: progress.now }] })).toBe(
      'progress.aliquotReadings.0.risePct',
    );
    expect(replan(timing, { ...progress, now: undefined })).toBe('progress.now');
  });
});
