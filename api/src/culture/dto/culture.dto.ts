import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  CULTURE_LOCATIONS,
  CULTURE_NAME_MAX_LENGTH,
  FLOUR_MAX_LENGTH,
  HYDRATION_MAX_PCT,
  NOTES_MAX_LENGTH,
  type CreateCultureRequest,
  type CultureLocation,
  type UpdateCultureRequest,
} from '@peakwise/shared';
import { IsBoolean, IsIn, IsUUID } from 'class-validator';
import { Omittable, Trim } from '../../common/dto-helpers.js';
import { Clearable, HYDRATION, IsCalendarDate, IsMeasure, IsText, TrimToNull } from '../../common/log-fields.js';

const NAME_MESSAGE = `Enter a name of 1 to ${CULTURE_NAME_MAX_LENGTH} characters.`;

/** The optional fields, shared by create and update. */
export class CultureFieldsDto implements Omit<CreateCultureRequest, 'name'> {
  @ApiPropertyOptional({ type: String, nullable: true, maxLength: NOTES_MAX_LENGTH })
  @TrimToNull()
  @Clearable()
  @IsText(1, NOTES_MAX_LENGTH, `Keep notes to ${NOTES_MAX_LENGTH} characters.`)
  notes?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: FLOUR_MAX_LENGTH, example: 'whole rye' })
  @TrimToNull()
  @Clearable()
  @IsText(1, FLOUR_MAX_LENGTH, `Describe the flour in at most ${FLOUR_MAX_LENGTH} characters.`)
  defaultFlour?: string | null;

  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    minimum: 0,
    exclusiveMinimum: true,
    maximum: HYDRATION_MAX_PCT,
    description: '%',
  })
  @Clearable()
  @IsMeasure(HYDRATION)
  defaultHydrationPct?: number | null;

  @ApiPropertyOptional({ enum: CULTURE_LOCATIONS, default: 'counter' })
  @Omittable()
  @IsIn(CULTURE_LOCATIONS, { message: 'Choose counter or fridge.' })
  location?: CultureLocation;

  @ApiPropertyOptional({ type: String, format: 'date', nullable: true, example: '2024-09-14' })
  @Clearable()
  @IsCalendarDate()
  startedOn?: string | null;

  @ApiPropertyOptional({ type: String, format: 'uuid', nullable: true, description: 'One of your cultures' })
  @Clearable()
  @IsUUID('all', { message: 'Not a valid culture id.' })
  parentCultureId?: string | null;
}

export class CreateCultureDto extends CultureFieldsDto implements CreateCultureRequest {
  @ApiProperty({ example: 'Bramble', maxLength: CULTURE_NAME_MAX_LENGTH })
  @Trim()
  @IsText(1, CULTURE_NAME_MAX_LENGTH, NAME_MESSAGE)
  name: string;
}

export class UpdateCultureDto extends CultureFieldsDto implements UpdateCultureRequest {
  @ApiPropertyOptional({ example: 'Bramble', maxLength: CULTURE_NAME_MAX_LENGTH })
  @Omittable()
  @Trim()
  @IsText(1, CULTURE_NAME_MAX_LENGTH, NAME_MESSAGE)
  name?: string;

  @ApiPropertyOptional({
    description: 'true archives the culture (keeping the first archive time), false brings it back',
  })
  @Omittable()
  @IsBoolean({ message: 'Send true or false.' })
  archived?: boolean;
}
