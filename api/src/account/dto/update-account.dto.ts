import { ApiPropertyOptional } from '@nestjs/swagger';
import {
  DISPLAY_NAME_MAX_LENGTH,
  TEMPERATURE_UNITS,
  UNIT_SYSTEMS,
  type TemperatureUnit,
  type UnitSystem,
  type UpdateAccountRequest,
} from '@peakwise/shared';
import { IsIn, IsString, Length } from 'class-validator';
import { IsTimeZone, Omittable, Trim } from '../../common/dto-helpers.js';

export class UpdateAccountDto implements UpdateAccountRequest {
  @ApiPropertyOptional()
  @Omittable()
  @Trim()
  @Length(1, DISPLAY_NAME_MAX_LENGTH, { message: `Enter a name of 1 to ${DISPLAY_NAME_MAX_LENGTH} characters.` })
  @IsString({ message: 'Enter your name.' })
  displayName?: string;

  @ApiPropertyOptional({ enum: UNIT_SYSTEMS })
  @Omittable()
  @IsIn(UNIT_SYSTEMS, { message: 'Choose metric or US units.' })
  unitSystem?: UnitSystem;

  @ApiPropertyOptional({ enum: TEMPERATURE_UNITS })
  @Omittable()
  @IsIn(TEMPERATURE_UNITS, { message: 'Choose °C or °F.' })
  temperatureUnit?: TemperatureUnit;

  @ApiPropertyOptional({ example: 'Europe/London' })
  @Omittable()
  @IsTimeZone()
  timeZone?: string;
}
