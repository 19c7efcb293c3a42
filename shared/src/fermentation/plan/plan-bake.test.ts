import { describe, expect, it } from 'vitest';
import { predictBulkEnd } from '../bulk/bulk-end.js';
import { defaultKinetics, fitCultureKinetics } from '../kinetics/fit-kinetics.js';
import { predictNextPeak } from '../kinetics/predict.js';
import { type ObservedFeeding } from '../kinetics/types.js';
import { relativeRate } from '../temperature/models.js';
import { addHours } from '../temperature/time.js';
import { planBake } from './plan-bake.js';
import { DOUGH, hours, inQuiet, input, ms, step } from './plan-test-helpers.js';
import { type PlanOption } from './types.js';

const option = (plan: ReturnType<typeof planBake>, kind: PlanOption['kind']): PlanOption => {
  const o = plan.options.find((x) => x.kind === kind);
  if (!o) throw new Error(`no option ${kind}`);
  return o;
};

describe('planBake: ready at, no quiet hours', () => {
  const plan = planBake(input());
  const sameDay = option(plan, 'same-day');

  it('gives a same-day plan whose steps are in order and join up', () => {
    expect(sameDay.fits).toBe(true);
    expect(plan.recommended).toBe('same-day');
    const starts = sameDay.steps.map((s) => ms(s.startAt));
    expect(starts).toEqual([...starts].sort((a, b) => a - b));
    for (const s of sameDay.steps) expect(ms(s.endAt)).toBeGreaterThanOrEqual(ms(s.startAt));
    expect(ms(step(sameDay, 'feed-starter').startAt)).toBeGreaterThanOrEqual(ms(plan.now));
    // Each step begins where the one it waits for ends.
    const joins: Array<[string, 'startAt' | 'endAt', string]> = [
      ['feed-starter', 'endAt', 'starter-rise'],
      ['mix', 'endAt', 'rest'],
      ['rest', 'endAt', 'add-salt'],
      ['add-salt', 'endAt', 'bulk'],
      ['bulk', 'endAt', 'bulk-end'],
      ['bulk-end', 'startAt', 'shape'],
      ['shape', 'endAt', 'proof'],
      ['proof', 'endAt', 'bake'],
      ['bake', 'endAt', 'cool'],
      ['cool', 'endAt', 'finish'],
    ];
    for (const [a, at, b] of joins) expect(step(sameDay, b).startAt, `${a} → ${b}`).toBe(step(sameDay, a)[at]);
    expect(step(sameDay, 'starter-rise').endAt).toBe(step(sameDay, 'mix').startAt);
  });

  it('preheats over the end of the proof and has the bread cooled by "ready at"', () => {
    const preheat = step(sameDay, 'preheat');
    expect(preheat.endAt).toBe(step(sameDay, 'bake').startAt);
    expect(hours(preheat.startAt, preheat.endAt)).toBeCloseTo(45 / 60, 9);
    expect(ms(preheat.startAt)).toBeGreaterThan(ms(step(sameDay, 'proof').startAt));
    const cool = step(sameDay, 'cool');
    expect(cool.endAt).toBe(plan.readyAt);
    // Cooling at least the 60 min default, at most 60 + the 120 min a loaf may wait.
    expect(hours(cool.startAt, cool.endAt)).toBeGreaterThanOrEqual(1);
    expect(hours(cool.startAt, cool.endAt)).toBeLessThanOrEqual(3);
    const bake = step(sameDay, 'bake');
    expect(hours(bake.startAt, bake.endAt)).toBeCloseTo(50 / 60, 9);
    expect(bake.uncertainty).toMatchObject({ source: 'bake-time', level: null, high: bake.endAt });
    expect(hours(bake.startAt, bake.uncertainty?.low ?? '')).toBeCloseTo(40 / 60, 9);
  });

  it('bulk lasts what predictBulkEnd says for the mix time (the model as its own oracle)', () => {
    const mix = step(sameDay, 'mix').startAt;
    const bulkEnd = step(sameDay, 'bulk-end');
    const e = predictBulkEnd({ ...DOUGH, mixedAt: mix });
    expect(hours(mix, bulkEnd.startAt)).toBeCloseTo(e.hoursFromMix ?? NaN, 3);
    expect(hours(mix, bulkEnd.uncertainty?.low ?? '')).toBeCloseTo(e.lowHours ?? NaN, 3);
    expect(hours(mix, bulkEnd.uncertainty?.high ?? '')).toBeCloseTo(e.highHours ?? NaN, 3);
  });

  it('folds: 4 sets 30 min apart from the start of bulk [common-practice defaults]', () => {
    const folds = sameDay.steps.filter((s) => s.kind === 'fold');
    expect(folds.map((f) => f.set)).toEqual([1, 2, 3, 4]);
    const bulkStart = step(sameDay, 'bulk').startAt;
    folds.forEach((f, i) => expect(hours(bulkStart, f.startAt)).toBeCloseTo(0.5 * (i + 1), 9));
    expect(folds.every((f) => f.action)).toBe(true);
  });

  it('marks hands-on steps and waiting steps, and the cautions of a lean dough', () => {
    const action = Object.fromEntries(sameDay.steps.map((s) => [s.id, s.action]));
    expect(action).toMatchObject({ mix: true, rest: false, bulk: false, shape: true, proof: false, bake: true });
    expect(step(sameDay, 'mix').cautions).toEqual(['raw-dough']);
    expect(step(sameDay, 'shape').cautions).toEqual(['raw-dough']);
    expect(step(sameDay, 'bake').cautions).toEqual(['hot-oven']);
    expect(step(sameDay, 'bulk').cautions).toEqual([]);
    expect(plan.assumptions).toContain('4 sets of stretch-and-folds [common practice]');
  });
});

