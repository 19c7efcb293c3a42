import { unit as mathUnit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { readReferenceCsv as readCsv } from '../../bench/reference-data.js';
import { fahrenheitToCelsius } from '../../units.js';
import { BakersMathError } from './bakers-math-error.js';
import {
  MASS_UNITS,
  VOLUME_UNITS,
  convertVolume,
  gramsPer,
  gramsToMassUnit,
  millilitresPer,
  parseMeasureUnit,
  type MassStandard,
  type MassUnit,
  type VolumeStandard,
  type VolumeUnit,
} from './measure-units.js';

// Source: test-fixtures/reference/units/volume_mass_temperature_units.csv (NIST Handbook 44
// Appendix C, NIST SP 811 Appendix B, 21 CFR 101.9(b)(5)(viii)). Each row, mapped to our unit.
type Row = { volume: [VolumeUnit, VolumeStandard] } | { mass: [MassUnit, MassStandard] } | { temperature: true };
const CSV_ROWS: Record<string, Row> = {
  'US gallon': { volume: ['gallon', 'us-customary'] },
  'US liquid quart': { volume: ['quart', 'us-customary'] },
  'US liquid pint': { volume: ['pint', 'us-customary'] },
  'US cup (measuring)': { volume: ['cup', 'us-customary'] },
  'US fluid ounce': { volume: ['fl oz', 'us-customary'] },
  'US tablespoon': { volume: ['tbsp', 'us-customary'] },
  'US teaspoon': { volume: ['tsp', 'us-customary'] },
  'avoirdupois pound': { mass: ['lb', 'avoirdupois'] },
  'avoirdupois ounce': { mass: ['oz', 'avoirdupois'] },
  'cup (nutrition labeling)': { volume: ['cup', 'us-nutrition-label'] },
  'fluid ounce (nutrition labeling)': { volume: ['fl oz', 'us-nutrition-label'] },
  'tablespoon (nutrition labeling)': { volume: ['tbsp', 'us-nutrition-label'] },
  'teaspoon (nutrition labeling)': { volume: ['tsp', 'us-nutrition-label'] },
  'ounce weight (nutrition labeling)': { mass: ['oz', 'us-nutrition-label'] },
  // The table itself marks the two imperial values "from memory, verify".
  'imperial gallon': { volume: ['gallon', 'imperial'] },
  'imperial fluid ounce': { volume: ['fl oz', 'imperial'] },
  'degree Fahrenheit (temperature)': { temperature: true },
  'degree Fahrenheit (interval)': { temperature: true },
};

describe('every unit in the reference units table (NIST HB44 App. C / SP 811 / 21 CFR 101.9)', () => {
  const rows = readCsv('units/volume_mass_temperature_units.csv');

  it('has a mapping for every row of the table', () => {
    expect(rows.length).toBe(18);
    for (const r of rows) expect(CSV_ROWS[r.unit ?? ''], r.unit).toBeDefined();
  });

  it.each(rows.filter((r) => r.si_unit === 'mL' || r.si_unit === 'g').map((r) => [r.unit ?? '', r] as const))(
    '%s converts to exactly the tabled value',
    (name, r) => {
      const mapping = CSV_ROWS[name];
      const value = Number(r.value);
      if (mapping && 'volume' in mapping) expect(millilitresPer(...mapping.volume)).toBe(value);
      else if (mapping && 'mass' in mapping) expect(gramsPer(...mapping.mass)).toBe(value);
      else throw new Error(`no mapping for ${name}`);
    },
  );

  it('°F → °C follows the table: t_C = (t_F − 32)/1.8; differences without the 32 (NIST SP 811)', () => {
    for (const f of [-40, 32, 39.2, 75.2, 212]) expect(fahrenheitToCelsius(f)).toBeCloseTo((f - 32) / 1.8, 12);
    // The interval row is exercised by the DDT tests (friction 1.8 °F ≡ 1 °C).
  });
});

describe('US customary units are one system (NIST HB44: gallon = 231 in³, inch = 2.54 cm)', () => {
  it('the gallon is 231 cubic inches', () => {
    expect(231 * 2.54 ** 3).toBeCloseTo(millilitresPer('gallon'), 9);
  });
  it.each([
    ['quart', 4],
    ['pint', 8],
    ['cup', 16],
    ['fl oz', 128],
    ['tbsp', 256],
    ['tsp', 768],
  ] as const)('a gallon is %s × %d', (u, n) => {
    expect(millilitresPer(u) * n).toBeCloseTo(millilitresPer('gallon'), 9);
  });
  it('an ounce is 1/16 of the avoirdupois pound', () => {
    expect(gramsPer('oz') * 16).toBeCloseTo(gramsPer('lb'), 12);
  });
});

// mathjs 15 (a general-purpose units library) as an independent cross-check of the definitions.
describe('cross-check against mathjs units', () => {
  const ml = (amount: number, u: string): number => mathUnit(amount, u).toNumber('ml');
  const g = (amount: number, u: string): number => mathUnit(amount, u).toNumber('g');
  const close = (a: number, b: number): void => expect(Math.abs(a / b - 1)).toBeLessThan(1e-12);

  it.each([
    ['cup', 'cup'],
    ['fluidounce', 'fl oz'],
    ['floz', 'fl oz'],
    ['pint', 'pint'],
    ['quart', 'quart'],
    ['gallon', 'gallon'],
    ['ml', 'ml'],
    ['l', 'l'],
  ] as const)('mathjs "%s" matches the NIST %s (to float precision)', (theirs, ours) => {
    close(ml(1, theirs), millilitresPer(ours));
  });

  it.each([
    ['lbm', 'lb'],
    ['lbs', 'lb'],
    ['oz', 'oz'],
    ['g', 'g'],
    ['kg', 'kg'],
  ] as const)('mathjs "%s" matches the avoirdupois/SI %s', (theirs, ours) => {
    close(g(1, theirs), gramsPer(ours));
  });

  it('differs: mathjs "teaspoon"/"tablespoon" are 5 mL and 15 mL (the labelling values), not NIST', () => {
    close(ml(1, 'teaspoon'), millilitresPer('tsp', 'us-nutrition-label'));
    close(ml(1, 'tablespoon'), millilitresPer('tbsp', 'us-nutrition-label'));
    expect(ml(1, 'teaspoon') / millilitresPer('tsp') - 1).toBeCloseTo(0.01442, 4);
    expect(() => mathUnit(1, 'tsp')).toThrow();
    expect(() => mathUnit(1, 'tbsp')).toThrow();
  });

  it('differs: mathjs has one cup only (US customary 236.588 mL), no 240 mL or 250 mL cup', () => {
    close(ml(1, 'cup'), millilitresPer('cup', 'us-customary'));
    expect(ml(1, 'cup')).not.toBeCloseTo(millilitresPer('cup', 'us-nutrition-label'), 0);
    expect(ml(1, 'cup')).not.toBeCloseTo(millilitresPer('cup', 'metric'), 0);
  });

  it('differs: mathjs "stick" is a 115 g mass; USDA SR weighs a stick of butter at 113 g', () => {
    expect(g(1, 'stick')).toBeCloseTo(115, 9);
  });

  it('differs: mathjs "gr" is the grain (64.79891 mg), so Peakwise does not read "gr" as grams', () => {
    expect(g(1, 'gr')).toBeCloseTo(0.06479891, 12);
    expect(() => parseMeasureUnit('gr')).toThrow(BakersMathError);
  });

  it('differs: mathjs has no imperial gallon or imperial fluid ounce', () => {
    expect(() => mathUnit(1, 'ukgallon')).toThrow();
    expect(() => mathUnit(1, 'impgallon')).toThrow();
  });
});

describe('reading units as bakers type them', () => {
  it.each([
    ['Tbsp', 'tbsp'],
    ['tablespoons', 'tbsp'],
    ['fl. oz.', 'fl oz'],
    ['fl  oz', 'fl oz'],
    ['Cups', 'cup'],
    ['L', 'l'],
    ['lbs', 'lb'],
    [' g ', 'g'],
    ['sticks', 'stick'],
  ])('"%s" → %s', (text, canonical) => {
    expect(parseMeasureUnit(text)).toBe(canonical);
  });

  it('names every canonical unit as itself', () => {
    for (const u of [...MASS_UNITS, ...VOLUME_UNITS]) expect(parseMeasureUnit(u)).toBe(u);
  });

  it('rejects an unknown unit with the field path', () => {
    expect(() => parseMeasureUnit('handful', 'ingredients.2.unit')).toThrow(
      expect.objectContaining({ name: 'BakersMathError', path: 'ingredients.2.unit' }) as Error,
    );
    expect(() => parseMeasureUnit(3)).toThrow(RangeError);
  });

  it('refuses units a standard does not define, instead of guessing', () => {
    expect(() => millilitresPer('gallon', 'us-nutrition-label')).toThrow(/not defined/);
    expect(() => millilitresPer('tbsp', 'imperial')).toThrow(/not defined/);
    expect(() => millilitresPer('fl oz', 'metric')).toThrow(/not defined/);
    expect(() => gramsPer('lb', 'us-nutrition-label')).toThrow(/not defined/);
  });

  it('converts across standards and back to pounds', () => {
    // 1 metric cup (250 mL, from memory) in NIST tablespoons.
    expect(convertVolume(1, 'cup', 'tbsp', { from: 'metric' })).toBeCloseTo(250 / 14.78676478125, 12);
    expect(convertVolume(2, 'cup', 'pint')).toBeCloseTo(1, 12);
    expect(gramsToMassUnit(453.59237 * 1.775, 'lb')).toBeCloseTo(1.775, 12);
  });
});
