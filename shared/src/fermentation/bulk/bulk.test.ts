import { describe, expect, it } from 'vitest';
import { readReferenceCsv } from '../../bench/reference-data.js';
import { fitCultureKinetics } from '../kinetics/fit-kinetics.js';
import { type ObservedFeeding } from '../kinetics/types.js';
import { relativeRate } from '../temperature/models.js';
import { addHours, hoursBetween } from '../temperature/time.js';
import { predictBulkEnd } from './bulk-end.js';
import { defaultTargetRisePct, inoculation, rateFactors } from './dough.js';
import { growthForRise, riseForGrowth } from './rise-model.js';
import { type BulkInput } from './types.js';

const MIXED = '2026-03-07T09:00:00+01:00';
/** 20 % prefermented flour: 800 g flour + 400 g starter at 100 % (200 g flour), 2 % salt. */
const dough = (over: Partial<BulkInput> = {}): BulkInput => ({
  mixedAt: MIXED,
  flourG: 800,
  waterG: 550,
  starterG: 400,
  saltG: 20,
  temperatureC: 24,
  targetRisePct: 50,
  ...over,
});
const hours = (input: BulkInput, kinetics?: ReturnType<typeof fitCultureKinetics>): number =>
  predictBulkEnd(input, kinetics ? { kinetics } : {}).hoursFromMix ?? NaN;

describe('dough inoculation and factors', () => {
  it('prefermented flour matches the Tartine worked example (baking/bakers_percentage_worked_examples.csv: 9.09 %)', () => {
    const row = readReferenceCsv('baking/bakers_percentage_worked_examples.csv').find(
      (r) => r.example_id === 'tartine_country' && r.ingredient === 'prefermented flour',
    );
    const inoc = inoculation({ mixedAt: MIXED, flourG: 1000, waterG: 750, starterG: 200, starterHydrationPct: 100 });
    expect(inoc.prefermentedFlourPct).toBeCloseTo(Number(row?.percent_of_component_flour), 2);
    expect(inoc.starterPctOfFlour).toBe(20);
    expect(inoc.dilution).toBeCloseTo(11, 12);
  });

  it('a starter of the feed’s own hydration gives the feeding ratio’s dilution (1:1:1 → 3)', () => {
    expect(inoculation({ mixedAt: MIXED, flourG: 50, waterG: 50, starterG: 50 }).dilution).toBeCloseTo(3, 12);
  });

  it('salt slows by 1 − salt/8 % (Gänzle 1998: the yeast tolerates up to 8 % NaCl); enrichment slows [common practice]', () => {
    expect(rateFactors(dough()).salt).toBeCloseTo(0.75, 12);
    expect(rateFactors(dough({ saltG: 0 })).salt).toBe(1);
    const braid = rateFactors(dough({ enrichment: { sugarG: 100, fatG: 100, milkG: 600 } }));
    expect(braid.enrichment).toBeCloseTo(0.9 * 0.9 * 0.88, 12);
    // A little sugar (up to 5 % of the flour) costs nothing.
    expect(rateFactors(dough({ enrichment: { sugarG: 40 } })).enrichment).toBe(1);
  });

  it('default target rise follows the Sourdough Framework protein table (SOURCES.md §6c)', () => {
    expect(defaultTargetRisePct(9)).toBe(25);
    expect(defaultTargetRisePct(11)).toBe(50);
    expect(defaultTargetRisePct(13.5)).toBe(100);
    expect(defaultTargetRisePct()).toBe(50);
  });

  it('rise model: 0 at mixing, the peak rise once the culture has grown back by ln D', () => {
    expect(riseForGrowth(0, 150, 5)).toBe(0);
    expect(riseForGrowth(Math.log(5), 150, 5)).toBeCloseTo(150, 10);
    expect(riseForGrowth(growthForRise(60, 150, 5), 150, 5)).toBeCloseTo(60, 10);
  });
});

