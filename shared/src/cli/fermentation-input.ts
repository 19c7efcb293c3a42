// Strict readers for the predict-peak and bulk-end commands. The model functions assume sane
// input; here every field is checked first so a mistake comes back as {error, path}.
import type { AliquotReading, BulkInput, DoughEnrichment } from '../fermentation/bulk/types.js';
import type { NextFeeding } from '../fermentation/kinetics/types.js';
import { fitRise } from '../fermentation/rise/fit-rise.js';
import type { ForecastSegment, TemperatureSample } from '../fermentation/temperature/series.js';
import {
  InputError,
  each,
  isoTime,
  joinPath,
  number,
  object,
  optionalArray,
  optionalIsoTime,
  optionalNumber,
  type JsonObject,
} from './input.js';

// The same bounds as the logbook API (shared/src/contracts/culture.ts).
const GRAMS = { min: 0, exclusiveMin: true, max: 20_000 } as const;
const CELSIUS = { min: -5, max: 50 } as const;

function temperatures(o: JsonObject, path: string): TemperatureSample[] | undefined {
  const list = optionalArray(o, 'temperatures', path);
  if (!list) return undefined;
  return each(list, joinPath(path, 'temperatures'), (r, p) => ({
    at: isoTime(r, 'at', p),
    c: number(r, 'c', p, CELSIUS),
  }));
}

function forecast(o: JsonObject, path: string): ForecastSegment[] | undefined {
  const list = optionalArray(o, 'forecast', path);
  if (!list) return undefined;
  return each(list, joinPath(path, 'forecast'), (s, p) => {
    const from = optionalIsoTime(s, 'from', p);
    const until = optionalIsoTime(s, 'until', p);
    return { c: number(s, 'c', p, CELSIUS), ...(from ? { from } : {}), ...(until ? { until } : {}) };
  });
}

function requireSomeTemperature(o: JsonObject, path: string, found: boolean): void {
  if (!found) throw new InputError(joinPath(path, 'temperatureC'), 'give temperatureC, temperatures or forecast');
  void o;
}

export function readNextFeeding(o: JsonObject, path: string): NextFeeding {
  const temperatureC = optionalNumber(o, 'temperatureC', path, CELSIUS);
  const series = temperatures(o, path);
  const plan = forecast(o, path);
  requireSomeTemperature(o, path, temperatureC !== undefined || !!series?.length || !!plan?.length);
  return {
    fedAt: isoTime(o, 'fedAt', path),
    starterG: number(o, 'starterG', path, GRAMS),
    flourG: number(o, 'flourG', path, { ...GRAMS, exclusiveMin: false }),
    waterG: number(o, 'waterG', path, { ...GRAMS, exclusiveMin: false }),
    ...(temperatureC === undefined ? {} : { temperatureC }),
    ...(series ? { temperatures: series } : {}),
    ...(plan ? { forecast: plan } : {}),
  };
}

export interface PastFeeding {
  feeding: NextFeeding;
  /** Null when its readings do not show a peak yet: such a feeding cannot teach the kinetics. */
  hoursToPeak: number | null;
  note?: string;
}

/** A past feeding tells its peak directly (`peakAt`) or through its rise checks (`readings`). */
export function readPastFeeding(o: JsonObject, path: string): PastFeeding {
  const feeding = readNextFeeding(o, path);
  const fedMs = Date.parse(feeding.fedAt);
  const peakAt = optionalIsoTime(o, 'peakAt', path);
  if (peakAt) {
    const hours = (Date.parse(peakAt) - fedMs) / 3_600_000;
    if (!(hours > 0)) throw new InputError(joinPath(path, 'peakAt'), 'must be after fedAt');
    return { feeding, hoursToPeak: hours };
  }
  if (o.readings === undefined)
    throw new InputError(joinPath(path, 'peakAt'), 'give peakAt or initialHeightMm and readings');
  const rise = fitRise({ fedAt: feeding.fedAt, initialHeightMm: o.initialHeightMm, readings: o.readings } as never);
  if (rise.status === 'invalid-input') throw new InputError(joinPath(path, rise.field ?? ''), rise.reason ?? 'invalid');
  if (rise.status !== 'peaked' || rise.hoursToPeak === null) {
    return { feeding, hoursToPeak: null, note: `no peak seen in its readings (${rise.status})` };
  }
  return { feeding, hoursToPeak: rise.hoursToPeak };
}

function enrichment(o: JsonObject, path: string): DoughEnrichment | undefined {
  if (o.enrichment === undefined) return undefined;
  const at = joinPath(path, 'enrichment');
  const e = object(o.enrichment, at);
  const rule = { min: 0, max: 20_000 };
  const sugarG = optionalNumber(e, 'sugarG', at, rule);
  const fatG = optionalNumber(e, 'fatG', at, rule);
  const milkG = optionalNumber(e, 'milkG', at, rule);
  return {
    ...(sugarG === undefined ? {} : { sugarG }),
    ...(fatG === undefined ? {} : { fatG }),
    ...(milkG === undefined ? {} : { milkG }),
  };
}

export function readBulkInput(o: JsonObject): BulkInput {
  const temperatureC = optionalNumber(o, 'temperatureC', '', CELSIUS);
  const series = temperatures(o, '');
  const plan = forecast(o, '');
  requireSomeTemperature(o, '', temperatureC !== undefined || !!series?.length || !!plan?.length);
  const readingList = optionalArray(o, 'readings', '');
  const readings: AliquotReading[] | undefined = readingList
    ? each(readingList, 'readings', (r, p) => ({
        at: isoTime(r, 'at', p),
        risePct: number(r, 'risePct', p, { min: 0, max: 1000 }),
      }))
    : undefined;
  const optional = (key: string, rule: { min: number; max: number; exclusiveMin?: boolean }) => {
    const value = optionalNumber(o, key, '', rule);
    return value === undefined ? {} : { [key]: value };
  };
  const extra = enrichment(o, '');
  return {
    mixedAt: isoTime(o, 'mixedAt', ''),
    flourG: number(o, 'flourG', '', GRAMS),
    waterG: number(o, 'waterG', '', { ...GRAMS, exclusiveMin: false }),
    starterG: number(o, 'starterG', '', GRAMS),
    ...optional('starterHydrationPct', { min: 0, exclusiveMin: true, max: 1000 }),
    ...optional('saltG', { min: 0, max: 20_000 }),
    ...optional('targetRisePct', { min: 0, exclusiveMin: true, max: 400 }),
    ...optional('flourProteinPct', { min: 0, exclusiveMin: true, max: 100 }),
    ...(extra ? { enrichment: extra } : {}),
    ...(temperatureC === undefined ? {} : { temperatureC }),
    ...(series ? { temperatures: series } : {}),
    ...(plan ? { forecast: plan } : {}),
    ...(readings ? { readings } : {}),
  };
}
