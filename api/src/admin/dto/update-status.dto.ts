import { ApiProperty } from '@nestjs/swagger';
import type { UpdateAccountStatusRequest } from '@peakwise/shared';
import { IsBoolean } from 'class-validator';

export class UpdateStatusDto implements UpdateAccountStatusRequest {
  @ApiProperty({ description: 'true disables the account and ends its sessions; false enables it' })
  @IsBoolean({ message: 'Send true to disable the account or false to enable it.' })
  disabled: boolean;
}
