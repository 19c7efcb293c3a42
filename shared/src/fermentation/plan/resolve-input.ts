// Checks a plan request field by field (BakersMathError naming the path, e.g.
// `steps.folds.sets`) and fills in the defaults, recording each one the baker did not choose.
import { defaultKinetics } from '../kinetics/fit-kinetics.js';
import { type CultureKinetics } from '../kinetics/types.js';
import { type ForecastSegment } from '../temperature/series.js';
import { MS_PER_HOUR, parseMs } from '../temperature/time.js';
import { BakersMathError, requireFinite } from '../units/bakers-math-error.js';
import { DEFAULTS } from './defaults.js';
import { type PlanDough, type PlanInput, type PlanOptionKind, type FeedRatio } from './types.js';
import { checkTimeZone, parseClockTime, type ClockTime } from './zone.js';

export interface ResolvedPlan {
  mode: PlanInput['mode'];
  nowMs: number;
  readyAtMs: number | null;
  timeZone: string;
  quiet: { from: ClockTime; until: ClockTime; label: string } | null;
  dough: PlanDough;
  /** The dough temperature to quote: the constant, or the forecast's last value, °C. */
  doughC: number;
  kinetics: CultureKinetics;
  starter: { ratio: FeedRatio; temperatureC: number; skip: boolean };
  /** Minutes of each fixed-length step (0 = no such step). */
  min: {
    feed: number;
    mix: number;
    rest: number;
    salt: number;
    foldInterval: number;
    foldEach: number;
    shape: number;
    preheat: number;
    takeOut: number;
    cool: number;
    maxHold: number;
    finish: number;
    bakeMin: number;
    bakeMax: number;
  };
  folds: number;
  proof: { hours: number | null; temperatureC: number };
  retard: { fridgeC: number; minHours: number; maxHours: number };
  ovenC: number;
  requested: PlanOptionKind;
  flags: { dairy: boolean; egg: boolean; sugar: boolean };
  assumptions: string[];
}

type Obj = Record<string, unknown>;

function obj(value: unknown, path: string, optional = true): Obj | undefined {
  if (value === undefined && optional) return undefined;
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new BakersMathError(path, `${path || 'input'} must be an object`);
  }
  return value as Obj;
}

function num(value: unknown, path: string, lo: number, hi: number, openLow = false): number {
  const v = requireFinite(value, path);
  if (openLow ? v <= lo : v < lo)
    throw new BakersMathError(path, `${path} must be ${openLow ? 'above' : 'at least'} ${lo}`);
  if (v > hi) throw new BakersMathError(path, `${path} must be at most ${hi}`);
  return v;
}

function time(value: unknown, path: string): number {
  if (typeof value !== 'string') throw new BakersMathError(path, `${path} must be an ISO 8601 time with an offset`);
  try {
    return parseMs(value);
  } catch {
    throw new BakersMathError(path, `${path} must be an ISO 8601 time with an offset, e.g. 2026-12-05T09:00:00+01:00`);
  }
}

function flag(value: unknown, path: string): boolean | undefined {
  if (value === undefined) return undefined;
  if (typeof value !== 'boolean') throw new BakersMathError(path, `${path} must be true or false`);
  return value;
}

const GRAMS = 100_000;
const DOUGH_C = [-5, 50] as const;

function readDough(o: Obj): { dough: PlanDough; doughC: number } {
  const p = (k: string): string => `dough.${k}`;
  const opt = (k: string, lo: number, hi: number, openLow = false): number | undefined =>
    o[k] === undefined ? undefined : num(o[k], p(k), lo, hi, openLow);
  const dough: PlanDough = {
    flourG: num(o.flourG, p('flourG'), 0, GRAMS, true),
    waterG: num(o.waterG, p('waterG'), 0, GRAMS),
    starterG: num(o.starterG, p('starterG'), 0, GRAMS, true),
  };
  const set = <K extends keyof PlanDough>(k: K, v: PlanDough[K] | undefined): void => {
    if (v !== undefined) dough[k] = v;
  };
  set('starterHydrationPct', opt('starterHydrationPct', 0, 500, true));
  set('saltG', opt('saltG', 0, GRAMS));
  set('targetRisePct', opt('targetRisePct', 0, 400, true));
  set('flourProteinPct', opt('flourProteinPct', 0, 100, true));
  set('temperatureC', opt('temperatureC', ...DOUGH_C));
  const e = obj(o.enrichment, p('enrichment'));
  if (e) {
    const at = (k: string): string => `dough.enrichment.${k}`;
    set('enrichment', {
      ...(e.sugarG === undefined ? {} : { sugarG: num(e.sugarG, at('sugarG'), 0, GRAMS) }),
      ...(e.fatG === undefined ? {} : { fatG: num(e.fatG, at('fatG'), 0, GRAMS) }),
      ...(e.milkG === undefined ? {} : { milkG: num(e.milkG, at('milkG'), 0, GRAMS) }),
    });
  }
  if (o.forecast !== undefined) {
    if (!Array.isArray(o.forecast)) throw new BakersMathError(p('forecast'), 'dough.forecast must be an array');
    set(
      'forecast',
      o.forecast.map((s: unknown, i): ForecastSegment => {
        const at = `dough.forecast.${i}`;
        const seg = obj(s, at, false) ?? {};
        if (seg.from !== undefined) time(seg.from, `${at}.from`);
        if (seg.until !== undefined) time(seg.until, `${at}.until`);
        return {
          c: num(seg.c, `${at}.c`, ...DOUGH_C),
          ...(seg.from === undefined ? {} : { from: seg.from as string }),
          ...(seg.until === undefined ? {} : { until: seg.until as string }),
        };
      }),
    );
  }
  const last = dough.forecast?.[dough.forecast.length - 1]?.c;
  const doughC = dough.temperatureC ?? last;
  if (doughC === undefined) throw new BakersMathError(p('temperatureC'), 'give dough.temperatureC or dough.forecast');
  return { dough, doughC };
}

