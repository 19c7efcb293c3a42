import { BakersMathError } from './bakers-math-error.js';

/*
 * Kitchen units and their exact sizes. US customary values are the NIST Handbook 44 (Appendix C) /
 * SP 811 (Appendix B) definitions: gallon = 231 in³ with the inch 2.54 cm, and everything else an
 * exact fraction of it. They are written out as decimals (all terminate) rather than computed, so a
 * value compares equal to the same decimal read from a standards table.
 */

export const MASS_UNITS = ['g', 'kg', 'oz', 'lb'] as const;
export type MassUnit = (typeof MASS_UNITS)[number];

export const VOLUME_UNITS = ['ml', 'l', 'tsp', 'tbsp', 'fl oz', 'cup', 'pint', 'quart', 'gallon'] as const;
export type VolumeUnit = (typeof VOLUME_UNITS)[number];

/**
 * Counted household portions whose weight depends entirely on the food (a stick of butter, a
 * packet of yeast). They convert only through a food's USDA portion weight, never a density.
 */
export const PORTION_UNITS = ['stick', 'pat', 'packet', 'cake', 'dash'] as const;
export type PortionUnit = (typeof PORTION_UNITS)[number];

export type MeasureUnit = MassUnit | VolumeUnit | PortionUnit;

/** Which definition of "ounce" to weigh by. */
export const MASS_STANDARDS = ['avoirdupois', 'us-nutrition-label'] as const;
export type MassStandard = (typeof MASS_STANDARDS)[number];

/** Which definition of a cup, spoon or fluid ounce a recipe was written in. */
export const VOLUME_STANDARDS = ['us-customary', 'us-nutrition-label', 'metric', 'imperial'] as const;
export type VolumeStandard = (typeof VOLUME_STANDARDS)[number];

const SI_VOLUME = { ml: 1, l: 1000 } as const;

/** Millilitres per unit, per standard. A unit missing from a standard is not defined by it. */
const MILLILITRES: Record<VolumeStandard, Partial<Record<VolumeUnit, number>>> = {
  // NIST Handbook 44 Appendix C; NIST SP 811 Appendix B; SP 430 kitchen table (cup = 16 tbsp = 48 tsp).
  'us-customary': {
    ...SI_VOLUME,
    tsp: 4.92892159375,
    tbsp: 14.78676478125,
    'fl oz': 29.5735295625,
    cup: 236.5882365,
    pint: 473.176473,
    quart: 946.352946,
    gallon: 3785.411784,
  },
  // 21 CFR 101.9(b)(5)(viii): "a teaspoon means 5 milliliters (mL), a tablespoon means 15 mL, a cup
  // means 240 mL, 1 fl oz means 30 mL". The rule defines nothing larger than a cup.
  'us-nutrition-label': { ...SI_VOLUME, tsp: 5, tbsp: 15, 'fl oz': 30, cup: 240 },
  // The metric cup of 250 mL with 15 mL / 5 mL spoons: from memory (not in the project's sources).
  metric: { ...SI_VOLUME, tsp: 5, tbsp: 15, cup: 250 },
  // UK imperial: gallon 4.546 09 L exactly (Weights and Measures Act 1985), fl oz = 1/160 gallon,
  // pint = 20 fl oz. Marked "from memory, verify" in the project's units table. Imperial spoons and
  // cups were never standardised for cooking, so they are left undefined rather than guessed.
  imperial: { ...SI_VOLUME, 'fl oz': 28.4130625, pint: 568.26125, quart: 1136.5225, gallon: 4546.09 },
};

const GRAMS: Record<MassStandard, Record<MassUnit, number | undefined>> = {
  // Avoirdupois pound 453.592 37 g (1959 international agreement), ounce = 1/16 pound: NIST HB44 App. C.
  avoirdupois: { g: 1, kg: 1000, oz: 28.349523125, lb: 453.59237 },
  // 21 CFR 101.9(b)(5)(viii): "1 oz in weight means 28 g"; the rule does not define a pound.
  'us-nutrition-label': { g: 1, kg: 1000, oz: 28, lb: undefined },
};

