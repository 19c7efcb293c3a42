import { ApiProperty } from '@nestjs/swagger';
import type {
  KitchenReading,
  KitchenReadingListResponse,
  KitchenReadingsAdded,
  KitchenSummary,
} from '@peakwise/shared';

export class KitchenReadingView implements KitchenReading {
  @ApiProperty({ format: 'date-time' }) takenAt: string;
  @ApiProperty({ description: 'The room, °C' }) temperatureC: number;
}

export class KitchenReadingListView implements KitchenReadingListResponse {
  @ApiProperty({ type: [KitchenReadingView], description: 'Oldest first' }) items: KitchenReadingView[];
}

export class KitchenReadingsAddedView implements KitchenReadingsAdded {
  @ApiProperty({ description: 'New readings stored; times already there are skipped' }) added: number;
  @ApiProperty({ description: 'The plan’s readings after this request' }) total: number;
}

export class KitchenSummaryView implements KitchenSummary {
  @ApiProperty() count: number;
  @ApiProperty({ format: 'date-time' }) firstAt: string;
  @ApiProperty({ format: 'date-time' }) lastAt: string;
}
