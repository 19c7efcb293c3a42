import { ApiProperty } from '@nestjs/swagger';
import type { DevPushListResponse, DevPushMessage } from '@peakwise/shared';

export class DevPushMessageView implements DevPushMessage {
  @ApiProperty({ format: 'date-time' }) receivedAt: string;
  @ApiProperty({ type: String, nullable: true }) device: string | null;
  @ApiProperty() title: string;
  @ApiProperty() body: string;
  @ApiProperty() url: string;
  @ApiProperty({ type: String, nullable: true }) urgency: string | null;
  @ApiProperty({ type: Number, nullable: true, description: 's' }) ttl: number | null;
}

export class DevPushListView implements DevPushListResponse {
  @ApiProperty({ type: [DevPushMessageView], description: 'Newest first' }) items: DevPushMessageView[];
}