describe('planBake: the levain peaks at mixing', () => {
  it("feeds so that predictNextPeak's peak is the mix time (default kinetics)", () => {
    const o = option(planBake(input()), 'same-day');
    const p = predictNextPeak(defaultKinetics(), {
      fedAt: step(o, 'feed-starter').startAt,
      starterG: 1,
      flourG: 2,
      waterG: 2,
      temperatureC: 24,
    });
    expect(Math.abs(ms(p.peakAt ?? '') - ms(step(o, 'mix').startAt))).toBeLessThanOrEqual(1000);
    expect(step(o, 'starter-rise').uncertainty).toMatchObject({ source: 'starter-peak', level: 0.8 });
  });

  it("uses the culture's own kinetics, its feed ratio and the levain's temperature", () => {
    // A culture peaking in about 3 h after 1:1:1 at 24 °C (faster than the defaults).
    const history: ObservedFeeding[] = Array.from({ length: 10 }, (_, i) => ({
      fedAt: addHours('2026-11-20T08:00:00+01:00', 24 * i),
      starterG: 50,
      flourG: 50,
      waterG: 50,
      temperatureC: 24,
      hoursToPeak: 3 * (1 + 0.04 * Math.sin(i)),
    }));
    const kinetics = fitCultureKinetics(history);
    const o = option(
      planBake(input({ kinetics, starter: { ratio: { starter: 1, flour: 5, water: 5 }, temperatureC: 21 } })),
      'same-day',
    );
    const feed = { fedAt: step(o, 'feed-starter').startAt, starterG: 1, flourG: 5, waterG: 5, temperatureC: 21 };
    const p = predictNextPeak(kinetics, feed);
    expect(Math.abs(ms(p.peakAt ?? '') - ms(step(o, 'mix').startAt))).toBeLessThanOrEqual(1000);
    expect(step(o, 'starter-rise').temperatureC).toBe(21);
  });

  it('a ripe starter (skipFeeding) starts the plan at mixing', () => {
    const o = option(planBake(input({ starter: { skipFeeding: true } })), 'same-day');
    expect(o.steps[0]?.kind).toBe('mix');
    expect(o.steps.some((s) => s.kind === 'feed-starter')).toBe(false);
  });
});

