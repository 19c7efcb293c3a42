import { ApiProperty } from '@nestjs/swagger';
import {
  TEMPERATURE_READINGS_MAX_PER_REQUEST,
  type CreateTemperatureReadingsRequest,
  type NewTemperatureReading,
} from '@peakwise/shared';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, ValidateNested } from 'class-validator';
import { IsLogTime, IsMeasure, TEMPERATURE } from '../../common/log-fields.js';

export class NewTemperatureReadingDto implements NewTemperatureReading {
  @ApiProperty({ format: 'date-time', description: 'Not before the feeding’s fedAt' })
  @IsLogTime()
  takenAt: string;

  @ApiProperty({ minimum: -5, maximum: 50, description: '°C' })
  @IsMeasure(TEMPERATURE)
  temperatureC: number;
}

const MAX = TEMPERATURE_READINGS_MAX_PER_REQUEST;

export class CreateTemperatureReadingsDto implements CreateTemperatureReadingsRequest {
  @ApiProperty({ type: [NewTemperatureReadingDto], minItems: 1, maxItems: MAX, description: 'One or more readings' })
  @ValidateNested({ each: true, message: 'Each reading needs takenAt and temperatureC.' })
  @Type(() => NewTemperatureReadingDto)
  @ArrayMaxSize(MAX, { message: `Send at most ${MAX} readings at once.` })
  @ArrayMinSize(1, { message: 'Send at least one reading.' })
  @IsArray({ message: 'Send the readings as a list.' })
  readings: NewTemperatureReadingDto[];
}
