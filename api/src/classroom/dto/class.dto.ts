import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  CLASS_DESCRIPTION_MAX_LENGTH,
  CLASS_MAX_DAYS,
  CLASS_NAME_MAX_LENGTH,
  type CreateClassRequest,
  type UpdateClassRequest,
} from '@peakwise/shared';
import { IsBoolean } from 'class-validator';
import { Omittable, Trim } from '../../common/dto-helpers.js';
import { IsText } from '../../common/log-fields.js';
import { PageQuery } from '../../common/page-query.js';
import { IsClassDate, IsClassEnd } from './class-fields.js';

const NAME_MESSAGE = `Enter a class name of 1 to ${CLASS_NAME_MAX_LENGTH} characters.`;
const DESCRIPTION_MESSAGE = `Keep the description to ${CLASS_DESCRIPTION_MAX_LENGTH} characters.`;
const ENDS_ON = `Calendar date (YYYY-MM-DD), on or after startsOn; a class runs at most ${CLASS_MAX_DAYS} days, both ends counted`;

export class CreateClassDto implements CreateClassRequest {
  @ApiProperty({ example: 'Weekend Levain', maxLength: CLASS_NAME_MAX_LENGTH })
  @Trim()
  @IsText(1, CLASS_NAME_MAX_LENGTH, NAME_MESSAGE)
  name: string;

  @ApiPropertyOptional({ maxLength: CLASS_DESCRIPTION_MAX_LENGTH, default: '' })
  @Omittable()
  @Trim()
  @IsText(0, CLASS_DESCRIPTION_MAX_LENGTH, DESCRIPTION_MESSAGE)
  description?: string;

  @ApiProperty({ format: 'date', example: '2026-03-07', description: 'Calendar date (YYYY-MM-DD)' })
  @IsClassDate()
  startsOn: string;

  @ApiProperty({ format: 'date', example: '2026-04-25', description: ENDS_ON })
  @IsClassEnd()
  @IsClassDate()
  endsOn: string;
}

export class UpdateClassDto implements UpdateClassRequest {
  @ApiPropertyOptional({ maxLength: CLASS_NAME_MAX_LENGTH })
  @Omittable()
  @Trim()
  @IsText(1, CLASS_NAME_MAX_LENGTH, NAME_MESSAGE)
  name?: string;

  @ApiPropertyOptional({ maxLength: CLASS_DESCRIPTION_MAX_LENGTH })
  @Omittable()
  @Trim()
  @IsText(0, CLASS_DESCRIPTION_MAX_LENGTH, DESCRIPTION_MESSAGE)
  description?: string;

  @ApiPropertyOptional({ format: 'date', description: 'Calendar date (YYYY-MM-DD)' })
  @Omittable()
  @IsClassDate()
  startsOn?: string;

  @ApiPropertyOptional({ format: 'date', description: ENDS_ON })
  @Omittable()
  @IsClassEnd()
  @IsClassDate()
  endsOn?: string;

  @ApiPropertyOptional({
    description: 'true: a new join code (the old one stops working); false: joining by code off',
  })
  @Omittable()
  @IsBoolean({ message: 'joinCode must be true (a new code) or false (joining by code off).' })
  joinCode?: boolean;
}

/** Newest start first. */
export class ListClassesQuery extends PageQuery(50, 200) {}

/** Members by name. */
export class ListMembersQuery extends PageQuery(100, 500) {}

/** Newest invitation first. */
export class ListInvitesQuery extends PageQuery(100, 500) {}
