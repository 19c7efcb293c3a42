import { ApiPropertyOptional } from '@nestjs/swagger';
import {
  FEEDING_OBSERVATIONS,
  FLOUR_MAX_LENGTH,
  GRAMS_MAX,
  NOTES_MAX_LENGTH,
  parseRatio,
  type CreateFeedingRequest,
  type FeedingObservation,
  type UpdateFeedingRequest,
} from '@peakwise/shared';
import { ValidateIf, registerDecorator } from 'class-validator';
import { Omittable } from '../../common/dto-helpers.js';
import {
  Clearable,
  GRAMS,
  HEIGHT,
  IsLogTime,
  IsMeasure,
  IsText,
  NotWith,
  TEMPERATURE,
  TrimToNull,
  type MeasureRange,
} from '../../common/log-fields.js';

const TOTAL: MeasureRange = {
  min: 0,
  minExclusive: true,
  max: 3 * GRAMS_MAX,
  message: `Enter a total weight above 0 g and at most ${3 * GRAMS_MAX} g.`,
};
const BOTH_WAYS = 'Send either the three weights or a ratio with a total, not both.';

const usesRatio = (o: FeedingFieldsDto) => o.ratio !== undefined || o.totalG !== undefined;

const IsRatio = () => (object: object, propertyName: string) =>
  registerDecorator({
    name: 'isRatio',
    target: object.constructor,
    propertyName,
    options: { message: 'Enter a ratio starter:flour:water of numbers above 0, e.g. 1:2:2.' },
    validator: { validate: (value: unknown) => typeof value === 'string' && value.length <= 40 && !!parseRatio(value) },
  });

const IsObservationList = () => (object: object, propertyName: string) =>
  registerDecorator({
    name: 'isObservationList',
    target: object.constructor,
    propertyName,
    options: { message: `List each observation once, from: ${FEEDING_OBSERVATIONS.join(', ')}.` },
    validator: {
      validate: (value: unknown) =>
        Array.isArray(value) &&
        new Set(value).size === value.length &&
        value.every((item) => (FEEDING_OBSERVATIONS as readonly unknown[]).includes(item)),
    },
  });

const GRAMS_DOC = {
  type: Number,
  minimum: 0,
  exclusiveMinimum: true,
  maximum: GRAMS_MAX,
  description: 'g; or send ratio + totalG instead',
};

/** Everything but the three weights, which create requires and update does not. */
class FeedingFieldsDto {
  @ApiPropertyOptional({ format: 'date-time', description: 'Now when left out (create)' })
  @Omittable()
  @IsLogTime()
  fedAt?: string;

  @ApiPropertyOptional({ example: '1:2:2', description: 'starter:flour:water, with totalG; instead of the weights' })
  @ValidateIf(usesRatio)
  @IsRatio()
  ratio?: string;

  @ApiPropertyOptional({ minimum: 0, exclusiveMinimum: true, maximum: 3 * GRAMS_MAX, description: 'g, split by ratio' })
  @ValidateIf(usesRatio)
  @IsMeasure(TOTAL)
  totalG?: number;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: FLOUR_MAX_LENGTH, example: 'whole rye' })
  @TrimToNull()
  @Clearable()
  @IsText(1, FLOUR_MAX_LENGTH, `Describe the flour in at most ${FLOUR_MAX_LENGTH} characters.`)
  flour?: string | null;

  @ApiPropertyOptional({ type: Number, nullable: true, minimum: -5, maximum: 50, description: '°C' })
  @Clearable()
  @IsMeasure(TEMPERATURE)
  waterTemperatureC?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true, minimum: -5, maximum: 50, description: '°C, room or jar' })
  @Clearable()
  @IsMeasure(TEMPERATURE)
  temperatureC?: number | null;

  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    minimum: 0,
    exclusiveMinimum: true,
    maximum: 1000,
    description: 'mm',
  })
  @Clearable()
  @IsMeasure(HEIGHT)
  initialHeightMm?: number | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: NOTES_MAX_LENGTH })
  @TrimToNull()
  @Clearable()
  @IsText(1, NOTES_MAX_LENGTH, `Keep notes to ${NOTES_MAX_LENGTH} characters.`)
  notes?: string | null;

  @ApiPropertyOptional({ enum: FEEDING_OBSERVATIONS, isArray: true })
  @Omittable()
  @IsObservationList()
  observations?: FeedingObservation[];
}

export class CreateFeedingDto extends FeedingFieldsDto implements CreateFeedingRequest {
  // Required unless a ratio is sent; refused alongside one. NotWith sits lowest so it is reported first.
  @ApiPropertyOptional(GRAMS_DOC)
  @ValidateIf((o: CreateFeedingDto) => o.starterG !== undefined || !usesRatio(o))
  @IsMeasure(GRAMS)
  @NotWith(['ratio', 'totalG'], BOTH_WAYS)
  starterG?: number;

  @ApiPropertyOptional(GRAMS_DOC)
  @ValidateIf((o: CreateFeedingDto) => o.flourG !== undefined || !usesRatio(o))
  @IsMeasure(GRAMS)
  @NotWith(['ratio', 'totalG'], BOTH_WAYS)
  flourG?: number;

  @ApiPropertyOptional(GRAMS_DOC)
  @ValidateIf((o: CreateFeedingDto) => o.waterG !== undefined || !usesRatio(o))
  @IsMeasure(GRAMS)
  @NotWith(['ratio', 'totalG'], BOTH_WAYS)
  waterG?: number;
}

export class UpdateFeedingDto extends FeedingFieldsDto implements UpdateFeedingRequest {
  @ApiPropertyOptional(GRAMS_DOC)
  @Omittable()
  @IsMeasure(GRAMS)
  @NotWith(['ratio', 'totalG'], BOTH_WAYS)
  starterG?: number;

  @ApiPropertyOptional(GRAMS_DOC)
  @Omittable()
  @IsMeasure(GRAMS)
  @NotWith(['ratio', 'totalG'], BOTH_WAYS)
  flourG?: number;

  @ApiPropertyOptional(GRAMS_DOC)
  @Omittable()
  @IsMeasure(GRAMS)
  @NotWith(['ratio', 'totalG'], BOTH_WAYS)
  waterG?: number;
}
