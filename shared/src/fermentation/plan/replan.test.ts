import { describe, expect, it } from 'vitest';
import { predictBulkEnd } from '../bulk/bulk-end.js';
import { doughFromKitchen } from '../temperature/kitchen.js';
import { addHours } from '../temperature/time.js';
import { planBake } from './plan-bake.js';
import { DOUGH, hours, input, ms, step } from './plan-test-helpers.js';
import { replanBake } from './replan.js';
import { type DoneStep, type PlanOption, type PlanStep } from './types.js';

const plan = planBake(input());
const sameDay = plan.options.find((o) => o.kind === 'same-day') as PlanOption;
const timing =
  sameDay.timing ??
  (() => {
    throw new Error('no timing');
  })();
const planned = (id: string): PlanStep => step(sameDay, id);
const asPlanned = (...ids: string[]): DoneStep[] =>
  ids.map((id) => ({ id, startedAt: planned(id).startAt, endedAt: planned(id).endAt }));
const shift = (a: string, b: string): number => hours(a, b) * 60;

describe('replanBake', () => {
  it('with nothing new it reproduces the plan', () => {
    const mix = planned('mix');
    // Half an hour after mixing: the rest is running, the salt not yet due.
    const live = replanBake(input(), timing, {
      now: addHours(mix.startAt, 0.5),
      done: asPlanned('feed-starter', 'mix'),
    });
    expect(live.steps.map((s) => [s.id, s.startAt, s.endAt])).toEqual(
      sameDay.steps.map((s) => [s.id, s.startAt, s.endAt]),
    );
    expect(live.steps.filter((s) => s.done).map((s) => s.id)).toEqual(['feed-starter', 'starter-rise', 'mix']);
    expect(live.bulk.status).toBe('fermenting');
    expect(live.warnings).toEqual([]);
    expect(live.temperatureLever).toBeNull();
  });

  it('a mix checked off 20 min late moves every later step by 20 min; the cooling absorbs what it can', () => {
    const mixAt = addHours(planned('mix').startAt, 1 / 3);
    const live = replanBake(input(), timing, {
      now: addHours(mixAt, 0.1),
      done: [...asPlanned('feed-starter'), { id: 'mix', startedAt: mixAt }],
    });
    expect(step(live, 'mix').startAt).toBe(mixAt);
    expect(step(live, 'feed-starter').startAt).toBe(planned('feed-starter').startAt);
    for (const id of ['rest', 'add-salt', 'fold-1', 'fold-4', 'bulk-end', 'shape', 'proof', 'preheat', 'bake']) {
      expect(shift(planned(id).startAt, step(live, id).startAt), id).toBeCloseTo(20, 1);
    }
    // Ready at the asked time if the loaf still gets its 60 min of cooling, else that much later.
    const cooled = ms(step(live, 'bake').endAt) + 60 * 60_000;
    expect(ms(step(live, 'cool').endAt)).toBe(Math.max(cooled, ms(plan.readyAt ?? '')));
  });

  it('after a late bulk (cooler dough, slow aliquot jar) the bulk end and all later steps move later', () => {
    const mix = planned('mix').startAt;
    const now = addHours(mix, 3);
    const doughTemperatures = [
      { at: mix, c: 24 },
      { at: addHours(mix, 1.5), c: 21 },
      { at: now, c: 20 },
    ];
    const aliquotReadings = [{ at: now, risePct: 4 }];
    const done = asPlanned('feed-starter', 'mix', 'rest', 'add-salt', 'fold-1', 'fold-2', 'fold-3', 'fold-4');
    const live = replanBake(input(), timing, { now, done, doughTemperatures, aliquotReadings });
    // The oracle: predictBulkEnd on the same readings, the dough held at its last reading.
    const e = predictBulkEnd(
      { ...DOUGH, temperatureC: undefined, mixedAt: mix, temperatures: doughTemperatures, readings: aliquotReadings },
      {},
    );
    expect(hours(mix, live.bulk.endAt ?? '')).toBeCloseTo(e.hoursFromMix ?? NaN, 3);
    expect(live.bulk.rateScale).toBeLessThan(1);
    expect(live.bulk.readingsUsed).toBe(1);
    const delay = shift(planned('bulk-end').startAt, step(live, 'bulk-end').startAt);
    expect(delay).toBeGreaterThan(60);
    for (const id of ['shape', 'proof', 'preheat', 'bake', 'finish']) {
      expect(shift(planned(id).startAt, step(live, id).startAt), id).toBeGreaterThanOrEqual(delay - 0.02);
    }
    // Done steps keep their actual times.
    for (const d of done)
      expect(step(live, d.id)).toMatchObject({ startAt: d.startedAt, endAt: d.endedAt, done: true });
    // Ready later than asked: the re-plan says when.
    expect(ms(live.readyAt ?? '')).toBeGreaterThan(ms(plan.readyAt ?? ''));
  });

  it('a jar past its target ends bulk at the crossing (status done)', () => {
    const mix = planned('mix').startAt;
    const live = replanBake(input(), timing, {
      now: addHours(mix, 5),
      done: asPlanned('feed-starter', 'mix', 'rest', 'add-salt', 'fold-1', 'fold-2', 'fold-3', 'fold-4'),
      aliquotReadings: [
        { at: addHours(mix, 4), risePct: 40 },
        { at: addHours(mix, 5), risePct: 60 },
      ],
    });
    expect(live.bulk.status).toBe('done');
    expect(hours(mix, live.bulk.endAt ?? '')).toBeCloseTo(4.5, 3);
    // The model's end is past, the shaping is not done: it is due now.
    expect(step(live, 'bulk-end').startAt).toBe(addHours(mix, 5));
  });

  it('a step left unchecked before one checked off stays where it was planned, not at now', () => {
    const mix = planned('mix');
    const live = replanBake(input(), timing, { now: addHours(mix.startAt, 0.5), done: asPlanned('mix') });
    expect(step(live, 'feed-starter').startAt).toBe(planned('feed-starter').startAt);
    expect(step(live, 'feed-starter').done).toBe(false);
  });

  it('an overdue fold moves to now, and the next one follows at the interval', () => {
    const fold2 = planned('fold-2');
    const now = addHours(fold2.startAt, 0.25);
    const live = replanBake(input(), timing, {
      now,
      done: asPlanned('feed-starter', 'mix', 'rest', 'add-salt', 'fold-1'),
    });
    expect(step(live, 'fold-2').startAt).toBe(now);
    expect(hours(step(live, 'fold-2').startAt, step(live, 'fold-3').startAt)).toBeCloseTo(0.5, 9);
  });

  it('retard: a late shape keeps the bake while the fridge time allows, else moves it', () => {
    const p = planBake(input({ readyAt: '2026-12-05T10:00:00+01:00', quietHours: { from: '23:00', until: '06:00' } }));
    const retard = p.options.find((o) => o.kind === 'overnight-retard') as PlanOption;
    const t =
      retard.timing ??
      (() => {
        throw new Error('no timing');
      })();
    const shape = step(retard, 'shape');
    const fridgeHours = hours(step(retard, 'retard').startAt, step(retard, 'retard').endAt);
    const lateBy = (h: number) =>
      replanBake(input({ readyAt: '2026-12-05T10:00:00+01:00', quietHours: { from: '23:00', until: '06:00' } }), t, {
        now: addHours(shape.startAt, h),
        done: [{ id: 'bulk-end', startedAt: addHours(shape.startAt, h) }],
      });
    const small = lateBy(0.25);
    expect(step(small, 'bake').startAt).toBe(step(retard, 'bake').startAt);
    const big = lateBy(fridgeHours - 8 + 1);
    expect(hours(step(big, 'retard').startAt, step(big, 'retard').endAt)).toBeCloseTo(8, 6);
    expect(ms(step(big, 'bake').startAt)).toBeGreaterThan(ms(step(retard, 'bake').startAt));
    expect(big.warnings.join(' ')).toMatch(/8 h in the fridge/);
  });

  it('live lever: a slow bulk heading into the night gets a warmer spot that ends it before 22:30', () => {
    const quietHours = { from: '23:00', until: '06:00' };
    const request = input({ readyAt: '2026-12-05T10:00:00+01:00', quietHours });
    const retard = planBake(request).options.find((o) => o.kind === 'overnight-retard') as PlanOption;
    const t =
      retard.timing ??
      (() => {
        throw new Error('no timing');
      })();
    const mix = step(retard, 'mix').startAt;
    const now = addHours(mix, 3);
    const doughTemperatures = [
      { at: mix, c: 24 },
      { at: now, c: 19 },
    ];
    const live = replanBake(request, t, {
      now,
      done: [{ id: 'mix', startedAt: mix }],
      doughTemperatures,
    });
    expect(step(live, 'shape').inQuietHours).toBe(true);
    const lever = live.temperatureLever;
    expect(lever).not.toBeNull();
    if (!lever) return;
    expect(lever.doughTemperatureC).toBeGreaterThan(19);
    expect(lever.fromAt).toBe(now);
    expect(lever.reason).toMatch(/warmer spot/);
    // The oracle: the logged temperatures, then the new spot from now.
    const e = predictBulkEnd({
      ...DOUGH,
      temperatureC: undefined,
      mixedAt: mix,
      temperatures: doughTemperatures,
      forecast: [{ c: lever.doughTemperatureC, from: now }],
    });
    expect(hours(mix, lever.bulkEndAt)).toBeCloseTo(e.hoursFromMix ?? NaN, 3);
    // Shaped (30 min) before 23:00.
    expect(ms(lever.bulkEndAt)).toBeLessThanOrEqual(ms('2026-12-04T22:30:00+01:00'));
  });

  it('logged temperatures replace the part of a planned forecast they cover', () => {
    const forecast = [{ c: 22, until: '2026-12-05T09:00:00+01:00' }, { c: 26 }];
    const request = input({ dough: { ...DOUGH, temperatureC: undefined, forecast } });
    const p = planBake(request).options.find((o) => o.kind === 'same-day') as PlanOption;
    const t =
      p.timing ??
      (() => {
        throw new Error('no timing');
      })();
    const mix = step(p, 'mix').startAt;
    const now = addHours(mix, 4);
    const doughTemperatures = [
      { at: mix, c: 21 },
      { at: now, c: 23 },
    ];
    const live = replanBake(request, t, { now, done: [{ id: 'mix', startedAt: mix }], doughTemperatures });
    // The last reading comes after the 22 °C stretch ended: what is left is 26 °C from then on.
    expect(ms(now)).toBeGreaterThan(ms('2026-12-05T09:00:00+01:00'));
    const e = predictBulkEnd({
      ...DOUGH,
      temperatureC: undefined,
      mixedAt: mix,
      temperatures: doughTemperatures,
      forecast: [{ c: 26 }],
    });
    expect(hours(mix, live.bulk.endAt ?? '')).toBeCloseTo(e.hoursFromMix ?? NaN, 3);
  });

  describe('a kitchen logger series (the room, not the dough)', () => {
    const mix = planned('mix').startAt;
    const now = addHours(mix, 2);
    const done = asPlanned('feed-starter', 'mix');
    const room = (c: number) => Array.from({ length: 25 }, (_, i) => ({ at: addHours(mix, i / 12), c }));

    it('a warm kitchen brings the bulk end forward, a cool one moves it later', () => {
      const base = replanBake(input(), timing, { now, done });
      const warm = replanBake(input(), timing, { now, done, kitchenTemperatures: room(29) });
      const cool = replanBake(input(), timing, { now, done, kitchenTemperatures: room(19) });
      expect(ms(warm.bulk.endAt ?? '')).toBeLessThan(ms(base.bulk.endAt ?? '') - 30 * 60_000);
      expect(ms(cool.bulk.endAt ?? '')).toBeGreaterThan(ms(base.bulk.endAt ?? '') + 30 * 60_000);
    });

    it('is the oracle: predictBulkEnd on the dough series doughFromKitchen makes of it', () => {
      const kitchenTemperatures = room(20);
      const live = replanBake(input(), timing, { now, done, kitchenTemperatures });
      const temperatures = doughFromKitchen({ kitchen: kitchenTemperatures, dough: [], mixMs: ms(mix), mixC: 24 });
      const e = predictBulkEnd({ ...DOUGH, temperatureC: undefined, mixedAt: mix, temperatures }, {});
      expect(hours(mix, live.bulk.endAt ?? '')).toBeCloseTo(e.hoursFromMix ?? NaN, 3);
    });

    it('a measured dough temperature outweighs the room at its time', () => {
      const kitchenTemperatures = room(20);
      const measured = [{ at: addHours(mix, 1.9), c: 27 }];
      const roomOnly = replanBake(input(), timing, { now, done, kitchenTemperatures });
      const both = replanBake(input(), timing, { now, done, kitchenTemperatures, doughTemperatures: measured });
      expect(ms(both.bulk.endAt ?? '')).toBeLessThan(ms(roomOnly.bulk.endAt ?? ''));
    });

    it('names the reading when a room temperature is out of range', () => {
      expect(() => replanBake(input(), timing, { now, done, kitchenTemperatures: [{ at: mix, c: 80 }] })).toThrow(
        /progress\.kitchenTemperatures\.0\.c/,
      );
    });
  });
});
