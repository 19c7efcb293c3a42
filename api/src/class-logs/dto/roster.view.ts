import { ApiProperty } from '@nestjs/swagger';
import {
  ROSTER_FLAGS,
  type ClassProgressResponse,
  type ClassProgressSeries,
  type RosterFlag,
  type RosterResponse,
  type RosterRow,
} from '@peakwise/shared';

/** Documents the roster shapes in the OpenAPI reference; the types live in shared/. */
export class RosterRowView implements RosterRow {
  @ApiProperty({ format: 'uuid' }) studentId: string;
  @ApiProperty({ example: 'Dev Rowan' }) studentName: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) cultureId: string | null;
  @ApiProperty({ type: String, nullable: true, example: 'Pip' }) cultureName: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) lastFedAt: string | null;
  @ApiProperty({ type: Number, nullable: true, description: 'h' }) hoursSinceFed: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Time to peak of a 1:1:1 feeding at 24 °C, h' })
  hoursToPeakAtReference: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Peak height ÷ starting height' })
  riseMultiple: number | null;
  @ApiProperty({ enum: ['steady', 'faster', 'slower'], nullable: true }) trend: RosterRow['trend'];
  @ApiProperty({ enum: ROSTER_FLAGS, isArray: true }) flags: RosterFlag[];
}

export class RosterView implements RosterResponse {
  @ApiProperty({ type: [RosterRowView] }) items: RosterRowView[];
  @ApiProperty({ description: 'Rows matching the filter, on every page' }) total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}

export class ProgressPointView {
  @ApiProperty({ format: 'date-time' }) fedAt: string;
  @ApiProperty({ description: 'Observed time to peak restated at 1:1:1 and 24 °C, h' }) hoursToPeakAtReference: number;
}

export class ProgressSeriesView implements ClassProgressSeries {
  @ApiProperty({ format: 'uuid' }) studentId: string;
  @ApiProperty() studentName: string;
  @ApiProperty({ format: 'uuid' }) cultureId: string;
  @ApiProperty() cultureName: string;
  @ApiProperty({ type: [ProgressPointView], description: 'Completed feedings since the class began, oldest first' })
  points: ProgressPointView[];
}

export class ProgressView implements ClassProgressResponse {
  @ApiProperty({ type: [ProgressSeriesView] }) series: ProgressSeriesView[];
}
