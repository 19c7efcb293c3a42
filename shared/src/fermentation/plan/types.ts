// Shapes of the bake planner: what a baker tells it, and the timeline it gives back. Times are ISO
// 8601 with an offset; output times carry the offset of the baker's zone at that instant.
import { type AliquotReading, type BulkInput } from '../bulk/types.js';
import { type CultureKinetics } from '../kinetics/types.js';
import { type TemperatureSample } from '../temperature/series.js';

export type PlanMode = 'ready-at' | 'start-now';

/** Local clock times "HH:MM" in the baker's zone; `until` at or before `from` means overnight. */
export interface QuietHours {
  from: string;
  until: string;
}

/** The dough as the bulk model needs it, without the times (the planner chooses those). */
export type PlanDough = Omit<BulkInput, 'mixedAt' | 'readings' | 'temperatures'>;

/** Parts of starter, flour and water in the levain feeding, e.g. 1 : 2 : 2. */
export interface FeedRatio {
  starter: number;
  flour: number;
  water: number;
}

export interface PlanStarter {
  /** Default 1 : 2 : 2 [common practice]. */
  ratio?: FeedRatio;
  /** Where the levain rises, °C; default the dough temperature. */
  temperatureC?: number;
  /** The starter is ripe already: no feeding step, mixing comes first. */
  skipFeeding?: boolean;
}

export interface PlanFolds {
  /** Sets of stretch-and-folds; default 4 (0 = none). */
  sets?: number;
  /** Minutes between sets, the first one this long after bulk begins; default 30. */
  intervalMinutes?: number;
  /** Hands-on minutes per set; default 5. */
  minutesEach?: number;
}

/** Final proof on the counter; `hours` given by the baker, else derived from the bulk model. */
export interface RoomProof {
  kind: 'room';
  hours?: number;
  /** °C; default the dough temperature. */
  temperatureC?: number;
}

/** Cold retard: shaped dough in the fridge, baked straight from it. */
export interface ColdRetard {
  kind: 'retard';
  /** Default 4 °C [common practice]. */
  fridgeC?: number;
  /** Window the retard may last; default 8–16 h [common practice]. */
  minHours?: number;
  maxHours?: number;
}

export interface PlanOven {
  /** Default 250 °C. */
  temperatureC?: number;
  /** Bake time range; default 40–50 min [common practice: lidded pot, then uncovered]. */
  minMinutes?: number;
  maxMinutes?: number;
}

/** Every field optional: defaults are common practice and listed in the plan's `assumptions`. */
export interface PlanStepOptions {
  feedMinutes?: number;
  mixMinutes?: number;
  /** Rest or autolyse after mixing, minutes; 0 = none. Default 30. */
  restMinutes?: number;
  /** Salt goes in after the rest (its own step); default true. False: salt in the mix. */
  saltAfterRest?: boolean;
  saltMinutes?: number;
  folds?: PlanFolds;
  /** Divide, pre-shape, bench rest and shape, minutes; default 30. */
  shapeMinutes?: number;
  /** Default: a room-temperature proof derived from the model. */
  finalProof?: RoomProof | ColdRetard;
  /** Oven heating before the bake, overlapping the end of the proof; default 45. */
  preheatMinutes?: number;
  oven?: PlanOven;
  /** Out of the fridge and scored, minutes; default 5. */
  takeOutMinutes?: number;
  /** Cooling before slicing, minutes; default 60. */
  coolMinutes?: number;
  /** How much longer the cooled loaf may wait for "ready at", minutes; default 120. */
  maxHoldMinutes?: number;
  finishMinutes?: number;
}

/** What the formula holds, for the cautions (milk/sugar in `dough.enrichment` count as well). */
export interface FormulaFlags {
  dairy?: boolean;
  egg?: boolean;
  sugar?: boolean;
}

export interface PlanInput {
  mode: PlanMode;
  /** The current instant (the planner has no clock). */
  now: string;
  /** Bread ready to eat, for mode "ready-at". */
  readyAt?: string;
  /** IANA zone of the baker, e.g. "Europe/Berlin". */
  timeZone: string;
  quietHours?: QuietHours | null;
  dough: PlanDough;
  /** The culture's fitted kinetics (fitCultureKinetics); absent or null: the published priors. */
  kinetics?: CultureKinetics | null;
  starter?: PlanStarter;
  steps?: PlanStepOptions;
  formula?: FormulaFlags;
}

export type PlanStepKind =
  | 'feed-starter'
  | 'starter-rise'
  | 'mix'
  | 'rest'
  | 'add-salt'
  | 'bulk'
  | 'fold'
  | 'bulk-end'
  | 'shape'
  | 'proof'
  | 'retard'
  | 'take-out'
  | 'preheat'
  | 'bake'
  | 'cool'
  | 'finish';