describe('planBake: temperature', () => {
  it("a warmer dough shortens bulk by relativeRate's factor (temperature/models.ts)", () => {
    const bulkHours = (c: number): number => {
      const o = option(planBake(input({ mode: 'start-now', dough: { ...DOUGH, temperatureC: c } })), 'same-day');
      return hours(step(o, 'mix').startAt, step(o, 'bulk-end').startAt);
    };
    const model = defaultKinetics().temperatureModel;
    const factor = relativeRate(model, 26) / relativeRate(model, 21);
    expect(factor).toBeGreaterThan(1);
    // Times are written to the second, so the ratio agrees to about 1e-4.
    expect(bulkHours(21) / bulkHours(26)).toBeCloseTo(factor, 3);
  });

  it('the model-derived proof is 40 % of the bulk at the same temperature [our assumption]', () => {
    const o = option(planBake(input()), 'same-day');
    const bulk = hours(step(o, 'mix').startAt, step(o, 'bulk-end').startAt);
    const proof = step(o, 'proof');
    expect(hours(proof.startAt, proof.endAt)).toBeCloseTo(0.4 * bulk, 2);
  });

  it('a forecast (cool morning, warmer afternoon) is integrated as predictBulkEnd does', () => {
    const forecast = [{ c: 19, until: '2026-12-05T12:00:00+01:00' }, { c: 25 }];
    const dough = { ...DOUGH, temperatureC: undefined, forecast };
    const o = option(planBake(input({ dough })), 'same-day');
    const mix = step(o, 'mix').startAt;
    const e = predictBulkEnd({ ...dough, mixedAt: mix });
    expect(hours(mix, step(o, 'bulk-end').startAt)).toBeCloseTo(e.hoursFromMix ?? NaN, 3);
    expect(step(o, 'bulk').temperatureC).toBe(25);
  });

  it("a baker-given proof is used as given, at the baker's proof temperature", () => {
    const o = option(
      planBake(input({ steps: { finalProof: { kind: 'room', hours: 2.5, temperatureC: 26 } } })),
      'same-day',
    );
    const proof = step(o, 'proof');
    expect(hours(proof.startAt, proof.endAt)).toBeCloseTo(2.5, 9);
    expect(proof.temperatureC).toBe(26);
    expect(proof.uncertainty).toBeNull();
  });
});

describe('planBake: quiet hours', () => {
  // Quiet 23:00–06:00. Ready at 10:00: the same-day plan would bulk through the night and shape
  // or fold in it; the overnight retard shapes before 23:00 and bakes in the morning.
  const plan = planBake(input({ readyAt: '2026-12-05T10:00:00+01:00', quietHours: { from: '23:00', until: '06:00' } }));
  const sameDay = option(plan, 'same-day');
  const retard = option(plan, 'overnight-retard');

  it('push the plan into the overnight retard', () => {
    expect(sameDay.fits).toBe(false);
    expect(sameDay.reason).toMatch(/inside quiet hours 23:00–06:00/);
    // Its attempt is shown in full, the clashing steps marked.
    expect(sameDay.steps.some((s) => s.inQuietHours)).toBe(true);
    expect(retard.fits).toBe(true);
    expect(retard.reason).toBeNull();
    expect(plan.recommended).toBe('overnight-retard');
  });

  it('no hands-on step of the retard plan falls in quiet hours; waiting runs through the night', () => {
    for (const s of retard.steps.filter((x) => x.action)) {
      expect(inQuiet(s, 23 * 60, 6 * 60), s.id).toBe(false);
      expect(s.inQuietHours).toBe(false);
    }
    const fridge = step(retard, 'retard');
    expect(inQuiet({ ...fridge, action: true }, 23 * 60, 6 * 60)).toBe(true);
    expect(hours(fridge.startAt, fridge.endAt)).toBeGreaterThanOrEqual(8);
    expect(hours(fridge.startAt, fridge.endAt)).toBeLessThanOrEqual(16);
    expect(fridge.temperatureC).toBe(4);
    expect(step(retard, 'take-out').endAt).toBe(step(retard, 'bake').startAt);
    expect(step(retard, 'preheat').endAt).toBe(step(retard, 'bake').startAt);
    expect(retard.timing).toMatchObject({ kind: 'overnight-retard', bakeAt: step(retard, 'bake').startAt });
    expect(step(retard, 'cool').endAt).toBe(plan.readyAt);
  });

  it('offers the reverse: a retard asked for but out of reach, the same-day plan fits', () => {
    // Ready the same evening: no time for 8 h in the fridge.
    const p = planBake(
      input({
        readyAt: '2026-12-04T22:00:00+01:00',
        starter: { skipFeeding: true },
        steps: { finalProof: { kind: 'retard' } },
      }),
    );
    expect(option(p, 'overnight-retard').fits).toBe(false);
    expect(option(p, 'overnight-retard').reason).toMatch(/before now/);
    expect(option(p, 'same-day').fits).toBe(true);
    expect(p.recommended).toBe('same-day');
  });

  it('keeps the retard when it is asked for and fits, and the same-day plan when that fits too', () => {
    const p = planBake(input({ readyAt: '2026-12-05T12:00:00+01:00', steps: { finalProof: { kind: 'retard' } } }));
    expect(option(p, 'overnight-retard').fits).toBe(true);
    expect(p.recommended).toBe('overnight-retard');
  });
});

