import { ApiPropertyOptional } from '@nestjs/swagger';
import { HEIGHT_MAX_MM, type CreateRiseCheckRequest, type UpdateRiseCheckRequest } from '@peakwise/shared';
import { ValidateIf } from 'class-validator';
import { Omittable } from '../../common/dto-helpers.js';
import {
  Clearable,
  HEIGHT,
  IsLogTime,
  IsMeasure,
  NotWith,
  TEMPERATURE,
  type MeasureRange,
} from '../../common/log-fields.js';

const ONE_HEIGHT = 'Send only one of heightMm, risePct or multiple.';
const RISE_PCT: MeasureRange = {
  min: -100,
  minExclusive: true,
  max: 900,
  message: 'Enter the rise in % above the initial height, above -100 and at most 900 (100 = doubled).',
};
const MULTIPLE: MeasureRange = {
  min: 0,
  minExclusive: true,
  max: 10,
  message: 'Enter the height as a multiple of the initial height, above 0 and at most 10 (2 = doubled).',
};

class RiseCheckFieldsDto {
  @ApiPropertyOptional({ format: 'date-time', description: 'Now when left out (create); not before fedAt' })
  @Omittable()
  @IsLogTime()
  takenAt?: string;

  @ApiPropertyOptional({ description: "% above the feeding's initial height (100 = doubled); instead of heightMm" })
  @Omittable()
  @IsMeasure(RISE_PCT)
  @NotWith(['heightMm', 'multiple'], ONE_HEIGHT)
  risePct?: number;

  @ApiPropertyOptional({ description: "× the feeding's initial height (2 = doubled); instead of heightMm" })
  @Omittable()
  @IsMeasure(MULTIPLE)
  @NotWith(['heightMm', 'risePct'], ONE_HEIGHT)
  multiple?: number;

  @ApiPropertyOptional({ type: Number, nullable: true, minimum: -5, maximum: 50, description: '°C' })
  @Clearable()
  @IsMeasure(TEMPERATURE)
  temperatureC?: number | null;
}

const HEIGHT_DOC = {
  type: Number,
  minimum: 0,
  exclusiveMinimum: true,
  maximum: HEIGHT_MAX_MM,
  description: "mm from the jar's base; or send risePct or multiple instead",
};

export class CreateRiseCheckDto extends RiseCheckFieldsDto implements CreateRiseCheckRequest {
  // Required unless risePct or multiple is sent.
  @ApiPropertyOptional(HEIGHT_DOC)
  @ValidateIf(
    (o: CreateRiseCheckDto) => o.heightMm !== undefined || (o.risePct === undefined && o.multiple === undefined),
  )
  @IsMeasure(HEIGHT)
  @NotWith(['risePct', 'multiple'], ONE_HEIGHT)
  heightMm?: number;
}

export class UpdateRiseCheckDto extends RiseCheckFieldsDto implements UpdateRiseCheckRequest {
  @ApiPropertyOptional(HEIGHT_DOC)
  @Omittable()
  @IsMeasure(HEIGHT)
  @NotWith(['risePct', 'multiple'], ONE_HEIGHT)
  heightMm?: number;
}