const ALIASES: Record<string, MeasureUnit> = {
  g: 'g',
  gram: 'g',
  grams: 'g',
  kg: 'kg',
  kilogram: 'kg',
  kilograms: 'kg',
  oz: 'oz',
  ounce: 'oz',
  ounces: 'oz',
  lb: 'lb',
  lbs: 'lb',
  pound: 'lb',
  pounds: 'lb',
  ml: 'ml',
  millilitre: 'ml',
  milliliter: 'ml',
  millilitres: 'ml',
  milliliters: 'ml',
  l: 'l',
  litre: 'l',
  liter: 'l',
  litres: 'l',
  liters: 'l',
  tsp: 'tsp',
  teaspoon: 'tsp',
  teaspoons: 'tsp',
  tbsp: 'tbsp',
  tablespoon: 'tbsp',
  tablespoons: 'tbsp',
  'fl oz': 'fl oz',
  floz: 'fl oz',
  'fl. oz': 'fl oz',
  'fluid ounce': 'fl oz',
  'fluid ounces': 'fl oz',
  cup: 'cup',
  cups: 'cup',
  pint: 'pint',
  pints: 'pint',
  pt: 'pint',
  quart: 'quart',
  quarts: 'quart',
  qt: 'quart',
  gallon: 'gallon',
  gallons: 'gallon',
  gal: 'gallon',
  stick: 'stick',
  sticks: 'stick',
  pat: 'pat',
  pats: 'pat',
  packet: 'packet',
  packets: 'packet',
  cake: 'cake',
  cakes: 'cake',
  dash: 'dash',
  dashes: 'dash',
};

/** Reads a unit as a baker types it ("Tbsp", "fl. oz.", "cups") into its canonical name. */
export function parseMeasureUnit(text: unknown, path = 'unit'): MeasureUnit {
  if (typeof text !== 'string') throw new BakersMathError(path, 'unit must be a string such as "g" or "cup"');
  const key = text.trim().toLowerCase().replace(/\.$/, '').replace(/\s+/g, ' ');
  const unit = ALIASES[key];
  if (unit === undefined) {
    const known = [...MASS_UNITS, ...VOLUME_UNITS, ...PORTION_UNITS].join(', ');
    throw new BakersMathError(path, `unknown unit "${text}"; use one of ${known}`);
  }
  return unit;
}

export function isMassUnit(unit: MeasureUnit): unit is MassUnit {
  return (MASS_UNITS as readonly string[]).includes(unit);
}

export function isVolumeUnit(unit: MeasureUnit): unit is VolumeUnit {
  return (VOLUME_UNITS as readonly string[]).includes(unit);
}

export function isPortionUnit(unit: MeasureUnit): unit is PortionUnit {
  return (PORTION_UNITS as readonly string[]).includes(unit);
}

/** Millilitres in one `unit` under `standard`; throws when the standard does not define the unit. */
export function millilitresPer(unit: VolumeUnit, standard: VolumeStandard = 'us-customary', path = 'unit'): number {
  const table = MILLILITRES[standard] as Partial<Record<string, number>> | undefined;
  if (table === undefined) throw new BakersMathError('volumeStandard', `unknown volume standard "${standard}"`);
  const ml = table[unit];
  if (ml === undefined) throw new BakersMathError(path, `"${unit}" is not defined in the ${standard} standard`);
  return ml;
}

/** Grams in one `unit` under `standard`; throws when the standard does not define the unit. */
export function gramsPer(unit: MassUnit, standard: MassStandard = 'avoirdupois', path = 'unit'): number {
  const table = GRAMS[standard] as Partial<Record<string, number>> | undefined;
  if (table === undefined) throw new BakersMathError('massStandard', `unknown mass standard "${standard}"`);
  const g = table[unit];
  if (g === undefined) throw new BakersMathError(path, `"${unit}" is not defined in the ${standard} standard`);
  return g;
}

/** A weight in grams expressed in another mass unit, e.g. to show a US baker pounds. */
export function gramsToMassUnit(grams: number, unit: MassUnit, standard: MassStandard = 'avoirdupois'): number {
  return grams / gramsPer(unit, standard);
}

/** Converts between volume units, possibly across standards (a metric cup into US tablespoons). */
export function convertVolume(
  amount: number,
  from: VolumeUnit,
  to: VolumeUnit,
  standards: { from?: VolumeStandard; to?: VolumeStandard } = {},
): number {
  return (amount * millilitresPer(from, standards.from)) / millilitresPer(to, standards.to);
}
