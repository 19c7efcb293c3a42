import type { TemperatureUnit } from '../../contracts/account.js';
import { celsiusDeltaToFahrenheit, celsiusToFahrenheit, fahrenheitToCelsius } from '../../units.js';
import { BakersMathError, fieldPath, requireFinite } from '../units/bakers-math-error.js';
import { iceForWater, type IceResult } from './ice.js';

/*
 * Desired dough temperature. The dough settles near the average of what goes into it plus the
 * heat of mixing, so with n = 3 (room, flour, friction) or n = 4 (with a preferment or levain):
 *   water = n·DDT − (room + flour + [preferment] + friction)
 *   friction = n·FDT − (room + flour + [preferment] + water)     (FDT: measured final dough temp)
 * (San Francisco Baking Institute, Artisan I material, 2009; SOURCES.md §6a.) The friction factor
 * is a temperature *difference*: °F = °C × 1.8 with no +32. Everything is worked in °C inside, so
 * °C and °F inputs describing the same dough give the same physical answer.
 */

export interface DdtInput {
  /** Unit of every temperature below and of the friction factor; default 'C'. */
  unit?: TemperatureUnit;
  /** Desired dough temperature. */
  desired: number;
  room: number;
  flour: number;
  /** Temperature of the preferment or levain; when given, the 4-factor formula is used. */
  preferment?: number;
  /** Friction factor: the dough's warming from mixing, as a temperature difference. */
  friction: number;
  /** Tap water temperature; with `waterG`, works out the ice when the tap is too warm. */
  tap?: number;
  waterG?: number;
  /** Unit of the answer; default the input unit. */
  outputUnit?: TemperatureUnit;
}

export type DdtWarningCode =
  'water-warm-for-culture' | 'water-above-hand-safe' | 'water-below-freezing' | 'ice-cannot-reach';

export interface DdtWarning {
  code: DdtWarningCode;
  message: string;
}

export interface DdtResult {
  factors: 3 | 4;
  unit: TemperatureUnit;
  /** Water temperature that lands the dough at the desired temperature, in `unit`. */
  water: number;
  waterC: number;
  /** n × DDT, in `unit` (the "base temperature" some bakers quote). */
  base: number;
  /** Present when tap and waterG were given and the tap is warmer than the water must be. */
  ice?: IceResult;
  warnings: DdtWarning[];
}

/** Above this the water is too warm for the culture it meets (common practice: about 40 °C). */
export const CULTURE_WARM_LIMIT_C = 40;
/** Above this, water is a scald risk to the hands (from memory: the 49 °C / 120 °F water-heater advice). */
export const HAND_SAFE_LIMIT_C = 49;

const toC = (t: number, unit: TemperatureUnit): number => (unit === 'F' ? fahrenheitToCelsius(t) : t);
const fromC = (c: number, unit: TemperatureUnit): number => (unit === 'F' ? celsiusToFahrenheit(c) : c);
const deltaToC = (d: number, unit: TemperatureUnit): number => (unit === 'F' ? d / 1.8 : d);
const deltaFromC = (d: number, unit: TemperatureUnit): number => (unit === 'F' ? celsiusDeltaToFahrenheit(d) : d);

function unitOf(value: unknown, path: string, fallback: TemperatureUnit): TemperatureUnit {
  if (value === undefined) return fallback;
  if (value !== 'C' && value !== 'F') throw new BakersMathError(path, 'unit must be "C" or "F"');
  return value;
}

/** Room, flour and (optional) preferment in °C, checked, and the factor count they imply. */
function knownTemperaturesC(
  input: { room: number; flour: number; preferment?: number },
  unit: TemperatureUnit,
  at: string,
): { sumC: number; factors: 3 | 4 } {
  const room = toC(requireFinite(input.room, fieldPath(at, 'room')), unit);
  const flour = toC(requireFinite(input.flour, fieldPath(at, 'flour')), unit);
  if (input.preferment === undefined) return { sumC: room + flour, factors: 3 };
  const preferment = toC(requireFinite(input.preferment, fieldPath(at, 'preferment')), unit);
  return { sumC: room + flour + preferment, factors: 4 };
}