export type PlanCaution = 'raw-dough' | 'dairy-egg-room-temperature' | 'hot-oven' | 'hot-sugar';

/** When a step's end may fall: an interval from a prediction or the baker's time range. */
export interface StepUncertainty {
  low: string;
  high: string;
  /** Central coverage (0.8), or null for a plain range (the bake time). */
  level: number | null;
  source: 'starter-peak' | 'bulk-end' | 'final-proof' | 'bake-time';
}

export interface PlanStep {
  /** Stable across re-plans: "feed-starter", "fold-2", "bake"… (the key for check-offs). */
  id: string;
  kind: PlanStepKind;
  startAt: string;
  endAt: string;
  /** Needs the baker's hands (true) or only waiting (false). */
  action: boolean;
  /** Checked off: the times are the actual ones. */
  done: boolean;
  /** An action step that touches quiet hours. */
  inQuietHours: boolean;
  uncertainty: StepUncertainty | null;
  cautions: PlanCaution[];
  /** °C where it matters: dough (bulk, proof), fridge (retard), oven (preheat, bake). */
  temperatureC?: number;
  /** Number of the stretch-and-fold set, from 1. */
  set?: number;
}

export type PlanOptionKind = 'same-day' | 'overnight-retard';

/** What fixes an option's times; with the input it reproduces the plan and drives re-planning. */
export interface PlanTiming {
  kind: PlanOptionKind;
  mixAt: string;
  /** Retard: when the bake starts (the fridge time stretches to meet it). */
  bakeAt: string | null;
  /** Ready-at: when the bread is ready (the cooling stretches to meet it). */
  readyAt: string | null;
  /** The temperature lever's constant dough temperature, when this timing came from it. */
  doughTemperatureC: number | null;
}

export interface PlanOption {
  kind: PlanOptionKind;
  fits: boolean;
  /** Why it does not fit (or null). */
  reason: string | null;
  /** The times; when it does not fit, the nearest attempt (its clashes marked inQuietHours). */
  timing: PlanTiming | null;
  steps: PlanStep[];
  /** Bread ready to eat (end of cooling). */
  readyAt: string | null;
  warnings: string[];
}

/** A constant bulk temperature that would let the same-day plan (or, failing that, the retard) fit. */
export interface TemperatureLever {
  doughTemperatureC: number;
  /** The temperature the plan assumed (the constant, or the forecast's last value). */
  currentDoughTemperatureC: number;
  /** The bulk end it aims at. */
  bulkEndAt: string;
  reason: string;
  option: PlanOption;
}

export interface BakePlan {
  mode: PlanMode;
  timeZone: string;
  now: string;
  readyAt: string | null;
  /** The option to show first: the one asked for if it fits, else the other, else null. */
  recommended: PlanOptionKind | null;
  options: PlanOption[];
  /**
   * Offered when the same-day plan does not fit and a warmer or cooler spot (18–30 °C) would; or,
   * when neither option fits, a spot that lets the retard fit (see `option.kind`).
   */
  temperatureLever: TemperatureLever | null;
  /** Defaults the planner took, in words. */
  assumptions: string[];
}

/** A step checked off, with its actual times. */
export interface DoneStep {
  id: string;
  startedAt: string;
  endedAt?: string;
}

export interface PlanProgress {
  now: string;
  done: DoneStep[];
  doughTemperatures?: TemperatureSample[];
  /**
   * The room, from a kitchen logger. The dough follows it slowly (doughFromKitchen); measured
   * dough temperatures win at their times.
   */
  kitchenTemperatures?: TemperatureSample[];
  aliquotReadings?: AliquotReading[];
}

/** Live: a spot to move the dough to now so bulk ends outside quiet hours. */
export interface LiveTemperatureLever {
  /** In half degrees, within 18–30 °C. */
  doughTemperatureC: number;
  /** From when (the re-plan's now). */
  fromAt: string;
  /** Bulk end at that temperature. */
  bulkEndAt: string;
  reason: string;
}

export interface LivePlan {
  now: string;
  timing: PlanTiming;
  steps: PlanStep[];
  bulk: {
    status: 'fermenting' | 'done' | 'not-reached';
    endAt: string | null;
    low: string | null;
    high: string | null;
    rateScale: number;
    readingsUsed: number;
  };
  readyAt: string | null;
  /** Offered when the bulk would end so that shaping falls in quiet hours. */
  temperatureLever: LiveTemperatureLever | null;
  warnings: string[];
}
