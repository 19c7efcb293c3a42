import { ApiPropertyOptional } from '@nestjs/swagger';
import {
  ROSTER_FLAGS,
  ROSTER_SORTS,
  type RosterFlag,
  type RosterQuery,
  type RosterSort,
  type SortOrder,
} from '@peakwise/shared';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { PageQuery, SortOrderParam } from '../../common/page-query.js';

/** A class is a few dozen students; one page usually holds the whole roster. */
export class RosterQueryDto extends PageQuery(50, 200) implements RosterQuery {
  @ApiPropertyOptional({
    enum: ROSTER_SORTS,
    default: 'sluggish',
    description: 'sluggish: cultures falling behind first',
  })
  @IsOptional()
  @IsIn(ROSTER_SORTS, { message: `sort must be one of: ${ROSTER_SORTS.join(', ')}.` })
  sort?: RosterSort;

  @SortOrderParam('Default: asc for student and lastFed (longest ago first) and riseMultiple; desc otherwise')
  order?: SortOrder;

  @ApiPropertyOptional({ enum: ROSTER_FLAGS, description: 'Only rows with this flag' })
  @IsOptional()
  @IsIn(ROSTER_FLAGS, { message: `flag must be one of: ${ROSTER_FLAGS.join(', ')}.` })
  flag?: RosterFlag;

  @ApiPropertyOptional({ description: 'Part of a student’s or culture’s name', maxLength: 120 })
  @IsOptional()
  @IsString({ message: 'q must be text.' })
  @MaxLength(120, { message: 'q must be at most 120 characters.' })
  q?: string;
}

/** The CSV takes the same filter and order, and returns every row. */
export class RosterCsvQueryDto implements RosterQuery {
  @ApiPropertyOptional({ enum: ROSTER_SORTS, default: 'sluggish' })
  @IsOptional()
  @IsIn(ROSTER_SORTS, { message: `sort must be one of: ${ROSTER_SORTS.join(', ')}.` })
  sort?: RosterSort;

  @SortOrderParam('As for the roster')
  order?: SortOrder;

  @ApiPropertyOptional({ enum: ROSTER_FLAGS })
  @IsOptional()
  @IsIn(ROSTER_FLAGS, { message: `flag must be one of: ${ROSTER_FLAGS.join(', ')}.` })
  flag?: RosterFlag;

  @ApiPropertyOptional({ maxLength: 120 })
  @IsOptional()
  @IsString({ message: 'q must be text.' })
  @MaxLength(120, { message: 'q must be at most 120 characters.' })
  q?: string;
}
