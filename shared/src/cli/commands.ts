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
import { predictBulkEnd } from '../fermentation/bulk/bulk-end.js';
import { fitCultureKinetics } from '../fermentation/kinetics/fit-kinetics.js';
import { predictNextPeak } from '../fermentation/kinetics/predict.js';
import type { ObservedFeeding } from '../fermentation/kinetics/types.js';
import { readBulkInput, readNextFeeding, readPastFeeding } from './fermentation-input.js';
import { planCommand } from './plan-command.js';
import { InputError, array, each, object, optionalArray, type JsonObject } from './input.js';

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

function predictPeakCommand(input: JsonObject): unknown {
  const past = each(array(input, 'history', ''), 'history', readPastFeeding);
  const next = readNextFeeding(object(input.next, 'next'), 'next');
  const usable: ObservedFeeding[] = past.flatMap((p) =>
    p.hoursToPeak === null ? [] : [{ ...p.feeding, hoursToPeak: p.hoursToPeak }],
  );
  const kinetics = fitCultureKinetics(usable, { asOf: next.fedAt });
  const prediction = predictNextPeak(kinetics, next);
  const skipped = past.flatMap((p, index) => (p.note ? [{ index, reason: p.note }] : []));
  return {
    peakAt: prediction.peakAt,
    low: prediction.low,
    high: prediction.high,
    level: 0.8,
    hoursToPeak: prediction.hoursToPeak,
    lowHours: prediction.lowHours,
    highHours: prediction.highHours,
    ...(prediction.q10 === undefined ? {} : { q10: prediction.q10 }),
    model: prediction.model,
    basis: prediction.basis,
    feedingsUsed: prediction.feedingsUsed,
    hoursToPeakAt24C1to1to1: kinetics.hoursToPeakAtReference,
    trend: kinetics.trend.label,
    ...(skipped.length ? { skipped } : {}),
  };
}

function bulkEndCommand(input: JsonObject): unknown {
  const dough = readBulkInput(input);
  const history = optionalArray(input, 'history', '');
  const usable: ObservedFeeding[] = history
    ? each(history, 'history', readPastFeeding).flatMap((p) =>
        p.hoursToPeak === null ? [] : [{ ...p.feeding, hoursToPeak: p.hoursToPeak }],
      )
    : [];
  const kinetics = usable.length ? fitCultureKinetics(usable, { asOf: dough.mixedAt }) : undefined;
  return predictBulkEnd(dough, kinetics ? { kinetics } : {});
}

export const COMMANDS: Record<string, Command> = {
  'fit-curve': fitCurveCommand,
  'fit-rise': fitRiseCommand,
  formula: formulaCommand,
  ddt: ddtCommand,
  blend: blendCommand,
  'predict-peak': predictPeakCommand,
  'bulk-end': bulkEndCommand,
  plan: planCommand,
};
