import { ApiProperty } from '@nestjs/swagger';
import { CULTURE_LOCATIONS, type Culture, type CultureListResponse, type CultureLocation } from '@peakwise/shared';

/** Documents the Culture shape in the OpenAPI reference; the type itself lives in shared/. */
export class CultureView implements Culture {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: 'Bramble' }) name: string;
  @ApiProperty({ type: String, nullable: true }) notes: string | null;
  @ApiProperty({ type: String, nullable: true, example: '80 % bread flour, 20 % whole rye' })
  defaultFlour: string | null;
  @ApiProperty({ type: Number, nullable: true, example: 100, description: '%' }) defaultHydrationPct: number | null;
  @ApiProperty({ enum: CULTURE_LOCATIONS }) location: CultureLocation;
  @ApiProperty({ type: String, format: 'date', nullable: true }) startedOn: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) parentCultureId: string | null;
  @ApiProperty() archived: boolean;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) archivedAt: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true, description: 'fedAt of the latest feeding' })
  lastFedAt: string | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time' }) updatedAt: string;
}

export class CultureListView implements CultureListResponse {
  @ApiProperty({ type: [CultureView] }) items: CultureView[];
  @ApiProperty({ description: 'Cultures matching the filter, on every page' }) total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}
