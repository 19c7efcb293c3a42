import { describe, expect, it } from 'vitest';
import { predictBulkEnd } from '../bulk/bulk-end.js';
import { defaultKinetics } from '../kinetics/fit-kinetics.js';
import { addHours } from '../temperature/time.js';
import { BakersMathError } from '../units/bakers-math-error.js';
import { doughTemperatureForBulkEnd, warmestUsefulC } from './lever.js';
import { planBake } from './plan-bake.js';
import { DOUGH, hours, inQuiet, input, ms, step } from './plan-test-helpers.js';

const MIXED = '2026-12-05T09:00:00+01:00';

describe('doughTemperatureForBulkEnd', () => {
  it('finds the temperature whose bulk end (by predictBulkEnd) is the wanted time', () => {
    for (const wanted of [5.5, 7, 10]) {
      const a = doughTemperatureForBulkEnd({ dough: DOUGH, mixedAt: MIXED, wantedEndAt: addHours(MIXED, wanted) });
      expect(a.reachable).toBe(true);
      expect(a.temperatureC).toBeGreaterThanOrEqual(18);
      expect(a.temperatureC).toBeLessThanOrEqual(30);
      const e = predictBulkEnd({ ...DOUGH, mixedAt: MIXED, temperatureC: a.temperatureC });
      // Within a minute of the wanted end: the model as the oracle.
      expect(Math.abs((e.hoursFromMix ?? NaN) - wanted)).toBeLessThan(1 / 60);
      expect(a.bulkEndAt.slice(-6)).toBe('+01:00');
    }
  });

  it('longer wanted bulk → cooler spot', () => {
    const t = [5.5, 7, 10].map(
      (h) => doughTemperatureForBulkEnd({ dough: DOUGH, mixedAt: MIXED, wantedEndAt: addHours(MIXED, h) }).temperatureC,
    );
    expect(t[0]).toBeGreaterThan(t[1] ?? NaN);
    expect(t[1]).toBeGreaterThan(t[2] ?? NaN);
  });

  it('says when the wanted time is out of the 18–30 °C range [common practice], with the nearest end', () => {
    const fast = doughTemperatureForBulkEnd({ dough: DOUGH, mixedAt: MIXED, wantedEndAt: addHours(MIXED, 1) });
    expect(fast).toMatchObject({ reachable: false, temperatureC: 30 });
    expect(fast.reason).toMatch(/even at 30.0 °C/);
    const slow = doughTemperatureForBulkEnd({ dough: DOUGH, mixedAt: MIXED, wantedEndAt: addHours(MIXED, 40) });
    expect(slow).toMatchObject({ reachable: false, temperatureC: 18 });
  });

  it('stays below the optimum of a culture that peaks inside the range (CTMI with Topt 27 °C)', () => {
    const k = defaultKinetics({ model: 'ctmi' });
    const warmest = warmestUsefulC({ ...k, temperatureModel: { kind: 'ctmi', tMin: 4, tOpt: 27, tMax: 41 } }, 18, 30);
    expect(warmest).toBeCloseTo(27, 1);
  });

  it('refuses a wanted end before the mix, naming the field', () => {
    try {
      doughTemperatureForBulkEnd({ dough: DOUGH, mixedAt: MIXED, wantedEndAt: addHours(MIXED, -1) });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(BakersMathError);
      expect((error as BakersMathError).path).toBe('wantedEndAt');
    }
  });
});

