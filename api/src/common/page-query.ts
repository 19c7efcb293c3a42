import { applyDecorators } from '@nestjs/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, Max, Min } from 'class-validator';
import { SORT_ORDERS } from '@peakwise/shared';

/**
 * limit/offset query parameters with a list's own default and ceiling. Lowest decorator first:
 * class-validator reports the first failure, so "abc" is "not a whole number", not "too large".
 */
export function PageQuery(defaultLimit: number, maxLimit: number) {
  class PageQueryDto {
    @ApiPropertyOptional({ type: Number, default: defaultLimit, minimum: 1, maximum: maxLimit })
    @IsOptional()
    @Type(() => Number)
    @Max(maxLimit, { message: `limit must be at most ${maxLimit}.` })
    @Min(1, { message: 'limit must be at least 1.' })
    @IsInt({ message: 'limit must be a whole number.' })
    limit: number = defaultLimit;

    @ApiPropertyOptional({ type: Number, default: 0, minimum: 0 })
    @IsOptional()
    @Type(() => Number)
    @Min(0, { message: 'offset must be 0 or more.' })
    @IsInt({ message: 'offset must be a whole number.' })
    offset = 0;
  }
  return PageQueryDto;
}

/** A sort order parameter; the list decides what "left out" means. */
export const SortOrderParam = (description: string) =>
  applyDecorators(
    ApiPropertyOptional({ enum: SORT_ORDERS, description }),
    IsOptional(),
    IsIn(SORT_ORDERS, { message: 'order must be asc or desc.' }),
  );

/** Query strings carry text: "true"/"false" become booleans, anything else stays and is refused. */
export const QueryBoolean = () =>
  Transform(({ value }: { value: unknown }) => (value === 'true' ? true : value === 'false' ? false : value));
