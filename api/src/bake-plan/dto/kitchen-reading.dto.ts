import { ApiProperty } from '@nestjs/swagger';
import {
  TEMPERATURE_READINGS_MAX_PER_REQUEST,
  type CreateKitchenReadingsRequest,
  type KitchenReading,
} from '@peakwise/shared';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, ValidateNested } from 'class-validator';
import { IsLogTime, IsMeasure, TEMPERATURE } from '../../common/log-fields.js';

export class NewKitchenReadingDto implements KitchenReading {
  @ApiProperty({ format: 'date-time', description: 'From 24 h before the planned mix; not in the future' })
  @IsLogTime()
  takenAt: string;

  @ApiProperty({ minimum: -5, maximum: 50, description: 'The room, °C' })
  @IsMeasure(TEMPERATURE)
  temperatureC: number;
}

const MAX = TEMPERATURE_READINGS_MAX_PER_REQUEST;

export class CreateKitchenReadingsDto implements CreateKitchenReadingsRequest {
  @ApiProperty({ type: [NewKitchenReadingDto], minItems: 1, maxItems: MAX })
  @ValidateNested({ each: true, message: 'Each reading needs takenAt and temperatureC.' })
  @Type(() => NewKitchenReadingDto)
  @ArrayMaxSize(MAX, { message: `Send at most ${MAX} readings at once.` })
  @ArrayMinSize(1, { message: 'Send at least one reading.' })
  @IsArray({ message: 'Send the readings as a list.' })
  readings: NewKitchenReadingDto[];
}
