import { ApiPropertyOptional } from '@nestjs/swagger';
import { CULTURE_SORTS, type CultureListQuery, type CultureSort, type SortOrder } from '@peakwise/shared';
import { IsBoolean, IsIn, IsOptional } from 'class-validator';
import { PageQuery, QueryBoolean, SortOrderParam } from '../../common/page-query.js';

export class ListCulturesQuery extends PageQuery(50, 200) implements CultureListQuery {
  @ApiPropertyOptional({ description: 'true: archived only; false: active only; left out: both' })
  @IsOptional()
  @QueryBoolean()
  @IsBoolean({ message: 'archived must be true or false.' })
  archived?: boolean;

  @ApiPropertyOptional({ enum: CULTURE_SORTS, default: 'name' })
  @IsOptional()
  @IsIn(CULTURE_SORTS, { message: 'sort must be name or lastFedAt.' })
  sort: CultureSort = 'name';

  @SortOrderParam('Default: asc for name, desc (newest first, never fed last) for lastFedAt')
  order?: SortOrder;
}
