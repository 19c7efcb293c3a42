import { ApiProperty } from '@nestjs/swagger';
import {
  ALERT_KINDS,
  ALERT_SUBJECT_TYPES,
  type Alert,
  type AlertKind,
  type AlertListResponse,
  type AlertSubjectType,
  type ReadAllAlertsResponse,
  type UnreadAlertCount,
} from '@peakwise/shared';

/** Documents the Alert shape in the OpenAPI reference; the type itself lives in shared/. */
export class AlertView implements Alert {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: ALERT_KINDS }) kind: AlertKind;
  @ApiProperty({ enum: ALERT_SUBJECT_TYPES }) subjectType: AlertSubjectType;
  @ApiProperty({ format: 'uuid', description: "The culture's or the bake plan's id" }) subjectId: string;
  @ApiProperty() title: string;
  @ApiProperty() body: string;
  @ApiProperty({ example: '/cultures/…', description: 'Where the alert leads in the web app' }) linkPath: string;
  @ApiProperty({ format: 'date-time' }) dueAt: string;
  @ApiProperty({ format: 'date-time', description: 'When it reached the app' }) deliveredAt: string;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) readAt: string | null;
}

export class AlertListView implements AlertListResponse {
  @ApiProperty({ type: [AlertView], description: 'Unread first, then newest due first' }) items: AlertView[];
  @ApiProperty() total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}

export class UnreadAlertCountView implements UnreadAlertCount {
  @ApiProperty() unread: number;
}

export class ReadAllAlertsView implements ReadAllAlertsResponse {
  @ApiProperty({ description: 'How many alerts this call marked read' }) marked: number;
}
