import { describe, expect, it } from 'vitest';
import { readReferenceCsv } from '../../bench/reference-data.js';
import { celsiusToFahrenheit, fahrenheitToCelsius } from '../../units.js';
import { calibrateFriction, expectedDoughTemperature, waterTemperatureForDdt, type DdtInput } from './ddt.js';

// Worked examples: test-fixtures/reference/baking/ddt_worked_examples.csv (SOURCES.md §6a):
// SFBI Artisan I (2009, quoted on the Farine blog), Pizza Today (June 2018), an eHow text quoted
// on a forum (weak), and two rows derived there from the 4-factor formula in °C and in °F.
const rows = readReferenceCsv('baking/ddt_worked_examples.csv');
const inputOf = (r: Record<string, string>): DdtInput => {
  const input: DdtInput = {
    unit: r.unit === 'F' ? 'F' : 'C',
    desired: Number(r.ddt),
    room: Number(r.room),
    flour: Number(r.flour),
    friction: Number(r.friction),
  };
  if (r.preferment !== '') input.preferment = Number(r.preferment);
  return input;
};
const byId = (id: string) => {
  const r = rows.find((x) => x.example_id === id);
  if (!r) throw new Error(`no row ${id}`);
  return r;
};

describe('water temperature for a desired dough temperature', () => {
  it('has the five worked rows', () => expect(rows.map((r) => r.example_id)).toHaveLength(5));

  it.each(rows.map((r) => [r.example_id ?? '', r] as const))('%s gives the tabled water temperature', (_id, r) => {
    const result = waterTemperatureForDdt(inputOf(r));
    expect(result.factors).toBe(Number(r.factors));
    expect(result.unit).toBe(r.unit);
    expect(result.water).toBeCloseTo(Number(r.water_expected), 9);
  });

  it('SFBI: base 3 × 75 °F = 225, water 87 °F', () => {
    const result = waterTemperatureForDdt(inputOf(byId('sfbi_artisan1')));
    expect(result.base).toBeCloseTo(225, 9);
    expect(result.water).toBeCloseTo(87, 9);
    expect(result.warnings).toEqual([]);
  });

  it('the °C and °F levain rows are the same dough and give the same water: 28 °C = 82.4 °F', () => {
    const inC = waterTemperatureForDdt(inputOf(byId('derived_levain_C')));
    const inF = waterTemperatureForDdt(inputOf(byId('derived_levain_F')));
    expect(inC.waterC).toBeCloseTo(inF.waterC, 9);
    expect(fahrenheitToCelsius(inF.water)).toBeCloseTo(28, 9);
    expect(waterTemperatureForDdt({ ...inputOf(byId('derived_levain_C')), outputUnit: 'F' }).water).toBeCloseTo(
      82.4,
      9,
    );
  });

  it('a friction factor converts as a difference: treating 1 °C as 33.8 °F would be 32 °F off (NIST SP 811)', () => {
    const asTemperature = { ...inputOf(byId('derived_levain_F')), friction: celsiusToFahrenheit(1) };
    expect(waterTemperatureForDdt(asTemperature).water).toBeCloseTo(82.4 - 32, 9);
  });
});

describe('friction factor from a measured dough temperature (friction = n·FDT − sum of the rest)', () => {
  it.each(rows.map((r) => [r.example_id ?? '', r] as const))(
    '%s: calibrating on its own answer returns its friction',
    (_id, r) => {
      const input = inputOf(r);
      const { desired, friction, ...rest } = input;
      const calibrated = calibrateFriction({ ...rest, finalDough: desired, water: Number(r.water_expected) });
      expect(calibrated.friction).toBeCloseTo(friction, 9);
      expect(calibrated.factors).toBe(Number(r.factors));
      expect(calibrated.warnings).toEqual([]);
      expect(expectedDoughTemperature({ ...rest, friction, water: Number(r.water_expected) })).toBeCloseTo(desired, 9);
    },
  );

  it('round-trips across units: calibrate in °F, use the friction in °C', () => {
    // A dough mixed with 20 °C water in a 22 °C room from 20 °C flour came out at 25 °C.
    const f = calibrateFriction({ unit: 'C', finalDough: 25, room: 22, flour: 20, water: 20, outputUnit: 'F' });
    expect(f.frictionC).toBeCloseTo(13, 9);
    expect(f.friction).toBeCloseTo(13 * 1.8, 9);
    const w = waterTemperatureForDdt({
      unit: 'F',
      desired: 77,
      room: 71.6,
      flour: 68,
      friction: f.friction,
      outputUnit: 'C',
    });
    expect(w.water).toBeCloseTo(20, 9);
  });

  it('warns when the numbers imply mixing cooled the dough', () => {
    const f = calibrateFriction({ finalDough: 20, room: 22, flour: 22, water: 22 });
    expect(f.friction).toBeCloseTo(-6, 9);
    expect(f.warnings.map((x) => x.code)).toEqual(['friction-negative']);
  });
});

describe('warnings and ice', () => {
  it('warns when the water would be too hot for the culture, or for hands', () => {
    const cold = { unit: 'C', desired: 26, room: 16, flour: 16, friction: 2 } as const; // → 44 °C
    expect(waterTemperatureForDdt(cold).water).toBeCloseTo(44, 9);
    expect(waterTemperatureForDdt(cold).warnings.map((w) => w.code)).toEqual(['water-warm-for-culture']);
    const colder = { ...cold, room: 10, flour: 10 }; // → 56 °C
    expect(waterTemperatureForDdt(colder).warnings.map((w) => w.code)).toEqual(['water-above-hand-safe']);
  });

  it('warns when the water would have to be below freezing, and does not pretend ice can do it', () => {
    const r = waterTemperatureForDdt({
      unit: 'F',
      desired: 75,
      room: 85,
      flour: 85,
      friction: 60,
      tap: 70,
      waterG: 700,
    });
    expect(r.water).toBeCloseTo(225 - 230, 9);
    expect(r.warnings.map((w) => w.code)).toEqual(['water-below-freezing', 'ice-cannot-reach']);
    expect(r.ice).toBeUndefined();
  });

  it('works out ice when the tap is warmer than the water must be (Pizza Today row, tap 75 °F)', () => {
    const r = waterTemperatureForDdt({ ...inputOf(byId('pizzatoday_2018')), tap: 75, waterG: 600 });
    const tapC = fahrenheitToCelsius(75);
    const targetC = fahrenheitToCelsius(65);
    expect(r.ice?.iceG).toBeCloseTo((600 * (tapC - targetC)) / (tapC + 334 / 4.18), 9);
    expect((r.ice?.iceG ?? 0) + (r.ice?.tapWaterG ?? 0)).toBeCloseTo(600, 9);
    // No ice when the tap is already cold enough.
    expect(waterTemperatureForDdt({ ...inputOf(byId('pizzatoday_2018')), tap: 60, waterG: 600 }).ice).toBeUndefined();
  });
});
