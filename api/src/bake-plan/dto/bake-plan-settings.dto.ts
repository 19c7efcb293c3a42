import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsObject, ValidateNested } from 'class-validator';
import {
  DOUGH_TEMPERATURE_MAX_C,
  DOUGH_TEMPERATURE_MIN_C,
  type BakePlanSettings,
  type FeedRatio,
  type PlanFolds,
  type PlanMode,
  type PlanOptionKind,
  type PlanOven,
  type PlanStarter,
  type PlanStepOptions,
  type QuietHours,
} from '@peakwise/shared';
import { Omittable } from '../../common/dto-helpers.js';
import { Clearable, IsMeasure } from '../../common/log-fields.js';
import { NotForProofKind, ReadyAtForMode } from './plan-validators.js';
import {
  ClockTime,
  Nested,
  OneOf,
  OptionalBoolean,
  OptionalNumber,
  OptionalWhole,
  RequiredNumber,
} from './plan-fields.js';

const DOUGH_C = [DOUGH_TEMPERATURE_MIN_C, DOUGH_TEMPERATURE_MAX_C] as const;
const DAY_MINUTES = 24 * 60;
export const PLAN_MODES = ['ready-at', 'start-now'] as const;
export const PLAN_OPTION_KINDS = ['same-day', 'overnight-retard'] as const;

export class QuietHoursDto implements QuietHours {
  @ClockTime('23:00') from: string;
  @ClockTime('06:30') until: string;
}

export class FeedRatioDto implements FeedRatio {
  @RequiredNumber(0, 1000, 'parts', true) starter: number;
  @RequiredNumber(0, 1000, 'parts') flour: number;
  @RequiredNumber(0, 1000, 'parts') water: number;
}

export class PlanStarterDto implements PlanStarter {
  @Nested(() => FeedRatioDto, 'Levain feeding in parts; default 1 : 2 : 2')
  ratio?: FeedRatioDto;

  @OptionalNumber(...DOUGH_C, '°C', 'Where the levain rises; default the dough temperature')
  temperatureC?: number;

  @OptionalBoolean('The starter is ripe already: no feeding step')
  skipFeeding?: boolean;
}

export class PlanFoldsDto implements PlanFolds {
  @OptionalWhole(0, 12, 'Sets of stretch-and-folds; default 4') sets?: number;
  @OptionalNumber(5, 240, 'min', 'Default 30') intervalMinutes?: number;
  @OptionalNumber(1, 60, 'min', 'Hands-on minutes per set; default 5') minutesEach?: number;
}

/** The room proof and the cold retard in one shape: `kind` says which fields apply. */
export class FinalProofDto {
  @ApiProperty({ enum: ['room', 'retard'] })
  @OneOf(['room', 'retard'])
  kind: 'room' | 'retard';

  @NotForProofKind('retard')
  @OptionalNumber(0, 24, 'h', 'Room proof only; default from the model', true)
  hours?: number;

  @NotForProofKind('retard')
  @OptionalNumber(...DOUGH_C, '°C', 'Room proof only; default the dough temperature')
  temperatureC?: number;

  @NotForProofKind('room')
  @OptionalNumber(-2, 12, '°C', 'Retard only; default 4')
  fridgeC?: number;

  @NotForProofKind('room')
  @OptionalNumber(0, 72, 'h', 'Retard only; default 8')
  minHours?: number;

  @NotForProofKind('room')
  @OptionalNumber(0, 72, 'h', 'Retard only; default 16')
  maxHours?: number;
}

export class PlanOvenDto implements PlanOven {
  @OptionalNumber(100, 320, '°C', 'Default 250') temperatureC?: number;
  @OptionalNumber(5, 300, 'min', 'Default 40') minMinutes?: number;
  @OptionalNumber(5, 300, 'min', 'Default 50') maxMinutes?: number;
}

export class PlanStepOptionsDto implements PlanStepOptions {
  @OptionalNumber(0, DAY_MINUTES, 'min') feedMinutes?: number;
  @OptionalNumber(0, DAY_MINUTES, 'min') mixMinutes?: number;
  @OptionalNumber(0, DAY_MINUTES, 'min', 'Rest or autolyse; 0 = none') restMinutes?: number;
  @OptionalBoolean('Salt after the rest (default) or in the mix') saltAfterRest?: boolean;
  @OptionalNumber(0, DAY_MINUTES, 'min') saltMinutes?: number;
  @Nested(() => PlanFoldsDto) folds?: PlanFoldsDto;
  @OptionalNumber(1, DAY_MINUTES, 'min') shapeMinutes?: number;
  @Nested(() => FinalProofDto) finalProof?: FinalProofDto;
  @OptionalNumber(0, DAY_MINUTES, 'min') preheatMinutes?: number;
  @Nested(() => PlanOvenDto) oven?: PlanOvenDto;
  @OptionalNumber(1, DAY_MINUTES, 'min') takeOutMinutes?: number;
  @OptionalNumber(0, DAY_MINUTES, 'min') coolMinutes?: number;
  @OptionalNumber(0, DAY_MINUTES, 'min') maxHoldMinutes?: number;
  @OptionalNumber(0, DAY_MINUTES, 'min') finishMinutes?: number;
}

export class BakePlanSettingsDto implements BakePlanSettings {
  @ApiProperty({ enum: PLAN_MODES })
  @OneOf(PLAN_MODES)
  mode: PlanMode;

  @ApiPropertyOptional({
    example: '2026-12-06T09:00:00+01:00',
    description: 'Bread ready to eat; required for "ready-at", left out for "start-now"',
  })
  @ReadyAtForMode()
  readyAt?: string;

  @ApiPropertyOptional({ type: QuietHoursDto, nullable: true, description: 'No hands-on steps inside; null = none' })
  @Clearable()
  @IsObject({ message: 'Send quiet hours as { from, until }, or null for none.' })
  @ValidateNested()
  @Type(() => QuietHoursDto)
  quietHours?: QuietHoursDto | null;

  @ApiProperty({ minimum: DOUGH_C[0], maximum: DOUGH_C[1], description: '°C during bulk' })
  @IsMeasure({
    min: DOUGH_C[0],
    max: DOUGH_C[1],
    message: `Enter a temperature from ${DOUGH_C[0]} to ${DOUGH_C[1]} °C.`,
  })
  doughTemperatureC: number;

  @Nested(() => PlanStarterDto) starter?: PlanStarterDto;
  @Nested(() => PlanStepOptionsDto) steps?: PlanStepOptionsDto;

  @ApiPropertyOptional({ enum: PLAN_OPTION_KINDS, description: 'Shown first when both fit; default same-day' })
  @Omittable()
  @OneOf(PLAN_OPTION_KINDS)
  prefer?: PlanOptionKind;
}