describe('predictBulkEnd', () => {
  it('common practice: about 20 % inoculation near 24 °C (75 °F) finishes bulk in roughly 4–5 h', () => {
    const e = predictBulkEnd(dough());
    expect(e.inoculation.prefermentedFlourPct).toBeCloseTo(20, 10);
    expect(e.status).toBe('fermenting');
    expect(e.hoursFromMix).toBeGreaterThanOrEqual(4);
    expect(e.hoursFromMix).toBeLessThanOrEqual(5);
    expect(e.basis).toBe('default');
    expect(e.endAt).toBe(addHours(MIXED, e.hoursFromMix ?? NaN));
    expect(e.lowHours).toBeLessThan(e.hoursFromMix ?? NaN);
    expect(e.highHours).toBeGreaterThan(e.hoursFromMix ?? NaN);
  });

  it('common practice: a fridge at about 4 °C slows fermentation to a small fraction', () => {
    // Default (CTMI, Gänzle's lactobacilli Tmin 4 °C): no progress at all; bulk never ends.
    const cold = predictBulkEnd(dough({ temperatureC: 4 }), { horizonHours: 72 });
    expect(cold.status).toBe('not-reached');
    expect(cold.endAt).toBeNull();
    // Even the Q10 alternative, which never stops, leaves the fridge at under a fifth of 24 °C.
    const q10 = fitCultureKinetics([], { model: 'q10' });
    expect(relativeRate(q10.temperatureModel, 4)).toBeLessThan(0.2);
    expect(hours(dough({ temperatureC: 4 }), q10) / hours(dough(), q10)).toBeGreaterThan(5);
  });

  it('more starter → sooner', () => {
    const h = [100, 200, 400, 600].map((starterG) => hours(dough({ starterG })));
    for (let i = 1; i < h.length; i++) expect(h[i]).toBeLessThan(h[i - 1] ?? NaN);
  });

  it('warmer → sooner up to the optimum, slower beyond it', () => {
    const h = [18, 21, 24, 27, 30].map((temperatureC) => hours(dough({ temperatureC })));
    for (let i = 1; i < h.length; i++) expect(h[i]).toBeLessThan(h[i - 1] ?? NaN);
    expect(hours(dough({ temperatureC: 39 }))).toBeGreaterThan(hours(dough({ temperatureC: 32.5 })));
  });

  it('salt and enrichment slow it [common practice]', () => {
    expect(hours(dough({ saltG: 0 }))).toBeLessThan(hours(dough()));
    expect(hours(dough({ enrichment: { sugarG: 100, fatG: 100, milkG: 600 } }))).toBeGreaterThan(hours(dough()));
  });

  it('readings showing a faster rise → earlier end; slower → later; on the model → about unchanged', () => {
    const plain = predictBulkEnd(dough());
    const at2h = addHours(MIXED, 2);
    const expected =
      predictBulkEnd(dough({ readings: [{ at: at2h, risePct: 0 }] })).expectedRiseAtLastReadingPct ?? NaN;
    const onModel = predictBulkEnd(dough({ readings: [{ at: at2h, risePct: expected }] }));
    const ahead = predictBulkEnd(dough({ readings: [{ at: at2h, risePct: expected + 15 }] }));
    const behind = predictBulkEnd(dough({ readings: [{ at: at2h, risePct: Math.max(0, expected - 10) }] }));
    expect(Math.abs((onModel.hoursFromMix ?? NaN) - (plain.hoursFromMix ?? NaN))).toBeLessThan(0.05);
    expect(ahead.hoursFromMix).toBeLessThan(plain.hoursFromMix ?? NaN);
    expect(ahead.rateScale).toBeGreaterThan(1);
    expect(behind.hoursFromMix).toBeGreaterThan(plain.hoursFromMix ?? NaN);
    expect(behind.rateScale).toBeLessThan(1);
    // A reading narrows the interval.
    const width = (e: typeof plain): number => (e.highHours ?? NaN) - (e.lowHours ?? NaN);
    expect(width(onModel)).toBeLessThan(width(plain));
  });

  it('once the jar passes the target, bulk is done at the interpolated crossing', () => {
    const e = predictBulkEnd(
      dough({
        readings: [
          { at: addHours(MIXED, 3), risePct: 30 },
          { at: addHours(MIXED, 4), risePct: 60 },
        ],
      }),
    );
    expect(e.status).toBe('done');
    expect(hoursBetween(MIXED, e.endAt ?? '')).toBeCloseTo(3 + 20 / 30, 3);
    expect(e.low).toBe(addHours(MIXED, 3));
    expect(e.high).toBe(addHours(MIXED, 4));
  });

  it('a cold retard then the counter: the fridge time adds about its own length', () => {
    const retard = predictBulkEnd(
      dough({ temperatureC: undefined, forecast: [{ c: 4, until: addHours(MIXED, 10) }, { c: 24 }] }),
    );
    expect((retard.hoursFromMix ?? NaN) - 10).toBeCloseTo(hours(dough()), 1);
  });

  it("uses the culture's kinetics: a culture twice as fast finishes sooner (basis 'culture')", () => {
    const fast: ObservedFeeding[] = Array.from({ length: 12 }, (_, i) => ({
      fedAt: addHours('2026-02-01T08:00:00+01:00', 24 * i),
      starterG: 50,
      flourG: 50,
      waterG: 50,
      temperatureC: 24,
      hoursToPeak: 2.2 * (1 + 0.05 * Math.sin(i)),
    }));
    const k = fitCultureKinetics(fast);
    const e = predictBulkEnd(dough(), { kinetics: k });
    expect(e.basis).toBe('culture');
    expect(e.hoursFromMix).toBeLessThan(0.7 * hours(dough()));
  });

  it('rejects a dough without flour, starter or temperature', () => {
    expect(() => predictBulkEnd(dough({ flourG: 0 }))).toThrow(RangeError);
    expect(() => predictBulkEnd(dough({ starterG: 0 }))).toThrow(RangeError);
    expect(() => predictBulkEnd(dough({ temperatureC: undefined }))).toThrow(RangeError);
    expect(() => predictBulkEnd(dough({ saltG: -1 }))).toThrow(RangeError);
  });
});
