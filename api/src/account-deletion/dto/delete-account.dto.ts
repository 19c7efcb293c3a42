import { ApiProperty } from '@nestjs/swagger';
import type { DeleteAccountRequest } from '@peakwise/shared';
import { IsString, MaxLength, MinLength } from 'class-validator';

export class DeleteAccountDto implements DeleteAccountRequest {
  @ApiProperty({ description: 'The account’s password, asked again: deleting cannot be undone' })
  @MaxLength(1024, { message: 'Enter your password.' })
  @MinLength(1, { message: 'Enter your password.' })
  @IsString({ message: 'Enter your password.' })
  password: string;
}
