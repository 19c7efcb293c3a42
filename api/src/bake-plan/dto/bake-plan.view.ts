import { KitchenSummaryView } from './kitchen-reading.view.js';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  BAKE_PLAN_STATUSES,
  type BakePlan,
  type BakePlanListItem,
  type BakePlanListResponse,
  type BakePlanPreview,
  type BakePlanStatus,
  type BakePlanView,
  type CheckedStep,
  type DoughEnrichment,
  type DoughReading,
  type LivePlan,
  type LiveTemperatureLever,
  type PlanCaution,
  type PlanDough,
  type PlanMode,
  type PlanOption,
  type PlanOptionKind,
  type PlanStep,
  type PlanStepKind,
  type PlanTiming,
  type StepUncertainty,
  type TemperatureLever,
} from '@peakwise/shared';
import { BakePlanSettingsDto, PLAN_MODES, PLAN_OPTION_KINDS } from './bake-plan-settings.dto.js';

// Documents the Bench shapes (shared/src/contracts/bake-plan.ts, fermentation/plan/types.ts) in
// the OpenAPI reference. Times of the planner are ISO 8601 in the baker's zone's offset.

const STEP_KINDS: PlanStepKind[] = [
  'feed-starter',
  'starter-rise',
  'mix',
  'rest',
  'add-salt',
  'bulk',
  'fold',
  'bulk-end',
  'shape',
  'proof',
  'retard',
  'take-out',
  'preheat',
  'bake',
  'cool',
  'finish',
];
const CAUTIONS: PlanCaution[] = ['raw-dough', 'dairy-egg-room-temperature', 'hot-oven', 'hot-sugar'];
const BASIS = { enum: ['culture', 'default'] };
const TIME = { type: String, nullable: true };

class StepUncertaintyDoc implements StepUncertainty {
  @ApiProperty() low: string;
  @ApiProperty() high: string;
  @ApiProperty({ type: Number, nullable: true, description: '0.8, or null for a plain range' }) level: number | null;
  @ApiProperty({ enum: ['starter-peak', 'bulk-end', 'final-proof', 'bake-time'] })
  source: StepUncertainty['source'];
}

export class PlanStepDoc implements PlanStep {
  @ApiProperty({ example: 'fold-2', description: 'Stable across re-plans: the key for check-offs' }) id: string;
  @ApiProperty({ enum: STEP_KINDS }) kind: PlanStepKind;
  @ApiProperty() startAt: string;
  @ApiProperty() endAt: string;
  @ApiProperty({ description: 'Hands-on (true) or waiting' }) action: boolean;
  @ApiProperty() done: boolean;
  @ApiProperty() inQuietHours: boolean;
  @ApiProperty({ type: StepUncertaintyDoc, nullable: true }) uncertainty: StepUncertaintyDoc | null;
  @ApiProperty({ enum: CAUTIONS, isArray: true }) cautions: PlanCaution[];
  @ApiPropertyOptional({ description: '°C: dough, fridge or oven' }) temperatureC?: number;
  @ApiPropertyOptional({ description: 'Set of folds, from 1' }) set?: number;
}

export class PlanTimingDoc implements PlanTiming {
  @ApiProperty({ enum: PLAN_OPTION_KINDS }) kind: PlanOptionKind;
  @ApiProperty() mixAt: string;
  @ApiProperty(TIME) bakeAt: string | null;
  @ApiProperty(TIME) readyAt: string | null;
  @ApiProperty({ type: Number, nullable: true, description: '°C, the temperature lever’s' })
  doughTemperatureC: number | null;
}

class PlanOptionDoc implements PlanOption {
  @ApiProperty({ enum: PLAN_OPTION_KINDS }) kind: PlanOptionKind;
  @ApiProperty() fits: boolean;
  @ApiProperty({ type: String, nullable: true }) reason: string | null;
  @ApiProperty({ type: PlanTimingDoc, nullable: true }) timing: PlanTimingDoc | null;
  @ApiProperty({ type: [PlanStepDoc] }) steps: PlanStepDoc[];
  @ApiProperty(TIME) readyAt: string | null;
  @ApiProperty({ type: [String] }) warnings: string[];
}

class TemperatureLeverDoc implements TemperatureLever {
  @ApiProperty({ description: '°C' }) doughTemperatureC: number;
  @ApiProperty({ description: '°C' }) currentDoughTemperatureC: number;
  @ApiProperty() bulkEndAt: string;
  @ApiProperty() reason: string;
  @ApiProperty({ type: PlanOptionDoc }) option: PlanOptionDoc;
}

class BakePlanDoc implements BakePlan {
  @ApiProperty({ enum: PLAN_MODES }) mode: PlanMode;
  @ApiProperty({ example: 'Europe/London' }) timeZone: string;
  @ApiProperty() now: string;
  @ApiProperty(TIME) readyAt: string | null;
  @ApiProperty({ enum: PLAN_OPTION_KINDS, nullable: true }) recommended: PlanOptionKind | null;
  @ApiProperty({ type: [PlanOptionDoc] }) options: PlanOptionDoc[];
  @ApiProperty({ type: TemperatureLeverDoc, nullable: true }) temperatureLever: TemperatureLeverDoc | null;
  @ApiProperty({ type: [String] }) assumptions: string[];
}

