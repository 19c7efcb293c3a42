import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ALIQUOT_RISE_MAX_PCT,
  BAKE_PLAN_NAME_MAX_LENGTH,
  BAKE_PLAN_NOTES_MAX_LENGTH,
  BAKE_PLAN_RATING_MAX,
  BAKE_PLAN_RATING_MIN,
  BAKE_PLAN_STATUSES,
  DOUGH_TEMPERATURE_MAX_C,
  DOUGH_TEMPERATURE_MIN_C,
  type BakePlanListQuery,
  type BakePlanStatus,
  type CheckOffStepRequest,
  type CreateBakePlanRequest,
  type CreateDoughReadingRequest,
  type FinishBakePlanRequest,
  type PlanOptionKind,
  type PreviewBakePlanRequest,
  type UpdateBakePlanRequest,
} from '@peakwise/shared';
import { IsIn, IsInt, IsOptional, IsUUID, Max, Min } from 'class-validator';
import { Omittable, Trim } from '../../common/dto-helpers.js';
import { Clearable, IsLogTime, IsMeasure, IsText, TrimToNull } from '../../common/log-fields.js';
import { PageQuery } from '../../common/page-query.js';
import { BakePlanSettingsDto, PLAN_OPTION_KINDS } from './bake-plan-settings.dto.js';
import { OneOf, OptionalBoolean } from './plan-fields.js';

const NAME_MESSAGE = `Enter a name of 1 to ${BAKE_PLAN_NAME_MAX_LENGTH} characters.`;
const NOTES_MESSAGE = `Keep notes to ${BAKE_PLAN_NOTES_MAX_LENGTH} characters.`;
const RATING_MESSAGE = `Rate it with a whole number from ${BAKE_PLAN_RATING_MIN} to ${BAKE_PLAN_RATING_MAX}.`;
const NOT_AN_ID = 'Not a valid id.';

export class PreviewBakePlanDto extends BakePlanSettingsDto implements PreviewBakePlanRequest {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: NOT_AN_ID })
  formulaId: string;

  @ApiPropertyOptional({ type: String, format: 'uuid', nullable: true, description: 'Its own kinetics time the plan' })
  @Clearable()
  @IsUUID('all', { message: NOT_AN_ID })
  cultureId?: string | null;
}

export class CreateBakePlanDto extends PreviewBakePlanDto implements CreateBakePlanRequest {
  @ApiPropertyOptional({ maxLength: BAKE_PLAN_NAME_MAX_LENGTH, description: 'Default: the formula and the ready time' })
  @Omittable()
  @Trim()
  @IsText(1, BAKE_PLAN_NAME_MAX_LENGTH, NAME_MESSAGE)
  name?: string;

  @ApiProperty({ enum: PLAN_OPTION_KINDS })
  @OneOf(PLAN_OPTION_KINDS)
  option: PlanOptionKind;

  @OptionalBoolean('Follow the temperature lever’s timing (same-day only)')
  useTemperatureLever?: boolean;
}

export class UpdateBakePlanDto implements UpdateBakePlanRequest {
  @ApiPropertyOptional({ maxLength: BAKE_PLAN_NAME_MAX_LENGTH })
  @Omittable()
  @Trim()
  @IsText(1, BAKE_PLAN_NAME_MAX_LENGTH, NAME_MESSAGE)
  name?: string;

  @ApiPropertyOptional({ enum: ['cancelled'], description: 'Only cancelling is done here' })
  @Omittable()
  @IsIn(['cancelled'], { message: 'Only "cancelled" can be set here; finish a plan through /finish.' })
  status?: 'cancelled';
}

export class CheckOffStepDto implements CheckOffStepRequest {
  @ApiPropertyOptional({ example: '2026-12-05T08:10:00Z', description: 'Default: endedAt, else now' })
  @Omittable()
  @IsLogTime()
  startedAt?: string;

  @ApiPropertyOptional({
    example: '2026-12-05T08:20:00Z',
    description: 'Default: now when startedAt is left out too, else the step’s planned length',
  })
  @Omittable()
  @IsLogTime()
  endedAt?: string;
}

export class CreateDoughReadingDto implements CreateDoughReadingRequest {
  @ApiProperty({ example: '2026-12-05T11:00:00Z' })
  @IsLogTime()
  takenAt: string;

  @ApiPropertyOptional({ minimum: DOUGH_TEMPERATURE_MIN_C, maximum: DOUGH_TEMPERATURE_MAX_C, description: '°C' })
  @Omittable()
  @IsMeasure({
    min: DOUGH_TEMPERATURE_MIN_C,
    max: DOUGH_TEMPERATURE_MAX_C,
    message: `Enter a dough temperature from ${DOUGH_TEMPERATURE_MIN_C} to ${DOUGH_TEMPERATURE_MAX_C} °C.`,
  })
  temperatureC?: number;

  @ApiPropertyOptional({ minimum: 0, maximum: ALIQUOT_RISE_MAX_PCT, description: '% above the height at mixing' })
  @Omittable()
  @IsMeasure({ min: 0, max: ALIQUOT_RISE_MAX_PCT, message: `Enter a rise from 0 to ${ALIQUOT_RISE_MAX_PCT} %.` })
  risePct?: number;
}

export class FinishBakePlanDto implements FinishBakePlanRequest {
  @ApiPropertyOptional({ type: String, nullable: true, maxLength: BAKE_PLAN_NOTES_MAX_LENGTH })
  @TrimToNull()
  @Clearable()
  @IsText(1, BAKE_PLAN_NOTES_MAX_LENGTH, NOTES_MESSAGE)
  notes?: string | null;

  @ApiPropertyOptional({ type: Number, nullable: true, minimum: BAKE_PLAN_RATING_MIN, maximum: BAKE_PLAN_RATING_MAX })
  @Clearable()
  @Max(BAKE_PLAN_RATING_MAX, { message: RATING_MESSAGE })
  @Min(BAKE_PLAN_RATING_MIN, { message: RATING_MESSAGE })
  @IsInt({ message: RATING_MESSAGE })
  rating?: number | null;

  @ApiPropertyOptional({ type: String, format: 'uuid', nullable: true, description: 'A feeding of the plan’s culture' })
  @Clearable()
  @IsUUID('all', { message: NOT_AN_ID })
  feedingId?: string | null;
}

/** Newest first. */
export class ListBakePlansQuery extends PageQuery(20, 100) implements BakePlanListQuery {
  @ApiPropertyOptional({ enum: BAKE_PLAN_STATUSES })
  @IsOptional()
  @IsIn(BAKE_PLAN_STATUSES, { message: `Choose one of: ${BAKE_PLAN_STATUSES.join(', ')}.` })
  status?: BakePlanStatus;
}