export function resolvePlanInput(raw: PlanInput): ResolvedPlan {
  const input = obj(raw, '', false) as Obj;
  const assumptions: string[] = [];
  const pick = <T>(value: T | undefined, fallback: T, words: string): T => {
    if (value !== undefined) return value;
    assumptions.push(words);
    return fallback;
  };
  const mode = input.mode;
  if (mode !== 'ready-at' && mode !== 'start-now') {
    throw new BakersMathError('mode', 'mode must be "ready-at" or "start-now"');
  }
  const nowMs = time(input.now, 'now');
  let readyAtMs: number | null = null;
  if (mode === 'ready-at') {
    readyAtMs = time(input.readyAt, 'readyAt');
    if (readyAtMs <= nowMs) throw new BakersMathError('readyAt', 'readyAt must be after now');
    if (readyAtMs - nowMs > DEFAULTS.maxLookaheadHours * MS_PER_HOUR) {
      throw new BakersMathError('readyAt', `readyAt must be within ${DEFAULTS.maxLookaheadHours / 24} days of now`);
    }
  }
  const timeZone = checkTimeZone(input.timeZone, 'timeZone');
  let quiet: ResolvedPlan['quiet'] = null;
  const q = input.quietHours === null ? undefined : obj(input.quietHours, 'quietHours');
  if (q) {
    const from = parseClockTime(q.from, 'quietHours.from');
    const until = parseClockTime(q.until, 'quietHours.until');
    if (from.hour === until.hour && from.minute === until.minute) {
      throw new BakersMathError('quietHours.until', 'quietHours.until must differ from quietHours.from');
    }
    quiet = { from, until, label: `${q.from as string}–${q.until as string}` };
  }
  const { dough, doughC } = readDough(obj(input.dough, 'dough', false) ?? {});
  // null (a stored plan without a culture) counts as absent.
  const given = (input.kinetics ?? undefined) as CultureKinetics | undefined;
  if (given !== undefined && (typeof given !== 'object' || typeof given.params !== 'object')) {
    throw new BakersMathError('kinetics', 'kinetics must come from fitCultureKinetics');
  }
  const kinetics = given ?? defaultKinetics();
  if (given === undefined) assumptions.push('culture kinetics: published defaults (no feeding history)');

  const s = obj(input.starter, 'starter') ?? {};
  const r = obj(s.ratio, 'starter.ratio');
  const ratio = r
    ? {
        starter: num(r.starter, 'starter.ratio.starter', 0, 1000, true),
        flour: num(r.flour, 'starter.ratio.flour', 0, 1000),
        water: num(r.water, 'starter.ratio.water', 0, 1000),
      }
    : pick<FeedRatio>(undefined, { ...DEFAULTS.feedRatio }, 'levain feeding 1 : 2 : 2 [common practice]');
  if (ratio.flour + ratio.water <= 0) {
    throw new BakersMathError('starter.ratio.flour', 'starter.ratio needs some flour or water');
  }
  const starterC =
    s.temperatureC === undefined
      ? pick(undefined, doughC, `levain at the dough temperature, ${doughC} °C`)
      : num(s.temperatureC, 'starter.temperatureC', ...DOUGH_C);
  const skip = flag(s.skipFeeding, 'starter.skipFeeding') ?? false;

  const st = obj(input.steps, 'steps') ?? {};
  const minutes = (k: string, fallback: number, words: string, lo = 0, hi = 24 * 60): number =>
    st[k] === undefined ? pick(undefined, fallback, words) : num(st[k], `steps.${k}`, lo, hi);
  const f = obj(st.folds, 'steps.folds') ?? {};
  const folds =
    f.sets === undefined
      ? pick(undefined, DEFAULTS.foldSets, '4 sets of stretch-and-folds [common practice]')
      : Math.round(num(f.sets, 'steps.folds.sets', 0, 12));
  const foldInterval =
    f.intervalMinutes === undefined
      ? pick(undefined, DEFAULTS.foldIntervalMinutes, 'folds every 30 min [common practice]')
      : num(f.intervalMinutes, 'steps.folds.intervalMinutes', 5, 240);
  const foldEach =
    f.minutesEach === undefined ? DEFAULTS.foldMinutes : num(f.minutesEach, 'steps.folds.minutesEach', 1, 60);
  const saltAfter = flag(st.saltAfterRest, 'steps.saltAfterRest') ?? true;
  const oven = obj(st.oven, 'steps.oven') ?? {};
  const bakeMin =
    oven.minMinutes === undefined
      ? pick(undefined, DEFAULTS.bakeMinMinutes, 'bake 40–50 min [common practice]')
      : num(oven.minMinutes, 'steps.oven.minMinutes', 5, 300);
  const bakeMax =
    oven.maxMinutes === undefined
      ? Math.max(bakeMin, DEFAULTS.bakeMaxMinutes)
      : num(oven.maxMinutes, 'steps.oven.maxMinutes', 5, 300);
  if (bakeMax < bakeMin)
    throw new BakersMathError('steps.oven.maxMinutes', 'steps.oven.maxMinutes must be at least minMinutes');
  const ovenC =
    oven.temperatureC === undefined
      ? pick(undefined, DEFAULTS.ovenC, 'oven at 250 °C [common practice for a lean hearth loaf]')
      : num(oven.temperatureC, 'steps.oven.temperatureC', 100, 320);

  const fp = obj(st.finalProof, 'steps.finalProof');
  if (fp && fp.kind !== 'room' && fp.kind !== 'retard') {
    throw new BakersMathError('steps.finalProof.kind', 'steps.finalProof.kind must be "room" or "retard"');
  }
  const requested: PlanOptionKind = fp?.kind === 'retard' ? 'overnight-retard' : 'same-day';
  const room = fp?.kind === 'room' ? fp : {};
  const cold = fp?.kind === 'retard' ? fp : {};
  const proofHours = room.hours === undefined ? null : num(room.hours, 'steps.finalProof.hours', 0, 24, true);
  if (proofHours === null)
    assumptions.push('room-temperature proof: 40 % of the bulk’s work, from the model [our assumption]');
  const proofC =
    room.temperatureC === undefined ? doughC : num(room.temperatureC, 'steps.finalProof.temperatureC', ...DOUGH_C);
  const fridgeC =
    cold.fridgeC === undefined
      ? pick(undefined, DEFAULTS.fridgeC, 'fridge at 4 °C [common practice]')
      : num(cold.fridgeC, 'steps.finalProof.fridgeC', -2, 12);
  const minHours =
    cold.minHours === undefined
      ? pick(undefined, DEFAULTS.retardMinHours, 'cold retard 8–16 h [common practice]')
      : num(cold.minHours, 'steps.finalProof.minHours', 0, 72);
  const maxHours =
    cold.maxHours === undefined
      ? Math.max(minHours, DEFAULTS.retardMaxHours)
      : num(cold.maxHours, 'steps.finalProof.maxHours', 0, 72);
  if (maxHours < minHours) {
    throw new BakersMathError('steps.finalProof.maxHours', 'steps.finalProof.maxHours must be at least minHours');
  }

  const fl = obj(input.formula, 'formula') ?? {};
  const e = dough.enrichment ?? {};
  return {
    mode,
    nowMs,
    readyAtMs,
    timeZone,
    quiet,
    dough,
    doughC,
    kinetics,
    starter: { ratio, temperatureC: starterC, skip },
    min: {
      feed: minutes('feedMinutes', DEFAULTS.feedMinutes, 'feeding takes 5 min'),
      mix: minutes('mixMinutes', DEFAULTS.mixMinutes, 'mixing takes 10 min'),
      rest: minutes('restMinutes', DEFAULTS.restMinutes, 'rest 30 min after mixing [common practice]'),
      salt: saltAfter ? minutes('saltMinutes', DEFAULTS.saltMinutes, 'adding the salt takes 5 min') : 0,
      foldInterval,
      foldEach,
      shape: minutes('shapeMinutes', DEFAULTS.shapeMinutes, 'divide, pre-shape, bench rest and shape 30 min', 1),
      preheat: minutes('preheatMinutes', DEFAULTS.preheatMinutes, 'preheat 45 min [common practice with a pot]'),
      takeOut: minutes('takeOutMinutes', DEFAULTS.takeOutMinutes, 'out of the fridge and scored in 5 min', 1),
      cool: minutes('coolMinutes', DEFAULTS.coolMinutes, 'cool at least 60 min before slicing [common practice]'),
      maxHold: minutes('maxHoldMinutes', DEFAULTS.maxHoldMinutes, 'a cooled loaf waits at most 2 h for "ready at"'),
      finish: minutes('finishMinutes', DEFAULTS.finishMinutes, 'slicing or storing takes 5 min'),
      bakeMin,
      bakeMax,
    },
    folds,
    proof: { hours: proofHours, temperatureC: proofC },
    retard: { fridgeC, minHours, maxHours },
    ovenC,
    requested,
    flags: {
      dairy: (flag(fl.dairy, 'formula.dairy') ?? false) || (e.milkG ?? 0) > 0,
      egg: flag(fl.egg, 'formula.egg') ?? false,
      sugar: (flag(fl.sugar, 'formula.sugar') ?? false) || (e.sugarG ?? 0) > 0,
    },
    assumptions,
  };
}
