// The commands of `npm run -s model`. Each takes the parsed stdin object and returns the object
// to print; bad input throws InputError (or the model's own BakersMathError), which main.ts turns
// into exit 2 with {"error", "path"}.
import { fitCurve } from '../fermentation/curve/fit-curve.js';
import { blendFlours, type BlendPart } from '../fermentation/formula/flour-blend.js';
import { bakersPercentages } from '../fermentation/formula/bakers-percentages.js';
import {
  calibrateFriction,
  waterTemperatureForDdt,
  type DdtInput,
  type FrictionInput,
} from '../fermentation/formula/ddt.js';
import { scaleFormula, type ScaleTarget } from '../fermentation/formula/scaling.js';
import type { Ingredient } from '../fermentation/formula/ingredient.js';
import { fitRise } from '../fermentation/rise/fit-rise.js';
import type { FitRiseInput } from '../fermentation/rise/rise-types.js';
import type { FitCurveInput } from '../fermentation/curve/curve-fit-types.js';
import { InputError, array, optionalArray, type JsonObject } from './input.js';

export type Command = (input: JsonObject) => unknown;

const DEFAULT_FRACTIONS = [0.5, 0.9, 0.95, 0.99];

function fitCurveCommand(input: JsonObject): unknown {
  const fractions = (optionalArray(input, 'fractions', '') ?? DEFAULT_FRACTIONS).map((p, i) => {
    if (typeof p !== 'number' || !(p > 0 && p < 1))
      throw new InputError(`fractions.${i}`, 'must be a number between 0 and 1');
    return p;
  });
  const fit = fitCurve({ model: input.model ?? 'auto', points: input.points } as unknown as FitCurveInput);
  if (fit.status === 'invalid-input') throw new InputError(fit.field ?? '', fit.reason);
  if (fit.status !== 'ok') return { status: fit.status, converged: false, reason: fit.reason };
  return {
    status: 'ok',
    model: fit.model,
    A: fit.A,
    muMax: fit.muMax,
    lag: fit.lag,
    ...(fit.nu === undefined ? {} : { nu: fit.nu }),
    se: fit.se,
    rss: fit.rss,
    r2: fit.r2,
    converged: fit.converged,
    iterations: fit.iterations,
    tAtFraction: Object.fromEntries(fractions.map((p) => [String(p), fit.tAtFraction(p)])),
  };
}

function fitRiseCommand(input: JsonObject): unknown {
  const result = fitRise(input as unknown as FitRiseInput);
  if (result.status === 'invalid-input') throw new InputError(result.field ?? '', result.reason ?? 'invalid input');
  return result;
}

function formulaCommand(input: JsonObject): unknown {
  const ingredients = array(input, 'ingredients', '') as unknown as Ingredient[];
  const summary = bakersPercentages(ingredients);
  if (input.target === undefined) return summary;
  return { ...summary, scaled: scaleFormula(ingredients, input.target as unknown as ScaleTarget) };
}

function ddtCommand(input: JsonObject): unknown {
  // With a measured final dough temperature the question is the mixer's friction factor.
  if (input.finalDough !== undefined) return calibrateFriction(input as unknown as FrictionInput);
  return waterTemperatureForDdt(input as unknown as DdtInput);
}

function blendCommand(input: JsonObject): unknown {
  const flours = array(input, 'flours', '') as unknown as BlendPart[];
  const flourG = input.flourG;
  if (flourG !== undefined && typeof flourG !== 'number') throw new InputError('flourG', 'must be a number of grams');
  return blendFlours(flours, flourG);
}

export const COMMANDS: Record<string, Command> = {
  'fit-curve': fitCurveCommand,
  'fit-rise': fitRiseCommand,
  formula: formulaCommand,
  ddt: ddtCommand,
  blend: blendCommand,
};