describe('planBake: the temperature lever', () => {
  // Start now at 09:00 with a ripe starter in a 19 °C kitchen, a 2 h proof: bulk runs to about
  // 21:00, so the bake would fall in quiet hours (23:00–06:30). A warmer spot fixes it.
  const plan = planBake(
    input({
      mode: 'start-now',
      now: '2026-12-04T09:00:00+01:00',
      quietHours: { from: '23:00', until: '06:30' },
      dough: { ...DOUGH, temperatureC: 19 },
      starter: { skipFeeding: true },
      steps: { finalProof: { kind: 'room', hours: 2 } },
    }),
  );

  it('offers a warmer spot whose same-day plan fits, and the model agrees on its bulk end', () => {
    const sameDay = plan.options.find((o) => o.kind === 'same-day');
    expect(sameDay?.fits).toBe(false);
    const lever = plan.temperatureLever;
    expect(lever).not.toBeNull();
    if (!lever) return;
    expect(lever.doughTemperatureC).toBeGreaterThan(19);
    expect(lever.doughTemperatureC).toBeLessThanOrEqual(30);
    // A temperature a baker can set: half degrees.
    expect(lever.doughTemperatureC * 2).toBe(Math.round(lever.doughTemperatureC * 2));
    expect(lever.currentDoughTemperatureC).toBe(19);
    expect(lever.reason).toMatch(/warmer spot/);
    expect(lever.option.fits).toBe(true);
    expect(lever.option.timing?.doughTemperatureC).toBe(lever.doughTemperatureC);
    for (const s of lever.option.steps.filter((x) => x.action))
      expect(inQuiet(s, 23 * 60, 6 * 60 + 30), s.id).toBe(false);
    const mix = step(lever.option, 'mix').startAt;
    const e = predictBulkEnd({ ...DOUGH, mixedAt: mix, temperatureC: lever.doughTemperatureC });
    expect(hours(mix, step(lever.option, 'bulk-end').startAt)).toBeCloseTo(e.hoursFromMix ?? NaN, 3);
    expect(lever.bulkEndAt).toBe(step(lever.option, 'bulk-end').startAt);
    expect(step(lever.option, 'bulk').temperatureC).toBe(lever.doughTemperatureC);
  });

  it('is the smallest such change: half a degree cooler does not fit', () => {
    const lever = plan.temperatureLever;
    if (!lever) throw new Error('no lever');
    const cooler = planBake(
      input({
        mode: 'start-now',
        now: '2026-12-04T09:00:00+01:00',
        quietHours: { from: '23:00', until: '06:30' },
        dough: { ...DOUGH, temperatureC: lever.doughTemperatureC - 0.5 },
        starter: { skipFeeding: true },
        steps: { finalProof: { kind: 'room', hours: 2 } },
      }),
    );
    expect(cooler.options.find((o) => o.kind === 'same-day')?.fits).toBe(false);
  });

  it('is not offered when the same-day plan fits', () => {
    expect(planBake(input()).temperatureLever).toBeNull();
  });

  it('ready-at: a lever plan still has the loaf cooled by "ready at"', () => {
    // 20 °C kitchen, ready 15:00 the next day: the same-day plan clashes with the night.
    const p = planBake(
      input({
        readyAt: '2026-12-05T15:00:00+01:00',
        quietHours: { from: '23:00', until: '06:30' },
        dough: { ...DOUGH, temperatureC: 20 },
      }),
    );
    const lever = p.temperatureLever;
    expect(p.options.find((o) => o.kind === 'same-day')?.fits).toBe(false);
    expect(lever?.option.fits).toBe(true);
    expect(ms(step(lever?.option ?? { steps: [] }, 'cool').endAt)).toBe(ms('2026-12-05T15:00:00+01:00'));
    expect(Math.abs((lever?.doughTemperatureC ?? 20) - 20)).toBeGreaterThanOrEqual(0.5);
  });

  it('when neither option fits, a spot that lets the overnight retard fit', () => {
    // Start at 08:00, quiet from 20:00: at 24 °C bulk ends near 20:30, too late to shape.
    const p = planBake(input({ mode: 'start-now', quietHours: { from: '20:00', until: '06:30' } }));
    expect(p.options.map((o) => o.fits)).toEqual([false, false]);
    const lever = p.temperatureLever;
    expect(lever?.option.kind).toBe('overnight-retard');
    expect(lever?.option.fits).toBe(true);
    expect(lever?.doughTemperatureC).toBeGreaterThan(24);
    expect(lever?.reason).toMatch(/then the overnight retard fits/);
    for (const s of lever?.option.steps.filter((x) => x.action) ?? []) {
      expect(inQuiet(s, 20 * 60, 6 * 60 + 30), s.id).toBe(false);
    }
  });
});
