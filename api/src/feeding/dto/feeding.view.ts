import { ApiProperty } from '@nestjs/swagger';
import {
  FEEDING_OBSERVATIONS,
  type Feeding,
  type FeedingListResponse,
  type FeedingObservation,
} from '@peakwise/shared';

/** Documents the Feeding shape in the OpenAPI reference; the type itself lives in shared/. */
export class FeedingView implements Feeding {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) cultureId: string;
  @ApiProperty({ format: 'date-time' }) fedAt: string;
  @ApiProperty({ description: 'g' }) starterG: number;
  @ApiProperty({ description: 'g' }) flourG: number;
  @ApiProperty({ description: 'g' }) waterG: number;
  @ApiProperty({ type: String, nullable: true }) flour: string | null;
  @ApiProperty({ type: Number, nullable: true, description: '°C' }) waterTemperatureC: number | null;
  @ApiProperty({ type: Number, nullable: true, description: '°C, room or jar' }) temperatureC: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'mm from the jar base' }) initialHeightMm: number | null;
  @ApiProperty({ type: String, nullable: true }) notes: string | null;
  @ApiProperty({ enum: FEEDING_OBSERVATIONS, isArray: true }) observations: FeedingObservation[];
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time' }) updatedAt: string;
}

export class FeedingListView implements FeedingListResponse {
  @ApiProperty({ type: [FeedingView] }) items: FeedingView[];
  @ApiProperty({ description: "All of the culture's feedings, on every page" }) total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}
