import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Max, Min } from 'class-validator';

// class-validator runs decorators bottom-up and we report the first failure per field, so the
// type check sits lowest: "abc" is "not a whole number", not "greater than 200".
export class ListAccountsQuery {
  @ApiPropertyOptional({ default: 50, minimum: 1, maximum: 200 })
  @IsOptional()
  @Type(() => Number)
  @Max(200, { message: 'limit must be at most 200.' })
  @Min(1, { message: 'limit must be at least 1.' })
  @IsInt({ message: 'limit must be a whole number.' })
  limit = 50;

  @ApiPropertyOptional({ default: 0, minimum: 0 })
  @IsOptional()
  @Type(() => Number)
  @Min(0, { message: 'offset must be 0 or more.' })
  @IsInt({ message: 'offset must be a whole number.' })
  offset = 0;
}