class DoughEnrichmentDoc implements DoughEnrichment {
  @ApiPropertyOptional({ description: 'g' }) sugarG?: number;
  @ApiPropertyOptional({ description: 'g (butter, oil)' }) fatG?: number;
  @ApiPropertyOptional({ description: 'g' }) milkG?: number;
}

class PlanDoughDoc implements PlanDough {
  @ApiProperty({ description: 'g, final dough (not the starter’s)' }) flourG: number;
  @ApiProperty({ description: 'g, final dough (not the starter’s)' }) waterG: number;
  @ApiProperty({ description: 'g' }) starterG: number;
  @ApiPropertyOptional({ description: '%' }) starterHydrationPct?: number;
  @ApiPropertyOptional({ description: 'g' }) saltG?: number;
  @ApiPropertyOptional({ type: DoughEnrichmentDoc }) enrichment?: DoughEnrichmentDoc;
  @ApiPropertyOptional({ description: '°C during bulk' }) temperatureC?: number;
}

export class BakePlanPreviewView implements BakePlanPreview {
  @ApiProperty({ type: BakePlanDoc }) plan: BakePlanDoc;
  @ApiProperty({ type: PlanDoughDoc }) dough: PlanDoughDoc;
  @ApiProperty(BASIS) kineticsBasis: 'culture' | 'default';
}

class LiveBulkDoc {
  @ApiProperty({ enum: ['fermenting', 'done', 'not-reached'] }) status: LivePlan['bulk']['status'];
  @ApiProperty(TIME) endAt: string | null;
  @ApiProperty(TIME) low: string | null;
  @ApiProperty(TIME) high: string | null;
  @ApiProperty({ description: 'This dough’s pace relative to the model (1 = as modelled)' }) rateScale: number;
  @ApiProperty() readingsUsed: number;
}

class LiveTemperatureLeverDoc implements LiveTemperatureLever {
  @ApiProperty({ description: '°C, in half degrees within 18–30' }) doughTemperatureC: number;
  @ApiProperty() fromAt: string;
  @ApiProperty() bulkEndAt: string;
  @ApiProperty() reason: string;
}

class LivePlanDoc implements LivePlan {
  @ApiProperty() now: string;
  @ApiProperty({ type: PlanTimingDoc }) timing: PlanTimingDoc;
  @ApiProperty({ type: [PlanStepDoc] }) steps: PlanStepDoc[];
  @ApiProperty({ type: LiveBulkDoc }) bulk: LiveBulkDoc;
  @ApiProperty(TIME) readyAt: string | null;
  @ApiProperty({ type: LiveTemperatureLeverDoc, nullable: true, description: 'A spot to move the dough to now' })
  temperatureLever: LiveTemperatureLeverDoc | null;
  @ApiProperty({ type: [String] }) warnings: string[];
}

export class CheckedStepView implements CheckedStep {
  @ApiProperty({ example: 'mix' }) stepId: string;
  @ApiProperty() startedAt: string;
  @ApiProperty({ type: String, nullable: true, description: 'Null: the step’s planned length' })
  endedAt: string | null;
}

export class DoughReadingView implements DoughReading {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() takenAt: string;
  @ApiProperty({ type: Number, nullable: true, description: '°C' }) temperatureC: number | null;
  @ApiProperty({ type: Number, nullable: true, description: '% above the height at mixing' }) risePct: number | null;
  @ApiProperty() createdAt: string;
}

export class BakePlanViewDoc implements BakePlanView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: BAKE_PLAN_STATUSES }) status: BakePlanStatus;
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'Null once the formula is deleted' })
  formulaId: string | null;
  @ApiProperty({ type: String, nullable: true }) formulaName: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) cultureId: string | null;
  @ApiProperty({ type: String, nullable: true }) cultureName: string | null;
  @ApiProperty({ type: BakePlanSettingsDto }) settings: BakePlanSettingsDto;
  @ApiProperty({ type: PlanTimingDoc, description: 'The chosen option as created' }) timing: PlanTimingDoc;
  @ApiProperty(BASIS) kineticsBasis: 'culture' | 'default';
  @ApiProperty({ type: LivePlanDoc }) live: LivePlanDoc;
  @ApiProperty({ type: [CheckedStepView] }) checked: CheckedStepView[];
  @ApiProperty({ type: [DoughReadingView] }) readings: DoughReadingView[];
  @ApiProperty({ type: KitchenSummaryView, nullable: true, description: 'The kitchen logger’s series, if any' })
  kitchen: KitchenSummaryView | null;
  @ApiProperty() dairyOrEgg: boolean;
  @ApiProperty({ type: String, nullable: true }) notes: string | null;
  @ApiProperty({ type: Number, nullable: true }) rating: number | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) feedingId: string | null;
  @ApiProperty(TIME) finishedAt: string | null;
  @ApiProperty(TIME) cancelledAt: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

class BakePlanListItemDoc implements BakePlanListItem {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: BAKE_PLAN_STATUSES }) status: BakePlanStatus;
  @ApiProperty({ type: String, nullable: true }) formulaName: string | null;
  @ApiProperty({ type: String, nullable: true }) cultureName: string | null;
  @ApiProperty(TIME) readyAt: string | null;
  @ApiProperty() createdAt: string;
}

export class BakePlanListView implements BakePlanListResponse {
  @ApiProperty({ type: [BakePlanListItemDoc] }) items: BakePlanListItemDoc[];
  @ApiProperty() total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}