export function waterTemperatureForDdt(input: DdtInput, at = ''): DdtResult {
  const unit = unitOf(input.unit, fieldPath(at, 'unit'), 'C');
  const outputUnit = unitOf(input.outputUnit, fieldPath(at, 'outputUnit'), unit);
  const desiredC = toC(requireFinite(input.desired, fieldPath(at, 'desired')), unit);
  const frictionC = deltaToC(requireFinite(input.friction, fieldPath(at, 'friction')), unit);
  const { sumC, factors } = knownTemperaturesC(input, unit, at);
  const waterC = factors * desiredC - (sumC + frictionC);

  const warnings: DdtWarning[] = [];
  const shown = (c: number): string => `${round1(fromC(c, outputUnit))} °${outputUnit}`;
  if (waterC > HAND_SAFE_LIMIT_C) {
    warnings.push({
      code: 'water-above-hand-safe',
      message: `water at ${shown(waterC)} can scald; warm the flour or the room instead, or mix longer`,
    });
  } else if (waterC > CULTURE_WARM_LIMIT_C) {
    warnings.push({
      code: 'water-warm-for-culture',
      message: `water at ${shown(waterC)} is hot for a sourdough culture; do not pour it onto the starter`,
    });
  }
  if (waterC < 0) {
    warnings.push({
      code: 'water-below-freezing',
      message: `the water would have to be ${shown(waterC)}, below freezing; chill the flour or mix less`,
    });
  }

  const result: DdtResult = {
    factors,
    unit: outputUnit,
    water: fromC(waterC, outputUnit),
    waterC,
    base: factors * fromC(desiredC, outputUnit),
    warnings,
  };
  if (input.tap !== undefined && input.waterG !== undefined) {
    const tapC = toC(requireFinite(input.tap, fieldPath(at, 'tap')), unit);
    if (tapC > waterC && waterC >= 0) {
      result.ice = iceForWater({ waterG: input.waterG, tapC, targetC: waterC }, at);
    } else if (tapC > waterC) {
      warnings.push({
        code: 'ice-cannot-reach',
        message: 'ice melts to water at 0 °C at best, which is not cold enough here',
      });
    }
  }
  return result;
}

export interface FrictionInput {
  unit?: TemperatureUnit;
  /** The dough's temperature measured right after mixing. */
  finalDough: number;
  room: number;
  flour: number;
  preferment?: number;
  /** The water temperature actually used. */
  water: number;
  outputUnit?: TemperatureUnit;
}

export interface FrictionResult {
  factors: 3 | 4;
  unit: TemperatureUnit;
  /** Friction factor, a temperature difference in `unit`. */
  friction: number;
  frictionC: number;
  warnings: { code: 'friction-negative'; message: string }[];
}

/** The friction factor of a mixer and mixing time, from one measured dough temperature. */
export function calibrateFriction(input: FrictionInput, at = ''): FrictionResult {
  const unit = unitOf(input.unit, fieldPath(at, 'unit'), 'C');
  const outputUnit = unitOf(input.outputUnit, fieldPath(at, 'outputUnit'), unit);
  const finalC = toC(requireFinite(input.finalDough, fieldPath(at, 'finalDough')), unit);
  const waterC = toC(requireFinite(input.water, fieldPath(at, 'water')), unit);
  const { sumC, factors } = knownTemperaturesC(input, unit, at);
  const frictionC = factors * finalC - (sumC + waterC);
  const warnings: FrictionResult['warnings'] =
    frictionC < 0
      ? [
          {
            code: 'friction-negative',
            message: 'mixing cannot cool a dough: check the thermometer and that the temperatures were taken at mixing',
          },
        ]
      : [];
  return { factors, unit: outputUnit, friction: deltaFromC(frictionC, outputUnit), frictionC, warnings };
}

/** Inverse of the DDT formula: the dough temperature a given water temperature will give. */
export function expectedDoughTemperature(
  input: Omit<DdtInput, 'desired' | 'tap' | 'waterG'> & { water: number },
  at = '',
): number {
  const unit = unitOf(input.unit, fieldPath(at, 'unit'), 'C');
  const outputUnit = unitOf(input.outputUnit, fieldPath(at, 'outputUnit'), unit);
  const waterC = toC(requireFinite(input.water, fieldPath(at, 'water')), unit);
  const frictionC = deltaToC(requireFinite(input.friction, fieldPath(at, 'friction')), unit);
  const { sumC, factors } = knownTemperaturesC(input, unit, at);
  return fromC((sumC + waterC + frictionC) / factors, outputUnit);
}

const round1 = (x: number): number => Math.round(x * 10) / 10;
