import { ApiProperty } from '@nestjs/swagger';
import type {
  TemperatureReading,
  TemperatureReadingBatchResponse,
  TemperatureReadingListResponse,
} from '@peakwise/shared';

/** Documents the TemperatureReading shape in the OpenAPI reference; the type lives in shared/. */
export class TemperatureReadingView implements TemperatureReading {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) feedingId: string;
  @ApiProperty({ format: 'date-time' }) takenAt: string;
  @ApiProperty({ description: '°C' }) temperatureC: number;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class TemperatureReadingBatchView implements TemperatureReadingBatchResponse {
  @ApiProperty({ type: [TemperatureReadingView], description: 'In the order sent' }) items: TemperatureReadingView[];
}

export class TemperatureReadingListView implements TemperatureReadingListResponse {
  @ApiProperty({ type: [TemperatureReadingView], description: 'Oldest first' }) items: TemperatureReadingView[];
  @ApiProperty() total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}
