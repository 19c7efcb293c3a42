import { ApiProperty } from '@nestjs/swagger';
import type { PasswordResetRequested } from '@peakwise/shared';

export class PasswordResetRequestedView implements PasswordResetRequested {
  @ApiProperty({ enum: [true], description: 'The request was taken; says nothing about whether the account exists' })
  accepted: true;

  @ApiProperty({ example: 60, description: 'How long an e-mailed link works, in minutes' })
  expiresInMinutes: number;
}