describe('planBake: cautions from the formula', () => {
  it('dairy or egg at room temperature during bulk and proof; sugar at the oven', () => {
    const o = option(planBake(input({ formula: { egg: true, sugar: true } })), 'same-day');
    expect(step(o, 'bulk').cautions).toContain('dairy-egg-room-temperature');
    expect(step(o, 'proof').cautions).toContain('dairy-egg-room-temperature');
    expect(step(o, 'bake').cautions).toEqual(['hot-oven', 'hot-sugar']);
    expect(step(o, 'preheat').cautions).toEqual(['hot-oven', 'hot-sugar']);
    // Milk in the enrichment counts as dairy without the flag; the fridge is not room temperature.
    const milk = planBake(input({ dough: { ...DOUGH, enrichment: { milkG: 300 } } }));
    expect(step(option(milk, 'same-day'), 'bulk').cautions).toContain('dairy-egg-room-temperature');
    expect(step(option(milk, 'overnight-retard'), 'retard').cautions).toEqual([]);
  });
});

describe('planBake: a few minutes late rather than nothing', () => {
  // Quiet 23:00–06:30, ready at 09:00: 45 min preheat + 50 min bake + 60 min cooling [the
  // planner's common-practice defaults] need the oven lit at 06:25, five minutes inside the quiet
  // hours. The nearest ready time that fits is 09:05.
  const plan = planBake(
    input({
      now: '2026-12-04T08:00:00+01:00',
      readyAt: '2026-12-05T09:00:00+01:00',
      quietHours: { from: '23:00', until: '06:30' },
    }),
  );
  const retard = option(plan, 'overnight-retard');

  it('offers the retard ready at 09:05 and says why it is late', () => {
    expect(retard.fits).toBe(true);
    expect(retard.readyAt).toBe('2026-12-05T09:05:00+01:00');
    expect(step(retard, 'cool').endAt).toBe(retard.readyAt);
    expect(retard.timing?.readyAt).toBe(retard.readyAt);
    expect(retard.warnings[0]).toMatch(/ready at 09:05 on Sat 5 Dec, 5 min later than asked/);
    for (const s of retard.steps.filter((x) => x.action)) expect(inQuiet(s, 23 * 60, 6 * 60 + 30), s.id).toBe(false);
    expect(plan.recommended).toBe('overnight-retard');
  });

  it('keeps "ready at" itself when it can be met', () => {
    const onTime = planBake(
      input({ readyAt: '2026-12-05T10:00:00+01:00', quietHours: { from: '23:00', until: '06:30' } }),
    );
    const r = option(onTime, 'overnight-retard');
    expect(r.fits).toBe(true);
    expect(r.readyAt).toBe('2026-12-05T10:00:00+01:00');
    expect(r.warnings.join(' ')).not.toMatch(/later than asked/);
  });
});
