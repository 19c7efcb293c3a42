import type {
  BakePlan,
  LivePlan,
  PlanDough,
  PlanMode,
  PlanOptionKind,
  PlanStarter,
  PlanStepOptions,
  PlanTiming,
  QuietHours,
} from '../fermentation/plan/types.js';
import type { PageQuery, Paged } from './paging.js';

// Bench: a bake plan made from a saved formula and (optionally) a culture. The planner itself is
// pure and lives in fermentation/plan; the API stores what the baker chose (settings), the input it
// froze at creation (dough from the formula, the culture's kinetics at that moment) and the timing
// of the option picked, and re-plans live from check-offs and dough readings on every read.

export const BAKE_PLAN_NAME_MAX_LENGTH = 80;
export const BAKE_PLAN_NOTES_MAX_LENGTH = 4000;
export const BAKE_PLAN_RATING_MIN = 1;
export const BAKE_PLAN_RATING_MAX = 5;
/** A plan may aim this far ahead: the planner's own look-ahead (PLAN_DEFAULTS.maxLookaheadHours ÷ 24). */
export const BAKE_PLAN_MAX_DAYS_AHEAD = 7;
/** Dough temperatures a plan accepts, °C (a fridge-cold dough to a very warm proofer). */
export const DOUGH_TEMPERATURE_MIN_C = 0;
export const DOUGH_TEMPERATURE_MAX_C = 40;
/** Aliquot-jar rise, % of the height at mixing. */
export const ALIQUOT_RISE_MAX_PCT = 400;

export const BAKE_PLAN_STATUSES = ['active', 'finished', 'cancelled'] as const;
export type BakePlanStatus = (typeof BAKE_PLAN_STATUSES)[number];

/** What the baker chooses on the "new plan" form; stored as given. */
export interface BakePlanSettings {
  mode: PlanMode;
  /** Bread ready to eat, ISO 8601 with offset: required for "ready-at" (ahead, within the days above), left out for "start-now". */
  readyAt?: string;
  /** The baker's night or other hours without hands-on steps; null = none. */
  quietHours?: QuietHours | null;
  /** The dough's expected temperature during bulk, °C. */
  doughTemperatureC: number;
  starter?: PlanStarter;
  steps?: PlanStepOptions;
  /** Show this option first when both fit; default "same-day". */
  prefer?: PlanOptionKind;
}

/** POST /api/plans/preview: the options for these settings, nothing stored. */
export interface PreviewBakePlanRequest extends BakePlanSettings {
  formulaId: string;
  /** The culture that leavens it: its own kinetics time the feeding and the bulk. */
  cultureId?: string | null;
}

export interface BakePlanPreview {
  plan: BakePlan;
  /** What the formula became for the bulk model (final-dough grams, starter, salt, enrichment). */
  dough: PlanDough;
  /** "culture": the culture's fitted kinetics; "default": published priors (no culture or too few feedings). */
  kineticsBasis: 'culture' | 'default';
}

/** POST /api/plans: recomputes the preview now and stores the chosen option. */
export interface CreateBakePlanRequest extends PreviewBakePlanRequest {
  /** Default: the formula's name and the ready time. */
  name?: string;
  /** The option to follow. */
  option: PlanOptionKind;
  /** Follow the temperature lever's timing (a warmer or cooler spot) instead. */
  useTemperatureLever?: boolean;
}

/** One look at the dough during bulk: its temperature, the aliquot jar's rise, or both. */
export interface DoughReading {
  id: string;
  takenAt: string;
  temperatureC: number | null;
  /** (height ÷ height at mixing − 1) × 100. */
  risePct: number | null;
  createdAt: string;
}

/** POST /api/plans/:id/readings → 201 DoughReading — at least one of temperatureC and risePct. */
export interface CreateDoughReadingRequest {
  takenAt: string;
  temperatureC?: number;
  risePct?: number;
}

/** A room temperature from a kitchen logger during the bake. */
export interface KitchenReading {
  takenAt: string;
  temperatureC: number;
}

/**
 * POST /api/plans/:id/kitchen-temperatures → 201 KitchenReadingsAdded. At most
 * TEMPERATURE_READINGS_MAX_PER_REQUEST per request; a time already stored is skipped, so sending
 * the same file again adds nothing. Not in the future; the plan may hold at most
 * KITCHEN_READINGS_MAX_PER_PLAN.
 */
export interface CreateKitchenReadingsRequest {
  readings: KitchenReading[];
}

export interface KitchenReadingsAdded {
  /** New readings stored by this request (times already there are not counted). */
  added: number;
  /** The plan's readings after it. */
  total: number;
}

/** GET /api/plans/:id/kitchen-temperatures → oldest first. DELETE the same path → 204, all gone. */
export interface KitchenReadingListResponse {
  items: KitchenReading[];
}

/** Three days at one reading a minute: more than a bake needs, with thinning at 5 min far more. */
export const KITCHEN_READINGS_MAX_PER_PLAN = 4320;

/** What the plan has from a kitchen logger, in short. */
export interface KitchenSummary {
  count: number;
  firstAt: string;
  lastAt: string;
}

/**
 * POST /api/plans/:id/steps/:stepId/done → 201 CheckedStep. Neither time: done now, taking no time;
 * startedAt only: it took its planned length; endedAt only: it took no time. Again for the same
 * step: the new times replace the old.
 */
export interface CheckOffStepRequest {
  startedAt?: string;
  endedAt?: string;
}

/** A step checked off, as stored; `endedAt` null: the step took its planned length from `startedAt`. */
export interface CheckedStep {
  stepId: string;
  startedAt: string;
  endedAt: string | null;
}

/** POST /api/plans/:id/finish — the bake's record. */
export interface FinishBakePlanRequest {
  notes?: string | null;
  rating?: number | null;
  /** The culture feeding that leavened this bake (one of the plan's culture's feedings). */
  feedingId?: string | null;
}

/** PATCH /api/plans/:id */
export interface UpdateBakePlanRequest {
  name?: string;
  /** Only "cancelled" may be set here (finishing goes through /finish). */
  status?: 'cancelled';
}

export interface BakePlanView {
  id: string;
  name: string;
  status: BakePlanStatus;
  formulaId: string | null;
  formulaName: string | null;
  cultureId: string | null;
  cultureName: string | null;
  settings: BakePlanSettings;
  /** The chosen option's timing as created. */
  timing: PlanTiming;
  kineticsBasis: 'culture' | 'default';
  /** Re-planned from the check-offs and readings at the time of the request (once finished or cancelled: at that time). */
  live: LivePlan;
  checked: CheckedStep[];
  readings: DoughReading[];
  /** The kitchen logger's series, when one was imported; the live plan integrates it. */
  kitchen: KitchenSummary | null;
  /** Bread with milk, butter or eggs: the room-temperature caution applies. */
  dairyOrEgg: boolean;
  notes: string | null;
  rating: number | null;
  feedingId: string | null;
  finishedAt: string | null;
  cancelledAt: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface BakePlanListItem {
  id: string;
  name: string;
  status: BakePlanStatus;
  formulaName: string | null;
  cultureName: string | null;
  /** When the bread is ready, as planned at creation. */
  readyAt: string | null;
  createdAt: string;
}

export interface BakePlanListQuery extends PageQuery {
  status?: BakePlanStatus;
}

export type BakePlanListResponse = Paged<BakePlanListItem>;
