import { ApiProperty } from '@nestjs/swagger';
import type { RiseCheck, RiseCheckListResponse } from '@peakwise/shared';

/** Documents the RiseCheck shape in the OpenAPI reference; the type itself lives in shared/. */
export class RiseCheckView implements RiseCheck {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) feedingId: string;
  @ApiProperty({ format: 'date-time' }) takenAt: string;
  @ApiProperty({ description: "mm from the jar's base" }) heightMm: number;
  @ApiProperty({ type: Number, nullable: true, description: '°C' }) temperatureC: number | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time' }) updatedAt: string;
}

export class RiseCheckListView implements RiseCheckListResponse {
  @ApiProperty({ type: [RiseCheckView], description: 'Oldest first' }) items: RiseCheckView[];
  @ApiProperty() total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}
