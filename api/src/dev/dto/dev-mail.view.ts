import { ApiProperty } from '@nestjs/swagger';
import type { DevMailListResponse, DevMailMessage } from '@peakwise/shared';

export class DevMailMessageView implements DevMailMessage {
  @ApiProperty({ type: [String] })
  to: string[];

  @ApiProperty()
  from: string;

  @ApiProperty()
  subject: string;

  @ApiProperty({ format: 'date-time', description: 'When the fake server received it' })
  date: string;

  @ApiProperty()
  text: string;

  @ApiProperty({ type: String, nullable: true })
  html: string | null;

  @ApiProperty({ type: String, nullable: true, example: '<3f…@peakwise.invalid>' })
  messageId: string | null;
}

export class DevMailListView implements DevMailListResponse {
  @ApiProperty({ type: [DevMailMessageView], description: 'Newest first' })
  items: DevMailMessageView[];
}
